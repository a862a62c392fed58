package org.congener.schemas;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.datatype.jsr310.JavaTimeModule;

/**
 * The one Jackson configuration every Congener module reads and writes topic values with.
 *
 * <ul>
 *   <li>Records round-trip as they are, {@code float[]} factors included; enums are written by name.</li>
 *   <li>{@code java.time} values, where a caller maps them, are ISO-8601 strings, not epoch numbers.</li>
 *   <li>Null fields are left out when writing, and absent optional fields read back as null.</li>
 *   <li>Unknown properties do not fail the mapping: the topic's JSON Schema rejects them first,
 *       with a precise reason, so the mapper need not.</li>
 *   <li>Trailing content after the value fails the parse, so a concatenated or corrupt payload is
 *       not half-read.</li>
 * </ul>
 * The mapper is shared and thread-safe; never reconfigure it. Call {@code Json.mapper().copy()}
 * for a variant.
 */
public final class Json {
    private static final ObjectMapper MAPPER = JsonMapper.builder()
            .addModule(new JavaTimeModule())
            .disable(SerializationFeature.WRITE_DATES_AS_TIMESTAMPS)
            .disable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
            .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
            .defaultPropertyInclusion(JsonInclude.Value.construct(JsonInclude.Include.NON_NULL, JsonInclude.Include.USE_DEFAULTS))
            .build();

    private Json() {
    }

    public static ObjectMapper mapper() {
        return MAPPER;
    }
}
