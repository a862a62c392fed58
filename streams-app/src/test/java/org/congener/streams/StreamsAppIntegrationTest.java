package org.congener.streams;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Properties;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.apache.kafka.clients.admin.Admin;
import org.apache.kafka.clients.admin.AdminClientConfig;
import org.apache.kafka.clients.consumer.ConsumerConfig;
import org.apache.kafka.clients.consumer.ConsumerRecord;
import org.apache.kafka.clients.consumer.KafkaConsumer;
import org.apache.kafka.clients.producer.KafkaProducer;
import org.apache.kafka.clients.producer.ProducerConfig;
import org.apache.kafka.clients.producer.ProducerRecord;
import org.apache.kafka.common.TopicPartition;
import org.apache.kafka.common.serialization.Deserializer;
import org.apache.kafka.common.serialization.StringDeserializer;
import org.apache.kafka.common.serialization.StringSerializer;
import org.congener.broker.SharedBroker;
import org.congener.broker.TopicAdmin;
import org.congener.schemas.DeadLetter;
import org.congener.schemas.Suggestions;
import org.congener.schemas.TopicName;
import org.congener.schemas.UsageEvent;
import org.congener.schemas.UsageKind;
import org.congener.streams.config.AppConfig;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;

/** The real topology on the shared embedded broker, with RocksDB state and the HTTP query API. */
@ExtendWith(SharedBroker.class)
class StreamsAppIntegrationTest {

    private static final Duration WAIT = Duration.ofSeconds(60);
    private final HttpClient http = HttpClient.newHttpClient();
    private final ObjectMapper json = new ObjectMapper();

    @TempDir
    Path stateDir;

    @Test
    void shouldPublishSuggestionsDeadLettersAndServeThemWhenEventsFlowThroughBroker() throws Exception {
        String prefix = SharedBroker.uniquePrefix("streams-app");
        String bootstrap = SharedBroker.bootstrapServers();
        prepareTopics(bootstrap, prefix);
        AppConfig config = config(bootstrap, prefix, SharedBroker.uniqueApplicationId("streams-app"),
                stateDir.resolve("only"));
        try (StreamsApp app = StreamsApp.start(config)) {
            assertTrue(app.awaitRunning(WAIT), "streams app reached RUNNING");

            // an unreadable catalogue record arriving while the app runs is skipped; the app carries on
            try (KafkaProducer<String, String> producer = producer(bootstrap)) {
                producer.send(new ProducerRecord<>(prefix + "catalog", "c-broken", "{\"schema\": 42"));
            }
            List<UsageEvent> good = List.of(
                    Fixtures.event("g1", "ben", "c-acetone", UsageKind.ORDER, "2026-01-02T10:00:00Z"),
                    Fixtures.event("g2", "ben", "c-toluene", UsageKind.ORDER, "2026-01-02T11:00:00Z"),
                    Fixtures.event("g3", "ada", "c-ethanol", UsageKind.ORDER, "2026-01-03T10:00:00Z"),
                    Fixtures.event("g4", "dee", "c-ethanol", UsageKind.VIEW, "2026-01-03T11:00:00Z"));
            try (KafkaProducer<String, String> producer = producer(bootstrap)) {
                String topic = TopicName.USAGE_EVENTS.withPrefix(prefix);
                producer.send(new ProducerRecord<>(topic, "ben", Fixtures.json(good.get(0))));
                producer.send(new ProducerRecord<>(topic, "ben", Fixtures.json(good.get(1))));
                producer.send(new ProducerRecord<>(topic, "ada", "this is not JSON"));
                producer.send(new ProducerRecord<>(topic, "ada", Fixtures.json(good.get(2))));
                producer.send(new ProducerRecord<>(topic, "dee", Fixtures.json(good.get(3))));
                producer.flush();
            }

            List<Suggestions> out = readAll(bootstrap, TopicName.SUGGESTIONS.withPrefix(prefix),
                    Fixtures.TOPICS.suggestions().valueSerde().deserializer(), 4);
            assertEquals(List.of("g1", "g2", "g3", "g4"),
                    out.stream().map(Suggestions::causedByEventId).sorted().toList());
            Suggestions forAda = out.stream().filter(s -> s.researcherId().equals("ada")).findFirst().orElseThrow();
            assertEquals(List.of("c-acetone", "c-toluene"),
                    forAda.items().stream().map(i -> i.compoundId()).sorted().toList());

            List<DeadLetter> letters = readAll(bootstrap, TopicName.DEAD_LETTERS.withPrefix(prefix),
                    Fixtures.TOPICS.deadLetters().valueSerde().deserializer(), 1);
            assertEquals(1, letters.size());
            assertEquals("this is not JSON", letters.get(0).payload());
            assertEquals(TopicName.USAGE_EVENTS.withPrefix(prefix), letters.get(0).sourceTopic());
            assertTrue(letters.get(0).offset() >= 0);

            JsonNode body = awaitOk(app.baseUrl() + "/researchers/ada/suggestions?n=1");
            assertEquals("ada", body.get("researcherId").asText());
            assertEquals(1, body.get("items").size());
            assertEquals(SafetyCaution.TEXT, body.get("caution").asText());

            HttpResponse<String> unknown = get(app.baseUrl() + "/researchers/zed/suggestions");
            assertEquals(404, unknown.statusCode());
            assertTrue(unknown.body().contains("unknown researcher 'zed'"));
            assertTrue(unknown.body().contains("safety data sheet"));

            HttpResponse<String> bad = get(app.baseUrl() + "/researchers/ada/suggestions?n=lots");
            assertEquals(400, bad.statusCode());
            assertTrue(bad.body().contains("n must be a whole number from 1 to 3"));
            assertTrue(bad.body().contains("safety data sheet"));

            HttpResponse<String> health = get(app.baseUrl() + "/health");
            assertEquals(200, health.statusCode());
            JsonNode healthBody = json.readTree(health.body());
            assertEquals("RUNNING", healthBody.get("status").asText());
            assertEquals(1, healthBody.get("deadLetters").asLong());
            assertEquals(1, app.deadLetterCount());
        }
    }

