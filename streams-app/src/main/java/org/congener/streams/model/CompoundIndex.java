package org.congener.streams.model;

import org.congener.streams.state.InteractionProfile;

/**
 * A version's compound ids to their item indices: open addressing over one int array holding, per
 * slot, the id's hash and its index + 1 side by side, with the ids' ASCII bytes packed in one array
 * beside. The stream looks up every compound of the researcher's history at every event (hundreds
 * for a heavy user); a map of boxed indices costs a table slot, a node, the key and a boxed value per
 * look-up, each a likely cache miss at 10,000 ids. Here a look-up by the bytes of a stored profile
 * reads one slot pair and compares the text within the packed array, and makes no String. Immutable.
 */
final class CompoundIndex implements InteractionProfile.IdLookup {

    private final String[] ids;
    /** slot s: pairs[2s] = hash, pairs[2s + 1] = index + 1 (0: empty). */
    private final int[] pairs;
    private final int mask;
    /** Id i's ASCII bytes at packed[packedAt[i] .. packedAt[i + 1]); an id that is not ASCII has none. */
    private final byte[] packed;
    private final int[] packedAt;

    /** @param ids distinct ids; index i is ids[i] */
    CompoundIndex(String[] ids) {
        this.ids = ids;
        int slots = Integer.highestOneBit(Math.max(8, 2 * ids.length - 1)) << 1;
        this.pairs = new int[2 * slots];
        this.mask = slots - 1;
        for (int i = 0; i < ids.length; i++) {
            int hash = ids[i].hashCode();
            int s = spread(hash) & mask;
            while (pairs[2 * s + 1] != 0) {
                if (pairs[2 * s] == hash && ids[pairs[2 * s + 1] - 1].equals(ids[i])) {
                    throw new IllegalArgumentException("compound id " + ids[i] + " is listed twice");
                }
                s = (s + 1) & mask;
            }
            pairs[2 * s] = hash;
            pairs[2 * s + 1] = i + 1;
        }
        java.io.ByteArrayOutputStream bytes = new java.io.ByteArrayOutputStream();
        this.packedAt = new int[ids.length + 1];
        for (int i = 0; i < ids.length; i++) {
            // a stored profile's ids on the byte path hold bytes 1 to 127 only, so an id with a NUL packed
            // here is never asked for by bytes and still found by its String
            if (ids[i].chars().allMatch(c -> c < 0x80)) {
                byte[] text = ids[i].getBytes(java.nio.charset.StandardCharsets.US_ASCII);
                bytes.write(text, 0, text.length);
            }
            packedAt[i + 1] = bytes.size();
        }
        this.packed = bytes.toByteArray();
    }

    @Override
    public int indexOf(byte[] bytes, int at, int length, int hash) {
        for (int s = spread(hash) & mask; ; s = (s + 1) & mask) {
            int slot = pairs[2 * s + 1];
            if (slot == 0) {
                return -1;
            }
            int i = slot - 1;
            // an id that is not ASCII packs no bytes and cannot be this ASCII text
            if (pairs[2 * s] == hash && packedAt[i + 1] - packedAt[i] == length
                    && java.util.Arrays.equals(packed, packedAt[i], packedAt[i + 1], bytes, at, at + length)) {
                return i;
            }
        }
    }

    /** The index of {@code id}, or −1. */
    @Override
    public int indexOf(String id) {
        int hash = id.hashCode();
        for (int s = spread(hash) & mask; ; s = (s + 1) & mask) {
            int at = pairs[2 * s + 1];
            if (at == 0) {
                return -1;
            }
            if (pairs[2 * s] == hash) {
                String known = ids[at - 1];
                if (known == id || known.equals(id)) {
                    return at - 1;
                }
            }
        }
    }

    /** Fibonacci hashing on the high bits folded in, so ids differing in their last characters spread. */
    private static int spread(int hash) {
        int h = (hash ^ (hash >>> 16)) * 0x9E3779B9;
        return h ^ (h >>> 15);
    }
}
