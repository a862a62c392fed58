package org.congener.streams;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Properties;

import org.apache.kafka.common.serialization.StringDeserializer;
import org.apache.kafka.common.serialization.StringSerializer;
import org.apache.kafka.streams.StreamsBuilder;
import org.apache.kafka.streams.StreamsConfig;
import org.apache.kafka.streams.TestInputTopic;
import org.apache.kafka.streams.TestOutputTopic;
import org.apache.kafka.streams.TopologyTestDriver;
import org.congener.core.fusion.FusionSettings;
import org.congener.core.fusion.OneResearcherScoring;
import org.congener.core.interactions.InteractionWeights;
import org.congener.schemas.CatalogEntry;
import org.congener.schemas.ItemFactors;
import org.congener.schemas.ItemNeighbours;
import org.congener.schemas.ModelManifest;
import org.congener.schemas.Neighbour;
import org.congener.schemas.Researcher;
import org.congener.schemas.Suggestion;
import org.congener.schemas.SuggestionSource;
import org.congener.schemas.Suggestions;
import org.congener.schemas.UsageEvent;
import org.congener.schemas.UsageKind;
import org.congener.streams.model.LiveModel;
import org.congener.streams.model.ModelAssembler;
import org.congener.streams.state.InteractionProfile;
import org.congener.streams.processor.DeadLetteringDeserializationHandler;
import org.congener.streams.processor.DeadLetteringProcessingHandler;
import org.congener.streams.processor.SuggestionProcessor;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Model versions through the topology: cold start, completeness, switching, rollback and the filters. */
class LiveModelTopologyTest {

    private static final List<String> COMPOUNDS =
            List.of("c-acetone", "c-ethanol", "c-precursor", "c-retired", "c-toluene");
    private static final Map<String, List<Neighbour>> NEIGHBOURS = Map.of(
            "c-ethanol", ModelVersions.list("c-newcomer", 0.9, "c-acetone", 0.7, "c-precursor", 0.6, "c-retired", 0.5),
            "c-acetone", ModelVersions.list("c-ethanol", 0.7, "c-toluene", 0.3),
            "c-toluene", ModelVersions.list("c-precursor", 0.4, "c-acetone", 0.3),
            "c-precursor", ModelVersions.list("c-ethanol", 0.6, "c-toluene", 0.4),
            "c-retired", ModelVersions.list("c-ethanol", 0.5),
            // a new compound with no factors yet, reachable through semantics only
            "c-newcomer", ModelVersions.list("c-ethanol", 0.9));
    private static final List<ModelVersions.Use> USES = List.of(
            new ModelVersions.Use("u1", "c-ethanol", 2), new ModelVersions.Use("u1", "c-acetone", 1),
            new ModelVersions.Use("u2", "c-acetone", 1), new ModelVersions.Use("u2", "c-toluene", 2),
            new ModelVersions.Use("u3", "c-toluene", 1), new ModelVersions.Use("u3", "c-precursor", 1),
            new ModelVersions.Use("u4", "c-ethanol", 1), new ModelVersions.Use("u4", "c-precursor", 2));

    @TempDir
    Path stateDir;

    private TopologyTestDriver driver;
    private ModelAssembler models;
    private TestInputTopic<String, String> usage;
    private TestInputTopic<String, ItemFactors> factors;
    private TestInputTopic<String, ItemNeighbours> neighbours;
    private TestInputTopic<String, ModelManifest> manifests;
    private TestInputTopic<String, CatalogEntry> catalog;
    private TestOutputTopic<String, Suggestions> suggestions;
    private int sequence;

    private TestInputTopic<String, org.congener.schemas.InventoryEvent> inventory;

    @BeforeEach
    void start() {
        start(false);
    }

    private void start(boolean inStockOnly) {
        start(inStockOnly, null);
    }

    private void start(boolean inStockOnly, org.congener.streams.model.SharedTerms sharedTerms) {
        start(inStockOnly, sharedTerms, SuggestionProcessor.Batching.NONE);
    }