    @Test
    void shouldAnswerForEveryResearcherOnEitherInstanceWhenTwoInstancesShareTheWork() throws Exception {
        String prefix = SharedBroker.uniquePrefix("two-instances");
        String bootstrap = SharedBroker.bootstrapServers();
        prepareTopics(bootstrap, prefix);
        String applicationId = SharedBroker.uniqueApplicationId("two-instances");
        try (StreamsApp first = StreamsApp.start(config(bootstrap, prefix, applicationId, stateDir.resolve("a")));
             StreamsApp second = StreamsApp.start(config(bootstrap, prefix, applicationId, stateDir.resolve("b")))) {
            assertTrue(first.awaitRunning(WAIT) && second.awaitRunning(WAIT), "both instances running");
            List<String> researchers = List.of("ada", "ben", "cyd", "dee");
            try (KafkaProducer<String, String> producer = producer(bootstrap)) {
                int n = 0;
                for (String researcher : researchers) {
                    UsageEvent event = Fixtures.event("t" + (++n), researcher, "c-ethanol", UsageKind.ORDER,
                            "2026-01-0" + n + "T10:00:00Z");
                    producer.send(new ProducerRecord<>(TopicName.USAGE_EVENTS.withPrefix(prefix), researcher,
                            Fixtures.json(event)));
                }
            }
            assertEquals(4, readAll(bootstrap, TopicName.SUGGESTIONS.withPrefix(prefix),
                    Fixtures.TOPICS.suggestions().valueSerde().deserializer(), 4).size());

            // each list lives on one instance, so the other one must forward the query to it
            for (StreamsApp app : List.of(first, second)) {
                for (String researcher : researchers) {
                    JsonNode body = awaitOk(app.baseUrl() + "/researchers/" + researcher + "/suggestions");
                    assertEquals(researcher, body.get("researcherId").asText());
                    assertEquals(SafetyCaution.TEXT, body.get("caution").asText());
                }
            }
        }
    }

