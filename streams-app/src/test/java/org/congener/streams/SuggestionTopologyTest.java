package org.congener.streams;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Properties;

import org.apache.kafka.common.Metric;
import org.apache.kafka.common.MetricName;
import org.apache.kafka.common.serialization.StringDeserializer;
import org.apache.kafka.common.serialization.StringSerializer;
import org.apache.kafka.streams.StreamsBuilder;
import org.apache.kafka.streams.StreamsConfig;
import org.apache.kafka.streams.TestInputTopic;
import org.apache.kafka.streams.TestOutputTopic;
import org.apache.kafka.streams.TopologyTestDriver;
import org.apache.kafka.streams.state.KeyValueStore;
import org.congener.schemas.CatalogEntry;
import org.congener.schemas.DeadLetter;
import org.congener.schemas.InventoryEvent;
import org.congener.schemas.Researcher;
import org.congener.schemas.Suggestion;
import org.congener.schemas.SuggestionSource;
import org.congener.schemas.Suggestions;
import org.congener.schemas.UsageEvent;
import org.congener.schemas.UsageKind;
import org.congener.streams.processor.DeadLetteringDeserializationHandler;
import org.congener.streams.processor.DeadLetteringProcessingHandler;
import org.congener.streams.scoring.GroupPopularityScorer;
import org.congener.streams.scoring.ScoredCandidate;
import org.congener.streams.scoring.ScoringInput;
import org.congener.streams.scoring.SuggestionScorer;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SuggestionTopologyTest {

    @TempDir
    Path stateDir;

    private TopologyTestDriver driver;
    private TestInputTopic<String, String> usage;
    private TestInputTopic<String, InventoryEvent> inventory;
    private TestOutputTopic<String, Suggestions> suggestions;
    private TestOutputTopic<String, DeadLetter> deadLetters;
    private int sequence;

    @BeforeEach
    void start() {
        start(null);
    }

    /** @param scorer null for the baseline */
    private void start(SuggestionScorer scorer) {
        if (driver != null) {
            driver.close();
        }
        StreamsBuilder builder = new StreamsBuilder();
        SuggestionTopology.Settings settings = new SuggestionTopology.Settings("lab.", 3, Duration.ofDays(30));
        if (scorer == null) {
            SuggestionTopology.build(builder, settings);
        } else {
            SuggestionTopology.build(builder, settings, scorer);
        }
        Properties props = new Properties();
        props.put(StreamsConfig.APPLICATION_ID_CONFIG, "topology-test");
        props.put(StreamsConfig.BOOTSTRAP_SERVERS_CONFIG, "unused:9092");
        props.put(StreamsConfig.STATE_DIR_CONFIG, stateDir.toString());
        props.put(StreamsConfig.DESERIALIZATION_EXCEPTION_HANDLER_CLASS_CONFIG, DeadLetteringDeserializationHandler.class);
        props.put(StreamsConfig.PROCESSING_EXCEPTION_HANDLER_CLASS_CONFIG, DeadLetteringProcessingHandler.class);
        props.put(DeadLetteringDeserializationHandler.TOPIC_PREFIX_CONFIG, "lab.");
        driver = new TopologyTestDriver(builder.build(), props);

        TestInputTopic<String, CatalogEntry> catalog = driver.createInputTopic("lab.catalog",
                new StringSerializer(), Fixtures.TOPICS.catalog().valueSerde().serializer());
        Fixtures.catalog().forEach(entry -> catalog.pipeInput(entry.compoundId(), entry));
        TestInputTopic<String, Researcher> researchers = driver.createInputTopic("lab.researchers",
                new StringSerializer(), Fixtures.TOPICS.researchers().valueSerde().serializer());
        Fixtures.researchers().forEach(r -> researchers.pipeInput(r.researcherId(), r));
        inventory = driver.createInputTopic("lab.inventory-events", new StringSerializer(),
                Fixtures.TOPICS.inventoryEvents().valueSerde().serializer());
        usage = driver.createInputTopic("lab.usage-events", new StringSerializer(), new StringSerializer());
        suggestions = driver.createOutputTopic("lab.suggestions", new StringDeserializer(),
                Fixtures.TOPICS.suggestions().valueSerde().deserializer());
        deadLetters = driver.createOutputTopic("lab.dead-letters", new StringDeserializer(),
                Fixtures.TOPICS.deadLetters().valueSerde().deserializer());
    }

    @AfterEach
    void stop() {
        driver.close();
    }

    private UsageEvent send(String researcher, String compound, UsageKind kind, String at) {
        UsageEvent event = Fixtures.event("e" + (++sequence), researcher, compound, kind, at);
        usage.pipeInput(researcher, Fixtures.json(event));
        return event;
    }

    private static List<String> ids(Suggestions s) {
        return s.items().stream().map(Suggestion::compoundId).toList();
    }

    @Test
    void shouldSuggestWhatColleaguesUseWhenResearcherActs() {
        send("ben", "c-acetone", UsageKind.ORDER, "2026-01-02T10:00:00Z");
        send("ben", "c-toluene", UsageKind.ORDER, "2026-01-02T11:00:00Z");
        send("ben", "c-toluene", UsageKind.WITHDRAWAL, "2026-01-02T12:00:00Z");
        suggestions.readValuesToList();

        UsageEvent trigger = send("ada", "c-ethanol", UsageKind.ORDER, "2026-01-03T09:00:00Z");
        Suggestions forAda = suggestions.readKeyValue().value;

        assertEquals("ada", forAda.researcherId());
        assertEquals(List.of("c-toluene", "c-acetone"), ids(forAda), "ethanol is ada's own; toluene used more");
        assertEquals(trigger.eventId(), forAda.causedByEventId());
        assertEquals(SuggestionSource.POPULARITY, forAda.source());
        assertEquals(SafetyCaution.TEXT, forAda.caution());
        assertEquals(List.of("H225"), forAda.items().get(0).hazardCodes());
        assertEquals(1, forAda.items().get(0).rank());
    }

    @Test
    void shouldRankRecentUseAboveOldUseWhenCountsAreEqual() {
        send("ben", "c-acetone", UsageKind.ORDER, "2026-01-01T10:00:00Z");
        send("ben", "c-toluene", UsageKind.ORDER, "2026-03-01T10:00:00Z");
        suggestions.readValuesToList();
        send("ada", "c-ethanol", UsageKind.VIEW, "2026-03-02T10:00:00Z");

        Suggestions forAda = suggestions.readValue();
        assertEquals(List.of("c-toluene", "c-acetone", "c-ethanol"), ids(forAda));
        // 59 days apart with a 30-day half-life: the old order weighs 2^(-59/30) of the new one
        double ratio = forAda.items().get(1).fusedScore() / forAda.items().get(0).fusedScore();
        assertEquals(Math.pow(2, -59.0 / 30.0), ratio, 1e-4);
    }

    @Test
    void shouldLeaveOutRestrictedInactiveAndOwnCompoundsWhenRanking() {
        send("ben", "c-precursor", UsageKind.ORDER, "2026-01-02T10:00:00Z");
        send("ben", "c-retired", UsageKind.ORDER, "2026-01-02T10:00:00Z");
        send("ben", "c-acetone", UsageKind.ORDER, "2026-01-02T10:00:00Z");
        send("cyd", "c-toluene", UsageKind.USAGE_LOG, "2026-01-02T10:00:00Z");
        suggestions.readValuesToList();

        send("cyd", "c-ethanol", UsageKind.ORDER, "2026-01-03T10:00:00Z");
        Suggestions forCyd = suggestions.readValue();
        assertEquals(List.of("c-acetone"), ids(forCyd),
                "no precursor without clearance, no inactive compound, nothing cyd already used");

        send("ada", "c-ethanol", UsageKind.ORDER, "2026-01-03T11:00:00Z");
        assertTrue(ids(suggestions.readValue()).contains("c-precursor"), "ada holds the clearance");
    }

    @Test
    void shouldIgnoreOtherGroupsWhenComputingPopularity() {
        send("dee", "c-toluene", UsageKind.ORDER, "2026-01-02T10:00:00Z");
        suggestions.readValuesToList();
        send("ada", "c-ethanol", UsageKind.ORDER, "2026-01-03T10:00:00Z");
        assertEquals(List.of(), ids(suggestions.readValue()));
    }

    @Test
    void shouldMarkSuggestionInStockWhenLatestStockEventHasQuantity() {
        inventory.pipeInput("c-acetone", Fixtures.stock("c-acetone", 2.5));
        inventory.pipeInput("c-toluene", Fixtures.stock("c-toluene", 0));
        send("ben", "c-acetone", UsageKind.ORDER, "2026-01-02T10:00:00Z");
        send("ben", "c-toluene", UsageKind.ORDER, "2026-01-02T10:00:00Z");
        suggestions.readValuesToList();
        send("ada", "c-ethanol", UsageKind.ORDER, "2026-01-03T10:00:00Z");
        List<Suggestion> items = suggestions.readValue().items();
        assertEquals(2, items.size());
        for (Suggestion item : items) {
            assertEquals(item.compoundId().equals("c-acetone"), item.inStock(), item.compoundId());
        }
    }

    @Test
    void shouldSendBadRecordsToDeadLettersAndKeepEveryGoodOne() {
        send("ben", "c-acetone", UsageKind.ORDER, "2026-01-02T10:00:00Z");
        usage.pipeInput("ada", "{\"schema\": \"congener/usage-event/v1\", \"eventId\": ");
        send("ada", "c-ethanol", UsageKind.ORDER, "2026-01-02T11:00:00Z");
        usage.pipeInput("zed", Fixtures.json(Fixtures.event("e-x", "zed", "c-ethanol", UsageKind.ORDER, Fixtures.DAY0)));
        usage.pipeInput("ada", Fixtures.json(Fixtures.event("e-y", "ada", "c-unobtainium", UsageKind.ORDER, Fixtures.DAY0)));
        send("ben", "c-toluene", UsageKind.ORDER, "2026-01-02T12:00:00Z");

        List<Suggestions> out = suggestions.readValuesToList();
        assertEquals(List.of("e1", "e2", "e3"), out.stream().map(Suggestions::causedByEventId).toList());

        List<DeadLetter> letters = deadLetters.readValuesToList();
        assertEquals(List.of(1L, 3L, 4L), letters.stream().map(DeadLetter::offset).toList());
        for (DeadLetter letter : letters) {
            assertEquals("lab.usage-events", letter.sourceTopic());
            assertEquals(0, letter.partition());
            assertEquals("utf-8", letter.payloadEncoding());
        }
        assertTrue(letters.get(0).reason().startsWith("usage-events: unreadable value: not valid JSON"),
                letters.get(0).reason());
        assertEquals("unknown researcher 'zed'", letters.get(1).reason());
        assertEquals("unknown compound 'c-unobtainium'", letters.get(2).reason());
        assertTrue(letters.get(0).payload().contains("\"eventId\": "), "raw payload kept");
        assertEquals(3.0, deadLetterCount());
    }

    @Test
    void shouldKeepNonUtf8PayloadAsBase64WhenDeadLettered() {
        TestInputTopic<String, byte[]> raw = driver.createInputTopic("lab.usage-events", new StringSerializer(),
                (topic, bytes) -> bytes);
        raw.pipeInput("ada", new byte[] {(byte) 0xff, (byte) 0xfe, 0x00});
        DeadLetter letter = deadLetters.readValue();
        assertEquals("base64", letter.payloadEncoding());
        assertEquals("//4A", letter.payload());
    }

    @Test
    void shouldRejectEventWhoseKeyIsNotItsResearcher() {
        usage.pipeInput("ben", Fixtures.json(Fixtures.event("e-k", "ada", "c-ethanol", UsageKind.ORDER, Fixtures.DAY0)));
        assertTrue(suggestions.isEmpty());
        assertEquals("key 'ben' is not the event's researcher 'ada'", deadLetters.readValue().reason());
    }

    @Test
    void shouldRejectEventWithoutKeyBecauseItsResearcherStateLivesByKey() {
        usage.pipeInput((String) null, Fixtures.json(Fixtures.event("e-n", "ada", "c-ethanol", UsageKind.ORDER, Fixtures.DAY0)));
        assertTrue(suggestions.isEmpty());
        assertEquals("no key: usage events are keyed by their researcher id ('ada')", deadLetters.readValue().reason());
    }

    @Test
    void shouldKeepLatestListPerResearcherInQueryableStore() {
        send("ben", "c-acetone", UsageKind.ORDER, "2026-01-02T10:00:00Z");
        send("ada", "c-ethanol", UsageKind.ORDER, "2026-01-03T10:00:00Z");
        send("ada", "c-toluene", UsageKind.VIEW, "2026-01-03T11:00:00Z");
        List<Suggestions> out = suggestions.readValuesToList();

        KeyValueStore<String, byte[]> latest = driver.getKeyValueStore(SuggestionTopology.LATEST_SUGGESTIONS_STORE);
        var reader = Fixtures.TOPICS.suggestions().valueSerde().deserializer();
        assertEquals(out.get(2), reader.deserialize("t", latest.get("ada")));
        assertEquals(out.get(0), reader.deserialize("t", latest.get("ben")));
        assertFalse(reader.deserialize("t", latest.get("ada")).items().isEmpty());
    }

    @Test
    void shouldKeepRunningWhenCatalogRecordIsCorrupt() {
        TestInputTopic<String, String> rawCatalog = driver.createInputTopic("lab.catalog", new StringSerializer(),
                new StringSerializer());
        rawCatalog.pipeInput("c-broken", "{\"schema\": 42");
        send("ben", "c-acetone", UsageKind.ORDER, "2026-01-02T10:00:00Z");
        assertEquals("e1", suggestions.readValue().causedByEventId(), "the app carries on after a bad catalogue record");
        // Kafka Streams' global thread writes no dead letters: the bad entry is logged and skipped,
        // so an event on that compound is refused as unknown
        usage.pipeInput("ben", Fixtures.json(Fixtures.event("e-b", "ben", "c-broken", UsageKind.ORDER, Fixtures.DAY0)));
        assertEquals("unknown compound 'c-broken'", deadLetters.readValue().reason());
    }

    @Test
    void shouldDeadLetterRecordAndCarryOnWhenScorerThrows() {
        SuggestionScorer baseline = new GroupPopularityScorer(Duration.ofDays(30).toMillis());
        start(new SuggestionScorer() {
            @Override
            public SuggestionSource source() {
                return baseline.source();
            }

            @Override
            public List<ScoredCandidate> rank(ScoringInput input, int n) {
                if (input.researcher().researcherId().equals("cyd")) {
                    throw new IllegalStateException("scorer defect");
                }
                return baseline.rank(input, n);
            }
        });
        send("ben", "c-acetone", UsageKind.ORDER, "2026-01-02T10:00:00Z");
        send("cyd", "c-toluene", UsageKind.ORDER, "2026-01-02T11:00:00Z");
        send("ada", "c-ethanol", UsageKind.ORDER, "2026-01-02T12:00:00Z");

        assertEquals(List.of("e1", "e3"), suggestions.readValuesToList().stream().map(Suggestions::causedByEventId).toList());
        DeadLetter letter = deadLetters.readValue();
        assertTrue(letter.reason().contains("scorer defect"), letter.reason());
        assertEquals("lab.usage-events", letter.sourceTopic(), "the raw record of the source topic, no internal hop");
        assertTrue(letter.payload().contains("\"eventId\":\"e2\""), letter.payload());
    }

    private double deadLetterCount() {
        double total = 0;
        for (var entry : driver.metrics().entrySet()) {
            MetricName name = entry.getKey();
            Metric metric = entry.getValue();
            if (name.group().equals("congener") && name.name().equals("dead-letters-total")) {
                total += (Double) metric.metricValue();
            }
        }
        return total;
    }

}
