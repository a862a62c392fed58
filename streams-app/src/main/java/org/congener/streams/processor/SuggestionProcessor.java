package org.congener.streams.processor;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;

import org.apache.kafka.common.serialization.Serializer;
import org.apache.kafka.streams.processor.api.Processor;
import org.apache.kafka.streams.processor.api.ProcessorContext;
import org.apache.kafka.streams.processor.api.Record;
import org.apache.kafka.streams.state.KeyValueStore;
import org.congener.schemas.CatalogEntry;
import org.congener.schemas.InventoryEvent;
import org.congener.schemas.Researcher;
import org.congener.schemas.SchemaIds;
import org.congener.schemas.Suggestion;
import org.congener.schemas.Suggestions;
import org.congener.schemas.UsageEvent;
import org.congener.schemas.UsageKind;
import org.congener.core.interactions.InteractionWeights;
import org.congener.streams.model.LiveModel;
import org.congener.streams.model.CatalogueSimilarity;
import org.congener.streams.model.SharedTerms;
import org.congener.streams.scoring.SimilarCompounds;
import org.congener.streams.SafetyCaution;
import org.congener.streams.scoring.CandidateFilter;
import org.congener.streams.scoring.ScoredCandidate;
import org.congener.streams.scoring.ScoringInput;
import org.congener.streams.scoring.SuggestionScorer;
import org.congener.streams.state.GroupPopularity;
import org.congener.streams.state.InteractionProfile;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * For each accepted usage event (keyed by researcher, so a researcher's state lives in the task of
 * their partition of {@code usage-events}, with no repartition hop): updates the researcher's
 * interaction profile, scores, keeps the folded vector for the next event's warm start, and publishes
 * the researcher's new top-N as JSON both to {@code suggestions} and to the queryable store of latest
 * lists — serialised once for both.
 *
 * <p>Before any model version is live the cold-start scorer ranks by ontology similarity to the
 * researcher's past compounds (when an ontology is configured) and group popularity; that popularity
 * is kept only while no version is live (it serves nothing afterwards and would cost a store read and
 * write per event), and only over the group's members whose partitions this task holds.
 */
public final class SuggestionProcessor implements Processor<String, UsageEvent, String, byte[]> {

    private static final Logger LOG = LoggerFactory.getLogger(SuggestionProcessor.class);

    /** Store and table names the processor reads. */
    /** Store names of the task's own stores and the instance's in-memory global tables. */
    public record Stores(String interactions, String groupPopularity, String latestSuggestions,
                         InMemoryTable<Researcher> researchers, InMemoryTable<CatalogEntry> catalog,
                         InMemoryTable<InventoryEvent> stock) {
    }

    private final Stores stores;
    private final SuggestionScorer scorer;
    private final InteractionWeights coldStartWeights;
    private final java.util.function.Supplier<LiveModel> liveModel;
    private final double halfLifeMs;
    private final int topN;
    private final boolean inStockOnly;
    private final SharedTerms sharedTerms;
    /** Neighbours per compound in the cold-start lists: the trainer's default K. */
    static final int COLD_START_NEIGHBOURS = org.congener.core.ontology.neighbours.NeighbourCacheSettings.DEFAULT_K;

    private final Serializer<Suggestions> listWriter;
    private final CatalogueSimilarity catalogueSimilarity;
    private ProcessorContext<String, byte[]> context;
    private KeyValueStore<String, InteractionProfile> interactions;
    private KeyValueStore<String, GroupPopularity> groups;
    private KeyValueStore<String, byte[]> latest;
    private InMemoryTable<Researcher> researchers;
    private InMemoryTable<CatalogEntry> catalog;
    private InMemoryTable<InventoryEvent> stock;

    /**
     * @param liveModel        the live model snapshot of this instance, null before any version is live
     * @param coldStartWeights interaction weights before any version is live (a live version brings its own)
     */
    public SuggestionProcessor(Stores stores, SuggestionScorer scorer, java.util.function.Supplier<LiveModel> liveModel,
                               InteractionWeights coldStartWeights, double halfLifeMs, int topN, boolean inStockOnly,
                               SharedTerms sharedTerms, Serializer<Suggestions> listWriter) {
        this.listWriter = listWriter;
        // one per processor (per task): the lists are built on the task's own thread, no sharing
        this.catalogueSimilarity = sharedTerms == null ? null
                : new CatalogueSimilarity(sharedTerms.ontology(), sharedTerms.informationContent(), COLD_START_NEIGHBOURS);
        this.inStockOnly = inStockOnly;
        this.sharedTerms = sharedTerms;
        this.stores = stores;
        this.scorer = scorer;
        this.liveModel = liveModel;
        this.coldStartWeights = coldStartWeights;
        this.halfLifeMs = halfLifeMs;
        this.topN = topN;
    }

