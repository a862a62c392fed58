package org.congener.streams.model;

/**
 * A version's compound ids to their item indices: open addressing over one int array holding, per
 * slot, the id's hash and its index + 1 side by side. The stream looks up every compound of the
 * researcher's history at every event (hundreds for a heavy user); a map of boxed indices costs a
 * table slot, a node, the key and a boxed value per look-up, each a likely cache miss at 10,000 ids.
 * Here a look-up reads one slot pair and the id array, and compares the text only when the hashes
 * agree and the two Strings are not one instance (ids read from the stores are shared with the
 * version's own: see {@code SharedAsciiStrings}). Immutable.
 */
final class CompoundIndex {

    private final String[] ids;
    /** slot s: pairs[2s] = hash, pairs[2s + 1] = index + 1 (0: empty). */
    private final int[] pairs;
    private final int mask;

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
    }

    /** The index of {@code id}, or −1. */
    int indexOf(String id) {
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
