package org.congener.streams.processor;

import org.apache.kafka.streams.processor.api.ProcessorContext;
import org.apache.kafka.streams.state.TimestampedKeyValueStore;
import org.apache.kafka.streams.state.ValueAndTimestamp;

/** Read access to a global table's store (catalogue, researchers, stock) from inside a processor. */
final class GlobalLookup<V> {

    private final TimestampedKeyValueStore<String, V> store;

    private GlobalLookup(TimestampedKeyValueStore<String, V> store) {
        this.store = store;
    }

    static <V> GlobalLookup<V> of(ProcessorContext<?, ?> context, String storeName) {
        return new GlobalLookup<>(context.getStateStore(storeName));
    }

    /** Every entry, in key order. */
    void forEach(java.util.function.BiConsumer<String, V> action) {
        try (var all = store.all()) {
            while (all.hasNext()) {
                var entry = all.next();
                if (entry.value != null && entry.value.value() != null) {
                    action.accept(entry.key, entry.value.value());
                }
            }
        }
    }

    /** The current value for {@code key}, or null when there is none. */
    V get(String key) {
        if (key == null) {
            return null;
        }
        ValueAndTimestamp<V> value = store.get(key);
        return value == null ? null : value.value();
    }
}
