package org.congener.core.ontology;

import java.util.Arrays;

/** An int list without boxing, for readers and builders that do not know their sizes in advance. */
public final class GrowableIntArray {
    private int[] values;
    private int size;

    public GrowableIntArray(int initialCapacity) {
        values = new int[Math.max(4, initialCapacity)];
    }

    public void add(int value) {
        if (size == values.length) {
            values = Arrays.copyOf(values, values.length + (values.length >> 1));
        }
        values[size++] = value;
    }

    public int get(int position) {
        if (position >= size) {
            throw new IndexOutOfBoundsException(position);
        }
        return values[position];
    }

    public int size() {
        return size;
    }

    public void clear() {
        size = 0;
    }

    /** A copy of the filled part. */
    public int[] toArray() {
        return Arrays.copyOf(values, size);
    }
}
