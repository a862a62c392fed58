package org.congener.bench.streams;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Properties;
import java.util.SplittableRandom;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicBoolean;

import org.apache.kafka.clients.consumer.ConsumerConfig;
import org.apache.kafka.clients.consumer.ConsumerRecord;
import org.apache.kafka.clients.consumer.KafkaConsumer;
import org.apache.kafka.clients.producer.KafkaProducer;
import org.apache.kafka.clients.producer.ProducerConfig;
import org.apache.kafka.clients.producer.ProducerRecord;
import org.apache.kafka.common.TopicPartition;
import org.apache.kafka.common.serialization.StringDeserializer;
import org.apache.kafka.common.serialization.StringSerializer;
import org.congener.broker.EmbeddedKafkaBroker;
import org.congener.broker.TopicAdmin;
import org.congener.core.factorisation.AlsConfig;
import org.congener.core.factorisation.FactorMatrix;
import org.congener.core.factorisation.FixedFactors;
import org.congener.core.fusion.FusionSettings;
import org.congener.core.fusion.ManifestSettings;
import org.congener.core.interactions.InteractionWeights;
import org.congener.schemas.CatalogEntry;
import org.congener.schemas.ItemFactors;
import org.congener.schemas.ItemNeighbours;
import org.congener.schemas.ModelManifest;
import org.congener.schemas.Neighbour;
import org.congener.schemas.Researcher;
import org.congener.schemas.SchemaIds;
import org.congener.schemas.Suggestions;
import org.congener.schemas.TopicName;
import org.congener.schemas.Topics;
import org.congener.schemas.UsageEvent;
import org.congener.schemas.UsageKind;
import org.congener.streams.StreamsApp;
import org.congener.streams.config.AppConfig;

/**
 * Events through a real embedded broker and the real streams app under a published model version:
 * paced at a given rate, latency from event produced to its suggestion list read committed, then an
 * unpaced burst for the sustained rate. Researchers and compounds are drawn with Zipf skew (a few
 * heavy users, a long tail).
 *
 * <p>Arguments: compounds rank researchers rate(events/s) seconds burstEvents.
 */
public final class StreamsEndToEnd {

    private static final int NEIGHBOURS = 20;

    private StreamsEndToEnd() {
    }

