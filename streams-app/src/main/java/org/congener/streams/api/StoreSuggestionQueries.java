package org.congener.streams.api;

import java.util.Optional;
import java.util.function.LongSupplier;

import org.apache.kafka.streams.KafkaStreams;
import org.apache.kafka.streams.StoreQueryParameters;
import org.apache.kafka.streams.errors.InvalidStateStoreException;
import org.apache.kafka.streams.state.QueryableStoreTypes;
import org.apache.kafka.streams.state.ReadOnlyKeyValueStore;
import org.congener.schemas.Researcher;
import org.congener.schemas.Suggestions;
import org.congener.streams.SuggestionTopology;

/**
 * Answers queries from this instance's stores: the {@code latest-suggestions} table and the
 * researchers global table. With several instances, a key may live on another one; this class then
 * answers "no suggestions yet" (forwarding to the owner via {@code queryMetadataForKey} is left open).
 */
public final class StoreSuggestionQueries implements SuggestionQueries {

    private final KafkaStreams streams;
    private final int maxItems;
    private final LongSupplier deadLetters;

    public StoreSuggestionQueries(KafkaStreams streams, int maxItems, LongSupplier deadLetters) {
        this.streams = streams;
        this.maxItems = maxItems;
        this.deadLetters = deadLetters;
    }

    @Override
    public Optional<Suggestions> latest(String researcherId) {
        ReadOnlyKeyValueStore<String, Suggestions> store = store(SuggestionTopology.LATEST_SUGGESTIONS_STORE);
        try {
            return Optional.ofNullable(store.get(researcherId));
        } catch (InvalidStateStoreException e) {
            throw notReady(SuggestionTopology.LATEST_SUGGESTIONS_STORE);
        }
    }

    @Override
    public boolean isKnownResearcher(String researcherId) {
        ReadOnlyKeyValueStore<String, Researcher> store = store(SuggestionTopology.RESEARCHERS_STORE);
        try {
            return store.get(researcherId) != null;
        } catch (InvalidStateStoreException e) {
            throw notReady(SuggestionTopology.RESEARCHERS_STORE);
        }
    }

    @Override
    public Health health() {
        KafkaStreams.State state = streams.state();
        return new Health(state.name(), state == KafkaStreams.State.RUNNING, deadLetters.getAsLong());
    }

    @Override
    public int maxItems() {
        return maxItems;
    }

    private <V> ReadOnlyKeyValueStore<String, V> store(String name) {
        try {
            return streams.store(StoreQueryParameters.fromNameAndType(name, QueryableStoreTypes.<String, V>keyValueStore()));
        } catch (InvalidStateStoreException e) {
            throw notReady(name);
        }
    }

    private NotReadyException notReady(String name) {
        return new NotReadyException("store " + name + " is not ready (streams state " + streams.state()
                + "); try again shortly");
    }
}
