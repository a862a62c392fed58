package org.congener.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.OutputStream;
import java.io.PrintStream;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Properties;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicBoolean;
import org.apache.kafka.clients.consumer.ConsumerConfig;
import org.apache.kafka.clients.consumer.ConsumerRecord;
import org.apache.kafka.clients.consumer.KafkaConsumer;
import org.apache.kafka.clients.producer.KafkaProducer;
import org.apache.kafka.clients.producer.ProducerConfig;
import org.apache.kafka.clients.producer.ProducerRecord;
import org.apache.kafka.common.TopicPartition;
import org.apache.kafka.common.serialization.ByteArraySerializer;
import org.apache.kafka.common.serialization.StringDeserializer;
import org.apache.kafka.common.serialization.StringSerializer;
import org.congener.broker.SharedBroker;
import org.congener.broker.TopicAdmin;
import org.congener.cli.demo.EventReplay;
import org.congener.cli.demo.ProgressLine;
import org.congener.cli.demo.ReplayScenario;
import org.congener.cli.demo.StandardScenario;
import org.congener.schemas.Suggestions;
import org.congener.schemas.Topics;
import org.congener.schemas.UsageEvent;
import org.congener.streams.StreamsApp;
import org.congener.streams.config.AppConfig;
import org.congener.trainer.publish.ModelPublisher;
import org.congener.trainer.publish.PublishHook;
import org.congener.trainer.publish.Rollback;
import org.congener.trainer.registry.ModelRegistry;
import org.congener.trainer.service.TopicSnapshotReader;
import org.congener.trainer.service.TrainerService;
import org.congener.trainer.service.TrainerSettings;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;

/**
 * The trainer and the streams app together on the shared broker: a version the trainer publishes while
 * events stream in becomes live with a list for every event, and a rollback makes the older one live.
 */
@ExtendWith(SharedBroker.class)
class ModelSwitchTest {
    private static final Duration WAIT = Duration.ofSeconds(60);

    @TempDir
    Path dir;

    @Test
    void shouldSwitchToPublishedVersionWithNoGapAndBackOnRollback() throws Exception {
        String prefix = SharedBroker.uniquePrefix("switch");
        String bootstrap = SharedBroker.bootstrapServers();
        Topics topics = new Topics(prefix);
        TopicAdmin.createAll(bootstrap, prefix, 2, (short) 1);
        ReplayScenario all = StandardScenario.load();
        ReplayScenario history = all.history(1200);
        EventReplay replay = new EventReplay(bootstrap, prefix);
        replay.loadReferenceData(history);
        replay.replayEvents(history, new ProgressLine(new PrintStream(OutputStream.nullOutputStream()), "", 1), 0,
                new ConcurrentHashMap<>());
        List<UsageEvent> live = all.after(1200).usageEvents();
        TrainerSettings settings = TrainCommand.settings("ndcg@10", 0.05, 3, null, 2, 4, List.of(8));
        TrainerService trainer = new TrainerService(bootstrap, topics, settings, TrainCommand.demoOntology(), l -> { },
                new PrintStream(OutputStream.nullOutputStream()), PublishHook.NONE);
        assertEquals("v0001", trainer.runOnce().version());

        Map<String, String> versionByEvent = new ConcurrentHashMap<>();
        AtomicBoolean stop = new AtomicBoolean();
        Thread reader = new Thread(() -> collect(bootstrap, topics, versionByEvent, stop), "suggestions-reader");
        reader.start();
        AppConfig config = AppConfig.defaults().with(Map.of(AppConfig.BOOTSTRAP_SERVERS, bootstrap,
                AppConfig.TOPIC_PREFIX, prefix, AppConfig.APPLICATION_ID, SharedBroker.uniqueApplicationId("switch"),
                AppConfig.STATE_DIR, dir.resolve("state").toString(), AppConfig.HTTP_PORT, "0"));
        int[] next = {0};
        try (StreamsApp app = StreamsApp.start(config);
             KafkaProducer<String, byte[]> producer = producer(bootstrap)) {
            assertTrue(app.awaitRunning(WAIT), "streams app running");
            List<String> before = send(producer, topics, live, next, 15);
            awaitLists(versionByEvent, before);
            before.forEach(id -> assertEquals("v0001", versionByEvent.get(id), id));

            // publish v0002 while events keep arriving
            List<String> during = new ArrayList<>();
            java.util.concurrent.atomic.AtomicReference<Object> published = new java.util.concurrent.atomic.AtomicReference<>();
            Thread publishing = new Thread(() -> {
                try {
                    published.set(trainer.runOnce().version());
                } catch (RuntimeException e) {
                    published.set(e);
                }
            }, "trainer");
            publishing.start();
            while (publishing.isAlive()) {
                during.addAll(send(producer, topics, live, next, 1));
                Thread.sleep(50);
            }
            assertEquals("v0002", published.get(), "the second run published");
            List<String> switching = sendUntil(producer, topics, live, next, versionByEvent, "v0002");
            during.addAll(switching);
            List<String> after = send(producer, topics, live, next, 15);
            awaitLists(versionByEvent, during);
            awaitLists(versionByEvent, after);
            for (String id : during) {
                String v = versionByEvent.get(id);
                assertTrue("v0001".equals(v) || "v0002".equals(v), id + " was scored under " + v);
            }
            after.forEach(id -> assertEquals("v0002", versionByEvent.get(id), id));

            try (ModelPublisher publisher = new ModelPublisher(bootstrap, topics, PublishHook.NONE)) {
                Rollback.to("v0001", new ModelRegistry(new TopicSnapshotReader(bootstrap, WAIT, l -> { }), topics).read(),
                        publisher);
            }
            sendUntil(producer, topics, live, next, versionByEvent, "v0001");
            List<String> rolledBack = send(producer, topics, live, next, 15);
            awaitLists(versionByEvent, rolledBack);
            rolledBack.forEach(id -> assertEquals("v0001", versionByEvent.get(id), id));
        } finally {
            stop.set(true);
            reader.join(10_000);
        }
    }