    public static void main(String[] args) throws Exception {
        int compounds = args.length > 0 ? Integer.parseInt(args[0]) : 10_000;
        int rank = args.length > 1 ? Integer.parseInt(args[1]) : 64;
        int researchers = args.length > 2 ? Integer.parseInt(args[2]) : 100_000;
        int rate = args.length > 3 ? Integer.parseInt(args[3]) : 1_000;
        int seconds = args.length > 4 ? Integer.parseInt(args[4]) : 30;
        int burst = args.length > 5 ? Integer.parseInt(args[5]) : 20_000;
        System.out.printf("compounds %d, rank %d, researchers %d, paced %d events/s for %d s, burst %d%n",
                compounds, rank, researchers, rate, seconds, burst);

        Path dir = Files.createTempDirectory("congener-e2e");
        try (EmbeddedKafkaBroker broker = EmbeddedKafkaBroker.builder().dataDir(dir.resolve("broker")).port(0).start()) {
            String bootstrap = broker.bootstrapServers();
            String prefix = "e2e.";
            TopicAdmin.createAll(bootstrap, prefix, 2, (short) 1);
            Topics topics = new Topics(prefix);
            long t0 = System.nanoTime();
            publishWorld(bootstrap, topics, compounds, rank, researchers);
            System.out.printf("catalogue, researchers and model v0001 published in %.1f s%n", (System.nanoTime() - t0) / 1e9);

            AppConfig config = AppConfig.defaults().with(Map.of(
                    AppConfig.BOOTSTRAP_SERVERS, bootstrap,
                    AppConfig.TOPIC_PREFIX, prefix,
                    AppConfig.APPLICATION_ID, "e2e-bench",
                    AppConfig.STATE_DIR, dir.resolve("state").toString(),
                    AppConfig.HTTP_PORT, "0"));
            try (StreamsApp app = StreamsApp.start(config)) {
                if (!app.awaitRunning(Duration.ofMinutes(3))) {
                    throw new IllegalStateException("streams app did not reach RUNNING");
                }
                Thread.sleep(2_000);
                Map<String, Long> producedAt = new ConcurrentHashMap<>();
                List<Long> latenciesNs = java.util.Collections.synchronizedList(new ArrayList<>());
                AtomicBoolean stop = new AtomicBoolean();
                Thread reader = new Thread(() -> readSuggestions(bootstrap, topics, producedAt, latenciesNs, stop));
                reader.start();

                Zipf users = new Zipf(researchers, 1.0);
                Zipf items = new Zipf(compounds, 0.9);
                SplittableRandom random = new SplittableRandom(11);
                int paced = rate * seconds;
                try (KafkaProducer<String, String> producer = producer(bootstrap)) {
                    long start = System.nanoTime();
                    for (int e = 0; e < paced; e++) {
                        long due = start + (long) (e * 1e9 / rate);
                        while (System.nanoTime() < due) {
                            Thread.onSpinWait();
                        }
                        send(producer, topics, "p" + e, users.next(random), items.next(random), random, producedAt);
                    }
                    producer.flush();
                }
                awaitCount(latenciesNs, paced, Duration.ofSeconds(120));
                List<Long> measured = new ArrayList<>(latenciesNs.subList(paced / 5, Math.min(paced, latenciesNs.size())));
                report("paced at " + rate + " events/s (first fifth left out as warm-up)", measured);

                latenciesNs.clear();
                long burstStart = System.nanoTime();
                try (KafkaProducer<String, String> producer = producer(bootstrap)) {
                    for (int e = 0; e < burst; e++) {
                        send(producer, topics, "b" + e, users.next(random), items.next(random), random, producedAt);
                    }
                    producer.flush();
                }
                awaitCount(latenciesNs, burst, Duration.ofMinutes(10));
                double secs = (System.nanoTime() - burstStart) / 1e9;
                System.out.printf("sustained: %d events in %.1f s = %.0f events/s (%d lists seen)%n",
                        burst, secs, latenciesNs.size() / secs, latenciesNs.size());
                stop.set(true);
                reader.join();
                System.out.printf("state dir after the run: %.1f MB%n", sizeMb(dir.resolve("state")));
            }
        }
    }

    private static void send(KafkaProducer<String, String> producer, Topics topics, String id, int user, int item,
                             SplittableRandom random, Map<String, Long> producedAt) {
        UsageKind kind = UsageKind.values()[random.nextInt(UsageKind.values().length)];
        String researcher = researcherId(user);
        UsageEvent event = new UsageEvent(SchemaIds.USAGE_EVENT, id, researcher, compoundId(item), kind,
                kind == UsageKind.VIEW ? 0 : 1 + random.nextInt(50), "g", Instant.now().toString());
        String json = new String(topics.usageEvents().valueSerde().serializer().serialize("", event), StandardCharsets.UTF_8);
        producedAt.put(id, System.nanoTime());
        producer.send(new ProducerRecord<>(topics.usageEvents().name(), researcher, json));
    }

    private static void readSuggestions(String bootstrap, Topics topics, Map<String, Long> producedAt,
                                        List<Long> latencies, AtomicBoolean stop) {
        Properties p = new Properties();
        p.put(ConsumerConfig.BOOTSTRAP_SERVERS_CONFIG, bootstrap);
        p.put(ConsumerConfig.ISOLATION_LEVEL_CONFIG, "read_committed");
        p.put(ConsumerConfig.FETCH_MAX_WAIT_MS_CONFIG, 5);
        String topic = topics.suggestions().name();
        // lists are read as text and only their causing event id is looked at: no schema check in the timing loop
        try (KafkaConsumer<String, String> consumer = new KafkaConsumer<>(p, new StringDeserializer(), new StringDeserializer())) {
            List<TopicPartition> parts = consumer.partitionsFor(topic).stream()
                    .map(i -> new TopicPartition(topic, i.partition())).toList();
            consumer.assign(parts);
            consumer.seekToEnd(parts);
            while (!stop.get()) {
                for (ConsumerRecord<String, String> r : consumer.poll(Duration.ofMillis(20))) {
                    long now = System.nanoTime();
                    String cause = causedBy(r.value());
                    Long at = cause == null ? null : producedAt.remove(cause);
                    if (at != null) {
                        latencies.add(now - at);
                    }
                }
            }
        }
    }