    private void start(boolean inStockOnly, org.congener.streams.model.SharedTerms sharedTerms,
                       SuggestionProcessor.Batching batching) {
        if (driver != null) {
            driver.close();
        }
        sequence = 0;
        StreamsBuilder builder = new StreamsBuilder();
        models = SuggestionTopology.build(builder,
                new SuggestionTopology.Settings("lab.", 4, Duration.ofDays(30), inStockOnly, batching), sharedTerms);
        Properties props = new Properties();
        props.put(StreamsConfig.APPLICATION_ID_CONFIG, "live-model-test");
        props.put(StreamsConfig.BOOTSTRAP_SERVERS_CONFIG, "unused:9092");
        props.put(StreamsConfig.STATE_DIR_CONFIG, stateDir.toString());
        props.put(StreamsConfig.DESERIALIZATION_EXCEPTION_HANDLER_CLASS_CONFIG, DeadLetteringDeserializationHandler.class);
        props.put(StreamsConfig.PROCESSING_EXCEPTION_HANDLER_CLASS_CONFIG, DeadLetteringProcessingHandler.class);
        props.put(DeadLetteringDeserializationHandler.TOPIC_PREFIX_CONFIG, "lab.");
        driver = new TopologyTestDriver(builder.build(), props);
        StringSerializer keys = new StringSerializer();
        catalog = driver.createInputTopic("lab.catalog", keys, Fixtures.TOPICS.catalog().valueSerde().serializer());
        Fixtures.catalog().forEach(e -> catalog.pipeInput(e.compoundId(), e));
        catalog.pipeInput("c-newcomer", Fixtures.compound("c-newcomer", "newcomer", List.of(), true));
        TestInputTopic<String, Researcher> researchers = driver.createInputTopic("lab.researchers", keys,
                Fixtures.TOPICS.researchers().valueSerde().serializer());
        Fixtures.researchers().forEach(r -> researchers.pipeInput(r.researcherId(), r));
        factors = driver.createInputTopic("lab.model-item-factors", keys,
                Fixtures.TOPICS.modelItemFactors().valueSerde().serializer());
        neighbours = driver.createInputTopic("lab.item-neighbours", keys,
                Fixtures.TOPICS.itemNeighbours().valueSerde().serializer());
        manifests = driver.createInputTopic("lab.model-manifests", keys,
                Fixtures.TOPICS.modelManifests().valueSerde().serializer());
        usage = driver.createInputTopic("lab.usage-events", keys, keys);
        inventory = driver.createInputTopic("lab.inventory-events", keys,
                Fixtures.TOPICS.inventoryEvents().valueSerde().serializer());
        suggestions = driver.createOutputTopic("lab.suggestions", new StringDeserializer(),
                Fixtures.TOPICS.suggestions().valueSerde().deserializer());
    }

    @AfterEach
    void stop() {
        driver.close();
    }

    private static ModelVersions.Version version(String name, FusionSettings fusion, long seed) {
        return ModelVersions.train(name, COMPOUNDS, USES, NEIGHBOURS, fusion, 2, seed);
    }

    private void publish(ModelVersions.Version v) {
        v.factors().forEach(f -> factors.pipeInput(ModelVersions.Version.key(v.name(), f.compoundId()), f));
        v.neighbours().forEach(n -> neighbours.pipeInput(ModelVersions.Version.key(v.name(), n.compoundId()), n));
        manifests.pipeInput(v.name(), v.manifest());
        manifests.pipeInput(ModelAssembler.CURRENT_KEY, v.manifest());
    }

    private Suggestions send(String researcher, String compound, UsageKind kind) {
        pipe(researcher, compound, kind);
        List<Suggestions> out = suggestions.readValuesToList();
        return out.get(out.size() - 1);
    }

