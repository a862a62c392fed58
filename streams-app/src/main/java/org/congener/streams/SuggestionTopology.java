package org.congener.streams;

import java.time.Duration;

import org.apache.kafka.common.serialization.Serializer;
import org.apache.kafka.common.serialization.Serdes;
import org.apache.kafka.common.utils.Bytes;
import org.apache.kafka.streams.StreamsBuilder;
import org.apache.kafka.streams.kstream.Consumed;
import org.apache.kafka.streams.kstream.KStream;
import org.apache.kafka.streams.kstream.Materialized;
import org.apache.kafka.streams.kstream.Produced;
import org.apache.kafka.streams.state.KeyValueStore;
import org.apache.kafka.streams.state.Stores;
import org.congener.schemas.DeadLetter;
import org.congener.schemas.Suggestions;
import org.congener.schemas.Topic;
import org.congener.schemas.TopicName;
import org.congener.schemas.Topics;
import org.congener.schemas.UsageEvent;
import org.congener.schemas.serde.SuggestionsJsonWriter;
import org.congener.streams.config.AppConfig;
import org.congener.streams.processor.Intake;
import org.congener.streams.processor.SuggestionProcessor;
import org.congener.streams.processor.UsageEventIntake;
import org.congener.streams.scoring.ColdStartScorer;
import org.congener.core.interactions.InteractionWeights;
import org.congener.streams.model.ModelAssembler;
import org.congener.streams.model.SharedTerms;
import org.congener.streams.processor.GlobalRecordProcessor;
import org.congener.streams.processor.InMemoryTable;
import org.congener.schemas.CatalogEntry;
import org.congener.schemas.InventoryEvent;
import org.congener.schemas.Researcher;
import org.congener.streams.scoring.HybridScorer;
import org.congener.schemas.ItemFactors;
import org.congener.schemas.ItemNeighbours;
import org.congener.schemas.ModelManifest;
import org.congener.streams.scoring.SuggestionScorer;
import org.congener.streams.serde.RecordSerdes;
import org.congener.streams.state.GroupPopularitySerde;
import org.congener.streams.state.InteractionProfileSerde;

/**
 * The suggestion topology.
 *
 * <pre>
 * usage-events (raw bytes, keyed by researcher) ─▶ intake ─┬─ rejected ─▶ dead-letters
 *                                                          └─ accepted ─▶ suggest ─▶ suggestions
 *     suggest's stores: researcher-interactions, latest-suggestions, pending-lists,
 *                       group-popularity (cold start only)
 * catalog, researchers, inventory-events ─▶ global stores ─▶ in-memory tables read by intake and suggest
 * model-item-factors, item-neighbours, model-manifests ─▶ global stores ─▶ model assembler ─▶ live snapshot
 * </pre>
 *
 * One sub-topology, no repartition: events arrive keyed by researcher, and everything a list needs
 * besides the researcher's own state is global. A repartition hop would cost a second exactly-once
 * write and read per event and a commit interval of latency (the design before this one keyed by
 * group, for group popularity, and ran at about 300 events/s with seconds of latency; BENCHMARKS.md).
 * The latest list per researcher is written by suggest itself, as the same JSON bytes it publishes,
 * into a store partitioned like {@code usage-events} that the query API reads.
 *
 * <p>Suggest gathers events into batches (up to {@code scoring.batch.events}, waiting at most
 * {@code scoring.batch.wait.ms}) so that one pass over the item factors scores them all; each event
 * is still folded in as it comes and gets its own list. A researcher with a begun but unpublished list
 * is marked in {@code pending-lists}, which is changelogged with the rest of the state, so a commit
 * taken while a batch waits loses nothing: whoever owns the task next publishes those lists.
 */
public final class SuggestionTopology {

