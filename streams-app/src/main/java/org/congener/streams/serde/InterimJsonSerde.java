package org.congener.streams.serde;

import java.io.IOException;
import java.lang.reflect.RecordComponent;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;
import org.apache.kafka.common.serialization.Deserializer;
import org.apache.kafka.common.serialization.Serde;
import org.apache.kafka.common.serialization.Serializer;
import org.congener.schemas.SchemaIds;
import org.congener.schemas.TopicName;

/**
 * Plain Jackson serde with a minimal check of its own (known schema id, no missing field) used by the
 * streams app until the schemas module's validating serde is wired in through {@link RecordSerdes}.
 * The deserializer throws {@link RecordRejectedException} on a bad value and returns null for a null
 * payload (a tombstone).
 */
public final class InterimJsonSerde<T> implements Serde<T> {

    static final ObjectMapper MAPPER = JsonMapper.builder()
            .enable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
            .enable(DeserializationFeature.FAIL_ON_NULL_FOR_PRIMITIVES)
            .build();

    private final Class<T> type;
    private final String schemaId;
    private final RecordComponent[] components;
    private final boolean checked;

    private InterimJsonSerde(Class<T> type, String schemaId, boolean checked) {
        this.type = type;
        this.schemaId = schemaId;
        this.components = type.getRecordComponents();
        this.checked = checked;
    }

    /** Reads and checks values of {@code topic}. */
    public static <T> InterimJsonSerde<T> of(TopicName topic, Class<T> type) {
        return new InterimJsonSerde<>(type, schemaIdOf(topic), true);
    }

    /** Reads without checks: for state stores, whose values were checked when they came off the topic. */
    public static <T> InterimJsonSerde<T> unchecked(TopicName topic, Class<T> type) {
        return new InterimJsonSerde<>(type, schemaIdOf(topic), false);
    }

    static String schemaIdOf(TopicName topic) {
        return switch (topic) {
            case USAGE_EVENTS -> SchemaIds.USAGE_EVENT;
            case INVENTORY_EVENTS -> SchemaIds.INVENTORY_EVENT;
            case CATALOG -> SchemaIds.CATALOG_ENTRY;
            case RESEARCHERS -> SchemaIds.RESEARCHER;
            case MODEL_ITEM_FACTORS -> SchemaIds.ITEM_FACTORS;
            case MODEL_MANIFESTS -> SchemaIds.MODEL_MANIFEST;
            case ITEM_NEIGHBOURS -> SchemaIds.ITEM_NEIGHBOURS;
            case SUGGESTIONS -> SchemaIds.SUGGESTIONS;
            case ARRIVAL_ALERTS -> SchemaIds.ARRIVAL_ALERT;
            case DRIFT_METRICS -> SchemaIds.DRIFT_METRICS;
            case DEAD_LETTERS -> SchemaIds.DEAD_LETTER;
        };
    }

    @Override
    public Serializer<T> serializer() {
        return (topic, value) -> {
            if (value == null) {
                return null;
            }
            try {
                return MAPPER.writeValueAsBytes(value);
            } catch (IOException e) {
                throw new IllegalStateException("cannot write " + type.getSimpleName() + " as JSON", e);
            }
        };
    }

    @Override
    public Deserializer<T> deserializer() {
        return (topic, bytes) -> bytes == null ? null : read(bytes);
    }

    private T read(byte[] bytes) {
        T value;
        try {
            value = MAPPER.readValue(bytes, type);
        } catch (IOException e) {
            throw new RecordRejectedException("not a valid " + type.getSimpleName() + ": "
                    + firstLine(e instanceof JsonProcessingException j ? j.getOriginalMessage() : e.getMessage()), e);
        }
        if (value == null) {
            throw new RecordRejectedException("not a valid " + type.getSimpleName() + ": JSON null");
        }
        if (checked) {
            checkComplete(value);
        }
        return value;
    }

    private void checkComplete(T value) {
        for (RecordComponent component : components) {
            Object field;
            try {
                field = component.getAccessor().invoke(value);
            } catch (ReflectiveOperationException e) {
                throw new IllegalStateException(e);
            }
            if (field == null && !component.getName().equals("modelVersion")) {
                throw new RecordRejectedException(type.getSimpleName() + " lacks field '" + component.getName() + "'");
            }
            if (component.getName().equals("schema") && !schemaId.equals(field)) {
                throw new RecordRejectedException("unknown schema '" + field + "', expected '" + schemaId + "'");
            }
        }
    }

    private static String firstLine(String message) {
        if (message == null) {
            return "unreadable";
        }
        int newline = message.indexOf('\n');
        return newline < 0 ? message : message.substring(0, newline);
    }
}
