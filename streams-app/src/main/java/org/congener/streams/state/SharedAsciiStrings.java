package org.congener.streams.state;

import java.nio.charset.StandardCharsets;

/**
 * One String instance per ASCII text read from the stores, as far as a fixed table allows. A
 * researcher's profile holds tens to hundreds of compound ids and is read at every event; as new
 * Strings each would be allocated, and hashed again by every map it is looked up in (the profile's
 * own, the live model's index), since a String keeps its hash only once computed. Returned from here
 * the same id is the same object each time, its hash computed once, and the bytes are only compared.
 *
 * <p>The table is direct-mapped and shared by all threads without locks: a slot holds the last String
 * that hashed to it, and a miss (an empty slot, or another id in it) makes a new String and puts it
 * there. A String is safe to publish through a data race (its fields are final), so a thread sees
 * either a complete String or an older one; a read that meets another id simply misses. The table
 * never grows: with more distinct ids than slots the rate of misses rises, and nothing else changes.
 */
final class SharedAsciiStrings {

    /** 2^16 slots (512 KB of references): catalogues of tens of thousands of ids mostly hit. */
    private static final int SLOTS = 1 << 16;
    /** Longer texts are not kept: compound ids and version names are short. */
    static final int LONGEST_KEPT = 64;
    private static final String[] TABLE = new String[SLOTS];

    private SharedAsciiStrings() {
    }

    /**
     * The String of the {@code count} ASCII bytes (each 1 to 127) at {@code array[from..]}: the kept
     * instance when the table holds it, else a new one, which is kept.
     */
    static String of(byte[] array, int from, int count) {
        if (count > LONGEST_KEPT) {
            return new String(array, from, count, StandardCharsets.US_ASCII);
        }
        // String.hashCode of these bytes as Latin-1 text, so a kept String's own hash would agree
        int hash = 0;
        for (int i = from; i < from + count; i++) {
            hash = 31 * hash + array[i];
        }
        int slot = (hash ^ (hash >>> 16)) & (SLOTS - 1);
        String kept = TABLE[slot];
        if (kept != null && sameText(kept, array, from, count)) {
            return kept;
        }
        String made = new String(array, from, count, StandardCharsets.US_ASCII);
        TABLE[slot] = made;
        return made;
    }

    private static boolean sameText(String kept, byte[] array, int from, int count) {
        if (kept.length() != count) {
            return false;
        }
        for (int i = 0; i < count; i++) {
            if (kept.charAt(i) != array[from + i]) {
                return false;
            }
        }
        return true;
    }
}
