package org.congener.schemas;

/**
 * A record Congener could not use, kept with why; key: the original record's key. Build one with
 * {@link DeadLetters#of}, which chooses the encoding and caps a huge payload.
 *
 * @param payload         the original value as UTF-8 text, or base64 when it was not valid UTF-8
 * @param payloadEncoding {@code utf-8} or {@code base64}
 */
public record DeadLetter(String schema, String sourceTopic, int partition, long offset, String reason,
                         String payload, String payloadEncoding, String failedAt) {
}
