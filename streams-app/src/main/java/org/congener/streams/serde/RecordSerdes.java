package org.congener.streams.serde;

import java.util.function.Function;

import org.apache.kafka.common.serialization.Serde;
import org.apache.kafka.common.serialization.Serdes;
import org.congener.schemas.CatalogEntry;
import org.congener.schemas.DeadLetter;
import org.congener.schemas.InventoryEvent;
import org.congener.schemas.Researcher;
import org.congener.schemas.Suggestions;
import org.congener.schemas.TopicName;
import org.congener.schemas.UsageEvent;

/**
 * The serdes of every topic the streams app touches, chosen in this one place. Values are JSON (other
 * systems read these topics); keys are UTF-8 strings.
 */
public final class RecordSerdes {

    private RecordSerdes() {
    }

    public static Serde<String> keys() {
        return Serdes.String();
    }

    public static <T> Serde<T> value(TopicName topic, Class<T> type) {
        if (!topic.valueType().equals(type)) {
            throw new IllegalArgumentException(topic + " carries " + topic.valueType().getSimpleName()
                    + ", not " + type.getSimpleName());
        }
        return InterimJsonSerde.of(topic, type);
    }

    /**
     * Serde of a state store holding values of {@code topic}: same bytes as the topic (global tables
     * restore by copying them), read without validation, since every value was checked on arrival and a
     * store is read far more often than written.
     */
    public static <T> Serde<T> storeValue(TopicName topic, Class<T> type) {
        if (!topic.valueType().equals(type)) {
            throw new IllegalArgumentException(topic + " carries " + topic.valueType().getSimpleName()
                    + ", not " + type.getSimpleName());
        }
        return InterimJsonSerde.unchecked(topic, type);
    }

    public static Serde<UsageEvent> usageEvents() {
        return value(TopicName.USAGE_EVENTS, UsageEvent.class);
    }

    public static Serde<InventoryEvent> inventoryEvents() {
        return value(TopicName.INVENTORY_EVENTS, InventoryEvent.class);
    }

    public static Serde<CatalogEntry> catalog() {
        return value(TopicName.CATALOG, CatalogEntry.class);
    }

    public static Serde<Researcher> researchers() {
        return value(TopicName.RESEARCHERS, Researcher.class);
    }

    public static Serde<Suggestions> suggestions() {
        return value(TopicName.SUGGESTIONS, Suggestions.class);
    }

    public static Serde<DeadLetter> deadLetters() {
        return value(TopicName.DEAD_LETTERS, DeadLetter.class);
    }

    /**
     * Parses {@code bytes} with {@code serde}; a failure of any kind becomes {@link RecordRejectedException}
     * with a reason, so the caller can send the record to the dead letters instead of stopping.
     */
    public static <T> T parse(Serde<T> serde, String topic, byte[] bytes) {
        return parse(b -> serde.deserializer().deserialize(topic, b), bytes);
    }

    static <T> T parse(Function<byte[], T> reader, byte[] bytes) {
        try {
            return reader.apply(bytes);
        } catch (RecordRejectedException e) {
            throw e;
        } catch (RuntimeException e) {
            throw new RecordRejectedException(e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage(), e);
        }
    }
}
