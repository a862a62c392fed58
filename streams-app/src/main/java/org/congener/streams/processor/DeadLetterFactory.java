package org.congener.streams.processor;

import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.Base64;

import org.congener.schemas.DeadLetter;
import org.congener.schemas.SchemaIds;

/** Builds a {@link DeadLetter} that keeps the original bytes: as text when they are UTF-8, else base64. */
public final class DeadLetterFactory {

    private DeadLetterFactory() {
    }

    public static DeadLetter of(String sourceTopic, int partition, long offset, String reason, byte[] raw,
                                Instant failedAt) {
        String payload;
        String encoding;
        if (raw == null) {
            payload = "";
            encoding = "utf-8";
        } else {
            try {
                payload = StandardCharsets.UTF_8.newDecoder()
                        .onMalformedInput(CodingErrorAction.REPORT)
                        .onUnmappableCharacter(CodingErrorAction.REPORT)
                        .decode(ByteBuffer.wrap(raw)).toString();
                encoding = "utf-8";
            } catch (CharacterCodingException e) {
                payload = Base64.getEncoder().encodeToString(raw);
                encoding = "base64";
            }
        }
        return new DeadLetter(SchemaIds.DEAD_LETTER, sourceTopic, partition, offset, reason, payload, encoding,
                failedAt.toString());
    }
}
