package org.congener.trainer.registry;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import org.congener.schemas.ModelManifest;

/**
 * The published versions as a read_committed consumer sees them: each version's manifest, the live one
 * ({@code current}), and the record keys present per version on the factor and neighbour topics.
 */
public record PublishedModels(TreeMap<String, ModelManifest> versions, ModelManifest current,
                              Map<String, List<String>> factorKeys, Map<String, List<String>> neighbourKeys) {

    public Optional<ModelManifest> live() {
        return Optional.ofNullable(current);
    }

    public String liveVersion() {
        return current == null ? null : current.version();
    }

    public int factorCount(String version) {
        return factorKeys.getOrDefault(version, List.of()).size();
    }

    public int neighbourCount(String version) {
        return neighbourKeys.getOrDefault(version, List.of()).size();
    }

    /** True when every record the manifest counts is on the broker, the condition for going live. */
    public boolean complete(String version) {
        ModelManifest m = versions.get(version);
        return m != null && factorCount(version) == m.itemCount() && neighbourCount(version) == m.neighbourCount();
    }
}