    /** One usage event in, its list not read (with batching it may not be out yet). */
    private void pipe(String researcher, String compound, UsageKind kind) {
        UsageEvent event = Fixtures.event("e" + (++sequence), researcher, compound, kind,
                "2026-01-02T10:00:" + String.format("%02d", sequence % 60) + "Z");
        usage.pipeInput(researcher, Fixtures.json(event));
    }

    /** The lists out so far, without the time each was made (which differs from run to run). */
    private List<Suggestions> listsOut() {
        return suggestions.readValuesToList().stream()
                .map(l -> new Suggestions(l.schema(), l.researcherId(), l.modelVersion(), l.source(),
                        l.causedByEventId(), "", l.items(), l.caution()))
                .toList();
    }

    /** Events of four researchers, two of them twice, under one version. */
    private static final List<List<String>> MIXED_EVENTS = List.of(
            List.of("ada", "c-ethanol", "ORDER"), List.of("ben", "c-acetone", "ORDER"),
            List.of("ada", "c-toluene", "VIEW"), List.of("cyd", "c-ethanol", "ORDER"),
            List.of("ben", "c-ethanol", "WITHDRAWAL"), List.of("dee", "c-acetone", "ORDER"));

    @Test
    void shouldPublishEachEventsOwnListInOrderAndTheSameListsWhenEventsAreScoredInBatches() {
        publish(version("v0001", FusionSettings.blend(0.5), 1));
        for (List<String> e : MIXED_EVENTS) {
            pipe(e.get(0), e.get(1), UsageKind.valueOf(e.get(2)));
        }
        List<Suggestions> oneByOne = listsOut();
        assertEquals(MIXED_EVENTS.size(), oneByOne.size(), "without batching every event's list is out at once");

        start(false, null, new SuggestionProcessor.Batching(4, Duration.ofHours(1)));
        publish(version("v0001", FusionSettings.blend(0.5), 1));
        for (int t = 0; t < 3; t++) {
            List<String> e = MIXED_EVENTS.get(t);
            pipe(e.get(0), e.get(1), UsageKind.valueOf(e.get(2)));
        }
        assertTrue(suggestions.isEmpty(), "three events wait for a fourth or for the wait to pass");
        List<String> fourth = MIXED_EVENTS.get(3);
        pipe(fourth.get(0), fourth.get(1), UsageKind.valueOf(fourth.get(2)));
        List<Suggestions> batched = new ArrayList<>(listsOut());
        assertEquals(List.of("e1", "e2", "e3", "e4"), batched.stream().map(Suggestions::causedByEventId).toList(),
                "a full batch publishes every event's list, in event order");
        for (int t = 4; t < MIXED_EVENTS.size(); t++) {
            List<String> e = MIXED_EVENTS.get(t);
            pipe(e.get(0), e.get(1), UsageKind.valueOf(e.get(2)));
        }
        assertTrue(suggestions.isEmpty());
        driver.advanceWallClockTime(Duration.ofHours(1));
        batched.addAll(listsOut());
        // the same scores to the bit: each event folded in as it came, CF scores from the shared pass
        assertEquals(oneByOne, batched);
        try (var pending = driver.<String, String>getKeyValueStore(SuggestionTopology.PENDING_LISTS_STORE).all()) {
            assertFalse(pending.hasNext(), "no list left pending");
        }
    }

    @Test
    void shouldPublishAWaitingBatchUnderItsOwnVersionWhenTheNextEventComesUnderANewOne() {
        start(false, null, new SuggestionProcessor.Batching(8, Duration.ofHours(1)));
        publish(version("v0001", FusionSettings.blend(0.5), 1));
        pipe("ada", "c-ethanol", UsageKind.ORDER);
        pipe("ben", "c-acetone", UsageKind.ORDER);
        publish(version("v0002", FusionSettings.product(), 2));
        assertTrue(suggestions.isEmpty(), "a new version alone publishes nothing");

        pipe("cyd", "c-ethanol", UsageKind.ORDER);
        List<Suggestions> first = listsOut();
        assertEquals(List.of("e1", "e2"), first.stream().map(Suggestions::causedByEventId).toList());
        assertEquals(List.of("v0001", "v0001"), first.stream().map(Suggestions::modelVersion).toList(),
                "the waiting events keep the version they were folded in under");
        driver.advanceWallClockTime(Duration.ofHours(1));
        Suggestions third = listsOut().get(0);
        assertEquals("e3", third.causedByEventId());
        assertEquals("v0002", third.modelVersion());
    }