    private static String causedBy(String json) {
        String tag = "\"causedByEventId\"";
        int i = json.indexOf(tag);
        if (i < 0) {
            return null;
        }
        int q1 = json.indexOf('"', json.indexOf(':', i + tag.length()) + 1);
        int q2 = json.indexOf('"', q1 + 1);
        return json.substring(q1 + 1, q2);
    }

    private static void awaitCount(List<Long> list, int expected, Duration timeout) throws InterruptedException {
        long deadline = System.nanoTime() + timeout.toNanos();
        while (list.size() < expected && System.nanoTime() < deadline) {
            Thread.sleep(50);
        }
    }

    private static void report(String what, List<Long> ns) {
        long[] v = ns.stream().mapToLong(Long::longValue).sorted().toArray();
        if (v.length == 0) {
            System.out.println(what + ": no lists seen");
            return;
        }
        System.out.printf("%s: %d lists, latency p50 %.1f ms, p99 %.1f ms, max %.1f ms%n", what, v.length,
                v[v.length / 2] / 1e6, v[(int) Math.min(v.length - 1, Math.round(v.length * 0.99))] / 1e6,
                v[v.length - 1] / 1e6);
    }

    private static void publishWorld(String bootstrap, Topics topics, int compounds, int rank, int researchers) {
        SplittableRandom random = new SplittableRandom(5);
        try (KafkaProducer<String, String> producer = producer(bootstrap)) {
            for (int c = 0; c < compounds; c++) {
                CatalogEntry entry = new CatalogEntry(SchemaIds.CATALOG_ENTRY, compoundId(c), "compound " + c,
                        List.of("T:" + c), c % 50 == 0 ? List.of("controlled") : List.of(), List.of("H225"), true);
                producer.send(new ProducerRecord<>(topics.catalog().name(), entry.compoundId(),
                        text(topics.catalog().valueSerde().serializer().serialize("", entry))));
            }
            for (int r = 0; r < researchers; r++) {
                Researcher researcher = new Researcher(SchemaIds.RESEARCHER, researcherId(r), "Researcher " + r,
                        "g" + (r / 20), r % 3 == 0 ? List.of("controlled") : List.of(), true);
                producer.send(new ProducerRecord<>(topics.researchers().name(), researcher.researcherId(),
                        text(topics.researchers().valueSerde().serializer().serialize("", researcher))));
            }
        }
        FactorMatrix y = FactorMatrix.random(compounds, rank, 3L);
        Properties p = new Properties();
        p.put(ProducerConfig.BOOTSTRAP_SERVERS_CONFIG, bootstrap);
        p.put(ProducerConfig.TRANSACTIONAL_ID_CONFIG, "e2e-publisher");
        p.put(ProducerConfig.LINGER_MS_CONFIG, 20);
        try (KafkaProducer<String, String> producer = new KafkaProducer<>(p, new StringSerializer(), new StringSerializer())) {
            producer.initTransactions();
            producer.beginTransaction();
            FactorMatrix published = new FactorMatrix(compounds, rank);
            java.security.MessageDigest sha = sha256();
            for (int c = 0; c < compounds; c++) {
                float[] f = new float[rank];
                for (int k = 0; k < rank; k++) {
                    f[k] = (float) y.get(c, k);
                    published.data()[published.offset(c) + k] = f[k];
                }
                ItemFactors factors = new ItemFactors(SchemaIds.ITEM_FACTORS, "v0001", compoundId(c), f);
                byte[] factorJson = topics.modelItemFactors().valueSerde().serializer().serialize("", factors);
                sha.update(factorJson);
                producer.send(new ProducerRecord<>(topics.modelItemFactors().name(), "v0001/" + compoundId(c),
                        text(factorJson)));
                List<Neighbour> list = new ArrayList<>(NEIGHBOURS);
                double sim = 0.95;
                for (int t = 0; t < NEIGHBOURS; t++) {
                    int other = (c + 1 + random.nextInt(compounds - 1)) % compounds;
                    list.add(new Neighbour(compoundId(other), sim));
                    sim *= 0.97;
                }
                ItemNeighbours neighbours = new ItemNeighbours(SchemaIds.ITEM_NEIGHBOURS, "v0001", compoundId(c), "lin",
                        dedupe(list));
                producer.send(new ProducerRecord<>(topics.itemNeighbours().name(), "v0001/" + compoundId(c),
                        text(topics.itemNeighbours().valueSerde().serializer().serialize("", neighbours))));
            }
            double[] gram = FixedFactors.of(published).gram();
            List<Double> gramList = Arrays.stream(gram).boxed().toList();
            AlsConfig als = AlsConfig.defaults().withRank(rank);
            ModelManifest manifest = new ModelManifest(SchemaIds.MODEL_MANIFEST, "v0001", Instant.now().toString(), rank,
                    als.lambda(), als.alpha(), compounds, compounds, gramList, FusionSettings.blend(0.5).rule(),
                    ManifestSettings.write(FusionSettings.blend(0.5), als, InteractionWeights.defaults()),
                    Map.of(), java.util.HexFormat.of().formatHex(sha.digest()));
            String json = text(topics.modelManifests().valueSerde().serializer().serialize("", manifest));
            producer.send(new ProducerRecord<>(topics.modelManifests().name(), "v0001", json));
            producer.send(new ProducerRecord<>(topics.modelManifests().name(), "current", json));
            producer.commitTransaction();
        }
    }

