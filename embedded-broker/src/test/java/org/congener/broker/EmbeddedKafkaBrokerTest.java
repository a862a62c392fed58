package org.congener.broker;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.net.InetAddress;
import java.net.ServerSocket;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Properties;

import org.apache.kafka.clients.admin.Admin;
import org.apache.kafka.clients.admin.AdminClientConfig;
import org.apache.kafka.clients.admin.NewTopic;
import org.apache.kafka.clients.consumer.ConsumerConfig;
import org.apache.kafka.clients.consumer.ConsumerRecord;
import org.apache.kafka.clients.consumer.KafkaConsumer;
import org.apache.kafka.clients.producer.KafkaProducer;
import org.apache.kafka.clients.producer.ProducerConfig;
import org.apache.kafka.clients.producer.ProducerRecord;
import org.apache.kafka.common.TopicPartition;
import org.apache.kafka.common.serialization.StringDeserializer;
import org.apache.kafka.common.serialization.StringSerializer;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;

@ExtendWith(SharedBroker.class)
class EmbeddedKafkaBrokerTest {

    @Test
    void shouldReturnProducedRecordsWhenConsumedFromTheSharedBroker() throws Exception {
        String topic = SharedBroker.uniquePrefix("round-trip") + "values";
        createTopic(SharedBroker.bootstrapServers(), topic);
        produce(SharedBroker.bootstrapServers(), topic, List.of("a", "b", "c"));

        assertEquals(List.of("a", "b", "c"), consumeAll(SharedBroker.bootstrapServers(), topic, 3));
    }

    @Test
    void shouldKeepRecordsWhenRestartedOnTheSameFolder(@TempDir Path dir) throws Exception {
        Path data = dir.resolve("broker");
        try (EmbeddedKafkaBroker first = EmbeddedKafkaBroker.builder().dataDir(data).start()) {
            createTopic(first.bootstrapServers(), "kept");
            produce(first.bootstrapServers(), "kept", List.of("one", "two"));
        }
        assertTrue(Files.isDirectory(data), "a folder the caller named survives close");

        try (EmbeddedKafkaBroker second = EmbeddedKafkaBroker.builder().dataDir(data).start()) {
            assertEquals(List.of("one", "two"), consumeAll(second.bootstrapServers(), "kept", 2));
        }
    }

    @Test
    void shouldNamePortInOneLineWhenPortIsTaken() throws Exception {
        try (ServerSocket squatter = new ServerSocket(0, 1, InetAddress.getByName("127.0.0.1"))) {
            int port = squatter.getLocalPort();
            BrokerStartException e = assertThrows(BrokerStartException.class,
                    () -> EmbeddedKafkaBroker.builder().port(port).start());
            assertTrue(e.getMessage().contains("port " + port), e.getMessage());
            assertTrue(e.getMessage().contains("already in use"), e.getMessage());
            assertFalse(e.getMessage().contains("\n"), "one line");
        }
    }

    @Test
    void shouldDeleteTempFolderWhenClosed() {
        EmbeddedKafkaBroker broker = EmbeddedKafkaBroker.start();
        Path data = broker.dataDir();
        assertTrue(Files.isDirectory(data));
        assertNotEquals(broker.port(), broker.controllerPort());
        broker.close();
        broker.close();
        assertFalse(Files.exists(data), "temp folder removed");
    }

    static void createTopic(String bootstrap, String topic) throws Exception {
        try (Admin admin = Admin.create(Map.of(AdminClientConfig.BOOTSTRAP_SERVERS_CONFIG, bootstrap))) {
            admin.createTopics(List.of(new NewTopic(topic, 1, (short) 1))).all().get();
        }
    }

    static void produce(String bootstrap, String topic, List<String> values) throws Exception {
        Properties p = new Properties();
        p.put(ProducerConfig.BOOTSTRAP_SERVERS_CONFIG, bootstrap);
        try (KafkaProducer<String, String> producer =
                     new KafkaProducer<>(p, new StringSerializer(), new StringSerializer())) {
            for (String value : values) {
                producer.send(new ProducerRecord<>(topic, value, value)).get();
            }
        }
    }

    static List<String> consumeAll(String bootstrap, String topic, int expected) {
        Properties p = new Properties();
        p.put(ConsumerConfig.BOOTSTRAP_SERVERS_CONFIG, bootstrap);
        List<String> values = new ArrayList<>();
        try (KafkaConsumer<String, String> consumer =
                     new KafkaConsumer<>(p, new StringDeserializer(), new StringDeserializer())) {
            TopicPartition partition = new TopicPartition(topic, 0);
            consumer.assign(List.of(partition));
            consumer.seekToBeginning(List.of(partition));
            long deadline = System.nanoTime() + Duration.ofSeconds(30).toNanos();
            while (values.size() < expected && System.nanoTime() < deadline) {
                for (ConsumerRecord<String, String> record : consumer.poll(Duration.ofMillis(200))) {
                    values.add(record.value());
                }
            }
        }
        return values;
    }
}
