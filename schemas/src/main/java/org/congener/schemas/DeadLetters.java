package org.congener.schemas;

import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.Arrays;
import java.util.Base64;
import java.util.Objects;

/**
 * Builds the {@link DeadLetter} for a record that could not be used.
 *
 * <p>The payload is kept as UTF-8 text when the bytes decode cleanly, else as base64. A payload
 * longer than {@link #MAX_PAYLOAD_BYTES} keeps only its first {@value #MAX_PAYLOAD_BYTES} bytes (cut
 * back to a whole character for text) and the reason says so, with both sizes: base64 of the cap is
 * about 350 kB, so a dead letter stays well below the broker's default 1 MB record limit
 * ({@code message.max.bytes}, common practice not to raise it for this).
 */
public final class DeadLetters {
    /** Original bytes kept at most: 256 KiB. */
    public static final int MAX_PAYLOAD_BYTES = 256 * 1024;
    /** The dead-letter schema allows a reason of at most this many characters. */
    static final int MAX_REASON_CHARS = 4096;
    public static final String UTF_8 = "utf-8";
    public static final String BASE64 = "base64";

    private DeadLetters() {
    }

    /**
     * @param partition -1 when not known
     * @param offset    -1 when not known
     * @param rawValue  the record's value as it arrived; null for none
     */
    public static DeadLetter of(String sourceTopic, int partition, long offset, String reason, byte[] rawValue,
                                Instant failedAt) {
        Objects.requireNonNull(sourceTopic, "sourceTopic");
        Objects.requireNonNull(failedAt, "failedAt");
        String why = reason == null || reason.isBlank() ? "no reason given" : reason.strip();
        if (rawValue == null) {
            return new DeadLetter(SchemaIds.DEAD_LETTER, sourceTopic, partition, offset, capReason(why, ""),
                    null, UTF_8, failedAt.toString());
        }
        byte[] kept = rawValue;
        String cutNote = "";
        if (rawValue.length > MAX_PAYLOAD_BYTES) {
            kept = Arrays.copyOf(rawValue, wholeCharacterPrefix(rawValue, MAX_PAYLOAD_BYTES));
            cutNote = " [payload cut to its first " + kept.length + " of " + rawValue.length + " bytes]";
        }
        String text = decodeUtf8(kept);
        String payload = text != null ? text : Base64.getEncoder().encodeToString(kept);
        String encoding = text != null ? UTF_8 : BASE64;
        return new DeadLetter(SchemaIds.DEAD_LETTER, sourceTopic, partition, offset, capReason(why, cutNote),
                payload, encoding, failedAt.toString());
    }

    /** The original bytes of a dead letter's payload (the kept part, if it was cut); null for none. */
    public static byte[] payloadBytes(DeadLetter letter) {
        if (letter.payload() == null) {
            return null;
        }
        return BASE64.equals(letter.payloadEncoding())
                ? Base64.getDecoder().decode(letter.payload())
                : letter.payload().getBytes(StandardCharsets.UTF_8);
    }

    /**
     * The longest prefix of at most {@code limit} bytes that does not end inside a UTF-8 sequence: step
     * back over continuation bytes (10xxxxxx, RFC 3629 §3) to the start of the character that was cut.
     * For bytes that are not UTF-8 this only shortens the prefix by at most three bytes.
     */
    static int wholeCharacterPrefix(byte[] bytes, int limit) {
        int end = limit;
        int stepped = 0;
        while (end > 0 && stepped < 3 && (bytes[end] & 0xC0) == 0x80) {
            end--;
            stepped++;
        }
        return end;
    }

    /** The text, or null when the bytes are not well-formed UTF-8. */
    private static String decodeUtf8(byte[] bytes) {
        try {
            return StandardCharsets.UTF_8.newDecoder()
                    .onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT)
                    .decode(ByteBuffer.wrap(bytes))
                    .toString();
        } catch (CharacterCodingException e) {
            return null;
        }
    }

    private static String capReason(String reason, String suffix) {
        int room = MAX_REASON_CHARS - suffix.length();
        String kept = reason.length() <= room ? reason : reason.substring(0, room - 1) + "…";
        return kept + suffix;
    }
}
