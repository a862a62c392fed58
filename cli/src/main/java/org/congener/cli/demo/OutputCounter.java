package org.congener.cli.demo;

import java.time.Duration;
import java.util.ArrayList;
import java.io.IOException;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Properties;
import java.util.Set;
import java.util.concurrent.ExecutionException;

import org.apache.kafka.clients.admin.Admin;
import org.apache.kafka.clients.admin.AdminClientConfig;
import org.apache.kafka.clients.consumer.ConsumerConfig;
import org.apache.kafka.clients.consumer.ConsumerRecord;
import org.apache.kafka.clients.consumer.KafkaConsumer;
import org.apache.kafka.common.TopicPartition;
import org.apache.kafka.common.serialization.ByteArrayDeserializer;
import org.apache.kafka.common.serialization.StringDeserializer;
import com.fasterxml.jackson.databind.JsonNode;
import org.congener.schemas.Json;
import org.congener.schemas.TopicName;

/**
 * Knows the streams app has processed everything when the outputs add up: every usage-topic record
 * yields exactly one suggestion list or one dead letter. Reads committed records with {@code assign()}
 * (no consumer group), so counting never disturbs the app.
 */
public final class OutputCounter implements AutoCloseable {

    /** What came out so far. */
    public record Counts(long suggestions, long deadLetters, Set<String> researchersWithSuggestions) {
        public long total() {
            return suggestions + deadLetters;
        }
    }

    private final KafkaConsumer<String, byte[]> consumer;
    private final String suggestionsTopic;
    private long suggestions;
    private long deadLetters;
    private final Set<String> researchers = new HashSet<>();
    private final Map<String, Long> seenAtNanos = new HashMap<>();
    private final List<String> researcherOrder = new ArrayList<>();

    public OutputCounter(String bootstrapServers, String prefix) {
        this.suggestionsTopic = TopicName.SUGGESTIONS.withPrefix(prefix);
        String deadLetterTopic = TopicName.DEAD_LETTERS.withPrefix(prefix);
        Properties p = new Properties();
        p.put(ConsumerConfig.BOOTSTRAP_SERVERS_CONFIG, bootstrapServers);
        p.put(ConsumerConfig.ISOLATION_LEVEL_CONFIG, "read_committed");
        p.put(ConsumerConfig.MAX_POLL_RECORDS_CONFIG, 5000);
        p.put(ConsumerConfig.FETCH_MAX_WAIT_MS_CONFIG, 50);
        this.consumer = new KafkaConsumer<>(p, new StringDeserializer(), new ByteArrayDeserializer());
        List<TopicPartition> partitions = new ArrayList<>();
        try (Admin admin = Admin.create(Map.of(AdminClientConfig.BOOTSTRAP_SERVERS_CONFIG, bootstrapServers))) {
            admin.describeTopics(List.of(suggestionsTopic, deadLetterTopic)).allTopicNames().get()
                    .forEach((name, description) -> description.partitions()
                            .forEach(info -> partitions.add(new TopicPartition(name, info.partition()))));
        } catch (ExecutionException e) {
            throw new IllegalStateException("cannot describe output topics: " + e.getCause().getMessage(), e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted", e);
        }
        consumer.assign(partitions);
        consumer.seekToBeginning(partitions);
    }

    /** Reads until {@code expected} outputs came or {@code timeout} passed; returns the counts either way. */
    public Counts awaitTotal(long expected, Duration timeout, ProgressLine progress) {
        long deadline = System.nanoTime() + timeout.toNanos();
        while (suggestions + deadLetters < expected && System.nanoTime() < deadline) {
            for (ConsumerRecord<String, byte[]> record : consumer.poll(Duration.ofMillis(200))) {
                if (record.topic().equals(suggestionsTopic)) {
                    suggestions++;
                    String cause = causeOf(record.value());
                    if (cause != null) {
                        seenAtNanos.putIfAbsent(cause, System.nanoTime());
                    }
                    if (record.key() != null && researchers.add(record.key())) {
                        researcherOrder.add(record.key());
                    }
                } else {
                    deadLetters++;
                }
            }
            progress.update(Math.min(expected, suggestions + deadLetters));
        }
        return new Counts(suggestions, deadLetters, Set.copyOf(researchers));
    }

    /** When ({@code System.nanoTime()}) the list caused by each event was first read, by event id. */
    public Map<String, Long> seenAtNanos() {
        return Map.copyOf(seenAtNanos);
    }

    private static String causeOf(byte[] value) {
        try {
            JsonNode cause = Json.mapper().readTree(value).get("causedByEventId");
            return cause == null ? null : cause.asText();
        } catch (IOException e) {
            return null;
        }
    }

    /** The researcher whose first list came out first, for an example URL; null when none. */
    public String firstResearcher() {
        return researcherOrder.isEmpty() ? null : researcherOrder.get(0);
    }

    @Override
    public void close() {
        consumer.close();
    }
}