    private static List<String> ids(Suggestions s) {
        return s.items().stream().map(Suggestion::compoundId).toList();
    }

    @Test
    void shouldFlagColdStartWhenNoVersionIsLive() {
        Suggestions s = send("ada", "c-ethanol", UsageKind.ORDER);
        assertNull(s.modelVersion());
        assertEquals(SuggestionSource.POPULARITY, s.source());
    }

    @Test
    void shouldKeepColdStartUntilEveryRecordOfTheCurrentVersionIsPresent() {
        ModelVersions.Version v1 = version("v0001", FusionSettings.blend(0.5), 1);
        v1.factors().forEach(f -> factors.pipeInput(ModelVersions.Version.key("v0001", f.compoundId()), f));
        manifests.pipeInput(ModelAssembler.CURRENT_KEY, v1.manifest());
        assertNull(send("ada", "c-ethanol", UsageKind.ORDER).modelVersion(), "neighbour records still missing");

        v1.neighbours().forEach(n -> neighbours.pipeInput(ModelVersions.Version.key("v0001", n.compoundId()), n));
        Suggestions s = send("ada", "c-ethanol", UsageKind.VIEW);
        assertEquals("v0001", s.modelVersion());
        assertEquals(SuggestionSource.HYBRID, s.source());
    }

    @Test
    void shouldKeepAVersionOffWhenItsFactorRecordsDoNotMatchTheManifestChecksum() {
        ModelVersions.Version v1 = version("v0001", FusionSettings.blend(0.5), 1);
        publish(v1);
        assertEquals("v0001", send("ada", "c-ethanol", UsageKind.ORDER).modelVersion());

        // v0002 arrives complete, but one factor record is not the one its manifest was written for
        ModelVersions.Version v2 = version("v0002", FusionSettings.blend(0.5), 2);
        List<ItemFactors> altered = new ArrayList<>(v2.factors());
        ItemFactors first = altered.get(0);
        float[] changed = first.factors().clone();
        changed[0] += 0.5f;
        altered.set(0, new ItemFactors(first.schema(), first.version(), first.compoundId(), changed));
        altered.forEach(f -> factors.pipeInput(ModelVersions.Version.key("v0002", f.compoundId()), f));
        v2.neighbours().forEach(n -> neighbours.pipeInput(ModelVersions.Version.key("v0002", n.compoundId()), n));
        manifests.pipeInput(ModelAssembler.CURRENT_KEY, v2.manifest());
        assertEquals("v0001", send("ada", "c-acetone", UsageKind.VIEW).modelVersion(), "checksum mismatch: v0001 stays");

        // the right record arrives (a republish): the checksum matches and v0002 goes live
        factors.pipeInput(ModelVersions.Version.key("v0002", first.compoundId()), first);
        assertEquals("v0002", send("ada", "c-acetone", UsageKind.VIEW).modelVersion());
    }

