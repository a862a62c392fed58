package org.congener.trainer.service;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;
import org.congener.schemas.CatalogEntry;
import org.congener.schemas.Researcher;
import org.congener.schemas.Topics;
import org.congener.schemas.UsageEvent;

/**
 * Reads the training history: the whole {@code usage-events} topic (the input the streams app also
 * reads, so nothing the app derived can drift from what the trainer sees), and the compacted
 * {@code catalog} and {@code researchers} topics as key → latest value.
 */
public final class HistoryReader {
    private final TopicSnapshotReader reader;
    private final Topics topics;

    public HistoryReader(TopicSnapshotReader reader, Topics topics) {
        this.reader = reader;
        this.topics = topics;
    }

    public TrainingHistory read(Consumer<Integer> onEvent) {
        TopicSnapshotReader.Snapshot<UsageEvent> events = reader.read(topics.usageEvents(), onEvent);
        TopicSnapshotReader.Snapshot<CatalogEntry> catalogue = reader.read(topics.catalog(), n -> { });
        TopicSnapshotReader.Snapshot<Researcher> researchers = reader.read(topics.researchers(), n -> { });
        List<UsageEvent> usage = events.records().stream().map(TopicSnapshotReader.KeyedValue::value)
                .filter(v -> v != null).toList();
        return new TrainingHistory(usage, latest(catalogue), latest(researchers), events.skipped(),
                catalogue.skipped(), researchers.skipped());
    }

    private static <V> Map<String, V> latest(TopicSnapshotReader.Snapshot<V> snapshot) {
        Map<String, V> out = new LinkedHashMap<>();
        for (TopicSnapshotReader.KeyedValue<V> r : snapshot.records()) {
            if (r.key() == null) {
                continue;
            }
            if (r.value() == null) {
                out.remove(r.key());
            } else {
                out.put(r.key(), r.value());
            }
        }
        return out;
    }
}
