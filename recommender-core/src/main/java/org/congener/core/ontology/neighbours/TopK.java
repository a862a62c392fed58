package org.congener.core.ontology.neighbours;

import java.util.Arrays;

/**
 * The K best (score, index) pairs seen so far, in a binary min-heap whose root is the worst kept pair, with the
 * heap position of each index so that a kept pair's score can rise in place. Higher score is better; on equal
 * scores the lower index is better, which makes results deterministic.
 */
final class TopK {
    private final int capacity;
    private final double[] scores;
    private final int[] indices;
    private final int[] positionOf;
    private int size;

    /** @param universe indices are in {@code 0 .. universe-1} */
    TopK(int capacity, int universe) {
        this.capacity = capacity;
        this.scores = new double[capacity];
        this.indices = new int[capacity];
        this.positionOf = new int[universe];
        Arrays.fill(positionOf, -1);
    }

    boolean isFull() {
        return size == capacity;
    }

    /** Score of the worst kept pair; only meaningful when not empty. */
    double worstScore() {
        return scores[0];
    }

    /**
     * Offers a score for an index; the heap keeps, per index, the highest score offered. This stays exact when an
     * index is dropped: it is dropped only as the worst kept pair, the worst kept score never falls afterwards
     * (the heap stays full), so a later lower score of that index cannot get back in.
     */
    void offerOrRaise(double score, int index) {
        int at = positionOf[index];
        if (at >= 0) {
            if (score > scores[at]) {
                scores[at] = score;
                siftDown(at);
            }
        } else if (size < capacity) {
            int i = size++;
            place(i, score, index);
            siftUp(i);
        } else if (worse(scores[0], indices[0], score, index)) {
            positionOf[indices[0]] = -1;
            place(0, score, index);
            siftDown(0);
        }
    }

    /**
     * Writes the kept pairs best first into the arrays from {@code offset} on, empties the heap and returns
     * how many were written.
     */
    int drainInto(int[] indexOut, double[] scoreOut, int offset) {
        int count = size;
        for (int r = count - 1; r >= 0; r--) {
            indexOut[offset + r] = indices[0];
            scoreOut[offset + r] = scores[0];
            positionOf[indices[0]] = -1;
            size--;
            if (size > 0) {
                place(0, scores[size], indices[size]);
                siftDown(0);
            }
        }
        return count;
    }

    /** True when pair (s1, i1) ranks below pair (s2, i2). */
    private static boolean worse(double s1, int i1, double s2, int i2) {
        return s1 < s2 || (s1 == s2 && i1 > i2);
    }

    private void place(int at, double score, int index) {
        scores[at] = score;
        indices[at] = index;
        positionOf[index] = at;
    }

    private void siftUp(int i) {
        while (i > 0) {
            int parent = (i - 1) >>> 1;
            if (!worse(scores[i], indices[i], scores[parent], indices[parent])) {
                return;
            }
            swap(i, parent);
            i = parent;
        }
    }

    private void siftDown(int i) {
        while (true) {
            int left = 2 * i + 1;
            if (left >= size) {
                return;
            }
            int worst = left;
            int right = left + 1;
            if (right < size && worse(scores[right], indices[right], scores[left], indices[left])) {
                worst = right;
            }
            if (!worse(scores[worst], indices[worst], scores[i], indices[i])) {
                return;
            }
            swap(i, worst);
            i = worst;
        }
    }

    private void swap(int a, int b) {
        double s = scores[a];
        int x = indices[a];
        place(a, scores[b], indices[b]);
        place(b, s, x);
    }
}
