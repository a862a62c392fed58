package org.congener.schemas.serde;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.util.List;
import java.util.Objects;
import java.util.function.Function;
import org.apache.kafka.common.errors.SerializationException;
import org.apache.kafka.common.serialization.Deserializer;
import org.apache.kafka.common.serialization.Serde;
import org.apache.kafka.common.serialization.Serializer;
import org.congener.schemas.Json;
import org.congener.schemas.TopicName;
import org.congener.schemas.validation.InvalidRecordException;
import org.congener.schemas.validation.SchemaValidator;
import org.congener.schemas.validation.Violation;

/**
 * JSON serde of one topic's values. Reading parses once into a tree, validates that tree against the
 * topic's schema, then maps it to the record; any failure throws {@link InvalidRecordException} with
 * a one-line reason, never returns null. A null payload (a tombstone) reads as null.
 *
 * <p>Usage events are first read by {@link UsageEventReader}, which accepts exactly what the schema
 * accepts; only a value it turns down takes the tree path, so every reason stays the tree path's.
 *
 * <p>{@link #of} writes without validating, for the hot paths; {@link #validatingWrites} also checks
 * each value before writing it, for low-volume producers whose mistakes would be costly (the trainer
 * publishing a model version).
 */
public final class ValidatingJsonSerde<T> implements Serde<T> {
    private static final ObjectMapper MAPPER = Json.mapper();

    private final TopicName topic;
    private final Class<T> type;
    private final SchemaValidator validator;
    private final boolean validateWrites;
    /** The record, or null to send the value down the tree path. */
    private final Function<byte[], T> fastRead;

    private ValidatingJsonSerde(TopicName topic, Class<T> type, boolean validateWrites) {
        this.topic = Objects.requireNonNull(topic, "topic");
        this.type = Objects.requireNonNull(type, "type");
        if (!topic.valueType().equals(type)) {
            throw new IllegalArgumentException("topic " + topic.baseName() + " carries "
                    + topic.valueType().getSimpleName() + ", not " + type.getSimpleName());
        }
        this.validator = SchemaValidator.forTopic(topic);
        this.validateWrites = validateWrites;
        this.fastRead = topic == TopicName.USAGE_EVENTS
                ? data -> type.cast(UsageEventReader.read(data))
                : data -> null;
    }

    public static <T> ValidatingJsonSerde<T> of(TopicName topic, Class<T> type) {
        return new ValidatingJsonSerde<>(topic, type, false);
    }

    /** Like {@link #of}, but the serializer throws {@link InvalidRecordException} for a value its schema rejects. */
    public static <T> ValidatingJsonSerde<T> validatingWrites(TopicName topic, Class<T> type) {
        return new ValidatingJsonSerde<>(topic, type, true);
    }

    public TopicName topic() {
        return topic;
    }

    @Override
    public Serializer<T> serializer() {
        return (kafkaTopic, value) -> write(value);
    }

    @Override
    public Deserializer<T> deserializer() {
        return (kafkaTopic, data) -> read(data);
    }

    /** The value as JSON bytes; null for null. */
    public byte[] write(T value) {
        if (value == null) {
            return null;
        }
        try {
            if (!validateWrites) {
                return MAPPER.writeValueAsBytes(value);
            }
            // check the bytes that go on the wire: a tree made from the value would still hold NaN as a
            // number, while the written JSON holds the string "NaN" that every reader rejects
            byte[] written = MAPPER.writeValueAsBytes(value);
            List<Violation> violations = validator.check(MAPPER.readTree(written));
            if (!violations.isEmpty()) {
                throw InvalidRecordException.violating(topic, violations);
            }
            return written;
        } catch (IOException e) {
            throw new SerializationException("cannot write " + type.getSimpleName() + " for " + topic.baseName(), e);
        }
    }

    /** The record in {@code data}; null for a tombstone. */
    public T read(byte[] data) {
        if (data == null) {
            return null;
        }
        T fast = fastRead.apply(data);
        return fast != null ? fast : readValidated(data);
    }

    /** The tree path alone: parse, validate, map; the one place that words a rejection. */
    T readValidated(byte[] data) {
        JsonNode tree = parse(data);
        List<Violation> violations = validator.check(tree);
        if (!violations.isEmpty()) {
            throw InvalidRecordException.violating(topic, violations);
        }
        try {
            return MAPPER.treeToValue(tree, type);
        } catch (JsonProcessingException | IllegalArgumentException e) {
            // the schema should rule this out; reported like any other unreadable value if it does not
            throw InvalidRecordException.unreadable(topic, "does not map to " + type.getSimpleName() + ": "
                    + e.getMessage(), e);
        }
    }

    private JsonNode parse(byte[] data) {
        if (data.length == 0) {
            throw InvalidRecordException.unreadable(topic, "empty value (0 bytes)", null);
        }
        try {
            JsonNode tree = MAPPER.readTree(data);
            if (tree == null || tree.isMissingNode()) {
                throw InvalidRecordException.unreadable(topic, "no JSON value in " + data.length + " bytes", null);
            }
            return tree;
        } catch (JsonProcessingException e) {
            throw InvalidRecordException.unreadable(topic, "not valid JSON: " + describe(e, data.length), e);
        } catch (IOException e) {
            throw InvalidRecordException.unreadable(topic, "cannot read: " + e.getMessage(), e);
        }
    }

    /** Jackson's first message line and where it stopped, without its multi-line source excerpt. */
    private static String describe(JsonProcessingException e, int length) {
        String message = e.getOriginalMessage();
        int newline = message.indexOf('\n');
        String first = newline < 0 ? message : message.substring(0, newline);
        JsonLocation location = e.getLocation();
        if (location == null) {
            return first + " (" + length + " bytes)";
        }
        return first + " at line " + location.getLineNr() + ", column " + location.getColumnNr()
                + " (byte " + location.getByteOffset() + " of " + length + ")";
    }
}
