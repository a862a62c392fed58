package org.congener.core.ontology;

import java.util.HashMap;
import java.util.Map;

/**
 * String id to dense int, by open addressing with linear probing: two flat arrays instead of a node and a
 * boxed Integer per entry, which matters when a load creates hundreds of thousands of them at once.
 * Not thread-safe while being filled; read-only use after that is safe.
 */
final class IdIndex {
    private String[] keys;
    private int[] values;
    private int size;
    private int mask;

    IdIndex(int expected) {
        int capacity = Integer.highestOneBit(Math.max(16, expected * 2 - 1)) << 1;
        keys = new String[capacity];
        values = new int[capacity];
        mask = capacity - 1;
    }

    /** The value of a key, or -1. */
    int get(String key) {
        for (int slot = slot(key); ; slot = (slot + 1) & mask) {
            String k = keys[slot];
            if (k == null) {
                return -1;
            }
            if (k.equals(key)) {
                return values[slot];
            }
        }
    }

    /** Puts the key unless present; returns the value already there, or -1 when it was added. */
    int putIfAbsent(String key, int value) {
        if (2 * (size + 1) > keys.length) {
            grow();
        }
        for (int slot = slot(key); ; slot = (slot + 1) & mask) {
            String k = keys[slot];
            if (k == null) {
                keys[slot] = key;
                values[slot] = value;
                size++;
                return -1;
            }
            if (k.equals(key)) {
                return values[slot];
            }
        }
    }

    int size() {
        return size;
    }

    Map<String, Integer> toMap() {
        Map<String, Integer> map = new HashMap<>(size * 2);
        for (int slot = 0; slot < keys.length; slot++) {
            if (keys[slot] != null) {
                map.put(keys[slot], values[slot]);
            }
        }
        return map;
    }

    private int slot(String key) {
        int h = key.hashCode() * 0x9E3779B9;
        return (h ^ (h >>> 16)) & mask;
    }

    private void grow() {
        String[] oldKeys = keys;
        int[] oldValues = values;
        keys = new String[oldKeys.length * 2];
        values = new int[oldKeys.length * 2];
        mask = keys.length - 1;
        size = 0;
        for (int slot = 0; slot < oldKeys.length; slot++) {
            if (oldKeys[slot] != null) {
                putIfAbsent(oldKeys[slot], oldValues[slot]);
            }
        }
    }
}