    @Override
    public void init(ProcessorContext<String, byte[]> context) {
        this.context = context;
        this.interactions = context.getStateStore(stores.interactions());
        this.groups = context.getStateStore(stores.groupPopularity());
        this.latest = context.getStateStore(stores.latestSuggestions());
        this.researchers = stores.researchers();
        this.catalog = stores.catalog();
        this.stock = stores.stock();
    }

    @Override
    public void process(Record<String, UsageEvent> record) {
        UsageEvent event = record.value();
        Researcher researcher = researchers.get(event.researcherId());
        if (researcher == null) {
            // accepted at intake, removed from the researchers table since: nothing to suggest to
            LOG.warn("researcher {} of event {} left the researchers table; no suggestions published",
                    event.researcherId(), event.eventId());
            return;
        }
        // one snapshot for the whole event: its weights, its fold-in and its scores
        LiveModel model = liveModel.get();
        InteractionWeights weights = model == null ? coldStartWeights : model.settings().weights();
        Instant occurred = Instant.parse(event.occurredAt());
        long at = occurred.toEpochMilli();
        // the event's weight as of its own time; the profile decays stored sums (if the weights have a half-life)
        float weight = (float) weights.contribution(event.kind(), event.quantity(), occurred, occurred);
        double strengthHalfLifeMs = weights.halfLife() == null ? 0 : weights.halfLife().toMillis();

        InteractionProfile profile = orNew(interactions.get(event.researcherId()), InteractionProfile::new);
        profile.add(event.compoundId(), weight, at, event.kind() != UsageKind.VIEW, strengthHalfLifeMs);

        GroupPopularity group = null;
        if (model == null) {
            group = orNew(groups.get(researcher.groupId()), GroupPopularity::new);
            group.add(event.compoundId(), weight, at, halfLifeMs);
            groups.put(researcher.groupId(), group);
        }

        CandidateFilter eligible = CandidateFilter.forResearcher(researcher, profile, catalog::get);
        if (inStockOnly) {
            eligible = eligible.and(this::inStock);
        }
        SimilarCompounds similar = model == null && catalogueSimilarity != null
                ? catalogueSimilarity.current(this::catalogueTerms, context.currentSystemTimeMs()) : null;
        ScoringInput input = new ScoringInput(researcher, profile, group, at, eligible, model, similar);
        // the scorer keeps the folded vector in the profile, so the profile is written after scoring
        List<ScoredCandidate> ranked = scorer.rank(input, topN);
        interactions.put(event.researcherId(), profile);
        Suggestions suggestions = new Suggestions(SchemaIds.SUGGESTIONS, researcher.researcherId(),
                scorer.modelVersionFor(input), scorer.sourceFor(input), event.eventId(),
                Instant.ofEpochMilli(context.currentSystemTimeMs()).toString(), items(ranked), SafetyCaution.TEXT);
        byte[] json = listWriter.serialize(null, suggestions);
        latest.put(researcher.researcherId(), json);
        context.forward(new Record<>(researcher.researcherId(), json, record.timestamp()));
    }

    private List<Suggestion> items(List<ScoredCandidate> ranked) {
        List<Suggestion> items = new ArrayList<>(ranked.size());
        int rank = 1;
        for (ScoredCandidate c : ranked) {
            CatalogEntry entry = catalog.get(c.compoundId());
            if (entry == null) {
                // removed from the catalogue by the global thread since the filter passed it
                continue;
            }
            SharedTerms.Term shared = sharedTerm(entry, c);
            items.add(new Suggestion(rank++, c.compoundId(), entry.name(), c.cfScore(), c.semanticScore(),
                    c.fusedScore(), c.contributors(), shared == null ? null : shared.id(),
                    shared == null ? null : shared.name(), entry.hazardCodes(), inStock(c.compoundId())));
        }
        return items;
    }

    /** The most informative class the suggestion shares with its top contributor, or null. */
    private SharedTerms.Term sharedTerm(CatalogEntry suggested, ScoredCandidate candidate) {
        if (sharedTerms == null || candidate.contributors().isEmpty()) {
            return null;
        }
        CatalogEntry past = catalog.get(candidate.contributors().get(0).compoundId());
        if (past == null) {
            return null;
        }
        return sharedTerms.mostInformativeShared(suggested.termIds(), past.termIds()).orElse(null);
    }

    /** Whether the compound's latest inventory event has quantity on hand above zero. */
    private boolean inStock(String compoundId) {
        InventoryEvent lastStock = stock.get(compoundId);
        return lastStock != null && lastStock.quantityOnHand() > 0;
    }

    /** Compound id → ontology term ids of every catalogue entry, for the cold-start neighbour lists. */
    private java.util.Map<String, List<String>> catalogueTerms() {
        java.util.Map<String, List<String>> terms = new java.util.TreeMap<>();
        catalog.forEach((id, entry) -> terms.put(id, entry.termIds()));
        return terms;
    }

    private static <T> T orNew(T value, java.util.function.Supplier<T> fresh) {
        return value != null ? value : fresh.get();
    }
}
