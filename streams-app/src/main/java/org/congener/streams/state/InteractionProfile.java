package org.congener.streams.state;

import java.util.AbstractList;
import java.util.Arrays;
import java.util.List;

/**
 * What one researcher has done with each compound: summed interaction strength r_ui, number of
 * events, when last seen, and whether the researcher has actually used it (anything but a view); and
 * the researcher's factor vector x_u as last folded in, with the model version it belongs to, so that
 * the next fold-in under the same version starts from it. Kept per researcher in a RocksDB store; see
 * {@link InteractionProfileSerde} for the bytes.
 *
 * <p>The entries are held column by column in first-seen order (position p in every array is one
 * compound), not as a map of entry objects: the profile is read from the store and written back at
 * every event, and a heavy user's has hundreds of entries, so a map would cost an entry object, a map
 * node and a String per compound per event. Look-up by id goes through a small open-addressing table
 * of positions, built on the first look-up of a profile that has more than a few entries.
 */
public final class InteractionProfile {

    /** One compound's line in the profile. */
    public record Entry(String compoundId, float strength, int events, long lastSeenEpochMs, boolean used) {
    }

    /** Up to this many entries a look-up scans the ids instead of building the table. */
    private static final int SCANNED_AT_MOST = 8;

    private String[] ids;
    private float[] strengths;
    private int[] eventCounts;
    private long[] lastSeen;
    private boolean[] usedFlags;
    private int size;
    /** Position + 1 of each id by its hash, 0 for an empty slot; null until a look-up needs it. */
    private int[] slots;
    private String vectorVersion;
    private float[] vector;

    public InteractionProfile() {
        this(4);
    }

    /** An empty profile with room for {@code capacity} entries, to be filled by {@link #append}. */
    InteractionProfile(int capacity) {
        int room = Math.max(1, capacity);
        ids = new String[room];
        strengths = new float[room];
        eventCounts = new int[room];
        lastSeen = new long[room];
        usedFlags = new boolean[room];
    }

    /** Adds a line for a compound not yet in the profile (the caller knows it is not), at the end. */
    void append(String compoundId, float strength, int events, long lastSeenEpochMs, boolean used) {
        if (size == ids.length) {
            int room = 2 * ids.length;
            ids = Arrays.copyOf(ids, room);
            strengths = Arrays.copyOf(strengths, room);
            eventCounts = Arrays.copyOf(eventCounts, room);
            lastSeen = Arrays.copyOf(lastSeen, room);
            usedFlags = Arrays.copyOf(usedFlags, room);
        }
        ids[size] = compoundId;
        strengths[size] = strength;
        eventCounts[size] = events;
        lastSeen[size] = lastSeenEpochMs;
        usedFlags[size] = used;
        size++;
        if (slots != null) {
            if (2 * size > slots.length) {
                slots = null;
            } else {
                place(size - 1);
            }
        }
    }

    /** Sets the stored vector as read from the store. */
    void restoreVector(String version, float[] factors) {
        this.vectorVersion = version;
        this.vector = factors;
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
        int p = positionOf(compoundId);
        if (p < 0) {
            append(compoundId, weight, 1, occurredEpochMs, used);
            return;
        }
        double sum;
        long asOf = Math.max(lastSeen[p], occurredEpochMs);
        if (halfLifeMs > 0) {
            sum = strengths[p] * decay(asOf - lastSeen[p], halfLifeMs) + weight * decay(asOf - occurredEpochMs, halfLifeMs);
        } else {
            sum = strengths[p] + weight;
        }
        strengths[p] = (float) sum;
        eventCounts[p]++;
        lastSeen[p] = asOf;
        usedFlags[p] |= used;
    }

    /**
     * The entry's strength at {@code atEpochMs} under half-life {@code halfLifeMs} (≤ 0: none). A time
     * before the last-seen time reads the stored value: an age is never negative, as in the batch weights.
     */
    public static double strengthAt(Entry entry, long atEpochMs, double halfLifeMs) {
        return strengthAt(entry.strength(), entry.lastSeenEpochMs(), atEpochMs, halfLifeMs);
    }

    /** {@link #strengthAt(Entry, long, double)} of the entry at position {@code p}. */
    public double strengthAt(int p, long atEpochMs, double halfLifeMs) {
        return strengthAt(strengths[check(p)], lastSeen[p], atEpochMs, halfLifeMs);
    }

    private static double strengthAt(float strength, long lastSeenEpochMs, long atEpochMs, double halfLifeMs) {
        if (!(halfLifeMs > 0)) {
            return strength;
        }
        return strength * decay(Math.max(0, atEpochMs - lastSeenEpochMs), halfLifeMs);
    }

    private static double decay(long ageMs, double halfLifeMs) {
        return Math.pow(2.0, -ageMs / halfLifeMs);
    }

    /** The entry of {@code compoundId}, or null when the researcher has none. */
    public Entry get(String compoundId) {
        int p = positionOf(compoundId);
        return p < 0 ? null : entry(p);
    }

    /** Whether the researcher ordered, withdrew or logged usage of the compound (views do not count). */
    public boolean hasUsed(String compoundId) {
        int p = positionOf(compoundId);
        return p >= 0 && usedFlags[p];
    }

    /** The entries in first-seen order, as records (made on each call; the scorers read the columns). */
    public List<Entry> entries() {
        return new AbstractList<>() {
            @Override
            public Entry get(int p) {
                return entry(p);
            }

            @Override
            public int size() {
                return size;
            }
        };
    }

    public int size() {
        return size;
    }

    /** The compound of the entry at position {@code p} (0 ≤ p &lt; {@link #size()}, first-seen order). */
    public String compoundId(int p) {
        return ids[check(p)];
    }

    /** The stored strength of the entry at {@code p}, as of its last-seen time. */
    public float strength(int p) {
        return strengths[check(p)];
    }

    public int events(int p) {
        return eventCounts[check(p)];
    }

    public long lastSeenEpochMs(int p) {
        return lastSeen[check(p)];
    }

    public boolean used(int p) {
        return usedFlags[check(p)];
    }

    private Entry entry(int p) {
        return new Entry(ids[check(p)], strengths[p], eventCounts[p], lastSeen[p], usedFlags[p]);
    }

    private int check(int p) {
        if (p < 0 || p >= size) {
            throw new IndexOutOfBoundsException("entry " + p + " of a profile of " + size);
        }
        return p;
    }

    /** Position of {@code compoundId}, or −1. */
    private int positionOf(String compoundId) {
        int hash = compoundId.hashCode();
        if (size <= SCANNED_AT_MOST) {
            for (int p = 0; p < size; p++) {
                if (ids[p].hashCode() == hash && ids[p].equals(compoundId)) {
                    return p;
                }
            }
            return -1;
        }
        if (slots == null) {
            slots = new int[Integer.highestOneBit(Math.max(16, 4 * size - 1)) << 1];
            for (int p = 0; p < size; p++) {
                place(p);
            }
        }
        int mask = slots.length - 1;
        for (int s = spread(hash) & mask; slots[s] != 0; s = (s + 1) & mask) {
            int p = slots[s] - 1;
            if (ids[p].hashCode() == hash && ids[p].equals(compoundId)) {
                return p;
            }
        }
        return -1;
    }

    private void place(int p) {
        int mask = slots.length - 1;
        int s = spread(ids[p].hashCode()) & mask;
        while (slots[s] != 0) {
            s = (s + 1) & mask;
        }
        slots[s] = p + 1;
    }

    private static int spread(int hash) {
        return (hash ^ (hash >>> 16)) * 0x9E3779B9;
    }
}