    public static final String INTERACTIONS_STORE = "researcher-interactions";
    public static final String GROUP_POPULARITY_STORE = "group-popularity";
    public static final String LATEST_SUGGESTIONS_STORE = "latest-suggestions";
    public static final String PENDING_LISTS_STORE = "pending-lists";
    public static final String CATALOG_STORE = "catalog-table";
    public static final String RESEARCHERS_STORE = "researchers-table";
    public static final String STOCK_STORE = "stock-table";
    public static final String ITEM_FACTORS_STORE = "model-item-factors-store";
    public static final String NEIGHBOURS_STORE = "item-neighbours-store";
    public static final String MANIFESTS_STORE = "model-manifests-store";

    /** What the topology needs besides the builder. */
    public record Settings(String topicPrefix, int topN, Duration popularityHalfLife, boolean inStockOnly,
                           SuggestionProcessor.Batching batching) {
        /** Each list published while its event is processed, no in-stock filter. */
        public Settings(String topicPrefix, int topN, Duration popularityHalfLife) {
            this(topicPrefix, topN, popularityHalfLife, false);
        }

        /** Each list published while its event is processed. */
        public Settings(String topicPrefix, int topN, Duration popularityHalfLife, boolean inStockOnly) {
            this(topicPrefix, topN, popularityHalfLife, inStockOnly, SuggestionProcessor.Batching.NONE);
        }

        public Settings {
            if (topN < 1) {
                throw new IllegalArgumentException("top-N must be at least 1, got " + topN);
            }
            if (popularityHalfLife.isNegative() || popularityHalfLife.isZero()) {
                throw new IllegalArgumentException("popularity half-life must be positive");
            }
        }

        public static Settings from(AppConfig config) {
            return new Settings(config.topicPrefix(), config.topN(), config.popularityHalfLife(), config.inStockOnly(),
                    new SuggestionProcessor.Batching(config.batchEvents(), Duration.ofMillis(config.batchWaitMs())));
        }

    }

    private SuggestionTopology() {
    }

    /**
     * The topology with the hybrid scorer: live model versions once one is complete, ontology
     * similarity and group popularity before ({@link ColdStartScorer}). Returns the instance's model assembler (its live snapshot is what events are scored under).
     */
    public static ModelAssembler build(StreamsBuilder builder, Settings settings) {
        return build(builder, settings, (SharedTerms) null);
    }

    /** The same, naming in each suggestion the ontology class it shares with its top contributor. */
    public static ModelAssembler build(StreamsBuilder builder, Settings settings, SharedTerms sharedTerms) {
        ColdStartScorer coldStart = new ColdStartScorer(settings.popularityHalfLife().toMillis());
        return build(builder, settings, new HybridScorer(coldStart), sharedTerms);
    }

    public static ModelAssembler build(StreamsBuilder builder, Settings settings, SuggestionScorer scorer) {
        return build(builder, settings, scorer, null);
    }