    private static java.security.MessageDigest sha256() {
        try {
            return java.security.MessageDigest.getInstance("SHA-256");
        } catch (java.security.NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }

    private static List<Neighbour> dedupe(List<Neighbour> list) {
        java.util.LinkedHashMap<String, Neighbour> byId = new java.util.LinkedHashMap<>();
        for (Neighbour n : list) {
            byId.putIfAbsent(n.compoundId(), n);
        }
        return new ArrayList<>(byId.values());
    }

    static String compoundId(int c) {
        return String.format("C%05d", c);
    }

    static String researcherId(int r) {
        return String.format("R%06d", r);
    }

    private static KafkaProducer<String, String> producer(String bootstrap) {
        Properties p = new Properties();
        p.put(ProducerConfig.BOOTSTRAP_SERVERS_CONFIG, bootstrap);
        p.put(ProducerConfig.LINGER_MS_CONFIG, 1);
        return new KafkaProducer<>(p, new StringSerializer(), new StringSerializer());
    }

    private static String text(byte[] bytes) {
        return new String(bytes, StandardCharsets.UTF_8);
    }

    private static double sizeMb(Path dir) throws java.io.IOException {
        try (var files = Files.walk(dir)) {
            return files.filter(Files::isRegularFile).mapToLong(f -> f.toFile().length()).sum() / 1e6;
        }
    }

    /** Zipf-distributed ranks 0..n−1 by inverse CDF over precomputed cumulative weights 1/(r+1)^s. */
    static final class Zipf {
        private final double[] cdf;

        Zipf(int n, double s) {
            cdf = new double[n];
            double sum = 0;
            for (int r = 0; r < n; r++) {
                sum += 1.0 / Math.pow(r + 1, s);
                cdf[r] = sum;
            }
            for (int r = 0; r < n; r++) {
                cdf[r] /= sum;
            }
        }

        int next(SplittableRandom random) {
            int i = Arrays.binarySearch(cdf, random.nextDouble());
            return Math.min(cdf.length - 1, i >= 0 ? i : -i - 1);
        }
    }
}
