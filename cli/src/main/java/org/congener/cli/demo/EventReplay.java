package org.congener.cli.demo;

import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Properties;
import java.util.concurrent.atomic.AtomicLong;
import java.util.concurrent.atomic.AtomicReference;

import org.apache.kafka.clients.producer.KafkaProducer;
import org.apache.kafka.clients.producer.ProducerConfig;
import org.apache.kafka.clients.producer.ProducerRecord;
import org.apache.kafka.common.serialization.ByteArraySerializer;
import org.apache.kafka.common.serialization.StringSerializer;
import org.congener.schemas.CatalogEntry;
import org.congener.schemas.InventoryEvent;
import org.congener.schemas.Researcher;
import org.congener.schemas.Topic;
import org.congener.schemas.Topics;
import org.congener.schemas.UsageEvent;

/**
 * Writes the scenario to the broker as the ordering and inventory systems would: reference data to
 * the compacted topics first, then usage and inventory events merged in time order, each with its
 * occurrence time as record timestamp, and the broken lines spread evenly among the usage events.
 */
public final class EventReplay {

    /** Counts of what was written. */
    public record Sent(int usageEvents, int inventoryEvents, int badLines) {
        public int usageTopicRecords() {
            return usageEvents + badLines;
        }

        public int total() {
            return usageEvents + inventoryEvents + badLines;
        }
    }

    /** One record to send; {@code eventId} is set for good usage events only (latency is measured on them). */
    private record Entry(String topic, String key, byte[] value, long timestamp, int order, String eventId) {
    }

    private final String bootstrapServers;
    private final Topics topics;

    public EventReplay(String bootstrapServers, String prefix) {
        this.bootstrapServers = bootstrapServers;
        this.topics = new Topics(prefix);
    }

    public void loadReferenceData(ReplayScenario scenario) {
        try (KafkaProducer<String, byte[]> producer = producer()) {
            Topic<CatalogEntry> catalog = topics.catalog();
            for (CatalogEntry entry : scenario.catalog()) {
                producer.send(new ProducerRecord<>(catalog.name(), entry.compoundId(),
                        catalog.valueSerde().serializer().serialize(catalog.name(), entry)));
            }
            Topic<Researcher> researchers = topics.researchers();
            for (Researcher researcher : scenario.researchers()) {
                producer.send(new ProducerRecord<>(researchers.name(), researcher.researcherId(),
                        researchers.valueSerde().serializer().serialize(researchers.name(), researcher)));
            }
            producer.flush();
        }
    }

    /**
     * Sends the timeline; paces it at {@code ratePerSecond} records per second when that is positive.
     *
     * @param ackedAtNanos filled with {@code System.nanoTime()} at the broker's acknowledgement of each
     *                     usage event, by event id
     */
    public Sent replayEvents(ReplayScenario scenario, ProgressLine progress, double ratePerSecond,
                             Map<String, Long> ackedAtNanos) throws InterruptedException {
        List<Entry> timeline = timeline(scenario);
        AtomicLong acknowledged = new AtomicLong();
        AtomicReference<Exception> failure = new AtomicReference<>();
        long start = System.nanoTime();
        try (KafkaProducer<String, byte[]> producer = producer()) {
            for (int i = 0; i < timeline.size(); i++) {
                if (failure.get() != null) {
                    break;
                }
                if (ratePerSecond > 0) {
                    long due = start + (long) (i * 1e9 / ratePerSecond);
                    long wait = due - System.nanoTime();
                    if (wait > 0) {
                        Thread.sleep(wait / 1_000_000, (int) (wait % 1_000_000));
                    }
                }
                Entry entry = timeline.get(i);
                producer.send(new ProducerRecord<>(entry.topic(), null, entry.timestamp(), entry.key(), entry.value()),
                        (metadata, exception) -> {
                            if (exception != null) {
                                failure.compareAndSet(null, exception);
                                return;
                            }
                            if (entry.eventId() != null) {
                                ackedAtNanos.put(entry.eventId(), System.nanoTime());
                            }
                            progress.update(acknowledged.incrementAndGet());
                        });
                if (ratePerSecond > 0) {
                    // paced: send now rather than wait for a fuller batch, or linger would add latency
                    producer.flush();
                }
            }
            producer.flush();
        }
        if (failure.get() != null) {
            throw new IllegalStateException("replay failed: " + failure.get().getMessage(), failure.get());
        }
        return new Sent(scenario.usageEvents().size(), scenario.inventoryEvents().size(), scenario.badUsageLines().size());
    }

    public static int timelineSize(ReplayScenario scenario) {
        return scenario.usageEvents().size() + scenario.inventoryEvents().size() + scenario.badUsageLines().size();
    }

    private List<Entry> timeline(ReplayScenario scenario) {
        String usageTopic = topics.usageEvents().name();
        String inventoryTopic = topics.inventoryEvents().name();
        List<Entry> timeline = new ArrayList<>(timelineSize(scenario));
        int order = 0;
        List<UsageEvent> usage = scenario.usageEvents();
        List<String> bad = scenario.badUsageLines();
        // a broken line after every usage.size()/(bad.size()+1) good events, stamped like its neighbour
        int spacing = Math.max(1, usage.size() / (bad.size() + 1));
        int nextBad = 0;
        for (int i = 0; i < usage.size(); i++) {
            UsageEvent event = usage.get(i);
            long at = Instant.parse(event.occurredAt()).toEpochMilli();
            timeline.add(new Entry(usageTopic, event.researcherId(),
                    topics.usageEvents().valueSerde().serializer().serialize(usageTopic, event), at, order++,
                    event.eventId()));
            if (nextBad < bad.size() && (i + 1) % spacing == 0) {
                timeline.add(new Entry(usageTopic, null, bad.get(nextBad++).getBytes(StandardCharsets.UTF_8), at, order++,
                        null));
            }
        }
        long lastAt = usage.isEmpty() ? System.currentTimeMillis()
                : Instant.parse(usage.get(usage.size() - 1).occurredAt()).toEpochMilli();
        while (nextBad < bad.size()) {
            timeline.add(new Entry(usageTopic, null, bad.get(nextBad++).getBytes(StandardCharsets.UTF_8), lastAt,
                    order++, null));
        }
        for (InventoryEvent event : scenario.inventoryEvents()) {
            timeline.add(new Entry(inventoryTopic, event.compoundId(),
                    topics.inventoryEvents().valueSerde().serializer().serialize(inventoryTopic, event),
                    Instant.parse(event.occurredAt()).toEpochMilli(), order++, null));
        }
        timeline.sort(Comparator.comparingLong(Entry::timestamp).thenComparingInt(Entry::order));
        return timeline;
    }

    private KafkaProducer<String, byte[]> producer() {
        Properties p = new Properties();
        p.put(ProducerConfig.BOOTSTRAP_SERVERS_CONFIG, bootstrapServers);
        p.put(ProducerConfig.ACKS_CONFIG, "all");
        p.put(ProducerConfig.ENABLE_IDEMPOTENCE_CONFIG, true);
        p.put(ProducerConfig.LINGER_MS_CONFIG, 10);
        p.put(ProducerConfig.BATCH_SIZE_CONFIG, 128 * 1024);
        return new KafkaProducer<>(p, new StringSerializer(), new ByteArraySerializer());
    }
}
