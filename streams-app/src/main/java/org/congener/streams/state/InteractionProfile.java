package org.congener.streams.state;

import java.util.Collection;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * What one researcher has done with each compound: summed interaction strength r_ui, number of
 * events, when last seen, and whether the researcher has actually used it (anything but a view); and
 * the researcher's factor vector x_u as last folded in, with the model version it belongs to, so that
 * the next fold-in under the same version starts from it. Kept per researcher in a RocksDB store; see
 * {@link InteractionProfileSerde} for the bytes.
 */
public final class InteractionProfile {

    /** One compound's line in the profile. */
    public record Entry(String compoundId, float strength, int events, long lastSeenEpochMs, boolean used) {
    }

    private final Map<String, Entry> entries;
    private String vectorVersion;
    private float[] vector;

    public InteractionProfile() {
        this.entries = new LinkedHashMap<>();
    }

    InteractionProfile(Map<String, Entry> entries, String vectorVersion, float[] vector) {
        this.entries = entries;
        this.vectorVersion = vectorVersion;
        this.vector = vector;
    }

    /**
     * The researcher's vector folded in under {@code version}, or null when the last fold-in was under
     * another version (or none): a vector is only a warm start under the item factors it was fitted to.
     */
    public float[] vectorUnder(String version) {
        return vector != null && version != null && version.equals(vectorVersion) ? vector : null;
    }

    /** The version the stored vector belongs to, or null. */
    public String vectorVersion() {
        return vectorVersion;
    }

    /** Keeps {@code x} (rounded to float, enough for a warm start) as the vector under {@code version}. */
    public void keepVector(String version, double[] x) {
        float[] kept = vector != null && vector.length == x.length ? vector : new float[x.length];
        for (int f = 0; f < x.length; f++) {
            kept[f] = (float) x[f];
        }
        this.vector = kept;
        this.vectorVersion = version;
    }

    /** Adds one event with weight {@code weight}, no decay; modifies this profile. */
    public void add(String compoundId, float weight, long occurredEpochMs, boolean used) {
        add(compoundId, weight, occurredEpochMs, used, 0);
    }

    /**
     * Adds one event with weight {@code weight}; modifies this profile. With a half-life h > 0 an
     * entry's strength is the decayed sum Σ w_e · 2^(−(t − t_e)/h) as of its last-seen time t
     * ({@link org.congener.core.interactions.InteractionWeights}' decay kept in one number per
     * compound: adding an event rescales the stored sum to the newer of the two times);
     * {@link #strengthAt} reads it at any later time. h ≤ 0: plain sums.
     */
    public void add(String compoundId, float weight, long occurredEpochMs, boolean used, double halfLifeMs) {
        entries.merge(compoundId, new Entry(compoundId, weight, 1, occurredEpochMs, used), (old, now) -> {
            double sum;
            long asOf = Math.max(old.lastSeenEpochMs(), occurredEpochMs);
            if (halfLifeMs > 0) {
                sum = old.strength() * decay(asOf - old.lastSeenEpochMs(), halfLifeMs)
                        + weight * decay(asOf - occurredEpochMs, halfLifeMs);
            } else {
                sum = old.strength() + weight;
            }
            return new Entry(compoundId, (float) sum, old.events() + 1, asOf, old.used() || used);
        });
    }

    /**
     * The entry's strength at {@code atEpochMs} under half-life {@code halfLifeMs} (≤ 0: none). A time
     * before the last-seen time reads the stored value: an age is never negative, as in the batch weights.
     */
    public static double strengthAt(Entry entry, long atEpochMs, double halfLifeMs) {
        if (!(halfLifeMs > 0)) {
            return entry.strength();
        }
        return entry.strength() * decay(Math.max(0, atEpochMs - entry.lastSeenEpochMs()), halfLifeMs);
    }

    private static double decay(long ageMs, double halfLifeMs) {
        return Math.pow(2.0, -ageMs / halfLifeMs);
    }

    public Entry get(String compoundId) {
        return entries.get(compoundId);
    }

    /** Whether the researcher ordered, withdrew or logged usage of the compound (views do not count). */
    public boolean hasUsed(String compoundId) {
        Entry entry = entries.get(compoundId);
        return entry != null && entry.used();
    }

    public Collection<Entry> entries() {
        return Collections.unmodifiableCollection(entries.values());
    }

    public int size() {
        return entries.size();
    }
}