    @Test
    void shouldStreamTheBatchTopNUnderAPublishedVersionAndNeverBreakAnAuthorisation() throws Exception {
        String prefix = SharedBroker.uniquePrefix("live-model");
        String bootstrap = SharedBroker.bootstrapServers();
        prepareTopics(bootstrap, prefix);
        List<String> compounds = List.of("c-acetone", "c-ethanol", "c-precursor", "c-retired", "c-toluene");
        ModelVersions.Version v1 = ModelVersions.train("v0001", compounds, List.of(
                        new ModelVersions.Use("u1", "c-ethanol", 2), new ModelVersions.Use("u1", "c-acetone", 1),
                        new ModelVersions.Use("u2", "c-toluene", 2), new ModelVersions.Use("u2", "c-precursor", 1),
                        new ModelVersions.Use("u3", "c-precursor", 1), new ModelVersions.Use("u3", "c-ethanol", 1)),
                Map.of("c-ethanol", ModelVersions.list("c-precursor", 0.6, "c-acetone", 0.5),
                        "c-acetone", ModelVersions.list("c-ethanol", 0.5, "c-toluene", 0.2),
                        "c-toluene", ModelVersions.list("c-precursor", 0.4),
                        "c-precursor", ModelVersions.list("c-ethanol", 0.6, "c-toluene", 0.4)),
                org.congener.core.fusion.FusionSettings.blend(0.5), 2, 5L);
        publishTransactionally(bootstrap, prefix, v1);

        String[][] script = {
                {"ada", "c-ethanol", "ORDER"}, {"cyd", "c-ethanol", "ORDER"}, {"ben", "c-toluene", "WITHDRAWAL"},
                {"cyd", "c-toluene", "VIEW"}, {"ada", "c-toluene", "USAGE_LOG"}, {"dee", "c-acetone", "ORDER"},
                {"cyd", "c-acetone", "ORDER"}, {"ben", "c-ethanol", "ORDER"}, {"ada", "c-acetone", "VIEW"}};
        try (StreamsApp app = StreamsApp.start(config(bootstrap, prefix, SharedBroker.uniqueApplicationId("live-model"),
                stateDir.resolve("live")))) {
            assertTrue(app.awaitRunning(WAIT), "streams app reached RUNNING");
            try (KafkaProducer<String, String> producer = producer(bootstrap)) {
                for (int i = 0; i < script.length; i++) {
                    UsageEvent event = Fixtures.event("m" + i, script[i][0], script[i][1], UsageKind.valueOf(script[i][2]),
                            "2026-01-05T10:00:0" + i + "Z");
                    producer.send(new ProducerRecord<>(TopicName.USAGE_EVENTS.withPrefix(prefix), script[i][0],
                            Fixtures.json(event)));
                }
            }
            List<Suggestions> out = readAll(bootstrap, TopicName.SUGGESTIONS.withPrefix(prefix),
                    Fixtures.TOPICS.suggestions().valueSerde().deserializer(), script.length);
            assertEquals(script.length, out.size());

            org.congener.streams.model.LiveModel model = org.congener.streams.model.LiveModel.assemble(
                    v1.manifest(), v1.factors(), v1.neighbours());
            Map<String, org.congener.schemas.Researcher> researchers = new java.util.HashMap<>();
            Fixtures.researchers().forEach(r -> researchers.put(r.researcherId(), r));
            Map<String, org.congener.schemas.CatalogEntry> catalog = new java.util.HashMap<>();
            Fixtures.catalog().forEach(c -> catalog.put(c.compoundId(), c));
            for (Suggestions s : out) {
                assertEquals("v0001", s.modelVersion());
                assertEquals(org.congener.schemas.SuggestionSource.HYBRID, s.source());
                for (var item : s.items()) {
                    assertTrue(researchers.get(s.researcherId()).authorisations()
                            .containsAll(catalog.get(item.compoundId()).restrictionTags()),
                            s.researcherId() + " got " + item.compoundId());
                }
            }
            for (String researcher : List.of("ada", "ben", "cyd", "dee")) {
                // the batch top-N from the same events, the same version and the same core code
                java.util.LinkedHashMap<String, Float> strengths = new java.util.LinkedHashMap<>();
                java.util.Set<String> used = new java.util.HashSet<>();
                String last = null;
                for (int i = 0; i < script.length; i++) {
                    if (script[i][0].equals(researcher)) {
                        UsageKind kind = UsageKind.valueOf(script[i][2]);
                        float w = (float) model.settings().weights().contribution(kind, kind == UsageKind.VIEW ? 0 : 1.0,
                                java.time.Instant.EPOCH, java.time.Instant.EPOCH);
                        strengths.merge(script[i][1], w, Float::sum);
                        if (kind != UsageKind.VIEW) {
                            used.add(script[i][1]);
                        }
                        last = "m" + i;
                    }
                }
                int[] items = strengths.keySet().stream().mapToInt(model::indexOf).toArray();
                double[] values = strengths.values().stream().mapToDouble(Float::doubleValue).toArray();
                var scores = org.congener.core.fusion.OneResearcherScoring.score(model.foldIn(), model.itemFactors(),
                        model.neighbours(), model.settings().fusion(), items, values);
                var who = researchers.get(researcher);
                int[] top = org.congener.core.fusion.OneResearcherScoring.topN(scores.fused(), 3, i -> {
                    var entry = catalog.get(model.compoundId(i));
                    return entry != null && entry.active() && who.authorisations().containsAll(entry.restrictionTags())
                            && !used.contains(entry.compoundId());
                });
                List<String> batch = java.util.Arrays.stream(top).mapToObj(model::compoundId).toList();
                String lastEvent = last;
                Suggestions streamed = out.stream().filter(s -> lastEvent.equals(s.causedByEventId())).findFirst().orElseThrow();
                assertEquals(batch, streamed.items().stream().map(i -> i.compoundId()).toList(), researcher);
            }

            // the alternatives of a compound name each one from the catalogue, over real HTTP
            HttpResponse<String> alternatives = http.send(HttpRequest.newBuilder(
                    URI.create(app.baseUrl() + "/compounds/c-ethanol/alternatives?n=3")).GET().build(),
                    HttpResponse.BodyHandlers.ofString());
            assertEquals(200, alternatives.statusCode(), alternatives.body());
            JsonNode byOntology = json.readTree(alternatives.body()).get("byOntology");
            assertEquals("c-precursor", byOntology.get(0).get("compoundId").asText());
            assertEquals(catalog.get("c-precursor").name(), byOntology.get(0).get("name").asText());
            assertFalse(byOntology.get(0).get("inStock").asBoolean(), "no inventory event was published");
            // nothing is in stock, so the in-stock view of a list is empty
            HttpResponse<String> inStock = http.send(HttpRequest.newBuilder(
                    URI.create(app.baseUrl() + "/researchers/ada/suggestions?inStock=true")).GET().build(),
                    HttpResponse.BodyHandlers.ofString());
            assertEquals(200, inStock.statusCode(), inStock.body());
            assertEquals(0, json.readTree(inStock.body()).get("items").size());
        }
    }

