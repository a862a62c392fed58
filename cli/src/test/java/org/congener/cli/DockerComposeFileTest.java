package org.congener.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import org.congener.schemas.TopicName;
import org.congener.streams.config.AppConfig;
import org.congener.streams.config.ConfigLoader;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.yaml.snakeyaml.Yaml;
import picocli.CommandLine;

/**
 * No Docker engine runs in the build, so the compose file is checked by reading it: the cluster, the
 * topic list, and the apps' command lines must agree with the code.
 */
class DockerComposeFileTest {

    private static final List<String> BROKERS = List.of("kafka-1", "kafka-2", "kafka-3");
    private static JsonNode services;

    @BeforeAll
    static void read() throws Exception {
        // SnakeYAML (the parser under jackson-dataformat-yaml) resolves anchors and merge keys (<<) as
        // docker compose does; Jackson's tree reader alone leaves "<<" as a plain key
        String text = Files.readString(Path.of("..", "docker-compose.yml"));
        new ObjectMapper(new YAMLFactory()).readTree(text);
        Object resolved = new Yaml().load(text);
        JsonNode root = new ObjectMapper().valueToTree(resolved);
        services = root.get("services");
    }

    @Test
    void shouldDeclareThreeCombinedKraftBrokersOfTheBuildsKafkaVersion() throws Exception {
        String kafkaVersion = kafkaVersionOfTheBuild();
        Set<String> nodeIds = new HashSet<>();
        for (String broker : BROKERS) {
            JsonNode service = services.get(broker);
            assertEquals("apache/kafka:" + kafkaVersion, service.get("image").asText(), broker);
            JsonNode env = service.get("environment");
            assertEquals("broker,controller", env.get("KAFKA_PROCESS_ROLES").asText(), broker);
            assertEquals("1@kafka-1:9093,2@kafka-2:9093,3@kafka-3:9093", env.get("KAFKA_CONTROLLER_QUORUM_VOTERS").asText());
            nodeIds.add(env.get("KAFKA_NODE_ID").asText());
            assertTrue(env.get("KAFKA_ADVERTISED_LISTENERS").asText().contains("PLAINTEXT://" + broker + ":9092"), broker);
            assertTrue(env.get("KAFKA_LISTENERS").asText().contains("CONTROLLER://:9093"), broker);
            int rf = env.get("KAFKA_TRANSACTION_STATE_LOG_REPLICATION_FACTOR").asInt();
            int minIsr = env.get("KAFKA_TRANSACTION_STATE_LOG_MIN_ISR").asInt();
            assertTrue(rf >= 2 && rf <= BROKERS.size() && minIsr < rf, "exactly-once needs a replicated transaction log");
            assertTrue(env.get("KAFKA_OFFSETS_TOPIC_REPLICATION_FACTOR").asInt() >= 2);
        }
        assertEquals(Set.of("1", "2", "3"), nodeIds);
    }

    @Test
    void shouldPublishEachHostPortOnceAndOnLoopbackOnly() {
        List<String> hostPorts = new ArrayList<>();
        services.fields().forEachRemaining(entry -> {
            JsonNode ports = entry.getValue().get("ports");
            if (ports != null) {
                ports.forEach(port -> {
                    String mapping = port.asText();
                    assertTrue(mapping.startsWith("127.0.0.1:"), entry.getKey() + " publishes " + mapping + " beyond loopback");
                    hostPorts.add(mapping.split(":")[1]);
                });
            }
        });
        assertEquals(hostPorts.size(), new HashSet<>(hostPorts).size(), "host ports clash: " + hostPorts);
        assertTrue(hostPorts.contains(String.valueOf(AppConfig.DEFAULT_HTTP_PORT)), "query API published");
    }

