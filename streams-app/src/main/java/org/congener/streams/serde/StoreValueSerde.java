package org.congener.streams.serde;

import java.io.IOException;

import org.apache.kafka.common.errors.SerializationException;
import org.apache.kafka.common.serialization.Deserializer;
import org.apache.kafka.common.serialization.Serde;
import org.apache.kafka.common.serialization.Serializer;
import org.congener.schemas.Json;

/**
 * The topic's JSON, read without schema validation: for state stores that hold topic values (the global
 * tables restore by copying the topic's bytes), whose values were validated when they came off the
 * topic and which are read far more often than written.
 */
final class StoreValueSerde<T> implements Serde<T> {

    private final Class<T> type;

    StoreValueSerde(Class<T> type) {
        this.type = type;
    }

    @Override
    public Serializer<T> serializer() {
        return (topic, value) -> {
            try {
                return value == null ? null : Json.mapper().writeValueAsBytes(value);
            } catch (IOException e) {
                throw new SerializationException("cannot write " + type.getSimpleName(), e);
            }
        };
    }

    @Override
    public Deserializer<T> deserializer() {
        return (topic, bytes) -> {
            try {
                return bytes == null ? null : Json.mapper().readValue(bytes, type);
            } catch (IOException e) {
                throw new SerializationException("cannot read " + type.getSimpleName() + " from a store", e);
            }
        };
    }
}
