package org.congener.trainer.service;

import java.time.Duration;
import java.util.List;
import java.util.Map;
import java.util.Properties;
import java.util.function.BooleanSupplier;
import java.util.function.Consumer;
import java.util.function.Supplier;
import org.apache.kafka.clients.consumer.ConsumerConfig;
import org.apache.kafka.clients.consumer.KafkaConsumer;
import org.apache.kafka.common.TopicPartition;
import org.apache.kafka.common.serialization.ByteArrayDeserializer;

/**
 * When the trainer runs again: once, every fixed period, or after N more records on
 * {@code usage-events} (counted from the topic's committed end offsets, so nothing is consumed).
 */
public sealed interface TrainingSchedule {
    record Once() implements TrainingSchedule {
    }

    record Every(Duration period) implements TrainingSchedule {
    }

    record AfterEvents(long events, Duration checkInterval) implements TrainingSchedule {
    }

    /**
     * Runs {@code run} per this schedule until {@code stop} says so (checked every 100 ms); a failed run
     * is reported to {@code onFailure} and the schedule goes on.
     */
    static void loop(TrainingSchedule schedule, Supplier<TrainingOutcome> run, Consumer<TrainingOutcome> onOutcome,
                     Consumer<RuntimeException> onFailure, BooleanSupplier stop, Supplier<Long> eventCount) {
        long lastCount = eventCount.get();
        attempt(run, onOutcome, onFailure);
        if (schedule instanceof Once) {
            return;
        }
        long next = System.nanoTime() + interval(schedule).toNanos();
        while (!stop.getAsBoolean()) {
            sleep(100);
            if (System.nanoTime() < next) {
                continue;
            }
            next = System.nanoTime() + interval(schedule).toNanos();
            if (schedule instanceof AfterEvents after) {
                long count = eventCount.get();
                if (count - lastCount < after.events()) {
                    continue;
                }
                lastCount = count;
            }
            attempt(run, onOutcome, onFailure);
        }
    }

    private static Duration interval(TrainingSchedule s) {
        return s instanceof Every e ? e.period() : s instanceof AfterEvents a ? a.checkInterval() : Duration.ZERO;
    }

    private static void attempt(Supplier<TrainingOutcome> run, Consumer<TrainingOutcome> onOutcome,
                                Consumer<RuntimeException> onFailure) {
        try {
            onOutcome.accept(run.get());
        } catch (RuntimeException e) {
            onFailure.accept(e);
        }
    }

    private static void sleep(long millis) {
        try {
            Thread.sleep(millis);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new TrainerException("interrupted", e);
        }
    }

    /** Sum of the committed end offsets of {@code topic}: how many records it has had. */
    static long endOffsetSum(String bootstrapServers, String topic, Duration timeout) {
        Properties p = new Properties();
        p.put(ConsumerConfig.BOOTSTRAP_SERVERS_CONFIG, bootstrapServers);
        p.put(ConsumerConfig.ISOLATION_LEVEL_CONFIG, "read_committed");
        p.put(ConsumerConfig.KEY_DESERIALIZER_CLASS_CONFIG, ByteArrayDeserializer.class.getName());
        p.put(ConsumerConfig.VALUE_DESERIALIZER_CLASS_CONFIG, ByteArrayDeserializer.class.getName());
        try (KafkaConsumer<byte[], byte[]> c = new KafkaConsumer<>(p)) {
            List<TopicPartition> parts = c.partitionsFor(topic, timeout).stream()
                    .map(i -> new TopicPartition(i.topic(), i.partition())).toList();
            Map<TopicPartition, Long> end = c.endOffsets(parts, timeout);
            return end.values().stream().mapToLong(Long::longValue).sum();
        }
    }
}
