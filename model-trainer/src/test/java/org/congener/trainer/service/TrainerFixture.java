package org.congener.trainer.service;

import java.io.IOException;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Properties;
import java.util.SplittableRandom;
import org.apache.kafka.clients.producer.KafkaProducer;
import org.apache.kafka.clients.producer.ProducerConfig;
import org.apache.kafka.clients.producer.ProducerRecord;
import org.apache.kafka.common.serialization.ByteArraySerializer;
import org.apache.kafka.common.serialization.StringSerializer;
import org.congener.broker.SharedBroker;
import org.congener.broker.TopicAdmin;
import org.congener.core.interactions.InteractionWeights;
import org.congener.core.ontology.Ontology;
import org.congener.core.ontology.io.EdgeListReader;
import org.congener.core.split.TimeSplit;
import org.congener.schemas.SchemaIds;
import org.congener.schemas.Topic;
import org.congener.schemas.Topics;
import org.congener.schemas.UsageEvent;
import org.congener.schemas.UsageKind;
import org.congener.trainer.evaluation.ExperimentSettings;

/**
 * Invented test scenario on the shared embedded broker: a taxonomy of 4 families × 4 groups × 8 leaf
 * compounds, and researchers who draw 85% of their orders from one or two groups. Topics get a prefix of
 * their own per test.
 */
final class TrainerFixture {
    static final int FAMILIES = 4;
    static final int GROUPS = 4;
    static final int LEAVES = 8;

    final Topics topics;
    final String bootstrap = SharedBroker.bootstrapServers();
    final List<String> log = java.util.Collections.synchronizedList(new ArrayList<>() {
        @Override
        public boolean add(String s) {
            System.err.println(java.time.LocalTime.now() + " " + s);
            return super.add(s);
        }
    });

    TrainerFixture(String testName) {
        this.topics = new Topics(SharedBroker.uniquePrefix(testName));
        TopicAdmin.createAll(bootstrap, topics.prefix(), 2, (short) 1);
    }

    static String item(int family, int group, int leaf) {
        return "item-" + family + "-" + group + "-" + leaf;
    }

    static Ontology ontology() {
        StringBuilder edges = new StringBuilder();
        for (int f = 0; f < FAMILIES; f++) {
            edges.append("family-").append(f).append("\troot\n");
            for (int g = 0; g < GROUPS; g++) {
                edges.append("group-").append(f).append('-').append(g).append("\tfamily-").append(f).append('\n');
                for (int l = 0; l < LEAVES; l++) {
                    edges.append(item(f, g, l)).append("\tgroup-").append(f).append('-').append(g).append('\n');
                }
            }
        }
        try {
            return new EdgeListReader().read(new StringReader(edges.toString()));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static List<UsageEvent> events(int researchers, int perResearcher, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        List<UsageEvent> out = new ArrayList<>();
        Instant start = Instant.parse("2026-01-05T08:00:00Z");
        for (int r = 0; r < researchers; r++) {
            int own = 1 + random.nextInt(2);
            int[][] groups = new int[own][];
            for (int g = 0; g < own; g++) {
                groups[g] = new int[] {random.nextInt(FAMILIES), random.nextInt(GROUPS)};
            }
            for (int n = 0; n < perResearcher; n++) {
                String id;
                if (random.nextDouble() < 0.85) {
                    int[] g = groups[random.nextInt(own)];
                    int leaf = Math.min(LEAVES - 1, (int) (-Math.log(1 - random.nextDouble()) * 2.5));
                    id = item(g[0], g[1], leaf);
                } else {
                    id = item(random.nextInt(FAMILIES), random.nextInt(GROUPS), random.nextInt(LEAVES));
                }
                out.add(new UsageEvent(SchemaIds.USAGE_EVENT, "e-" + r + "-" + n, "researcher-" + r, id,
                        UsageKind.ORDER, 1 + random.nextInt(3), "g", start.plusSeconds(3600L * n + r).toString()));
            }
        }
        return out;
    }

    void produce(List<UsageEvent> events) {
        send(topics.usageEvents(), events.stream().map(e -> new Keyed<>(e.researcherId(), e)).toList());
    }

    record Keyed<V>(String key, V value) {
    }

    <V> void send(Topic<V> topic, List<Keyed<V>> records) {
        try (KafkaProducer<String, byte[]> p = new KafkaProducer<>(producerProperties())) {
            for (Keyed<V> r : records) {
                p.send(new ProducerRecord<>(topic.name(), r.key(),
                        topic.valueSerde().serializer().serialize(topic.name(), r.value())));
            }
            p.flush();
        }
    }

    void sendRaw(String topic, String key, byte[] value) {
        try (KafkaProducer<String, byte[]> p = new KafkaProducer<>(producerProperties())) {
            p.send(new ProducerRecord<>(topic, key, value));
            p.flush();
        }
    }

    Properties producerProperties() {
        Properties p = new Properties();
        p.put(ProducerConfig.BOOTSTRAP_SERVERS_CONFIG, bootstrap);
        p.put(ProducerConfig.KEY_SERIALIZER_CLASS_CONFIG, StringSerializer.class.getName());
        p.put(ProducerConfig.VALUE_SERIALIZER_CLASS_CONFIG, ByteArraySerializer.class.getName());
        return p;
    }

    /** A small, quick experiment: one ALS configuration of {@code rank}, few bootstrap resamples. */
    static TrainerSettings settings(int rank, double margin) {
        ExperimentSettings e = new ExperimentSettings(new TimeSplit(0.2), new int[] {5, 10}, 50, "ndcg@10",
                List.of(rank), List.of(0.1), List.of(5.0), List.of(0.5), List.of(60.0), 6, 10, 10, 50, 0.95, 42L, 2);
        return new TrainerSettings(e, InteractionWeights.defaults(), margin, 3, null, Duration.ofSeconds(30));
    }

    TrainerService service(TrainerSettings settings, Ontology ontology, org.congener.trainer.publish.PublishHook hook) {
        return new TrainerService(bootstrap, topics, settings, ontology, log::add,
                new java.io.PrintStream(java.io.OutputStream.nullOutputStream()), hook);
    }

    org.congener.trainer.registry.PublishedModels published() {
        return new org.congener.trainer.registry.ModelRegistry(
                new TopicSnapshotReader(bootstrap, Duration.ofSeconds(30), log::add), topics).read();
    }
}
