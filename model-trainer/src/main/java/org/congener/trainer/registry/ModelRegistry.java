package org.congener.trainer.registry;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import org.congener.schemas.ModelManifest;
import org.congener.schemas.Topic;
import org.congener.schemas.Topics;
import org.congener.trainer.publish.VersionNames;
import org.congener.trainer.service.TopicSnapshotReader;

/** Reads what is published: the manifests topic and the keys (latest non-tombstone) of the factor and neighbour topics. */
public final class ModelRegistry {
    private final TopicSnapshotReader reader;
    private final Topics topics;

    public ModelRegistry(TopicSnapshotReader reader, Topics topics) {
        this.reader = reader;
        this.topics = topics;
    }

    public PublishedModels read() {
        TreeMap<String, ModelManifest> versions = new TreeMap<>();
        ModelManifest current = null;
        for (TopicSnapshotReader.KeyedValue<ModelManifest> r : reader.read(topics.modelManifests(), n -> { }).records()) {
            if (VersionNames.CURRENT.equals(r.key())) {
                current = r.value();
            } else if (VersionNames.isVersion(r.key())) {
                if (r.value() == null) {
                    versions.remove(r.key());
                } else {
                    versions.put(r.key(), r.value());
                }
            }
        }
        return new PublishedModels(versions, current, keysByVersion(topics.modelItemFactors()),
                keysByVersion(topics.itemNeighbours()));
    }

    private <V> Map<String, List<String>> keysByVersion(Topic<V> topic) {
        Set<String> present = new LinkedHashSet<>();
        for (TopicSnapshotReader.KeyedValue<V> r : reader.read(topic, n -> { }).records()) {
            if (r.value() == null) {
                present.remove(r.key());
            } else if (r.key() != null) {
                present.add(r.key());
            }
        }
        Map<String, List<String>> out = new LinkedHashMap<>();
        for (String key : present) {
            String version = VersionNames.versionOf(key);
            if (version != null) {
                out.computeIfAbsent(version, v -> new ArrayList<>()).add(key);
            }
        }
        return out;
    }
}
