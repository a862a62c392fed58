package org.congener.streams.state;

import java.nio.charset.StandardCharsets;
import java.util.Arrays;

/**
 * One String instance per ASCII text read from the stores, as far as a fixed table allows. A
 * researcher's profile holds tens to hundreds of compound ids and is read at every event; as new
 * Strings each would be allocated, and hashed again by every map it is looked up in, since a String
 * keeps its hash only once computed. Returned from here the same id is the same object each time, its
 * hash computed once; and a live model version puts its own ids here ({@link #shared(String)}), so a
 * profile's ids are the very instances its index holds and a look-up compares no text.
 *
 * <p>The table is direct-mapped and shared by all threads without locks: a slot holds the last text
 * that hashed to it, and a miss (an empty slot, or another text in it) makes a new String and puts it
 * there. A slot's value is immutable with final fields, so it is safe to publish through a data race:
 * a thread sees either a complete value or an older one, and a read that meets another text simply
 * misses. The table never grows: with more distinct ids than slots the rate of misses rises, and
 * nothing else changes.
 */
public final class SharedAsciiStrings {

    /** 2^16 slots: catalogues of tens of thousands of ids mostly hit. */
    private static final int SLOTS = 1 << 16;
    /** Longer texts are not kept: compound ids and version names are short. */
    static final int LONGEST_KEPT = 64;
    private static final Kept[] TABLE = new Kept[SLOTS];

    /** A kept String with its bytes, which a read compares with one array comparison. */
    private record Kept(String text, byte[] bytes) {
    }

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
        int slot = slot(array, from, count);
        Kept kept = TABLE[slot];
        if (kept != null && Arrays.equals(kept.bytes, 0, kept.bytes.length, array, from, from + count)) {
            return kept.text;
        }
        byte[] bytes = Arrays.copyOfRange(array, from, from + count);
        String made = new String(bytes, StandardCharsets.US_ASCII);
        TABLE[slot] = new Kept(made, bytes);
        return made;
    }

    /**
     * The kept instance of {@code text} when the table holds one, else {@code text} itself, now kept
     * (unless it is not plain ASCII or longer than {@link #LONGEST_KEPT}: then it is returned as it is).
     */
    public static String shared(String text) {
        int n = text.length();
        if (n > LONGEST_KEPT) {
            return text;
        }
        byte[] bytes = new byte[n];
        for (int i = 0; i < n; i++) {
            char c = text.charAt(i);
            if (c < 1 || c > 0x7F) {
                return text;
            }
            bytes[i] = (byte) c;
        }
        int slot = slot(bytes, 0, n);
        Kept kept = TABLE[slot];
        if (kept != null && Arrays.equals(kept.bytes, bytes)) {
            return kept.text;
        }
        TABLE[slot] = new Kept(text, bytes);
        return text;
    }

    private static int slot(byte[] array, int from, int count) {
        // String.hashCode of these bytes as Latin-1 text, spread over the table
        int hash = 0;
        for (int i = from; i < from + count; i++) {
            hash = 31 * hash + array[i];
        }
        return (hash ^ (hash >>> 16)) & (SLOTS - 1);
    }
}