    @Test
    void shouldScoreUnderTheNewVersionAtTheNextEventAndGoBackOnRollback() {
        ModelVersions.Version v1 = version("v0001", FusionSettings.blend(0.5), 1);
        ModelVersions.Version v2 = version("v0002", FusionSettings.product(), 2);
        publish(v1);
        assertEquals("v0001", send("ada", "c-ethanol", UsageKind.ORDER).modelVersion());

        // v0002's factors arrive, its manifest is not current yet: v0001 stays live
        v2.factors().forEach(f -> factors.pipeInput(ModelVersions.Version.key("v0002", f.compoundId()), f));
        v2.neighbours().forEach(n -> neighbours.pipeInput(ModelVersions.Version.key("v0002", n.compoundId()), n));
        assertEquals("v0001", send("ada", "c-acetone", UsageKind.VIEW).modelVersion());

        manifests.pipeInput(ModelAssembler.CURRENT_KEY, v2.manifest());
        assertEquals("v0002", send("ada", "c-acetone", UsageKind.VIEW).modelVersion());
        // the kept vector now belongs to v0002 and is its exact fold-in of ada's strengths
        org.apache.kafka.streams.state.KeyValueStore<String, InteractionProfile> profiles =
                driver.getKeyValueStore(SuggestionTopology.INTERACTIONS_STORE);
        InteractionProfile ada = profiles.get("ada");
        assertEquals("v0002", ada.vectorVersion());
        assertNull(ada.vectorUnder("v0001"), "a v0001 vector is never a warm start under v0002");
        LiveModel live = models.live();
        double[] exact = live.foldIn().foldInUser(
                new int[] {live.indexOf("c-ethanol"), live.indexOf("c-acetone")},
                new double[] {ada.get("c-ethanol").strength(), ada.get("c-acetone").strength()});
        float[] kept = ada.vectorUnder("v0002");
        for (int f = 0; f < exact.length; f++) {
            assertEquals(exact[f], kept[f], 1e-6 * Math.max(1, Math.abs(exact[f])), "factor " + f);
        }

        manifests.pipeInput(ModelAssembler.CURRENT_KEY, v1.manifest());
        assertEquals("v0001", send("ada", "c-acetone", UsageKind.VIEW).modelVersion());
        assertEquals("v0001", profiles.get("ada").vectorVersion());
    }

    @Test
    void shouldEqualTheBatchTopNOfTheSameInteractionsAndVersion() {
        ModelVersions.Version v1 = version("v0001", FusionSettings.blend(0.4), 3);
        publish(v1);
        send("ben", "c-ethanol", UsageKind.ORDER);
        Suggestions streamed = send("ben", "c-toluene", UsageKind.WITHDRAWAL);

        LiveModel model = models.live();
        InteractionWeights w = model.settings().weights();
        double ethanol = (float) w.contribution(UsageKind.ORDER, 1.0, java.time.Instant.EPOCH, java.time.Instant.EPOCH);
        double toluene = (float) w.contribution(UsageKind.WITHDRAWAL, 1.0, java.time.Instant.EPOCH, java.time.Instant.EPOCH);
        OneResearcherScoring.Scores batch = OneResearcherScoring.score(model.foldIn(), model.itemFactors(),
                model.neighbours(), model.settings().fusion(),
                new int[] {model.indexOf("c-ethanol"), model.indexOf("c-toluene")}, new double[] {ethanol, toluene});
        int[] top = OneResearcherScoring.topN(batch.fused(), 4, i -> !model.compoundId(i).equals("c-retired"));
        List<String> expected = new ArrayList<>();
        for (int i : top) {
            expected.add(model.compoundId(i));
        }
        assertEquals(expected, ids(streamed));
        // the second event folds in by CG from the first event's vector, converged to a relative
        // residual of 1e-11: within about 1e-10 of the batch's exact solution
        assertEquals(batch.fused()[top[0]], streamed.items().get(0).fusedScore(), 1e-9);
        assertEquals(batch.cf()[top[0]], streamed.items().get(0).cfScore(), 1e-9);
    }

    @Test
    void shouldNeverSuggestUsedInactiveOrUnauthorisedCompoundsUnderAModel() {
        publish(version("v0001", FusionSettings.blend(0.5), 1));
        Suggestions forCyd = send("cyd", "c-ethanol", UsageKind.ORDER);
        assertEquals(SuggestionSource.HYBRID, forCyd.source());
        assertFalse(ids(forCyd).contains("c-precursor"), "cyd lacks the precursor clearance");
        assertFalse(ids(forCyd).contains("c-retired"), "inactive");
        assertFalse(ids(forCyd).contains("c-ethanol"), "already used");

        Suggestions forAda = send("ada", "c-ethanol", UsageKind.ORDER);
        assertTrue(ids(forAda).contains("c-precursor"), "ada holds the clearance: " + ids(forAda));
        assertFalse(ids(forAda).contains("c-retired"));
    }