    /** @param sharedTerms null: suggestions name no shared ontology class */
    public static ModelAssembler build(StreamsBuilder builder, Settings settings, SuggestionScorer scorer,
                                       SharedTerms sharedTerms) {
        Topics topics = new Topics(settings.topicPrefix());
        ModelAssembler models = new ModelAssembler();
        globalStore(builder, topics.modelItemFactors(), ITEM_FACTORS_STORE, models::onFactors);
        globalStore(builder, topics.itemNeighbours(), NEIGHBOURS_STORE, models::onNeighbours);
        globalStore(builder, topics.modelManifests(), MANIFESTS_STORE, models::onManifest);
        InMemoryTable<CatalogEntry> catalog = new InMemoryTable<>();
        InMemoryTable<Researcher> researchers = new InMemoryTable<>();
        InMemoryTable<InventoryEvent> stock = new InMemoryTable<>();
        globalStore(builder, topics.catalog(), CATALOG_STORE, catalog);
        globalStore(builder, topics.researchers(), RESEARCHERS_STORE, researchers);
        // the latest stock event per compound; "in stock" means its quantity on hand is above zero
        globalStore(builder, topics.inventoryEvents(), STOCK_STORE, stock);

        // caching: a heavy user's several events within one commit interval cost one changelog record
        builder.addStateStore(Stores.keyValueStoreBuilder(Stores.persistentKeyValueStore(INTERACTIONS_STORE),
                Serdes.String(), new InteractionProfileSerde()).withCachingEnabled());
        builder.addStateStore(Stores.keyValueStoreBuilder(Stores.persistentKeyValueStore(GROUP_POPULARITY_STORE),
                Serdes.String(), new GroupPopularitySerde()).withCachingEnabled());
        builder.addStateStore(Stores.keyValueStoreBuilder(Stores.persistentKeyValueStore(LATEST_SUGGESTIONS_STORE),
                Serdes.String(), Serdes.ByteArray()).withCachingEnabled());
        // caching: a mark set and cleared within one commit interval reaches RocksDB and the changelog
        // as one delete; only a mark still set at a commit is kept, for whoever owns the task next
        builder.addStateStore(Stores.keyValueStoreBuilder(Stores.persistentKeyValueStore(PENDING_LISTS_STORE),
                Serdes.String(), Serdes.String()).withCachingEnabled());

        Topic<UsageEvent> usage = topics.usageEvents();
        KStream<String, Intake> intake = builder
                .stream(usage.name(), Consumed.with(usage.keySerde(), Serdes.ByteArray()))
                .process(() -> new UsageEventIntake(usage.valueSerde(), researchers, catalog));

        Topic<DeadLetter> deadLetters = topics.deadLetters();
        intake.filter((key, value) -> !value.isAccepted())
                .mapValues(Intake::deadLetter)
                .to(deadLetters.name(), Produced.with(deadLetters.keySerde(), deadLetters.valueSerde()));

        SuggestionProcessor.Stores stores = new SuggestionProcessor.Stores(INTERACTIONS_STORE, GROUP_POPULARITY_STORE,
                LATEST_SUGGESTIONS_STORE, PENDING_LISTS_STORE, researchers, catalog, stock);
        double halfLifeMs = settings.popularityHalfLife().toMillis();
        Topic<Suggestions> suggestions = topics.suggestions();
        // the lists are this app's own output, built from checked values: written without a schema check,
        // by the streaming writer that gives the topic serde's bytes without its reflection
        Serializer<Suggestions> listWriter = new SuggestionsJsonWriter();
        intake.filter((key, value) -> value.isAccepted())
                .mapValues(Intake::event)
                .process(() -> new SuggestionProcessor(stores, scorer, models::live, InteractionWeights.defaults(),
                        halfLifeMs, settings.topN(), settings.inStockOnly(), sharedTerms, listWriter,
                        settings.batching()),
                        INTERACTIONS_STORE, GROUP_POPULARITY_STORE, LATEST_SUGGESTIONS_STORE, PENDING_LISTS_STORE)
                .to(suggestions.name(), Produced.with(suggestions.keySerde(), Serdes.ByteArray()));
        return models;
    }

    /**
     * A global store over one compacted topic, validated when read from the topic and stored as the
     * topic's JSON, whose processor also hands every record to {@code sink} (the model assembler or an
     * in-memory table); on start the processor replays the restored store into it (restoration
     * bypasses processors).
     */
    @SuppressWarnings("unchecked")
    private static <V> void globalStore(StreamsBuilder builder, Topic<V> topic, String storeName,
                                        java.util.function.BiConsumer<String, V> sink) {
        Class<V> type = (Class<V>) topic.id().valueType();
        builder.addGlobalStore(
                Stores.keyValueStoreBuilder(Stores.persistentKeyValueStore(storeName), topic.keySerde(),
                        RecordSerdes.storeValue(topic.id(), type)).withLoggingDisabled(),
                topic.name(), Consumed.with(topic.keySerde(), topic.valueSerde()),
                () -> new GlobalRecordProcessor<>(storeName, sink));
    }
}
