package org.congener.trainer.service;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.List;
import java.util.Properties;
import org.apache.kafka.clients.producer.KafkaProducer;
import org.apache.kafka.clients.producer.ProducerConfig;
import org.apache.kafka.clients.producer.ProducerRecord;
import org.congener.broker.SharedBroker;
import org.congener.schemas.CatalogEntry;
import org.congener.schemas.SchemaIds;
import org.congener.schemas.UsageEvent;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;

@ExtendWith(SharedBroker.class)
class HistoryReaderTest {

    @Test
    void shouldReadCommittedEventsAndSkipUnreadableOnesWithTheirOffset() {
        TrainerFixture f = new TrainerFixture("history");
        List<UsageEvent> events = TrainerFixture.events(3, 4, 1);
        f.produce(events);
        f.sendRaw(f.topics.usageEvents().name(), "researcher-x", "{not json".getBytes(StandardCharsets.UTF_8));
        // an aborted transaction: read_committed must not see it
        Properties p = f.producerProperties();
        p.put(ProducerConfig.TRANSACTIONAL_ID_CONFIG, "history-test-aborted-" + f.topics.prefix());
        try (KafkaProducer<String, byte[]> tx = new KafkaProducer<>(p)) {
            tx.initTransactions();
            tx.beginTransaction();
            tx.send(new ProducerRecord<>(f.topics.usageEvents().name(), "researcher-0",
                    f.topics.usageEvents().valueSerde().serializer().serialize("", events.get(0))));
            tx.flush();
            tx.abortTransaction();
        }
        CatalogEntry entry = new CatalogEntry(SchemaIds.CATALOG_ENTRY, "item-0-0-0", "first", List.of("item-0-0-0"),
                List.of(), List.of(), true);
        f.send(f.topics.catalog(), List.of(new TrainerFixture.Keyed<>("item-0-0-0", entry)));

        TrainingHistory history = new HistoryReader(
                new TopicSnapshotReader(f.bootstrap, Duration.ofSeconds(30), f.log::add), f.topics).read(n -> { });

        assertEquals(events.size(), history.events().size());
        assertEquals(1, history.skippedEvents());
        assertEquals(1, history.catalogue().size());
        assertTrue(f.log.stream().anyMatch(l -> l.contains(f.topics.usageEvents().name() + "/") && l.contains("@")),
                () -> "the skipped record is logged with topic/partition@offset: " + f.log);
    }
}
