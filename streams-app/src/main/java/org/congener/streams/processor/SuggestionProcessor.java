package org.congener.streams.processor;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;

import org.apache.kafka.common.serialization.Serializer;
import org.apache.kafka.streams.processor.api.Processor;
import org.apache.kafka.streams.processor.api.ProcessorContext;
import org.apache.kafka.streams.processor.api.Record;
import org.apache.kafka.streams.KeyValue;
import org.apache.kafka.streams.processor.PunctuationType;
import org.apache.kafka.streams.state.KeyValueIterator;
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

    /** Store names of the task's own stores and the instance's in-memory global tables. */
    public record Stores(String interactions, String groupPopularity, String latestSuggestions, String pendingLists,
                         InMemoryTable<Researcher> researchers, InMemoryTable<CatalogEntry> catalog,
                         InMemoryTable<InventoryEvent> stock) {
    }

    /**
     * How events are gathered before their lists are scored and published: up to {@code events} at a
     * time, and no batch waits longer than {@code longestWait} of wall-clock time. One event publishes each
     * list while its event is processed.
     */
    public record Batching(int events, java.time.Duration longestWait) {
        /** Each list published while its event is processed. */
        public static final Batching NONE = new Batching(1, java.time.Duration.ofMillis(5));

        public Batching {
            if (events < 1) {
                throw new IllegalArgumentException("a batch holds at least one event, not " + events);
            }
            if (longestWait.isNegative() || longestWait.isZero()) {
                throw new IllegalArgumentException("batch wait must be positive, not " + longestWait);
            }
        }
    }

    /** An accepted event whose list is begun but not published yet. */
    private record Waiting(SuggestionScorer.Begun scoring, Researcher researcher, String eventId, long timestamp) {
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
    private final Batching batching;
    private final List<Waiting> waiting = new ArrayList<>();
    /** The pending flush of the waiting batch; null while nothing waits. */
    private org.apache.kafka.streams.processor.Cancellable flushTimer;
    /** Set at start when the pending-lists store holds events a previous owner of the task had not published. */
    private boolean recoveryDue;
    private final CatalogueSimilarity catalogueSimilarity;
    private ProcessorContext<String, byte[]> context;
    private KeyValueStore<String, InteractionProfile> interactions;
    private KeyValueStore<String, GroupPopularity> groups;
    private KeyValueStore<String, byte[]> latest;
    private KeyValueStore<String, String> pendingLists;
    private InMemoryTable<Researcher> researchers;
    private InMemoryTable<CatalogEntry> catalog;
    private InMemoryTable<InventoryEvent> stock;

    /**
     * @param liveModel        the live model snapshot of this instance, null before any version is live
     * @param coldStartWeights interaction weights before any version is live (a live version brings its own)
     */
    public SuggestionProcessor(Stores stores, SuggestionScorer scorer, java.util.function.Supplier<LiveModel> liveModel,
                               InteractionWeights coldStartWeights, double halfLifeMs, int topN, boolean inStockOnly,
                               SharedTerms sharedTerms, Serializer<Suggestions> listWriter, Batching batching) {
        this.listWriter = listWriter;
        this.batching = batching;
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
        this.pendingLists = context.getStateStore(stores.pendingLists());
        try (KeyValueIterator<String, String> marks = pendingLists.all()) {
            recoveryDue = marks.hasNext();
        }
        if (recoveryDue) {
            // publishes the recovered lists even when no record comes
            armFlushTimer();
        }
        this.researchers = stores.researchers();
        this.catalog = stores.catalog();
        this.stock = stores.stock();
    }

    @Override
    public void process(Record<String, UsageEvent> record) {
        if (recoveryDue) {
            recover();
        }
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
        Waiting waits = enqueue(researcher, profile, group, model, at, event.eventId(), record.timestamp());
        if (waiting.size() >= batching.events()) {
            publishWaiting(waits);
        }
        armFlushTimerIfWaiting();
    }

    /**
     * Begins the event's scoring (the fold-in, which the researcher's next event starts from), writes
     * the profile, marks the researcher's list as pending and adds the event to the batch. A batch holds
     * one model snapshot: an event under another one first publishes the batch, so no list mixes two
     * versions.
     */
    private Waiting enqueue(Researcher researcher, InteractionProfile profile, GroupPopularity group, LiveModel model,
                         long at, String eventId, long timestamp) {
        if (!waiting.isEmpty() && waiting.get(0).scoring().input().model() != model) {
            publishWaiting(null);
        }
        CandidateFilter eligible = CandidateFilter.forResearcher(researcher, profile, catalog::get);
        if (inStockOnly) {
            eligible = eligible.and(this::inStock);
        }
        SimilarCompounds similar = model == null && catalogueSimilarity != null
                ? catalogueSimilarity.current(this::catalogueTerms, context.currentSystemTimeMs()) : null;
        ScoringInput input = new ScoringInput(researcher, profile, group, at, eligible, model, similar);
        // the scorer keeps the folded vector in the profile, so the profile is written after begin
        SuggestionScorer.Begun begun = scorer.begin(input);
        interactions.put(researcher.researcherId(), profile);
        pendingLists.put(researcher.researcherId(), PendingMark.of(eventId, at, timestamp));
        Waiting event = new Waiting(begun, researcher, eventId, timestamp);
        waiting.add(event);
        return event;
    }

    /**
     * Schedules the flush of a partly filled batch {@code longestWait} from now, unless one is due or
     * nothing waits. The timer runs only while something waits: Kafka Streams takes every wall-clock
     * punctuation as work to commit, so a timer left running would make an idle app commit a
     * transaction every commit interval.
     */
    private void armFlushTimerIfWaiting() {
        if (!waiting.isEmpty()) {
            armFlushTimer();
        }
    }

    private void armFlushTimer() {
        if (flushTimer == null) {
            flushTimer = context.schedule(batching.longestWait(), PunctuationType.WALL_CLOCK_TIME,
                    now -> publishWaiting(null));
        }
    }

    private void disarmFlushTimer() {
        if (flushTimer != null) {
            flushTimer.cancel();
            flushTimer = null;
        }
    }

    /**
     * Scores the waiting events together, publishes each one's list (to {@code suggestions} and the
     * latest-list store) in event order, and clears their pending marks. Should the scorer fail on the
     * batch, each event is scored alone; an event that fails alone gets no list. When that event is
     * {@code current}, the record being processed, the failure is rethrown so the processing handler
     * dead-letters it like any other; for an earlier event of the batch it is logged with the event's id.
     */
    private void publishWaiting(Waiting current) {
        if (recoveryDue) {
            recover();
        }
        if (waiting.isEmpty()) {
            disarmFlushTimer();
            return;
        }
        RuntimeException currentFailure = null;
        try {
            List<List<ScoredCandidate>> lists = finishTogether();
            for (int t = 0; t < waiting.size(); t++) {
                Waiting w = waiting.get(t);
                try {
                    publish(w, lists != null ? lists.get(t) : scorer.finish(List.of(w.scoring()), topN).get(0));
                } catch (RuntimeException e) {
                    if (w == current) {
                        currentFailure = e;
                    } else {
                        LOG.error("no list published for event {} of researcher {}", w.eventId(),
                                w.researcher().researcherId(), e);
                    }
                }
            }
        } finally {
            for (Waiting w : waiting) {
                pendingLists.delete(w.researcher().researcherId());
            }
            waiting.clear();
            disarmFlushTimer();
        }
        if (currentFailure != null) {
            throw currentFailure;
        }
    }

    /** The lists of all waiting events from one call, or null when the scorer fails on the batch. */
    private List<List<ScoredCandidate>> finishTogether() {
        if (waiting.size() == 1) {
            return null;
        }
        List<SuggestionScorer.Begun> begun = new ArrayList<>(waiting.size());
        for (Waiting w : waiting) {
            begun.add(w.scoring());
        }
        try {
            return scorer.finish(begun, topN);
        } catch (RuntimeException e) {
            LOG.warn("scoring a batch of {} events failed; scoring each alone", begun.size(), e);
            return null;
        }
    }

    private void publish(Waiting w, List<ScoredCandidate> ranked) {
        ScoringInput input = w.scoring().input();
        Suggestions suggestions = new Suggestions(SchemaIds.SUGGESTIONS, w.researcher().researcherId(),
                scorer.modelVersionFor(input), scorer.sourceFor(input), w.eventId(),
                Instant.ofEpochMilli(context.currentSystemTimeMs()).toString(), items(ranked), SafetyCaution.TEXT);
        byte[] json = listWriter.serialize(null, suggestions);
        latest.put(w.researcher().researcherId(), json);
        context.forward(new Record<>(w.researcher().researcherId(), json, w.timestamp()));
    }

    /**
     * Lists a previous owner of this task had begun but not published when its last commit was taken
     * (a crash, or the task moving to another instance): each pending researcher gets one list for
     * their state as stored, under the version live now, carrying the id of their latest event. The
     * marks are in a changelogged store written in the same transaction as the profiles, so under
     * exactly-once no accepted event is left without a list.
     */
    private void recover() {
        recoveryDue = false;
        List<KeyValue<String, String>> marks = new ArrayList<>();
        try (KeyValueIterator<String, String> all = pendingLists.all()) {
            all.forEachRemaining(marks::add);
        }
        LiveModel model = liveModel.get();
        for (KeyValue<String, String> mark : marks) {
            Researcher researcher = researchers.get(mark.key);
            InteractionProfile profile = interactions.get(mark.key);
            if (researcher == null || profile == null) {
                LOG.warn("pending list of researcher {} dropped: researcher or profile gone", mark.key);
                pendingLists.delete(mark.key);
                continue;
            }
            PendingMark pending = PendingMark.parse(mark.value);
            GroupPopularity group = model == null
                    ? orNew(groups.get(researcher.groupId()), GroupPopularity::new) : null;
            LOG.info("publishing the pending list of researcher {} (event {})", mark.key, pending.eventId());
            enqueue(researcher, profile, group, model, pending.atEpochMs(), pending.eventId(), pending.timestamp());
            if (waiting.size() >= batching.events()) {
                publishWaiting(null);
            }
        }
        armFlushTimerIfWaiting();
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
