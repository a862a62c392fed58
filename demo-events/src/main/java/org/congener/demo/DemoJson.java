package org.congener.demo;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonSerializer;
import com.fasterxml.jackson.databind.MapperFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.SerializerProvider;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.module.SimpleModule;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.util.List;

/**
 * The one JSON mapper of the demo files. Records are written in record-component order (Jackson puts
 * canonical-constructor properties first and sorting is off), one compact object per line.
 * Doubles are rounded to three decimals and written in plain notation with at least one decimal,
 * so the files do not depend on the JDK's {@code Double.toString} algorithm (which changed in JDK 19).
 */
public final class DemoJson {

    private static final ObjectMapper MAPPER = JsonMapper.builder()
            .disable(MapperFeature.SORT_PROPERTIES_ALPHABETICALLY)
            .enable(MapperFeature.SORT_CREATOR_PROPERTIES_FIRST)
            .disable(SerializationFeature.INDENT_OUTPUT)
            .addModule(new SimpleModule("congener-demo-numbers")
                    .addSerializer(Double.class, new PlainDoubleSerializer())
                    .addSerializer(Double.TYPE, new PlainDoubleSerializer()))
            .build();

    private DemoJson() {
    }

    /** The shared mapper (read and write). */
    public static ObjectMapper mapper() {
        return MAPPER;
    }

    /** One value as one compact JSON line, without the line end. */
    public static String line(Object value) {
        try {
            return MAPPER.writeValueAsString(value);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot serialise " + value, e);
        }
    }

    /** JSON Lines: each value on its own line, every line ended by {@code \n}, UTF-8. */
    public static byte[] jsonLines(List<?> values) {
        StringBuilder out = new StringBuilder(values.size() * 160);
        for (Object value : values) {
            out.append(line(value)).append('\n');
        }
        return out.toString().getBytes(StandardCharsets.UTF_8);
    }

    /** A JSON array with one compact element per line; deterministic, no platform line separator. */
    public static byte[] jsonArray(List<?> values) {
        StringBuilder out = new StringBuilder("[\n");
        for (int i = 0; i < values.size(); i++) {
            out.append("  ").append(line(values.get(i))).append(i + 1 < values.size() ? ",\n" : "\n");
        }
        return out.append("]\n").toString().getBytes(StandardCharsets.UTF_8);
    }

    /** Reads one JSON line into {@code type}; the message names the line number on failure. */
    public static <T> T readLine(String line, Class<T> type, String source, int lineNumber) {
        try {
            return MAPPER.readValue(line, type);
        } catch (JsonProcessingException e) {
            throw new UncheckedIOException(source + " line " + lineNumber + ": " + e.getOriginalMessage(), e);
        }
    }

    /** Rounds half-up to thousandths. */
    static String plain(double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("not a finite number: " + value);
        }
        BigDecimal rounded = BigDecimal.valueOf(Math.round(value * 1000.0), 3).stripTrailingZeros();
        if (rounded.scale() < 1) {
            rounded = rounded.setScale(1);
        }
        return rounded.toPlainString();
    }

    private static final class PlainDoubleSerializer extends JsonSerializer<Double> {
        @Override
        public void serialize(Double value, JsonGenerator gen, SerializerProvider serializers) throws IOException {
            gen.writeNumber(plain(value));
        }
    }
}
