package org.congener.core.fusion;

/**
 * Items ordered by score, best first, ties by item index — the order that ranks the two sides of
 * reciprocal rank fusion — without boxing and without allocating per call: a stable least-significant-
 * digit radix sort over 64-bit keys that order like {@link Double#compare}, started from the index
 * order so equal keys keep it. One instance serves one thread; the returned array is reused.
 */
final class RankOrder {
    private static final int DIGITS = 8;
    private static final int BUCKETS = 256;

    private final long[] keys;
    private final long[] keysSwap;
    private final int[] order;
    private final int[] orderSwap;
    private final int[] counts = new int[DIGITS * BUCKETS];

    RankOrder(int itemCount) {
        keys = new long[itemCount];
        keysSwap = new long[itemCount];
        order = new int[itemCount];
        orderSwap = new int[itemCount];
    }

    int itemCount() {
        return order.length;
    }

    /**
     * The items 0..n−1 (n = this order's item count = {@code v.length}) by v descending, ties by index
     * ascending; the items {@code masked[from..to)} count as −∞. −0.0 ties with 0.0, NaN comes first.
     * The array is this instance's and is overwritten by the next call.
     */
    int[] descending(double[] v, int[] masked, int from, int to) {
        int n = order.length;
        if (v.length != n) {
            throw new IllegalArgumentException(v.length + " scores for an order of " + n + " items");
        }
        long maskedKey = descendingKey(Double.NEGATIVE_INFINITY);
        for (int i = 0; i < n; i++) {
            keys[i] = descendingKey(v[i]);
            order[i] = i;
        }
        for (int p = from; p < to; p++) {
            keys[masked[p]] = maskedKey;
        }
        if (n == 0) {
            return order;
        }
        java.util.Arrays.fill(counts, 0);
        for (int i = 0; i < n; i++) {
            long key = keys[i];
            counts[(int) (key & 0xFF)]++;
            counts[BUCKETS + (int) ((key >>> 8) & 0xFF)]++;
            counts[2 * BUCKETS + (int) ((key >>> 16) & 0xFF)]++;
            counts[3 * BUCKETS + (int) ((key >>> 24) & 0xFF)]++;
            counts[4 * BUCKETS + (int) ((key >>> 32) & 0xFF)]++;
            counts[5 * BUCKETS + (int) ((key >>> 40) & 0xFF)]++;
            counts[6 * BUCKETS + (int) ((key >>> 48) & 0xFF)]++;
            counts[7 * BUCKETS + (int) (key >>> 56)]++;
        }
        long[] srcKeys = keys;
        long[] dstKeys = keysSwap;
        int[] srcOrder = order;
        int[] dstOrder = orderSwap;
        for (int d = 0; d < DIGITS; d++) {
            int base = d * BUCKETS;
            int shift = 8 * d;
            if (counts[base + (int) ((srcKeys[0] >>> shift) & 0xFF)] == n) {
                continue; // every key has this digit: the pass would not move anything
            }
            int start = 0;
            for (int b = 0; b < BUCKETS; b++) {
                int c = counts[base + b];
                counts[base + b] = start;
                start += c;
            }
            for (int i = 0; i < n; i++) {
                long key = srcKeys[i];
                int p = counts[base + (int) ((key >>> shift) & 0xFF)]++;
                dstKeys[p] = key;
                dstOrder[p] = srcOrder[i];
            }
            long[] k = srcKeys;
            srcKeys = dstKeys;
            dstKeys = k;
            int[] o = srcOrder;
            srcOrder = dstOrder;
            dstOrder = o;
        }
        return srcOrder;
    }

    /**
     * An unsigned key that ascends as the score descends in {@link Double#compare}'s order: the IEEE
     * bits with the magnitude bits of negatives flipped order like signed longs; the sign flip makes
     * that order unsigned, and the complement reverses it. Adding 0.0 turns −0.0 into 0.0, and
     * {@link Double#doubleToLongBits} gives every NaN the same bits.
     */
    static long descendingKey(double score) {
        long bits = Double.doubleToLongBits(score + 0.0);
        long signedOrder = bits ^ ((bits >> 63) & Long.MAX_VALUE);
        return ~(signedOrder ^ Long.MIN_VALUE);
    }
}
