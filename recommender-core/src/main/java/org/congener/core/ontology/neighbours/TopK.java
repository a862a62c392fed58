package org.congener.core.ontology.neighbours;

/**
 * The K best (score, index) pairs seen so far, in a binary min-heap whose root is the worst kept pair.
 * Higher score is better; on equal scores the lower index is better, which makes results deterministic.
 */
final class TopK {
    private final int capacity;
    private final double[] scores;
    private final int[] indices;
    private int size;

    TopK(int capacity) {
        this.capacity = capacity;
        this.scores = new double[capacity];
        this.indices = new int[capacity];
    }

    void clear() {
        size = 0;
    }

    boolean isFull() {
        return size == capacity;
    }

    /** Score of the worst kept pair; only meaningful when not empty. */
    double worstScore() {
        return scores[0];
    }

    void offer(double score, int index) {
        if (size < capacity) {
            int i = size++;
            scores[i] = score;
            indices[i] = index;
            siftUp(i);
        } else if (worse(scores[0], indices[0], score, index)) {
            scores[0] = score;
            indices[0] = index;
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
            size--;
            if (size > 0) {
                scores[0] = scores[size];
                indices[0] = indices[size];
                siftDown(0);
            }
        }
        return count;
    }

    /** True when pair (s1, i1) ranks below pair (s2, i2). */
    private static boolean worse(double s1, int i1, double s2, int i2) {
        return s1 < s2 || (s1 == s2 && i1 > i2);
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
        scores[a] = scores[b];
        scores[b] = s;
        int x = indices[a];
        indices[a] = indices[b];
        indices[b] = x;
    }
}
