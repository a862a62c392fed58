package org.congener.core.fusion;

/**
 * Items ordered by score, best first, ties by item index — the order that ranks the two sides of
 * reciprocal rank fusion — without boxing and without allocating per call. Keys are 64-bit and order
 * like {@link Double#compare}; a stable partition puts the items above zero, at zero and below zero in
 * index order, and a stable least-significant-digit radix sort orders the first and last groups. The
 * zero group needs no sort (its keys are equal), and it holds most items of a semantic score, which is
 * 0 off the neighbour lists. One instance serves one thread; the returned array is reused.
 */
final class RankOrder {
    /** Six digits of 11 bits cover the 64-bit key: two passes fewer than bytes, and 2048 counts fit L1. */
    private static final int DIGITS = 6;
    private static final int DIGIT_BITS = 11;
    private static final int BUCKETS = 1 << DIGIT_BITS;
    private static final long DIGIT_MASK = BUCKETS - 1;
    private static final long ZERO = descendingKey(0.0);
    private static final long MASKED = descendingKey(Double.NEGATIVE_INFINITY);

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
        long[] byItem = keysSwap;
        int above = 0;
        int zero = 0;
        for (int i = 0; i < n; i++) {
            byItem[i] = descendingKey(v[i]);
        }
        for (int p = from; p < to; p++) {
            byItem[masked[p]] = MASKED;
        }
        // keys compare unsigned: scores above zero have keys below ZERO
        for (int i = 0; i < n; i++) {
            long key = byItem[i];
            above += Long.compareUnsigned(key, ZERO) < 0 ? 1 : 0;
            zero += key == ZERO ? 1 : 0;
        }
        int nextAbove = 0;
        int nextZero = above;
        int nextBelow = above + zero;
        for (int i = 0; i < n; i++) {
            long key = byItem[i];
            int p = Long.compareUnsigned(key, ZERO) < 0 ? nextAbove++ : key == ZERO ? nextZero++ : nextBelow++;
            keys[p] = key;
            order[p] = i;
        }
        sort(0, above);
        sort(above + zero, n);
        return order;
    }

    /** Stable radix sort of keys/order on [lo, hi) by key, unsigned ascending; the swap arrays are scratch. */
    private void sort(int lo, int hi) {
        if (hi - lo < 2) {
            return;
        }
        java.util.Arrays.fill(counts, 0);
        for (int i = lo; i < hi; i++) {
            long key = keys[i];
            counts[(int) (key & DIGIT_MASK)]++;
            counts[BUCKETS + (int) ((key >>> 11) & DIGIT_MASK)]++;
            counts[2 * BUCKETS + (int) ((key >>> 22) & DIGIT_MASK)]++;
            counts[3 * BUCKETS + (int) ((key >>> 33) & DIGIT_MASK)]++;
            counts[4 * BUCKETS + (int) ((key >>> 44) & DIGIT_MASK)]++;
            counts[5 * BUCKETS + (int) (key >>> 55)]++;
        }
        long[] srcKeys = keys;
        long[] dstKeys = keysSwap;
        int[] srcOrder = order;
        int[] dstOrder = orderSwap;
        for (int d = 0; d < DIGITS; d++) {
            int base = d * BUCKETS;
            int shift = DIGIT_BITS * d;
            if (counts[base + (int) ((srcKeys[lo] >>> shift) & DIGIT_MASK)] == hi - lo) {
                continue; // every key has this digit: the pass would not move anything
            }
            int start = lo;
            for (int b = 0; b < BUCKETS; b++) {
                int c = counts[base + b];
                counts[base + b] = start;
                start += c;
            }
            for (int i = lo; i < hi; i++) {
                long key = srcKeys[i];
                int p = counts[base + (int) ((key >>> shift) & DIGIT_MASK)]++;
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
        if (srcOrder != order) {
            System.arraycopy(srcKeys, lo, keys, lo, hi - lo);
            System.arraycopy(srcOrder, lo, order, lo, hi - lo);
        }
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