    /** One transaction, as the model-version contract says: factors, neighbours, manifest, current. */
    private static void publishTransactionally(String bootstrap, String prefix, ModelVersions.Version v) {
        Properties p = new Properties();
        p.put(ProducerConfig.BOOTSTRAP_SERVERS_CONFIG, bootstrap);
        p.put(ProducerConfig.TRANSACTIONAL_ID_CONFIG, prefix + "publisher");
        try (KafkaProducer<String, String> producer = new KafkaProducer<>(p, new StringSerializer(), new StringSerializer())) {
            producer.initTransactions();
            producer.beginTransaction();
            for (var f : v.factors()) {
                producer.send(new ProducerRecord<>(TopicName.MODEL_ITEM_FACTORS.withPrefix(prefix),
                        ModelVersions.Version.key(v.name(), f.compoundId()),
                        text(Fixtures.TOPICS.modelItemFactors().valueSerde().serializer().serialize("", f))));
            }
            for (var n : v.neighbours()) {
                producer.send(new ProducerRecord<>(TopicName.ITEM_NEIGHBOURS.withPrefix(prefix),
                        ModelVersions.Version.key(v.name(), n.compoundId()),
                        text(Fixtures.TOPICS.itemNeighbours().valueSerde().serializer().serialize("", n))));
            }
            String manifest = text(Fixtures.TOPICS.modelManifests().valueSerde().serializer().serialize("", v.manifest()));
            producer.send(new ProducerRecord<>(TopicName.MODEL_MANIFESTS.withPrefix(prefix), v.name(), manifest));
            producer.send(new ProducerRecord<>(TopicName.MODEL_MANIFESTS.withPrefix(prefix), "current", manifest));
            producer.commitTransaction();
        }
    }