    @Test
    void shouldSuggestANewCompoundThroughSemanticsAndNameTheContributor() {
        publish(version("v0001", FusionSettings.blend(0.5), 1));
        Suggestions s = send("ada", "c-ethanol", UsageKind.ORDER);
        Suggestion newcomer = s.items().stream().filter(i -> i.compoundId().equals("c-newcomer")).findFirst()
                .orElseThrow(() -> new AssertionError("newcomer missing: " + ids(s)));
        assertEquals(0.0, newcomer.cfScore(), "no factors yet");
        assertEquals(0.9, newcomer.semanticScore(), 1e-12);
        assertEquals("c-ethanol", newcomer.contributors().get(0).compoundId());
    }

    @Test
    void shouldOfferActiveAlternativesByOntologyAndCoUseButNeverTheCompoundItself() {
        publish(version("v0001", FusionSettings.blend(0.5), 1));
        LiveModel model = models.live();
        java.util.Set<String> active = new java.util.HashSet<>(List.of("c-acetone", "c-ethanol", "c-precursor",
                "c-toluene", "c-newcomer"));
        org.congener.streams.model.Alternatives.Lists lists =
                org.congener.streams.model.Alternatives.of(model, "c-ethanol", 3, active::contains);
        assertEquals(List.of("c-newcomer", "c-acetone", "c-precursor"),
                lists.byOntology().stream().map(org.congener.streams.model.Alternatives.Alternative::compoundId).toList());
        assertFalse(lists.byCoUse().isEmpty());
        for (org.congener.streams.model.Alternatives.Alternative a : lists.byCoUse()) {
            assertFalse(a.compoundId().equals("c-ethanol") || a.compoundId().equals("c-retired")
                    || a.compoundId().equals("c-newcomer"), "itself, inactive, or no factors: " + a);
            assertTrue(a.similarity() <= 1.0 + 1e-12 && a.similarity() >= -1.0 - 1e-12);
        }
    }

    @Test
    void shouldSuggestOnlyCompoundsInStockWhenInStockOnlyIsSet() {
        start(true);
        publish(version("v0001", FusionSettings.blend(0.5), 1));
        inventory.pipeInput("c-acetone", Fixtures.stock("c-acetone", 2));
        inventory.pipeInput("c-toluene", Fixtures.stock("c-toluene", 0));
        Suggestions s = send("ada", "c-ethanol", UsageKind.ORDER);
        assertEquals(List.of("c-acetone"), ids(s), "only acetone has stock on hand");
        assertTrue(s.items().get(0).inStock());
    }

    /** A small invented taxonomy over the fixture's compound terms. */
    private static final String OBO = String.join("\n",
            "format-version: 1.4", "",
            "[Term]", "id: T:root", "name: compound", "",
            "[Term]", "id: T:solvent", "name: organic solvent", "is_a: T:root", "",
            "[Term]", "id: T:alcohol", "name: alcohol", "is_a: T:solvent", "",
            "[Term]", "id: term:c-ethanol", "name: ethanol", "is_a: T:alcohol", "",
            "[Term]", "id: term:c-newcomer", "name: newcomer", "is_a: T:alcohol", "",
            "[Term]", "id: term:c-acetone", "name: acetone", "is_a: T:solvent", "");

