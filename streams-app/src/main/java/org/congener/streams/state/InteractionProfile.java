package org.congener.streams.state;

import java.nio.charset.StandardCharsets;
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
 * node and a String per compound per event. An id read from the store stays a range of the stored
 * bytes, with its hash, until something asks for it as a String: the stream looks ids up in the live
 * version's index by those bytes ({@link #indexIn}) and writes them back by copying them, so a
 * profile passes through an event without one String made per compound (the bytes were just read and
 * sit in cache; Strings kept elsewhere would be spread over the heap). Look-up by id compares hashes
 * through a small open-addressing table of positions, built on the first look-up of a profile that
 * has more than a few entries.
 */
public final class InteractionProfile {

    /** One compound's line in the profile. */
    public record Entry(String compoundId, float strength, int events, long lastSeenEpochMs, boolean used) {
    }

    /** Up to this many entries a look-up scans the ids instead of building the table. */
    private static final int SCANNED_AT_MOST = 8;

    /** The id as a String; null for an id still only in {@link #stored}, until asked for. */
    private String[] ids;
    /** The bytes the profile was read from, or null; an id at {@code idAt[p] ≥ 0} is ASCII there. */
    private byte[] stored;
    private int[] idAt;
    private int[] idLength;
    /** String.hashCode of each id. */
    private int[] idHash;
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
        idAt = new int[room];
        idLength = new int[room];
        idHash = new int[room];
        strengths = new float[room];
        eventCounts = new int[room];
        lastSeen = new long[room];
        usedFlags = new boolean[room];
    }

    /** Adds a line for a compound not yet in the profile (the caller knows it is not), at the end. */
    void append(String compoundId, float strength, int events, long lastSeenEpochMs, boolean used) {
        int p = appendColumns(strength, events, lastSeenEpochMs, used);
        ids[p] = compoundId;
        idAt[p] = -1;
        idHash[p] = compoundId.hashCode();
        indexNewEntry();
    }

    /**
     * {@link #append} for an id that is the {@code length} ASCII bytes (1 to 127 each) at
     * {@code bytes[at..]}, the profile's stored value: kept as that range until asked for as a String.
     */
    void appendStored(byte[] bytes, int at, int length, float strength, int events, long lastSeenEpochMs,
                      boolean used) {
        if (stored != bytes) {
            if (stored != null) {
                throw new IllegalStateException("a profile's stored ids come from one value");
            }
            stored = bytes;
        }
        int p = appendColumns(strength, events, lastSeenEpochMs, used);
        idAt[p] = at;
        idLength[p] = length;
        // String.hashCode of the same text (Latin-1), so stored and String ids compare by hash
        int hash = 0;
        for (int i = at; i < at + length; i++) {
            hash = 31 * hash + bytes[i];
        }
        idHash[p] = hash;
        indexNewEntry();
    }

    private int appendColumns(float strength, int events, long lastSeenEpochMs, boolean used) {
        if (size == ids.length) {
            int room = 2 * ids.length;
            ids = Arrays.copyOf(ids, room);
            idAt = Arrays.copyOf(idAt, room);
            idLength = Arrays.copyOf(idLength, room);
            idHash = Arrays.copyOf(idHash, room);
            strengths = Arrays.copyOf(strengths, room);
            eventCounts = Arrays.copyOf(eventCounts, room);
            lastSeen = Arrays.copyOf(lastSeen, room);
            usedFlags = Arrays.copyOf(usedFlags, room);
        }
        strengths[size] = strength;
        eventCounts[size] = events;
        lastSeen[size] = lastSeenEpochMs;
        usedFlags[size] = used;
        return size++;
    }

    private void indexNewEntry() {
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
        String id = ids[check(p)];
        if (id == null) {
            id = new String(stored, idAt[p], idLength[p], StandardCharsets.US_ASCII);
            ids[p] = id;
        }
        return id;
    }

    /** Looks a compound up by its id's text, as a String or as ASCII bytes. */
    public interface IdLookup {
        /** The index of {@code id}, or −1. */
        int indexOf(String id);

        /**
         * The index of the id whose text is the {@code length} ASCII bytes at {@code bytes[at..]} and
         * whose String.hashCode is {@code hash}, or −1.
         */
        int indexOf(byte[] bytes, int at, int length, int hash);
    }

    /** The index of the entry at {@code p}'s compound in {@code lookup}, read from the stored bytes when it has them. */
    public int indexIn(IdLookup lookup, int p) {
        check(p);
        return ids[p] == null ? lookup.indexOf(stored, idAt[p], idLength[p], idHash[p]) : lookup.indexOf(ids[p]);
    }

    /** Bytes {@link #putId} writes for the entry at {@code p}. */
    int idBytes(int p) {
        return ids[check(p)] == null ? 2 + idLength[p] : ModifiedUtf8.length(ids[p]);
    }

    /** Writes the id of the entry at {@code p} as {@link ModifiedUtf8#put} does; a stored id is copied. */
    void putId(java.nio.ByteBuffer out, int p) {
        if (ids[check(p)] == null) {
            out.putShort((short) idLength[p]);
            out.put(stored, idAt[p], idLength[p]);
        } else {
            ModifiedUtf8.put(out, ids[p]);
        }
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
        return new Entry(compoundId(p), strengths[p], eventCounts[p], lastSeen[p], usedFlags[p]);
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
                if (idHash[p] == hash && sameId(p, compoundId)) {
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
            if (idHash[p] == hash && sameId(p, compoundId)) {
                return p;
            }
        }
        return -1;
    }

    /** Whether the entry at {@code p} is {@code compoundId}, compared without making a String of a stored id. */
    private boolean sameId(int p, String compoundId) {
        if (ids[p] != null) {
            return ids[p].equals(compoundId);
        }
        int length = idLength[p];
        if (compoundId.length() != length) {
            return false;
        }
        int at = idAt[p];
        for (int i = 0; i < length; i++) {
            if (compoundId.charAt(i) != stored[at + i]) {
                return false;
            }
        }
        return true;
    }

    private void place(int p) {
        int mask = slots.length - 1;
        int s = spread(idHash[p]) & mask;
        while (slots[s] != 0) {
            s = (s + 1) & mask;
        }
        slots[s] = p + 1;
    }

    private static int spread(int hash) {
        return (hash ^ (hash >>> 16)) * 0x9E3779B9;
    }
}
