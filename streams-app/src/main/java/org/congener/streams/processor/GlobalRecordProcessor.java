package org.congener.streams.processor;

import java.util.function.BiConsumer;

import org.apache.kafka.streams.KeyValue;
import org.apache.kafka.streams.processor.api.Processor;
import org.apache.kafka.streams.processor.api.ProcessorContext;
import org.apache.kafka.streams.processor.api.Record;
import org.apache.kafka.streams.state.KeyValueIterator;
import org.apache.kafka.streams.state.KeyValueStore;

/**
 * Keeps one compacted topic in its global store and hands each record (tombstones too) to an
 * in-memory consumer: the model assembler for the model topics, an {@link InMemoryTable} for the
 * catalogue, researchers and stock. Every instance runs one per topic, so every instance holds the
 * same versions and tables.
 */
public final class GlobalRecordProcessor<V> implements Processor<String, V, Void, Void> {

    private final String storeName;
    private final BiConsumer<String, V> sink;
    private KeyValueStore<String, V> store;

    public GlobalRecordProcessor(String storeName, BiConsumer<String, V> sink) {
        this.storeName = storeName;
        this.sink = sink;
    }

    @Override
    public void init(ProcessorContext<Void, Void> context) {
        store = context.getStateStore(storeName);
        // a restart restores the store from the topic without calling process: replay it once
        try (KeyValueIterator<String, V> all = store.all()) {
            while (all.hasNext()) {
                KeyValue<String, V> kv = all.next();
                sink.accept(kv.key, kv.value);
            }
        }
    }

    @Override
    public void process(Record<String, V> record) {
        if (record.key() == null) {
            return;
        }
        if (record.value() == null) {
            store.delete(record.key());
        } else {
            store.put(record.key(), record.value());
        }
        sink.accept(record.key(), record.value());
    }
}
