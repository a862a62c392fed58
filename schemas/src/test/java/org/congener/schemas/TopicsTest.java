package org.congener.schemas;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Arrays;
import java.util.List;
import org.congener.schemas.validation.InvalidRecordException;
import org.junit.jupiter.api.Test;

class TopicsTest {

    @Test
    void shouldNameEveryTopicByItsBaseNameWhenPrefixIsEmpty() {
        Topics topics = new Topics("");
        assertEquals("usage-events", topics.usageEvents().name());
        assertEquals("model-item-factors", topics.modelItemFactors().name());
        assertEquals("dead-letters", topics.deadLetters().name());
    }

    @Test
    void shouldPutThePrefixBeforeEveryName() {
        Topics topics = new Topics("lab1.");
        List<String> expected = Arrays.stream(TopicName.values()).map(t -> "lab1." + t.baseName()).toList();
        assertEquals(expected, topics.all().stream().map(Topic::name).toList());
    }

    @Test
    void shouldListEveryTopicOnceInTopicNameOrder() {
        Topics topics = new Topics("x-");
        assertEquals(Arrays.asList(TopicName.values()), topics.all().stream().map(Topic::id).toList());
        for (TopicName id : TopicName.values()) {
            assertSame(topics.all().get(id.ordinal()), topics.get(id));
        }
        assertSame(topics.catalog(), topics.get(TopicName.CATALOG));
        assertSame(topics.researchers(), topics.get(TopicName.RESEARCHERS));
        assertSame(topics.suggestions(), topics.get(TopicName.SUGGESTIONS));
    }

    @Test
    void shouldRejectAPrefixKafkaWouldNotAccept() {
        assertThrows(IllegalArgumentException.class, () -> new Topics("lab 1/"));
        assertThrows(IllegalArgumentException.class, () -> new Topics("p".repeat(240)));
    }

    @Test
    void shouldValidateValuesReadThroughATopicsSerde() {
        Topic<UsageEvent> usage = new Topics("").usageEvents();
        byte[] bytes = usage.valueSerde().serializer().serialize(usage.name(), RecordSamples.usageEvent());
        assertEquals(RecordSamples.usageEvent(), usage.valueSerde().deserializer().deserialize(usage.name(), bytes));
        byte[] catalogEntry = Examples.typical(TopicName.CATALOG);
        assertThrows(InvalidRecordException.class,
                () -> usage.valueSerde().deserializer().deserialize(usage.name(), catalogEntry));
        assertEquals("r-0007", usage.keySerde().deserializer().deserialize(usage.name(),
                usage.keySerde().serializer().serialize(usage.name(), "r-0007")));
    }
}
