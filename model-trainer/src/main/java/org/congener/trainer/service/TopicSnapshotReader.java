package org.congener.trainer.service;

import java.time.Duration;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Properties;
import java.util.function.Consumer;
import org.apache.kafka.clients.consumer.ConsumerConfig;
import org.apache.kafka.clients.consumer.ConsumerRecord;
import org.apache.kafka.clients.consumer.KafkaConsumer;
import org.apache.kafka.common.PartitionInfo;
import org.apache.kafka.common.TopicPartition;
import org.apache.kafka.common.serialization.ByteArrayDeserializer;
import org.congener.schemas.Topic;

/**
 * Reads one topic from the beginning up to the end offsets seen when the read starts, with
 * {@code assign()} (no consumer group, nothing committed) and {@code read_committed}, so records of
 * aborted or open transactions are never seen. A record whose key or value cannot be read is counted,
 * logged with topic, partition and offset, and skipped.
 */
public final class TopicSnapshotReader {
    private static final Duration POLL = Duration.ofMillis(200);

    private final String bootstrapServers;
    private final Duration timeout;
    private final Consumer<String> log;

    public TopicSnapshotReader(String bootstrapServers, Duration timeout, Consumer<String> log) {
        this.bootstrapServers = bootstrapServers;
        this.timeout = timeout;
        this.log = log;
    }

    /** What one read gave: the readable records in offset order per partition, and how many were skipped. */
    public record Snapshot<V>(List<KeyedValue<V>> records, int skipped) {
    }

    /** One readable record; {@code value} is null for a tombstone. */
    public record KeyedValue<V>(String key, V value, int partition, long offset) {
    }

    /** Reads {@code topic} to its current end; {@code onRecord} is told the running count (for progress). */
    public <V> Snapshot<V> read(Topic<V> topic, Consumer<Integer> onRecord) {
        List<KeyedValue<V>> out = new ArrayList<>();
        int skipped = 0;
        try (KafkaConsumer<byte[], byte[]> consumer = new KafkaConsumer<>(properties())) {
            List<PartitionInfo> infos = consumer.partitionsFor(topic.name(), timeout);
            if (infos == null || infos.isEmpty()) {
                throw new TrainerException("topic " + topic.name() + " does not exist on " + bootstrapServers);
            }
            List<TopicPartition> partitions = infos.stream()
                    .map(p -> new TopicPartition(p.topic(), p.partition())).toList();
            consumer.assign(partitions);
            consumer.seekToBeginning(partitions);
            // with read_committed these are the last stable offsets: open transactions are not waited for
            Map<TopicPartition, Long> end = new LinkedHashMap<>(consumer.endOffsets(partitions, timeout));
            long deadline = System.nanoTime() + timeout.toNanos();
            while (!reached(consumer, end)) {
                if (System.nanoTime() > deadline) {
                    throw new TrainerException("reading " + topic.name() + " did not reach the end offsets "
                            + end + " within " + timeout);
                }
                for (ConsumerRecord<byte[], byte[]> r : consumer.poll(POLL)) {
                    TopicPartition tp = new TopicPartition(r.topic(), r.partition());
                    if (r.offset() >= end.getOrDefault(tp, Long.MAX_VALUE)) {
                        continue;
                    }
                    try {
                        String key = r.key() == null ? null : topic.keySerde().deserializer().deserialize(r.topic(), r.key());
                        V value = topic.valueSerde().deserializer().deserialize(r.topic(), r.value());
                        out.add(new KeyedValue<>(key, value, r.partition(), r.offset()));
                        onRecord.accept(out.size());
                    } catch (RuntimeException e) {
                        skipped++;
                        log.accept("skipped unreadable record " + r.topic() + "/" + r.partition() + "@" + r.offset()
                                + ": " + firstLine(e.getMessage()));
                    }
                }
            }
        }
        return new Snapshot<>(out, skipped);
    }

    private static boolean reached(KafkaConsumer<byte[], byte[]> consumer, Map<TopicPartition, Long> end) {
        for (Map.Entry<TopicPartition, Long> e : end.entrySet()) {
            if (consumer.position(e.getKey()) < e.getValue()) {
                return false;
            }
        }
        return true;
    }

    private static String firstLine(String message) {
        return message == null ? "" : message.lines().findFirst().orElse("");
    }

    private Properties properties() {
        Properties p = new Properties();
        p.put(ConsumerConfig.BOOTSTRAP_SERVERS_CONFIG, bootstrapServers);
        p.put(ConsumerConfig.ISOLATION_LEVEL_CONFIG, "read_committed");
        p.put(ConsumerConfig.ENABLE_AUTO_COMMIT_CONFIG, "false");
        p.put(ConsumerConfig.KEY_DESERIALIZER_CLASS_CONFIG, ByteArrayDeserializer.class.getName());
        p.put(ConsumerConfig.VALUE_DESERIALIZER_CLASS_CONFIG, ByteArrayDeserializer.class.getName());
        p.put(ConsumerConfig.MAX_POLL_RECORDS_CONFIG, "5000");
        return p;
    }
}