    @Test
    void shouldNameTheMostInformativeSharedClassWhenAnOntologyIsGiven() throws Exception {
        org.congener.core.ontology.Ontology ontology =
                new org.congener.core.ontology.io.OboReader().read(new java.io.StringReader(OBO));
        start(false, new org.congener.streams.model.SharedTerms(ontology));
        publish(version("v0001", FusionSettings.blend(0.5), 1));
        Suggestions s = send("ada", "c-ethanol", UsageKind.ORDER);
        Map<String, Suggestion> byId = new java.util.HashMap<>();
        s.items().forEach(i -> byId.put(i.compoundId(), i));
        assertEquals("T:alcohol", byId.get("c-newcomer").sharedTermId());
        assertEquals("alcohol", byId.get("c-newcomer").sharedTermName());
        assertEquals("T:solvent", byId.get("c-acetone").sharedTermId());
        assertEquals("organic solvent", byId.get("c-acetone").sharedTermName());
    }

    @Test
    void shouldRankByOntologyAndGroupPopularityBeforeAnyVersionWhenAnOntologyIsGiven() throws Exception {
        org.congener.core.ontology.Ontology ontology =
                new org.congener.core.ontology.io.OboReader().read(new java.io.StringReader(OBO));
        start(false, new org.congener.streams.model.SharedTerms(ontology));

        Suggestions first = send("ada", "c-ethanol", UsageKind.ORDER);
        assertEquals(SuggestionSource.SEMANTIC_AND_POPULARITY, first.source());
        assertNull(first.modelVersion());
        // newcomer shares "alcohol" with ethanol, acetone only "organic solvent": Lin ranks newcomer first;
        // toluene has no term in this ontology and nobody in the group used anything else yet
        assertEquals(List.of("c-newcomer", "c-acetone"), ids(first));
        Suggestion top = first.items().get(0);
        assertTrue(top.semanticScore() > first.items().get(1).semanticScore() && first.items().get(1).semanticScore() > 0);
        assertEquals(0.5, top.fusedScore(), 1e-12, "the best semantic score, normalised, times the weight 0.5; no popularity");
        assertEquals("c-ethanol", top.contributors().get(0).compoundId());

        // a colleague in ada's group orders toluene: it enters ada's next list through group popularity
        send("ben", "c-toluene", UsageKind.ORDER);
        Suggestions next = send("ada", "c-acetone", UsageKind.VIEW);
        assertTrue(ids(next).contains("c-toluene"), ids(next).toString());
        Suggestion toluene = next.items().stream().filter(i -> i.compoundId().equals("c-toluene")).findFirst().orElseThrow();
        assertEquals(0.0, toluene.semanticScore());
        assertEquals(0.5, toluene.fusedScore(), 1e-6, "the group's only popular compound, normalised, times 0.5");

        // once a version is live the same researcher gets hybrid lists
        publish(version("v0001", FusionSettings.blend(0.5), 1));
        assertEquals(SuggestionSource.HYBRID, send("ada", "c-acetone", UsageKind.VIEW).source());
    }

    @Test
    void shouldSkipAnUnreadableFactorRecordAndKeepTheVersionOffUntilItsRecordIsWhole() {
        ModelVersions.Version v1 = version("v0001", FusionSettings.blend(0.5), 1);
        TestInputTopic<String, String> rawFactors = driver.createInputTopic("lab.model-item-factors",
                new StringSerializer(), new StringSerializer());
        v1.factors().stream().skip(1).forEach(f -> factors.pipeInput(ModelVersions.Version.key("v0001", f.compoundId()), f));
        String first = ModelVersions.Version.key("v0001", v1.factors().get(0).compoundId());
        rawFactors.pipeInput(first, "{\"schema\": 42");
        v1.neighbours().forEach(n -> neighbours.pipeInput(ModelVersions.Version.key("v0001", n.compoundId()), n));
        manifests.pipeInput(ModelAssembler.CURRENT_KEY, v1.manifest());
        assertNull(send("ada", "c-ethanol", UsageKind.ORDER).modelVersion(), "one factor record is unreadable");

        factors.pipeInput(first, v1.factors().get(0));
        assertEquals("v0001", send("ada", "c-ethanol", UsageKind.VIEW).modelVersion());
    }
}
