package org.congener.streams.state;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;

/**
 * Strings in the form of {@link java.io.DataOutput#writeUTF} (an unsigned 16-bit byte count, then
 * modified UTF-8) on a byte buffer. Compound ids and version names are ASCII, which is copied byte for
 * byte; anything else goes through the data stream classes, so the bytes are theirs either way.
 */
final class ModifiedUtf8 {

    private ModifiedUtf8() {
    }

    /** Bytes {@link #put} writes for {@code s}, count included. */
    static int length(String s) {
        int n = s.length();
        int bytes = 0;
        for (int i = 0; i < n; i++) {
            char c = s.charAt(i);
            bytes += c >= 1 && c <= 0x7F ? 1 : c <= 0x7FF ? 2 : 3;
        }
        if (bytes > 0xFFFF) {
            throw new IllegalArgumentException("string of " + bytes + " encoded bytes is too long to store");
        }
        return 2 + bytes;
    }

    static void put(ByteBuffer out, String s) {
        int n = s.length();
        if (isPlainAscii(s)) {
            out.putShort((short) n);
            for (int i = 0; i < n; i++) {
                out.put((byte) s.charAt(i));
            }
            return;
        }
        ByteArrayOutputStream bytes = new ByteArrayOutputStream(length(s));
        try (DataOutputStream data = new DataOutputStream(bytes)) {
            data.writeUTF(s);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        out.put(bytes.toByteArray());
    }

    static String get(ByteBuffer in) {
        int count = in.getShort() & 0xFFFF;
        byte[] array = in.array();
        int from = in.arrayOffset() + in.position();
        if (from + count > in.arrayOffset() + in.limit()) {
            throw new java.nio.BufferUnderflowException();
        }
        boolean ascii = true;
        for (int i = from; i < from + count && ascii; i++) {
            ascii = array[i] >= 1;
        }
        in.position(in.position() + count);
        if (ascii) {
            return new String(array, from, count, StandardCharsets.US_ASCII);
        }
        byte[] framed = new byte[2 + count];
        framed[0] = (byte) (count >>> 8);
        framed[1] = (byte) count;
        System.arraycopy(array, from, framed, 2, count);
        try (DataInputStream data = new DataInputStream(new ByteArrayInputStream(framed))) {
            return data.readUTF();
        } catch (IOException e) {
            throw new IllegalStateException("stored string is not modified UTF-8", e);
        }
    }

    /**
     * Whether {@code bytes[at..at+length)} lies within the array and holds only bytes 1 to 127, text
     * that modified UTF-8 and ASCII write alike. A range past the end is not: the caller's read then
     * reports it cut short.
     */
    static boolean isPlainAscii(byte[] bytes, int at, int length) {
        if (at + length > bytes.length) {
            return false;
        }
        for (int i = at; i < at + length; i++) {
            if (bytes[i] < 1) {
                return false;
            }
        }
        return true;
    }

    private static boolean isPlainAscii(String s) {
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c < 1 || c > 0x7F) {
                return false;
            }
        }
        return true;
    }
}
