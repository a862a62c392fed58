package org.congener.streams.processor;

import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.BiConsumer;

/**
 * The parsed values of one global table (catalogue, researchers, stock), kept in memory beside its
 * RocksDB global store and fed by the same global processor. Every event reads the researcher, the
 * compound, and the catalogue entry and stock of each listed or checked candidate — 40 and more
 * lookups per event at top-10; from the store each would parse JSON again (a few µs each, about as
 * much as all the scoring arithmetic), from here each is a hash lookup. One writer (the global
 * thread), any number of readers (stream threads): a concurrent map.
 */
public final class InMemoryTable<V> implements BiConsumer<String, V> {

    private final Map<String, V> values = new ConcurrentHashMap<>();

    /** The current value for {@code key}, or null when there is none. */
    public V get(String key) {
        return key == null ? null : values.get(key);
    }

    /** Every entry, in no particular order. */
    public void forEach(BiConsumer<String, V> action) {
        values.forEach(action);
    }

    public int size() {
        return values.size();
    }

    /** A record of the table's topic; a null value (tombstone) removes the key. */
    @Override
    public void accept(String key, V value) {
        if (key == null) {
            return;
        }
        if (value == null) {
            values.remove(key);
        } else {
            values.put(key, value);
        }
    }
}
