package org.congener.schemas;

import java.util.Objects;
import org.apache.kafka.common.serialization.Serde;

/**
 * One topic as the code uses it: which topic it is, its name on the broker (prefix included) and the
 * serdes of its keys and values. Immutable; get instances from {@link Topics}.
 */
public record Topic<V>(TopicName id, String name, Serde<String> keySerde, Serde<V> valueSerde) {
    public Topic {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(keySerde, "keySerde");
        Objects.requireNonNull(valueSerde, "valueSerde");
    }
}
