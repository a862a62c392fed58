package org.congener.schemas.serde;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import org.apache.kafka.common.serialization.Serde;
import org.congener.schemas.ItemFactors;
import org.congener.schemas.Json;
import org.congener.schemas.RecordSamples;
import org.congener.schemas.SchemaIds;
import org.congener.schemas.TopicName;
import org.congener.schemas.UsageEvent;
import org.congener.schemas.Examples;
import org.congener.schemas.validation.InvalidRecordException;
import org.congener.schemas.validation.Violation;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

class ValidatingJsonSerdeTest {
    private static final String TOPIC = "lab1.usage-events";
    private final Serde<UsageEvent> usage = ValidatingJsonSerde.of(TopicName.USAGE_EVENTS, UsageEvent.class);

    @ParameterizedTest
    @EnumSource(TopicName.class)
    void shouldReadBackEveryRecordTypeItWrote(TopicName topic) {
        Object sample = RecordSamples.all().get(topic);
        Object back = roundTrip(topic, topic.valueType(), sample);
        if (sample instanceof ItemFactors factors) {
            ItemFactors read = (ItemFactors) back;
            assertArrayEquals(factors.factors(), read.factors(), 0.0f);
            assertEquals(Arrays.asList(factors.schema(), factors.version(), factors.compoundId()),
                    Arrays.asList(read.schema(), read.version(), read.compoundId()));
        } else {
            assertEquals(sample, back);
        }
    }

    @Test
    void shouldWriteEnumsByNameAndLeaveNullFieldsOut() throws Exception {
        var suggestions = RecordSamples.all().get(TopicName.SUGGESTIONS);
        String json = Json.mapper().writeValueAsString(suggestions);
        assertTrue(json.contains("\"source\":\"SEMANTIC_AND_POPULARITY\""), json);
        assertTrue(!json.contains("modelVersion") && !json.contains("null"), json);
    }

    @Test
    void shouldReturnNullForATombstone() {
        assertNull(usage.deserializer().deserialize(TOPIC, null));
        assertNull(usage.serializer().serialize(TOPIC, null));
    }

    @Test
    void shouldThrowWithParseReasonWhenJsonIsBroken() {
        InvalidRecordException e = readFails("{\"schema\": \"congener/usage-event/v1\", \"eventId\" 17}");
        assertEquals(TopicName.USAGE_EVENTS, e.topic());
        assertTrue(e.violations().isEmpty());
        assertTrue(e.reason().startsWith("usage-events: unreadable value: not valid JSON: "), e.reason());
        assertTrue(e.reason().contains("line 1, column 49"), e.reason());
        assertTrue(!e.reason().contains("\n"), e.reason());
    }

    @Test
    void shouldThrowWithParseReasonWhenPayloadIsTruncated() {
        byte[] whole = Examples.typical(TopicName.USAGE_EVENTS);
        byte[] half = Arrays.copyOf(whole, whole.length / 2);
        InvalidRecordException e = assertThrows(InvalidRecordException.class,
                () -> usage.deserializer().deserialize(TOPIC, half));
        assertTrue(e.parseError().contains("end-of-input"), e.parseError());
        assertTrue(e.reason().contains("of " + half.length + ")"), e.reason());
    }

    @Test
    void shouldThrowWhenValueIsEmptyOrFollowedByMoreContent() {
        InvalidRecordException empty = assertThrows(InvalidRecordException.class,
                () -> usage.deserializer().deserialize(TOPIC, new byte[0]));
        assertEquals("usage-events: unreadable value: empty value (0 bytes)", empty.reason());
        assertEquals("usage-events: unreadable value: no JSON value in 3 bytes", readFails(" \n ").reason());
        String twice = new String(Examples.typical(TopicName.USAGE_EVENTS), StandardCharsets.UTF_8).strip();
        InvalidRecordException trailing = readFails(twice + twice);
        assertTrue(trailing.parseError().startsWith("not valid JSON: Trailing token"), trailing.parseError());
    }

    @Test
    void shouldThrowWithEveryViolationWhenJsonIsValidButRecordIsNot() {
        String json = "{\"schema\":\"congener/usage-event/v1\",\"eventId\":\"e-1\",\"researcherId\":\"r-1\","
                + "\"compoundId\":\"c-1\",\"kind\":\"ORDER\",\"quantity\":-2,\"occurredAt\":\"2026-03-14T09:26:53Z\"}";
        InvalidRecordException e = readFails(json);
        assertNull(e.parseError());
        assertEquals(2, e.violations().size(), e.violations()::toString);
        assertEquals(new Violation("/quantity", "-2", "minimum", "must be >= 0"), e.violations().get(0));
        assertEquals(new Violation("/unit", null, "required", "is required"), e.violations().get(1));
        assertEquals("usage-events: 2 violations: /quantity = -2: must be >= 0 (minimum); "
                + "/unit: is required (required)", e.reason());
    }

    @Test
    void shouldRejectTopLevelValueThatIsNoObject() {
        InvalidRecordException e = readFails("[1, 2, 3]");
        assertEquals("usage-events: 1 violation: / = [1,2,3]: must be of type object (type)", e.reason());
    }

    @Test
    void shouldRefuseToWriteNanFactorsWhenWritesAreValidated() {
        var strict = ValidatingJsonSerde.validatingWrites(TopicName.MODEL_ITEM_FACTORS, ItemFactors.class);
        ItemFactors bad = new ItemFactors(SchemaIds.ITEM_FACTORS, "m-7", "cmp-0042", new float[] {0.5f, Float.NaN});
        InvalidRecordException e = assertThrows(InvalidRecordException.class,
                () -> strict.serializer().serialize("model-item-factors", bad));
        assertEquals("/factors/1", e.violations().get(0).field());
        assertEquals("type", e.violations().get(0).rule());
    }

    @Test
    void shouldRejectOnReadTheNanFactorsThatAPlainSerdeWrote() {
        var plain = ValidatingJsonSerde.of(TopicName.MODEL_ITEM_FACTORS, ItemFactors.class);
        ItemFactors bad = new ItemFactors(SchemaIds.ITEM_FACTORS, "m-7", "cmp-0042", new float[] {Float.NaN});
        byte[] written = plain.serializer().serialize("model-item-factors", bad);
        InvalidRecordException e = assertThrows(InvalidRecordException.class,
                () -> plain.deserializer().deserialize("model-item-factors", written));
        assertEquals("/factors/0 = \"NaN\": must be of type number (type)", e.violations().get(0).toString());
    }

    @Test
    void shouldRefuseATypeThatTheTopicDoesNotCarry() {
        assertThrows(IllegalArgumentException.class, () -> ValidatingJsonSerde.of(TopicName.CATALOG, UsageEvent.class));
    }

    private InvalidRecordException readFails(String json) {
        byte[] bytes = json.getBytes(StandardCharsets.UTF_8);
        return assertThrows(InvalidRecordException.class, () -> usage.deserializer().deserialize(TOPIC, bytes));
    }

    @SuppressWarnings("unchecked")
    private static <T> T roundTrip(TopicName topic, Class<T> type, Object value) {
        ValidatingJsonSerde<T> serde = ValidatingJsonSerde.validatingWrites(topic, type);
        byte[] bytes = serde.serializer().serialize(topic.baseName(), (T) value);
        return serde.deserializer().deserialize(topic.baseName(), bytes);
    }

}
