package org.congener.streams.model;

import java.util.HashMap;
import java.util.Map;
import java.util.concurrent.atomic.AtomicReference;

import org.congener.schemas.ItemFactors;
import org.congener.schemas.ItemNeighbours;
import org.congener.schemas.ModelChecksum;
import org.congener.schemas.ModelManifest;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Collects the records of the three model topics as they arrive and makes a version live when the
 * {@code current} manifest names it and exactly {@code itemCount} factor records and
 * {@code neighbourCount} neighbour records of that version are present; until then the previous
 * version stays live, and it stays off when the factor records do not match the manifest's checksum
 * ({@link ModelChecksum}). One writer (the global thread), any number of readers of {@link #live()}: the
 * switch is one atomic reference swap.
 */
public final class ModelAssembler {

    private static final Logger LOG = LoggerFactory.getLogger(ModelAssembler.class);
    public static final String CURRENT_KEY = "current";

    private final Map<String, Map<String, ItemFactors>> factors = new HashMap<>();
    private final Map<String, Map<String, ItemNeighbours>> neighbours = new HashMap<>();
    private final AtomicReference<LiveModel> live = new AtomicReference<>();
    private ModelManifest current;
    private String refusedVersion;

    /** The live snapshot, or null before any version is complete. */
    public LiveModel live() {
        return live.get();
    }

    /** A record of {@code model-item-factors}; a null value is a tombstone. */
    public synchronized void onFactors(String key, ItemFactors value) {
        VersionedKey k = VersionedKey.parse(key);
        if (k == null) {
            return;
        }
        put(factors, k, value);
        tryPromote();
    }

    /** A record of {@code item-neighbours}; a null value is a tombstone. */
    public synchronized void onNeighbours(String key, ItemNeighbours value) {
        VersionedKey k = VersionedKey.parse(key);
        if (k == null) {
            return;
        }
        put(neighbours, k, value);
        tryPromote();
    }

    /** A record of {@code model-manifests}: only the {@code current} key decides what goes live. */
    public synchronized void onManifest(String key, ModelManifest value) {
        if (CURRENT_KEY.equals(key) && value != null) {
            current = value;
            tryPromote();
        }
    }

    private static <V> void put(Map<String, Map<String, V>> byVersion, VersionedKey k, V value) {
        if (value == null) {
            Map<String, V> records = byVersion.get(k.version());
            if (records != null) {
                records.remove(k.compoundId());
                if (records.isEmpty()) {
                    byVersion.remove(k.version());
                }
            }
        } else {
            byVersion.computeIfAbsent(k.version(), v -> new HashMap<>()).put(k.compoundId(), value);
        }
    }

    private void tryPromote() {
        if (current == null) {
            return;
        }
        LiveModel now = live.get();
        String version = current.version();
        if (now != null && now.version().equals(version) && now.manifest().equals(current)) {
            return;
        }
        Map<String, ItemFactors> f = factors.getOrDefault(version, Map.of());
        Map<String, ItemNeighbours> n = neighbours.getOrDefault(version, Map.of());
        if (f.size() != current.itemCount() || n.size() != current.neighbourCount()) {
            return;
        }
        String checksum = ModelChecksum.of(f.values());
        if (!checksum.equals(current.checksum())) {
            if (!version.equals(refusedVersion)) {
                LOG.error("model version {} has all its records but their checksum {} is not the manifest's {};"
                        + " {} stays live", version, checksum, current.checksum(), now == null ? "no version" : now.version());
                refusedVersion = version;
            }
            return;
        }
        try {
            live.set(LiveModel.assemble(current, f.values(), n.values()));
            LOG.info("model version {} is live ({} factor records, {} neighbour records)", version, f.size(), n.size());
        } catch (RuntimeException e) {
            LOG.error("model version {} is complete but cannot be assembled; {} stays live: {}", version,
                    now == null ? "no version" : now.version(), e.getMessage());
        }
    }

    /** A key {@code <version>/<compoundId>}. */
    record VersionedKey(String version, String compoundId) {
        static VersionedKey parse(String key) {
            if (key == null) {
                return null;
            }
            int slash = key.indexOf('/');
            if (slash <= 0 || slash == key.length() - 1) {
                LOG.warn("model record key {} is not <version>/<compoundId>; ignored", key);
                return null;
            }
            return new VersionedKey(key.substring(0, slash), key.substring(slash + 1));
        }
    }
}
