package org.congener.schemas.serde;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.ObjectReader;
import java.io.IOException;
import org.congener.schemas.Json;
import org.congener.schemas.SchemaIds;
import org.congener.schemas.UsageEvent;
import org.congener.schemas.UsageKind;

/**
 * Reads a usage event straight off Jackson's token stream and applies every rule of
 * {@code usage-event.schema.json} and the finite-number rule on the way, returning null for anything
 * it does not accept so that the caller can take the tree path, whose verdict is the same and which
 * words the reason.
 *
 * <p>It exists because the tree path (parse into a tree, validate the tree, map it) took about 9 % of
 * a stream thread in a profile and allocates about 7 KB per event, six times what this reader does
 * (BENCHMARKS.md, wire contracts), while the streams app needs a read of well under 20 µs.
 */
final class UsageEventReader {
    private static final ObjectMapper MAPPER = Json.mapper();
    /** Reads one value in the middle of the object, where the next field is no trailing token. */
    private static final ObjectReader VALUE_AS_TREE = MAPPER.readerFor(JsonNode.class)
            .without(DeserializationFeature.FAIL_ON_TRAILING_TOKENS);

    private UsageEventReader() {
    }

    /** The event in {@code data}, or null when the schema, the mapper or the parser would refuse it. */
    static UsageEvent read(byte[] data) {
        // the mapper's own parser: same encoding detection, read constraints and JSON features
        try (JsonParser parser = MAPPER.createParser(data)) {
            return read(parser);
        } catch (IOException e) {
            return null;
        }
    }

    private static UsageEvent read(JsonParser parser) throws IOException {
        if (parser.nextToken() != JsonToken.START_OBJECT) {
            return null;
        }
        // the mapper's tree keeps the last of repeated names, so a bad value only counts while no
        // later one under the same name replaces it: null (NaN for quantity) stands for "not usable yet"
        String schema = null;
        String eventId = null;
        String researcherId = null;
        String compoundId = null;
        UsageKind kind = null;
        double quantity = Double.NaN;
        String unit = null;
        String occurredAt = null;
        for (String name = parser.nextFieldName(); name != null; name = parser.nextFieldName()) {
            JsonToken token = parser.nextToken();
            switch (name) {
                case "schema" -> schema = schemaId(parser, token);
                case "eventId" -> eventId = id(parser, token);
                case "researcherId" -> researcherId = id(parser, token);
                case "compoundId" -> compoundId = id(parser, token);
                case "kind" -> kind = kind(string(parser, token));
                case "quantity" -> quantity = quantity(parser, token);
                case "unit" -> unit = unit(parser, token);
                case "occurredAt" -> occurredAt = instant(parser, token);
                default -> {
                    // no later field can make a name that the schema does not list allowed
                    return null;
                }
            }
        }
        if (parser.nextToken() != null || schema == null || eventId == null || researcherId == null
                || compoundId == null || kind == null || Double.isNaN(quantity) || unit == null
                || occurredAt == null) {
            return null;
        }
        return new UsageEvent(schema, eventId, researcherId, compoundId, kind, quantity, unit, occurredAt);
    }

    /** The text of a string token; null after reading any other value whole, as the tree path would. */
    private static String string(JsonParser parser, JsonToken token) throws IOException {
        if (token == JsonToken.VALUE_STRING) {
            return parser.getText();
        }
        // decodes every string and number inside, so a broken one fails here exactly as in the tree
        VALUE_AS_TREE.readTree(parser);
        return null;
    }

    private static String schemaId(JsonParser parser, JsonToken token) throws IOException {
        return SchemaIds.USAGE_EVENT.equals(string(parser, token)) ? SchemaIds.USAGE_EVENT : null;
    }

    private static String id(JsonParser parser, JsonToken token) throws IOException {
        String text = string(parser, token);
        return text != null && CommonDefinitions.isId(text) ? text : null;
    }

    private static String unit(JsonParser parser, JsonToken token) throws IOException {
        String text = string(parser, token);
        return text != null && CommonDefinitions.isUnit(text) ? text : null;
    }

    private static String instant(JsonParser parser, JsonToken token) throws IOException {
        String text = string(parser, token);
        return text != null && CommonDefinitions.isInstant(text) ? text : null;
    }

    private static UsageKind kind(String text) {
        if (text == null) {
            return null;
        }
        return switch (text) {
            case "ORDER" -> UsageKind.ORDER;
            case "WITHDRAWAL" -> UsageKind.WITHDRAWAL;
            case "USAGE_LOG" -> UsageKind.USAGE_LOG;
            case "VIEW" -> UsageKind.VIEW;
            default -> null;
        };
    }

    /**
     * At least 0 as the schema's minimum compares it; a decimal must also be finite (it is read as a
     * double, so 1e400 is infinite), while an integer too large for a double is not checked by the
     * finite rule and maps to infinity.
     */
    private static double quantity(JsonParser parser, JsonToken token) throws IOException {
        if (token == JsonToken.VALUE_NUMBER_INT) {
            double value = parser.getDoubleValue();
            return value >= 0 ? value : Double.NaN;
        }
        if (token == JsonToken.VALUE_NUMBER_FLOAT) {
            double value = parser.getDoubleValue();
            return value >= 0 && value != Double.POSITIVE_INFINITY ? value : Double.NaN;
        }
        string(parser, token);
        return Double.NaN;
    }
}