    private static List<String> send(KafkaProducer<String, byte[]> producer, Topics topics, List<UsageEvent> events,
                                     int[] next, int n) {
        List<String> ids = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            UsageEvent e = events.get(next[0]++);
            producer.send(new ProducerRecord<>(topics.usageEvents().name(), e.researcherId(),
                    topics.usageEvents().valueSerde().serializer().serialize("", e)));
            ids.add(e.eventId());
        }
        producer.flush();
        return ids;
    }

    /** Sends one event at a time until one comes back scored under {@code version}; returns all sent. */
    private static List<String> sendUntil(KafkaProducer<String, byte[]> producer, Topics topics, List<UsageEvent> events,
                                          int[] next, Map<String, String> versionByEvent, String version)
            throws InterruptedException {
        List<String> sent = new ArrayList<>();
        long deadline = System.nanoTime() + WAIT.toNanos();
        while (System.nanoTime() < deadline) {
            String id = send(producer, topics, events, next, 1).get(0);
            sent.add(id);
            awaitLists(versionByEvent, List.of(id));
            if (version.equals(versionByEvent.get(id))) {
                return sent;
            }
            Thread.sleep(100);
        }
        throw new AssertionError("no list under " + version + " within " + WAIT);
    }

    private static void awaitLists(Map<String, String> versionByEvent, List<String> ids) throws InterruptedException {
        long deadline = System.nanoTime() + WAIT.toNanos();
        while (!versionByEvent.keySet().containsAll(ids) && System.nanoTime() < deadline) {
            Thread.sleep(50);
        }
        for (String id : ids) {
            assertNotNull(versionByEvent.get(id), "a list for event " + id);
        }
    }

    private static void collect(String bootstrap, Topics topics, Map<String, String> versionByEvent, AtomicBoolean stop) {
        Properties p = new Properties();
        p.put(ConsumerConfig.BOOTSTRAP_SERVERS_CONFIG, bootstrap);
        p.put(ConsumerConfig.ISOLATION_LEVEL_CONFIG, "read_committed");
        try (KafkaConsumer<String, byte[]> c = new KafkaConsumer<>(p, new StringDeserializer(),
                new org.apache.kafka.common.serialization.ByteArrayDeserializer())) {
            List<TopicPartition> parts = c.partitionsFor(topics.suggestions().name(), WAIT).stream()
                    .map(i -> new TopicPartition(i.topic(), i.partition())).toList();
            c.assign(parts);
            c.seekToBeginning(parts);
            while (!stop.get()) {
                for (ConsumerRecord<String, byte[]> r : c.poll(Duration.ofMillis(100))) {
                    Suggestions s = topics.suggestions().valueSerde().deserializer().deserialize(r.topic(), r.value());
                    if (s != null && s.causedByEventId() != null) {
                        versionByEvent.put(s.causedByEventId(), String.valueOf(s.modelVersion()));
                    }
                }
            }
        }
    }

    private static KafkaProducer<String, byte[]> producer(String bootstrap) {
        Properties p = new Properties();
        p.put(ProducerConfig.BOOTSTRAP_SERVERS_CONFIG, bootstrap);
        p.put(ProducerConfig.LINGER_MS_CONFIG, "0");
        return new KafkaProducer<>(p, new StringSerializer(), new ByteArraySerializer());
    }
}
