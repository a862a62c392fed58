package org.congener.schemas;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.Arrays;
import java.util.Base64;
import org.congener.schemas.serde.ValidatingJsonSerde;
import org.junit.jupiter.api.Test;

class DeadLettersTest {
    private static final Instant FAILED_AT = Instant.parse("2026-03-14T09:26:53Z");
    private final ValidatingJsonSerde<DeadLetter> serde =
            ValidatingJsonSerde.validatingWrites(TopicName.DEAD_LETTERS, DeadLetter.class);

    @Test
    void shouldKeepPayloadAsTextWhenItIsUtf8() {
        byte[] raw = "{\"name\":\"Velorin µ-chloride\"".getBytes(StandardCharsets.UTF_8);
        DeadLetter letter = DeadLetters.of("usage-events", 2, 17L, "truncated", raw, FAILED_AT);
        assertEquals("utf-8", letter.payloadEncoding());
        assertEquals("{\"name\":\"Velorin µ-chloride\"", letter.payload());
        assertEquals("2026-03-14T09:26:53Z", letter.failedAt());
        assertEquals(SchemaIds.DEAD_LETTER, letter.schema());
        assertEquals(letter, roundTrip(letter));
    }

    @Test
    void shouldKeepPayloadAsBase64WhenItIsNotUtf8() {
        // 0xC3 opens a two-byte sequence that 0x28 cannot continue; 0xFF never occurs in UTF-8 (RFC 3629 §1)
        byte[] raw = {(byte) 0xC3, 0x28, (byte) 0xFF, 0x00};
        DeadLetter letter = DeadLetters.of("usage-events", 0, 5L, "not JSON", raw, FAILED_AT);
        assertEquals("base64", letter.payloadEncoding());
        assertEquals("wyj/AA==", letter.payload());
        assertArrayEquals(raw, DeadLetters.payloadBytes(letter));
        assertEquals(letter, roundTrip(letter));
    }

    @Test
    void shouldCutHugePayloadAtWholeCharacterAndSayBothSizes() {
        byte[] raw = "é".repeat(DeadLetters.MAX_PAYLOAD_BYTES).getBytes(StandardCharsets.UTF_8);
        DeadLetter letter = DeadLetters.of("usage-events", 1, 9L, "too big", raw, FAILED_AT);
        assertEquals("utf-8", letter.payloadEncoding());
        assertEquals(DeadLetters.MAX_PAYLOAD_BYTES / 2, letter.payload().length());
        assertEquals("too big [payload cut to its first " + DeadLetters.MAX_PAYLOAD_BYTES + " of " + raw.length
                + " bytes]", letter.reason());
        assertEquals(letter, roundTrip(letter));
    }

    @Test
    void shouldStepBackOverAContinuationByteWhenTheCapSplitsACharacter() {
        byte[] raw = ("a" + "é".repeat(DeadLetters.MAX_PAYLOAD_BYTES)).getBytes(StandardCharsets.UTF_8);
        DeadLetter letter = DeadLetters.of("usage-events", 1, 9L, "too big", raw, FAILED_AT);
        assertEquals("utf-8", letter.payloadEncoding());
        byte[] kept = DeadLetters.payloadBytes(letter);
        assertEquals(DeadLetters.MAX_PAYLOAD_BYTES - 1, kept.length);
        assertArrayEquals(Arrays.copyOf(raw, kept.length), kept);
    }

    @Test
    void shouldCutHugeBinaryPayloadExactlyAtTheCap() {
        byte[] raw = new byte[DeadLetters.MAX_PAYLOAD_BYTES + 10];
        Arrays.fill(raw, (byte) 0xFF);
        DeadLetter letter = DeadLetters.of("usage-events", 1, 9L, "binary", raw, FAILED_AT);
        assertEquals("base64", letter.payloadEncoding());
        assertEquals(DeadLetters.MAX_PAYLOAD_BYTES, Base64.getDecoder().decode(letter.payload()).length);
        assertEquals(letter, roundTrip(letter));
    }

    @Test
    void shouldKeepNoPayloadAndGiveAReasonWhenBothAreMissing() {
        DeadLetter letter = DeadLetters.of("usage-events", -1, -1L, "  ", null, FAILED_AT);
        assertNull(letter.payload());
        assertNull(DeadLetters.payloadBytes(letter));
        assertEquals("no reason given", letter.reason());
        assertEquals(letter, roundTrip(letter));
    }

    @Test
    void shouldShortenAnOverlongReasonToWhatTheSchemaAllows() {
        DeadLetter letter = DeadLetters.of("usage-events", 0, 0L, "x".repeat(10_000), new byte[] {'{'}, FAILED_AT);
        assertEquals(DeadLetters.MAX_REASON_CHARS, letter.reason().length());
        assertTrue(letter.reason().endsWith("…"));
        assertEquals(letter, roundTrip(letter));
    }

    private DeadLetter roundTrip(DeadLetter letter) {
        return serde.deserializer().deserialize("dead-letters", serde.serializer().serialize("dead-letters", letter));
    }
}
