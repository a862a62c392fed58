package org.congener.streams.api;

import java.util.Optional;
import java.util.function.LongSupplier;

import org.apache.kafka.common.serialization.Serdes;
import org.apache.kafka.streams.KafkaStreams;
import org.apache.kafka.streams.KeyQueryMetadata;
import org.apache.kafka.streams.StoreQueryParameters;
import org.apache.kafka.streams.errors.InvalidStateStoreException;
import org.apache.kafka.streams.state.HostInfo;
import org.apache.kafka.streams.state.QueryableStoreTypes;
import org.apache.kafka.streams.state.ReadOnlyKeyValueStore;
import org.congener.schemas.CatalogEntry;
import org.congener.schemas.InventoryEvent;
import org.congener.streams.model.Alternatives;
import org.congener.streams.model.LiveModel;
import org.congener.streams.model.ModelAssembler;
import org.congener.schemas.Suggestions;
import org.congener.streams.SuggestionTopology;

/**
 * Answers queries from the streams app's stores. The {@code latest-suggestions} table is partitioned by
 * researcher; Kafka Streams' metadata ({@code queryMetadataForKey}) says which instance holds a
 * researcher's partition, and a query for a list held elsewhere is forwarded to that instance's query
 * API. The researchers table is global, so every instance answers "is this a researcher" itself.
 */
public final class StoreSuggestionQueries implements SuggestionQueries {

    private static final org.apache.kafka.common.serialization.Deserializer<Suggestions> LIST_READER =
            org.congener.streams.serde.RecordSerdes.storeValue(org.congener.schemas.TopicName.SUGGESTIONS,
                    Suggestions.class).deserializer();

    private final int maxItems;
    private final RemoteSuggestions remote = new RemoteSuggestions();
    private volatile KafkaStreams streams;
    private volatile HostInfo self;
    private volatile LongSupplier deadLetters = () -> 0;
    private volatile ModelAssembler models;

    public StoreSuggestionQueries(int maxItems) {
        this.maxItems = maxItems;
    }

    /**
     * Connects the queries to the running app; until then every query answers "not ready".
     *
     * @param self the address in {@code application.server}, i.e. how other instances reach this one
     */
    public void attach(KafkaStreams streams, HostInfo self, LongSupplier deadLetters, ModelAssembler models) {
        this.models = models;
        this.self = self;
        this.deadLetters = deadLetters;
        this.streams = streams;
    }

    @Override
    public Optional<Suggestions> latest(String researcherId, boolean localOnly) {
        KafkaStreams app = running();
        if (!localOnly) {
            KeyQueryMetadata metadata = app.queryMetadataForKey(SuggestionTopology.LATEST_SUGGESTIONS_STORE,
                    researcherId, Serdes.String().serializer());
            if (metadata == null || KeyQueryMetadata.NOT_AVAILABLE.equals(metadata)) {
                throw new NotReadyException("no instance holds researcher '" + researcherId
                        + "' right now (streams state " + app.state() + "); try again shortly");
            }
            if (!metadata.activeHost().equals(self)) {
                return remote.fetch(metadata.activeHost(), researcherId);
            }
        }
        // the store holds the JSON the app published; read without a schema check, it wrote them itself
        byte[] json = get(app, SuggestionTopology.LATEST_SUGGESTIONS_STORE, researcherId);
        return Optional.ofNullable(LIST_READER.deserialize(null, json));
    }

    @Override
    public boolean isKnownResearcher(String researcherId) {
        return get(running(), SuggestionTopology.RESEARCHERS_STORE, researcherId) != null;
    }

    @Override
    public boolean isKnownCompound(String compoundId) {
        return get(running(), SuggestionTopology.CATALOG_STORE, compoundId) != null;
    }

    @Override
    public Alternatives.Lists alternatives(String compoundId, int n, boolean inStockOnly) {
        KafkaStreams app = running();
        LiveModel model = models == null ? null : models.live();
        if (model == null) {
            throw new NotReadyException("no model version is live yet; alternatives need one");
        }
        ReadOnlyKeyValueStore<String, CatalogEntry> catalog = store(app, SuggestionTopology.CATALOG_STORE);
        ReadOnlyKeyValueStore<String, InventoryEvent> stock = store(app, SuggestionTopology.STOCK_STORE);
        try {
            return Alternatives.of(model, compoundId, n, id -> {
                CatalogEntry entry = catalog.get(id);
                if (entry == null || !entry.active()) {
                    return false;
                }
                return !inStockOnly || inStock(stock, id);
            }).map(a -> {
                CatalogEntry entry = catalog.get(a.compoundId());
                return a.withFacts(entry.name(), inStock(stock, a.compoundId()), entry.hazardCodes());
            });
        } catch (InvalidStateStoreException e) {
            throw notReady(app, SuggestionTopology.CATALOG_STORE);
        }
    }

    @Override
    public boolean isInStock(String compoundId) {
        InventoryEvent last = get(running(), SuggestionTopology.STOCK_STORE, compoundId);
        return last != null && last.quantityOnHand() > 0;
    }

    /** The value under {@code key} in this instance's store {@code name}, or null; 503 while not queryable. */
    private static <V> V get(KafkaStreams app, String name, String key) {
        ReadOnlyKeyValueStore<String, V> store = store(app, name);
        try {
            return store.get(key);
        } catch (InvalidStateStoreException e) {
            throw notReady(app, name);
        }
    }

    /** In stock: the compound's latest inventory event has quantity on hand above zero. */
    private static boolean inStock(ReadOnlyKeyValueStore<String, InventoryEvent> stock, String compoundId) {
        InventoryEvent last = stock.get(compoundId);
        return last != null && last.quantityOnHand() > 0;
    }

    @Override
    public Health health() {
        KafkaStreams app = streams;
        if (app == null) {
            return new Health("STARTING", false, 0);
        }
        KafkaStreams.State state = app.state();
        return new Health(state.name(), state == KafkaStreams.State.RUNNING, deadLetters.getAsLong());
    }

    @Override
    public int maxItems() {
        return maxItems;
    }

    private KafkaStreams running() {
        KafkaStreams app = streams;
        if (app == null) {
            throw new NotReadyException("the streams app is starting; try again shortly");
        }
        return app;
    }

    private static <V> ReadOnlyKeyValueStore<String, V> store(KafkaStreams app, String name) {
        try {
            return app.store(StoreQueryParameters.fromNameAndType(name, QueryableStoreTypes.<String, V>keyValueStore()));
        } catch (InvalidStateStoreException e) {
            throw notReady(app, name);
        }
    }

    private static NotReadyException notReady(KafkaStreams app, String name) {
        return new NotReadyException("store " + name + " is not ready (streams state " + app.state()
                + "); try again shortly");
    }
}
