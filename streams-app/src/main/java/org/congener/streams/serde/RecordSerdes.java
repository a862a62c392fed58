package org.congener.streams.serde;

import org.apache.kafka.common.serialization.Serde;
import org.congener.schemas.TopicName;
import org.congener.schemas.validation.InvalidRecordException;

/**
 * Serdes the streams app needs besides the topics' own ({@link org.congener.schemas.Topics}), and the
 * one place where a failed read becomes a {@link RecordRejectedException}.
 */
public final class RecordSerdes {

    private RecordSerdes() {
    }

    /**
     * Serde of a state store that holds values of {@code topic}: the same bytes as on the topic, read
     * without validation (see {@link StoreValueSerde}).
     */
    public static <T> Serde<T> storeValue(TopicName topic, Class<T> type) {
        if (!topic.valueType().equals(type)) {
            throw new IllegalArgumentException(topic + " carries " + topic.valueType().getSimpleName()
                    + ", not " + type.getSimpleName());
        }
        return new StoreValueSerde<>(type);
    }

    /**
     * Parses {@code bytes} with {@code serde}; any failure becomes {@link RecordRejectedException} with a
     * one-line reason, so the caller can send the record to the dead letters instead of stopping.
     */
    public static <T> T parse(Serde<T> serde, String topic, byte[] bytes) {
        try {
            return serde.deserializer().deserialize(topic, bytes);
        } catch (InvalidRecordException e) {
            throw new RecordRejectedException(e.reason(), e);
        } catch (RuntimeException e) {
            throw new RecordRejectedException(e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage(), e);
        }
    }
}
