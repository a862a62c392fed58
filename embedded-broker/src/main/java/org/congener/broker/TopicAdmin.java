package org.congener.broker;

import java.time.Duration;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Properties;
import java.util.Set;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;

import org.apache.kafka.clients.admin.Admin;
import org.apache.kafka.clients.admin.AdminClientConfig;
import org.apache.kafka.clients.admin.NewTopic;
import org.apache.kafka.common.KafkaFuture;
import org.apache.kafka.common.config.TopicConfig;
import org.apache.kafka.common.errors.TopicExistsException;
import org.congener.schemas.TopicName;

/**
 * Creates every Congener topic ({@link TopicName}) under a name prefix. Compacted topics get
 * {@code cleanup.policy=compact}. Topics that already exist are left as they are, so running it
 * again is harmless.
 */
public final class TopicAdmin {

    private static final Duration TIMEOUT = Duration.ofSeconds(60);

    private TopicAdmin() {
    }

    /** What {@link #createAll} did: the topics it created and those that were already there. */
    public record Outcome(List<String> created, List<String> existing) {
    }

    /** The topic as the broker should hold it: prefixed name, partitions, replication, clean-up policy. */
    public static NewTopic newTopic(TopicName topic, String prefix, int partitions, short replicationFactor) {
        NewTopic newTopic = new NewTopic(topic.withPrefix(prefix), partitions, replicationFactor);
        if (topic.compacted()) {
            newTopic.configs(Map.of(TopicConfig.CLEANUP_POLICY_CONFIG, TopicConfig.CLEANUP_POLICY_COMPACT));
        }
        return newTopic;
    }

    public static Outcome createAll(String bootstrapServers, String prefix, int partitions, short replicationFactor) {
        Properties p = new Properties();
        p.put(AdminClientConfig.BOOTSTRAP_SERVERS_CONFIG, bootstrapServers);
        try (Admin admin = Admin.create(p)) {
            return createAll(admin, prefix, partitions, replicationFactor);
        }
    }

    public static Outcome createAll(Admin admin, String prefix, int partitions, short replicationFactor) {
        if (partitions < 1) {
            throw new IllegalArgumentException("partitions must be at least 1, got " + partitions);
        }
        if (replicationFactor < 1) {
            throw new IllegalArgumentException("replication factor must be at least 1, got " + replicationFactor);
        }
        Map<TopicName, NewTopic> wanted = new EnumMap<>(TopicName.class);
        for (TopicName topic : TopicName.values()) {
            wanted.put(topic, newTopic(topic, prefix, partitions, replicationFactor));
        }
        Map<String, KafkaFuture<Void>> results = admin.createTopics(wanted.values()).values();
        List<String> created = new ArrayList<>();
        List<String> existing = new ArrayList<>();
        for (NewTopic topic : wanted.values()) {
            try {
                results.get(topic.name()).get(TIMEOUT.toMillis(), TimeUnit.MILLISECONDS);
                created.add(topic.name());
            } catch (ExecutionException e) {
                if (e.getCause() instanceof TopicExistsException) {
                    existing.add(topic.name());
                } else {
                    throw new IllegalStateException("cannot create topic " + topic.name() + ": "
                            + e.getCause().getMessage(), e.getCause());
                }
            } catch (TimeoutException e) {
                throw new IllegalStateException("creating topic " + topic.name() + " took longer than "
                        + TIMEOUT.toSeconds() + " s", e);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IllegalStateException("interrupted while creating topic " + topic.name(), e);
            }
        }
        awaitVisible(admin, wanted.values().stream().map(NewTopic::name).toList());
        return new Outcome(List.copyOf(created), List.copyOf(existing));
    }

    /**
     * A created topic is known to the controller before every broker serves it; clients that start right
     * after creation (the streams app, the demo's producer) should find it, so wait until brokers describe it.
     */
    private static void awaitVisible(Admin admin, List<String> names) {
        long deadline = System.nanoTime() + TIMEOUT.toNanos();
        while (true) {
            try {
                admin.describeTopics(names).allTopicNames().get(TIMEOUT.toMillis(), TimeUnit.MILLISECONDS);
                return;
            } catch (ExecutionException | TimeoutException e) {
                if (System.nanoTime() > deadline) {
                    throw new IllegalStateException("created topics are not visible after "
                            + TIMEOUT.toSeconds() + " s: " + e.getMessage(), e);
                }
                sleep(100);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IllegalStateException("interrupted while waiting for topics", e);
            }
        }
    }

    private static void sleep(long millis) {
        try {
            Thread.sleep(millis);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while waiting for topics", e);
        }
    }

    /** Names of every Congener topic under {@code prefix}. */
    public static Set<String> allNames(String prefix) {
        Set<String> names = new LinkedHashSet<>();
        for (TopicName topic : TopicName.values()) {
            names.add(topic.withPrefix(prefix));
        }
        return names;
    }
}