    private static void prepareTopics(String bootstrap, String prefix) throws Exception {
        TopicAdmin.createAll(bootstrap, prefix, 2, (short) 1);
        try (KafkaProducer<String, String> producer = producer(bootstrap)) {
            for (var entry : Fixtures.catalog()) {
                producer.send(new ProducerRecord<>(prefix + "catalog", entry.compoundId(),
                        text(Fixtures.TOPICS.catalog().valueSerde().serializer().serialize("", entry))));
            }
            for (var researcher : Fixtures.researchers()) {
                producer.send(new ProducerRecord<>(prefix + "researchers", researcher.researcherId(),
                        text(Fixtures.TOPICS.researchers().valueSerde().serializer().serialize("", researcher))));
            }
            producer.flush();
        }
    }

    private static AppConfig config(String bootstrap, String prefix, String applicationId, Path stateDir) {
        return AppConfig.defaults().with(Map.of(
                AppConfig.BOOTSTRAP_SERVERS, bootstrap,
                AppConfig.TOPIC_PREFIX, prefix,
                AppConfig.APPLICATION_ID, applicationId,
                AppConfig.STATE_DIR, stateDir.toString(),
                AppConfig.HTTP_PORT, "0",
                AppConfig.TOP_N, "3"));
    }

    private JsonNode awaitOk(String url) throws Exception {
        long deadline = System.nanoTime() + WAIT.toNanos();
        HttpResponse<String> response = get(url);
        while (response.statusCode() != 200 && System.nanoTime() < deadline) {
            Thread.sleep(100);
            response = get(url);
        }
        assertEquals(200, response.statusCode(), response.body());
        return json.readTree(response.body());
    }

    private HttpResponse<String> get(String url) throws Exception {
        return http.send(HttpRequest.newBuilder(URI.create(url)).GET().build(), HttpResponse.BodyHandlers.ofString());
    }

    private static KafkaProducer<String, String> producer(String bootstrap) {
        Properties p = new Properties();
        p.put(ProducerConfig.BOOTSTRAP_SERVERS_CONFIG, bootstrap);
        return new KafkaProducer<>(p, new StringSerializer(), new StringSerializer());
    }

    private static String text(byte[] bytes) {
        return new String(bytes, java.nio.charset.StandardCharsets.UTF_8);
    }

    /** Reads every partition from the start with assign() (no consumer group) until {@code expected} values came. */
    static <V> List<V> readAll(String bootstrap, String topic, Deserializer<V> values, int expected) throws Exception {
        Properties p = new Properties();
        p.put(ConsumerConfig.BOOTSTRAP_SERVERS_CONFIG, bootstrap);
        p.put(ConsumerConfig.ISOLATION_LEVEL_CONFIG, "read_committed");
        List<V> out = new ArrayList<>();
        try (Admin admin = Admin.create(Map.of(AdminClientConfig.BOOTSTRAP_SERVERS_CONFIG, bootstrap));
             KafkaConsumer<String, V> consumer = new KafkaConsumer<>(p, new StringDeserializer(), values)) {
            int partitions = admin.describeTopics(List.of(topic)).allTopicNames().get().get(topic).partitions().size();
            List<TopicPartition> assigned = new ArrayList<>();
            for (int i = 0; i < partitions; i++) {
                assigned.add(new TopicPartition(topic, i));
            }
            consumer.assign(assigned);
            consumer.seekToBeginning(assigned);
            long deadline = System.nanoTime() + WAIT.toNanos();
            while (out.size() < expected && System.nanoTime() < deadline) {
                for (ConsumerRecord<String, V> record : consumer.poll(Duration.ofMillis(200))) {
                    out.add(record.value());
                }
            }
            // a little longer, so that an unexpected extra record would show
            for (ConsumerRecord<String, V> record : consumer.poll(Duration.ofMillis(500))) {
                out.add(record.value());
            }
        }
        return out;
    }
}