    @Test
    void shouldCreateExactlyTheTopicsOfTopicNameWithTheirCleanUpPolicy() {
        JsonNode env = services.get("topics").get("environment");
        Set<String> deleteTopics = words(env.get("DELETE_TOPICS").asText());
        Set<String> compactedTopics = words(env.get("COMPACTED_TOPICS").asText());
        Set<String> expectedDelete = new TreeSet<>();
        Set<String> expectedCompacted = new TreeSet<>();
        for (TopicName topic : TopicName.values()) {
            (topic.compacted() ? expectedCompacted : expectedDelete).add(topic.baseName());
        }
        assertEquals(expectedDelete, new TreeSet<>(deleteTopics));
        assertEquals(expectedCompacted, new TreeSet<>(compactedTopics));

        int replication = env.get("REPLICATION_FACTOR").asInt();
        assertTrue(replication >= 2 && replication <= BROKERS.size(), "replication " + replication);
        assertTrue(env.get("MIN_INSYNC_REPLICAS").asInt() < replication, "one broker may be down");
        assertEquals(AppConfig.DEFAULT_PARTITIONS, env.get("PARTITIONS").asInt());
        assertEquals(brokerList(), env.get("BOOTSTRAP_SERVERS").asText());
        String script = services.get("topics").get("command").get(0).asText();
        assertTrue(script.contains("$${CONGENER_TOPIC_PREFIX}$$1") || script.contains("${CONGENER_TOPIC_PREFIX}$1"),
                "topic names carry the prefix: " + script);
        assertTrue(script.contains("--if-not-exists"), "re-running is harmless");
    }

    @Test
    void shouldStartStreamsAppWithCommandLineTheCliAccepts() {
        JsonNode streams = services.get("streams");
        List<String> command = strings(streams.get("command"));
        assertEquals("streams", command.get(0));

        StreamsCommand parsed = new StreamsCommand();
        new CommandLine(parsed).parseArgs(command.subList(1, command.size()).toArray(String[]::new));
        Map<String, String> env = envOf(streams);
        AppConfig config = ConfigLoader.load(null, env, parsed.flags());

        assertEquals(Arrays.asList(brokerList().split(",")), config.bootstrapServers());
        assertEquals("exactly_once_v2", config.processingGuarantee());
        assertEquals(AppConfig.DEFAULT_APPLICATION_ID, config.applicationId());
        assertEquals(AppConfig.DEFAULT_HTTP_PORT, config.httpPort());
        assertEquals(AppConfig.DEFAULT_TOP_N, config.topN());
        if (config.httpHost().equals("0.0.0.0")) {
            assertEquals("streams:" + config.httpPort(), config.httpAdvertisedAddress(),
                    "other instances need a reachable address when the app listens on every interface");
        }
        assertEquals(services.get("topics").get("environment").get("CONGENER_TOPIC_PREFIX").asText(), config.topicPrefix());
        assertTrue(strings(streams.get("ports")).contains("127.0.0.1:" + config.httpPort() + ":" + config.httpPort()));
        assertEquals("service_completed_successfully",
                streams.get("depends_on").get("topics").get("condition").asText(), "topics exist before the app starts");
    }

    @Test
    void shouldRunTrainerFromTheSameImageAgainstTheSameCluster() {
        JsonNode train = services.get("train");
        List<String> command = strings(train.get("command"));
        assertEquals("train", command.get(0));
        int flag = command.indexOf("--bootstrap-servers");
        assertTrue(flag > 0, "trainer gets the cluster");
        assertEquals(brokerList(), command.get(flag + 1));
        assertEquals(services.get("streams").get("image").asText(), train.get("image").asText());
    }

    private static String brokerList() {
        return BROKERS.stream().map(b -> b + ":9092").collect(Collectors.joining(","));
    }

    private static Set<String> words(String text) {
        return new LinkedHashSet<>(Arrays.asList(text.trim().split("\\s+")));
    }

    private static List<String> strings(JsonNode array) {
        List<String> out = new ArrayList<>();
        array.forEach(node -> out.add(node.asText()));
        return out;
    }

    private static Map<String, String> envOf(JsonNode service) {
        Map<String, String> env = new java.util.HashMap<>();
        service.get("environment").fields().forEachRemaining(e -> env.put(e.getKey(), e.getValue().asText()));
        return env;
    }

    private static String kafkaVersionOfTheBuild() throws Exception {
        String pom = Files.readString(Path.of("..", "pom.xml"));
        Matcher m = Pattern.compile("<kafka.version>([^<]+)</kafka.version>").matcher(pom);
        assertTrue(m.find(), "parent pom declares kafka.version");
        return m.group(1);
    }
}
