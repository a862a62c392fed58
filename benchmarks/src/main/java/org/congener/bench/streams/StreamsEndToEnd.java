package org.congener.bench.streams;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
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
import org.congener.bench.factorisation.MultiplyAddRate;
import org.congener.bench.factorisation.PeakMultiplyAddRate;
import org.congener.core.factorisation.DenseKernels;
import org.congener.schemas.SuggestionSource;
import org.congener.streams.StreamsApp;
import org.congener.streams.SuggestionTopology;
import org.congener.streams.scoring.ScoredCandidate;
import org.congener.streams.scoring.ScoringInput;
import org.congener.streams.scoring.SuggestionScorer;
import org.congener.streams.state.InteractionProfile;
import org.congener.streams.state.InteractionProfileSerde;
import org.congener.streams.config.AppConfig;

/**
 * Events through a real embedded broker and the real streams app under a published model version, in
 * two or three runs on the same broker and world (catalogue, researchers, model version):
 * <ol>
 *   <li>the app as it ships: a warm-up burst (JIT, caches), then events paced at a given rate with the
 *       latency from event produced to its suggestion list read committed, then an unpaced burst whose
 *       events per second are the sustained rate; then the bytes of the interaction store per
 *       researcher;</li>
 *   <li>the platform's ceiling: the same topology, topics, serdes, stores, guarantee and threads with a
 *       scorer that offers nothing, under the same unpaced burst, run three times; the best is the
 *       ceiling;</li>
 *   <li>with {@code -Dceiling.full.lists=true}, the same with a scorer that returns lists of the app's
 *       size without computing them: what publishing and storing the lists costs on its own.</li>
 * </ol>
 * Then this machine's multiply-add rate, the multiply-adds the app's scoring does per event (counted
 * from the researchers' actual history sizes), and the ideal rate 1 / (1/ceiling + work/rate). Researchers
 * and compounds are drawn with Zipf skew (a few heavy users, a long tail).
 *
 * <p>Arguments: compounds rank researchers rate(events/s) seconds burstEvents. Any setting of the app
 * given as a system property of the same name (e.g. {@code -Dcommit.interval.ms=100}), and
 * {@code guarantee} for {@code processing.guarantee}, overrides the app's default for both runs;
 * {@code latency.series=FILE} writes the paced run's latencies in the order the events were produced.
 * Every run prints its commits' count and where a commit's time goes (producer flush, offsets,
 * transaction commit), and each burst the CPU per event of every thread of the JVM.
 * {@code broker.process=HEAP} runs the broker in a JVM of its own instead of this one.
 */
public final class StreamsEndToEnd {

    private static final int NEIGHBOURS = 20;
    private static final int WARM_UP_EVENTS = 3_000;
    /** Bursts of the pass-through run, the best of which is the ceiling. */
    private static final int CEILING_BURSTS = 3;
    /** Warm-up bursts at most, and the JIT share of a burst below which the JVM counts as warm. */
    private static final int MAX_WARM_UP_ROUNDS = 30;
    private static final double SETTLED_JIT_SHARE = 0.05;

    private StreamsEndToEnd() {
    }

    /** What one run of the pipeline gave. */
    record RunResult(double p50Ms, double p99Ms, double maxMs, int pacedLists, double sustainedPerSecond,
                     double storeBytesPerResearcher, long researchersStored) {
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
        // -Dbroker.process=HEAP runs the broker in a JVM of its own with that heap, as deployed; without it
        // the broker shares this JVM (the layout of the demo and of the earlier figures)
        String brokerHeap = System.getProperty("broker.process");
        System.out.println(brokerHeap == null ? "broker: in this JVM"
                : "broker: in a JVM of its own (heap " + brokerHeap + ")");
        try (EmbeddedKafkaBroker inThisJvm = brokerHeap == null
                ? EmbeddedKafkaBroker.builder().dataDir(dir.resolve("broker")).port(0).start() : null;
             BrokerProcess ofItsOwn = brokerHeap == null ? null : BrokerProcess.start(dir.resolve("broker"), brokerHeap)) {
            String bootstrap = inThisJvm != null ? inThisJvm.bootstrapServers() : ofItsOwn.bootstrapServers();
            Workload workload = new Workload(researchers, compounds, 0);
            RunResult app = run(bootstrap, dir, "e2e.", null, workload, compounds, rank, rate, seconds, burst);
            RunResult ceiling = run(bootstrap, dir, "e2e-ceiling.", new OffersNothing(), workload, compounds, rank,
                    0, 0, burst);
            // -Dceiling.full.lists=true: also the pass-through publishing lists of the app's size, to part
            // the gap between app and ceiling into publishing the lists and computing them
            RunResult fullLists = Boolean.getBoolean("ceiling.full.lists")
                    ? run(bootstrap, dir, "e2e-lists.", new ListsWithoutScoring(compounds), workload, compounds, rank,
                    0, 0, burst)
                    : null;
            // the ideal uses the core's peak rate (register FMA chains), the strictest yardstick; the rate
            // of length-64 dot products, the kernels' common shape, is printed beside it
            double fmaRate = PeakMultiplyAddRate.best(5);
            double dotRate = MultiplyAddRate.best(DenseKernels.best(), 1, 5);
            double work = workload.meanMultiplyAddsPerEvent(rank, compounds, NEIGHBOURS);
            double ideal = 1.0 / (1.0 / ceiling.sustainedPerSecond() + work / fmaRate);
            System.out.printf(Locale.ROOT, "%n== summary ==%n");
            System.out.printf(Locale.ROOT, "app: %.0f events/s sustained; paced at %d events/s p50 %.1f ms, p99 %.1f ms,"
                    + " max %.1f ms over %d lists%n", app.sustainedPerSecond(), rate, app.p50Ms(), app.p99Ms(),
                    app.maxMs(), app.pacedLists());
            System.out.printf(Locale.ROOT, "ceiling (same pipeline, scorer offers nothing): %.0f events/s%n",
                    ceiling.sustainedPerSecond());
            if (fullLists != null) {
                System.out.printf(Locale.ROOT, "same pipeline publishing lists of the app's size without scoring:"
                        + " %.0f events/s%n", fullLists.sustainedPerSecond());
            }
            System.out.printf(Locale.ROOT, "work per event: %.0f multiply-adds (mean history %.1f compounds);"
                    + " one core's peak rate %.2f G multiply-adds/s: %.1f µs (at the length-64 dot rate"
                    + " %.2f G/s: %.1f µs)%n", work, workload.meanHistory(), fmaRate / 1e9, work / fmaRate * 1e6,
                    dotRate / 1e9, work / dotRate * 1e6);
            System.out.printf(Locale.ROOT, "ideal 1/(1/ceiling + work/rate) = %.0f events/s; app reaches %.2f of it%n",
                    ideal, app.sustainedPerSecond() / ideal);
            // the same with the rate of the length-64 dot products, the yardstick of earlier figures
            double dotIdeal = 1.0 / (1.0 / ceiling.sustainedPerSecond() + work / dotRate);
            System.out.printf(Locale.ROOT, "  (at the length-64 dot rate instead of the peak: ideal %.0f events/s,"
                    + " app reaches %.2f of it)%n", dotIdeal, app.sustainedPerSecond() / dotIdeal);
            System.out.printf(Locale.ROOT, "interaction store: %.0f bytes per researcher over %d researchers%n",
                    app.storeBytesPerResearcher(), app.researchersStored());
            System.out.printf(Locale.ROOT, "broker and state dirs after the runs: %.1f MB%n", sizeMb(dir));
            printTopicBytes(dir.resolve("broker"));
        } finally {
            // gigabytes of logs and state per run: a benchmark left on a machine must not fill its disk
            deleteTree(dir);
        }
    }

    private static void deleteTree(Path dir) throws java.io.IOException {
        try (var paths = Files.walk(dir)) {
            for (Path p : paths.sorted(java.util.Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(p);
            }
        }
    }

    /** One pipeline run on its own topics; {@code scorer} null is the app as it ships. */
    private static RunResult run(String bootstrap, Path dir, String prefix, SuggestionScorer scorer,
                                 Workload workload, int compounds, int rank, int rate, int seconds, int burst)
            throws Exception {
        String label = scorer == null ? "app" : scorer instanceof ListsWithoutScoring ? "lists" : "ceiling";
        TopicAdmin.createAll(bootstrap, prefix, 2, (short) 1);
        Topics topics = new Topics(prefix);
        long t0 = System.nanoTime();
        // the researchers measured, and as many again for warm-up only, so that however long the JIT takes
        // to settle, the measured researchers' histories are those of the paced and burst events alone
        publishWorld(bootstrap, topics, compounds, rank, 2 * workload.researchers());
        Workload warmUpWorkload = new Workload(workload.researchers(), compounds, workload.researchers());
        System.out.printf("[%s] catalogue, researchers and model v0001 published in %.1f s%n", label,
                (System.nanoTime() - t0) / 1e9);

        Map<String, String> settings = new java.util.HashMap<>();
        // any setting of the app can be given as a system property of the same name, for both runs
        for (String name : AppConfig.DEFINITION.names()) {
            String value = System.getProperty(name);
            if (value != null) {
                settings.put(name, value);
            }
        }
        settings.put(AppConfig.PROCESSING_GUARANTEE, System.getProperty("guarantee",
                settings.getOrDefault(AppConfig.PROCESSING_GUARANTEE, "exactly_once_v2")));
        settings.putAll(Map.of(
                AppConfig.BOOTSTRAP_SERVERS, bootstrap,
                AppConfig.TOPIC_PREFIX, prefix,
                AppConfig.APPLICATION_ID, prefix + "bench",
                AppConfig.STATE_DIR, dir.resolve(prefix + "state").toString(),
                AppConfig.HTTP_PORT, "0"));
        AppConfig config = AppConfig.defaults().with(settings);
        try (StreamsApp app = StreamsApp.start(config, scorer)) {
            if (!app.awaitRunning(Duration.ofMinutes(3))) {
                throw new IllegalStateException("streams app did not reach RUNNING");
            }
            awaitLiveModel(app);
            Map<String, Long> producedAt = new ConcurrentHashMap<>();
            List<Long> latenciesNs = java.util.Collections.synchronizedList(new ArrayList<>());
            // each list's (produced, read) nanoTimes, for a series of the paced run (-Dlatency.series=FILE)
            List<long[]> series = java.util.Collections.synchronizedList(new ArrayList<>());
            AtomicBoolean stop = new AtomicBoolean();
            Thread reader = new Thread(() -> readSuggestions(bootstrap, topics, producedAt, latenciesNs, series, stop));
            // a failed run must not leave the JVM waiting on its reader
            reader.setDaemon(true);
            reader.start();
            Thread.sleep(1_000);
            SplittableRandom random = new SplittableRandom(scorer == null ? 11 : 12);

            // the broker shares this JVM: its code and the app's keep the JIT busy for tens of thousands of
            // events, so warm-up runs until compiling takes under 5 % of a burst, not for a fixed count
            for (int round = 1; round <= MAX_WARM_UP_ROUNDS; round++) {
                long jitBefore = jitMillis();
                long wallBefore = System.nanoTime();
                unpaced(bootstrap, topics, "w" + round + "-", WARM_UP_EVENTS, warmUpWorkload, random, producedAt,
                        latenciesNs, null);
                double jitShare = (jitMillis() - jitBefore) / ((System.nanoTime() - wallBefore) / 1e6);
                System.out.printf(Locale.ROOT, "[%s] warm-up %d: %d events, JIT compiling %.0f %% of the time%n",
                        label, round, WARM_UP_EVENTS, 100 * jitShare);
                if (jitShare < SETTLED_JIT_SHARE) {
                    break;
                }
            }

            RunResult paced = null;
            int pacedCount = rate * seconds;
            Map<String, Double> metricsBefore = commitMetrics(app);
            if (pacedCount > 0) {
                latenciesNs.clear();
                series.clear();
                try (KafkaProducer<String, String> producer = producer(bootstrap)) {
                    long start = System.nanoTime();
                    // ties the series' nanoTimes to the JVM's uptime, the clock of GC and safepoint logs
                    System.out.printf(Locale.ROOT, "[%s] paced run starts at nanoTime %d, JVM uptime %d ms%n", label,
                            start, java.lang.management.ManagementFactory.getRuntimeMXBean().getUptime());
                    for (int e = 0; e < pacedCount; e++) {
                        long due = start + (long) (e * 1e9 / rate);
                        // park, not spin: a spinning producer would take one of the machine's two cores
                        for (long wait = due - System.nanoTime(); wait > 0; wait = due - System.nanoTime()) {
                            java.util.concurrent.locks.LockSupport.parkNanos(wait);
                        }
                        send(producer, topics, "p" + e, workload, random, producedAt, null);
                    }
                    producer.flush();
                }
                awaitCount(latenciesNs, pacedCount, Duration.ofSeconds(120));
                long[] v = sorted(latenciesNs);
                paced = new RunResult(v[v.length / 2] / 1e6, v[(int) Math.min(v.length - 1, Math.round(v.length * 0.99))] / 1e6,
                        v[v.length - 1] / 1e6, v.length, 0, 0, 0);
                System.out.printf(Locale.ROOT, "[%s] paced at %d events/s: %d lists, p50 %.1f ms, p99 %.1f ms, max %.1f ms%n",
                        label, rate, v.length, paced.p50Ms(), paced.p99Ms(), paced.maxMs());
                printCommits(label + "] [paced", metricsBefore, commitMetrics(app));
                String seriesFile = System.getProperty("latency.series");
                if (seriesFile != null) {
                    writeSeries(Path.of(seriesFile), series);
                }
            }
            metricsBefore = commitMetrics(app);

            // the ceiling is the platform's capacity, so it is the best of several bursts: a single short burst
            // of the pass-through is easily slowed by the JIT, and a low ceiling would flatter the app
            int bursts = scorer == null ? 1 : CEILING_BURSTS;
            double perSecond = 0;
            for (int b = 1; b <= bursts; b++) {
                long jitBefore = jitMillis();
                long wallBefore = System.nanoTime();
                long streamCpuBefore = streamThreadCpuNanos(prefix + "bench");
                ThreadCpuBreakdown cpuBefore = ThreadCpuBreakdown.now();
                double burstPerSecond = unpaced(bootstrap, topics, "b" + b + "-", burst, workload, random, producedAt,
                        latenciesNs, scorer == null ? workload : null);
                double streamCpuPerEventUs = (streamThreadCpuNanos(prefix + "bench") - streamCpuBefore) / 1e3 / burst;
                double jitShare = (jitMillis() - jitBefore) / ((System.nanoTime() - wallBefore) / 1e6);
                System.out.printf(Locale.ROOT, "[%s] sustained: %d events at %.0f events/s; stream thread CPU %.0f µs per"
                        + " event (%.0f %% busy); JIT compiling %.0f %% of the time%n", label, burst, burstPerSecond,
                        streamCpuPerEventUs, 100 * streamCpuPerEventUs * burstPerSecond / 1e6, 100 * jitShare);
                ThreadCpuBreakdown.now().printSince(cpuBefore, burst, label);
                printCommits(label + "] [burst", metricsBefore, commitMetrics(app));
                metricsBefore = commitMetrics(app);
                perSecond = Math.max(perSecond, burstPerSecond);
            }
            stop.set(true);
            reader.join();
            long[] store = scorer == null ? interactionStoreBytes(app) : new long[] {0, 0};
            double perResearcher = store[1] == 0 ? 0 : (double) store[0] / store[1];
            return paced == null
                    ? new RunResult(0, 0, 0, 0, perSecond, perResearcher, store[1])
                    : new RunResult(paced.p50Ms(), paced.p99Ms(), paced.maxMs(), paced.pacedLists(), perSecond,
                    perResearcher, store[1]);
        }
    }

    /**
     * Sends {@code count} events at once and waits for their lists; returns lists per second from the
     * first send to the last list read. {@code counting} (or null) records each event's history size.
     */
    private static double unpaced(String bootstrap, Topics topics, String idPrefix, int count, Workload workload,
                                  SplittableRandom random, Map<String, Long> producedAt, List<Long> latenciesNs,
                                  Workload counting) throws InterruptedException {
        latenciesNs.clear();
        long start = System.nanoTime();
        try (KafkaProducer<String, String> producer = producer(bootstrap)) {
            for (int e = 0; e < count; e++) {
                send(producer, topics, idPrefix + e, workload, random, producedAt, counting);
            }
            producer.flush();
        }
        awaitCount(latenciesNs, count, Duration.ofMinutes(10));
        double secs = (System.nanoTime() - start) / 1e9;
        if (latenciesNs.size() < count) {
            throw new IllegalStateException("only " + latenciesNs.size() + " of " + count + " lists arrived");
        }
        return count / secs;
    }

    /**
     * Running totals of the clients' commit work: the stream threads' commits (their count and the
     * longest so far) and the transactional producers' time in flush, offsets-to-transaction and commit.
     */
    private static Map<String, Double> commitMetrics(StreamsApp app) {
        Map<String, Double> totals = new java.util.TreeMap<>();
        for (var e : app.kafkaStreams().metrics().entrySet()) {
            var name = e.getKey();
            Object value = e.getValue().metricValue();
            if (!(value instanceof Number number) || Double.isNaN(number.doubleValue())) {
                continue;
            }
            boolean thread = name.group().equals("stream-thread-metrics");
            boolean producer = name.group().equals("producer-metrics");
            if ((thread && (name.name().equals("commit-total") || name.name().equals("commit-latency-max")))
                    || (producer && (name.name().equals("txn-commit-time-ns-total")
                    || name.name().equals("txn-send-offsets-time-ns-total") || name.name().equals("flush-time-ns-total")
                    || name.name().equals("txn-begin-time-ns-total")))) {
                totals.merge(name.name(), number.doubleValue(), Double::sum);
            }
        }
        return totals;
    }

    private static void printCommits(String label, Map<String, Double> before, Map<String, Double> after) {
        double commits = after.getOrDefault("commit-total", 0.0) - before.getOrDefault("commit-total", 0.0);
        if (commits <= 0) {
            return;
        }
        java.util.function.ToDoubleFunction<String> msPerCommit = key ->
                (after.getOrDefault(key, 0.0) - before.getOrDefault(key, 0.0)) / 1e6 / commits;
        System.out.printf(Locale.ROOT, "[%s] %.0f commits; per commit: producer flush %.2f ms, offsets to"
                        + " transaction %.2f ms, transaction commit %.2f ms; longest commit so far %.1f ms%n", label, commits,
                msPerCommit.applyAsDouble("flush-time-ns-total"), msPerCommit.applyAsDouble("txn-send-offsets-time-ns-total"),
                msPerCommit.applyAsDouble("txn-commit-time-ns-total"), after.getOrDefault("commit-latency-max", 0.0));
    }

    /** One line per list, by time produced: ms since the first event was produced, and the latency in ms. */
    private static void writeSeries(Path file, List<long[]> series) throws java.io.IOException {
        List<long[]> byProduced;
        synchronized (series) {
            byProduced = new ArrayList<>(series);
        }
        byProduced.sort(java.util.Comparator.comparingLong(pair -> pair[0]));
        long first = byProduced.isEmpty() ? 0 : byProduced.get(0)[0];
        try (var out = Files.newBufferedWriter(file)) {
            out.write("produced_ms,latency_ms\n");
            for (long[] pair : byProduced) {
                out.write(String.format(Locale.ROOT, "%.3f,%.3f%n", (pair[0] - first) / 1e6, (pair[1] - pair[0]) / 1e6));
            }
        }
    }

    /** CPU time so far of the app's stream threads (named after its application id). */
    private static long streamThreadCpuNanos(String applicationId) {
        java.lang.management.ThreadMXBean threads = java.lang.management.ManagementFactory.getThreadMXBean();
        long total = 0;
        for (java.lang.management.ThreadInfo info : threads.getThreadInfo(threads.getAllThreadIds())) {
            if (info != null && info.getThreadName().startsWith(applicationId)
                    && info.getThreadName().contains("-StreamThread-")) {
                total += Math.max(0, threads.getThreadCpuTime(info.getThreadId()));
            }
        }
        return total;
    }

    /** Milliseconds the JIT compilers have spent so far, summed over their threads. */
    private static long jitMillis() {
        return java.lang.management.ManagementFactory.getCompilationMXBean().getTotalCompilationTime();
    }

    private static void awaitLiveModel(StreamsApp app) throws InterruptedException {
        long deadline = System.nanoTime() + Duration.ofMinutes(3).toNanos();
        while (app.liveModelVersion() == null && System.nanoTime() < deadline) {
            Thread.sleep(100);
        }
        if (app.liveModelVersion() == null) {
            throw new IllegalStateException("no model version went live");
        }
    }

    /** Total serialized bytes and count of the researcher profiles in the interaction store. */
    private static long[] interactionStoreBytes(StreamsApp app) {
        var store = app.kafkaStreams().store(org.apache.kafka.streams.StoreQueryParameters.fromNameAndType(
                SuggestionTopology.INTERACTIONS_STORE,
                org.apache.kafka.streams.state.QueryableStoreTypes.<String, InteractionProfile>keyValueStore()));
        var serializer = new InteractionProfileSerde().serializer();
        long bytes = 0;
        long count = 0;
        try (var all = store.all()) {
            while (all.hasNext()) {
                var kv = all.next();
                bytes += kv.key.getBytes(StandardCharsets.UTF_8).length + serializer.serialize("", kv.value).length;
                count++;
            }
        }
        return new long[] {bytes, count};
    }

    private static long[] sorted(List<Long> ns) {
        synchronized (ns) {
            return ns.stream().mapToLong(Long::longValue).sorted().toArray();
        }
    }

    /**
     * Lists of the app's size and shape (n candidates, each with three contributors and scores printed
     * at full precision) taken from a fixed set of compounds without any arithmetic: the platform's
     * cost of publishing and storing the app's lists, apart from scoring them.
     */
    static final class ListsWithoutScoring implements SuggestionScorer {
        private static final int CONTRIBUTORS = 3;
        private final List<String> candidates = new ArrayList<>();

        ListsWithoutScoring(int compounds) {
            // spread over the catalogue so that restricted compounds are met as in the app's lists
            for (int c = 0; c < 200; c++) {
                candidates.add(compoundId((int) ((long) c * 7919 % compounds)));
            }
        }

        @Override
        public SuggestionSource source() {
            return SuggestionSource.HYBRID;
        }

        @Override
        public List<ScoredCandidate> rank(ScoringInput input, int n) {
            List<InteractionProfile.Entry> history = input.profile().entries();
            List<org.congener.schemas.Contribution> contributors = new ArrayList<>(CONTRIBUTORS);
            for (int i = 0; i < Math.min(CONTRIBUTORS, history.size()); i++) {
                contributors.add(new org.congener.schemas.Contribution(
                        history.get(history.size() - 1 - i).compoundId(), 1.0 / (i + 1.7)));
            }
            List<ScoredCandidate> list = new ArrayList<>(n);
            for (int c = 0; c < candidates.size() && list.size() < n; c++) {
                String id = candidates.get(c);
                if (input.eligible().eligible(id)) {
                    double score = 1.0 / (c + 1.3);
                    list.add(new ScoredCandidate(id, score * 0.61, score * 0.39, score, contributors));
                }
            }
            return list;
        }
    }

    /** A scorer that offers nothing: the pipeline's cost without the scoring work. */
    static final class OffersNothing implements SuggestionScorer {
        @Override
        public SuggestionSource source() {
            return SuggestionSource.HYBRID;
        }

        @Override
        public List<ScoredCandidate> rank(ScoringInput input, int n) {
            return List.of();
        }
    }

    /**
     * Who acts on what: Zipf-skewed researchers and compounds, and each researcher's distinct compounds
     * so far, from which the work per event is counted.
     */
    static final class Workload {
        private final int researchers;
        private final int firstResearcher;
        private final Zipf users;
        private final Zipf items;
        private final Map<Integer, java.util.Set<Integer>> history = new java.util.HashMap<>();
        private long countedEvents;
        private long historySum;

        /** @param firstResearcher index of the first researcher drawn from */
        Workload(int researchers, int compounds, int firstResearcher) {
            this.researchers = researchers;
            this.firstResearcher = firstResearcher;
            this.users = new Zipf(researchers, 1.0);
            this.items = new Zipf(compounds, 0.9);
        }

        int researchers() {
            return researchers;
        }

        int[] next(SplittableRandom random, boolean count) {
            int user = firstResearcher + users.next(random);
            int item = items.next(random);
            java.util.Set<Integer> seen = history.computeIfAbsent(user, u -> new java.util.HashSet<>());
            seen.add(item);
            if (count) {
                countedEvents++;
                historySum += seen.size();
            }
            return new int[] {user, item};
        }

        double meanHistory() {
            return countedEvents == 0 ? 0 : (double) historySum / countedEvents;
        }

        /**
         * Multiply-adds of one event's scoring at the mean history n_u, counted from the code's loops:
         * exact fold-in n_u·k(k+1)/2 (rank-one updates of the upper triangle) + n_u·k (right-hand side)
         * + k³/6 (Cholesky) + k² (two triangular solves); CF scores I·k; semantic spread n_u·K.
         */
        double meanMultiplyAddsPerEvent(int k, int items, int neighbours) {
            double n = meanHistory();
            return n * k * (k + 1) / 2.0 + n * k + k * (double) k * k / 6 + (double) k * k
                    + (double) items * k + n * neighbours;
        }
    }

    private static void send(KafkaProducer<String, String> producer, Topics topics, String id, Workload workload,
                             SplittableRandom random, Map<String, Long> producedAt, Workload counting) {
        int[] who = workload.next(random, counting != null);
        int user = who[0];
        int item = who[1];
        UsageKind kind = UsageKind.values()[random.nextInt(UsageKind.values().length)];
        String researcher = researcherId(user);
        UsageEvent event = new UsageEvent(SchemaIds.USAGE_EVENT, id, researcher, compoundId(item), kind,
                kind == UsageKind.VIEW ? 0 : 1 + random.nextInt(50), "g", Instant.now().toString());
        String json = new String(topics.usageEvents().valueSerde().serializer().serialize("", event), StandardCharsets.UTF_8);
        producedAt.put(id, System.nanoTime());
        producer.send(new ProducerRecord<>(topics.usageEvents().name(), researcher, json));
    }

    private static void readSuggestions(String bootstrap, Topics topics, Map<String, Long> producedAt,
                                        List<Long> latencies, List<long[]> series, AtomicBoolean stop) {
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
                        series.add(new long[] {at, now});
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

    private static void publishWorld(String bootstrap, Topics topics, int compounds, int rank, int researchers) {
        SplittableRandom random = new SplittableRandom(5);
        // a record the broker refused would leave the run waiting for lists of unknown compounds or
        // researchers: the first failure ends the run with its cause
        java.util.concurrent.atomic.AtomicReference<Exception> failed = new java.util.concurrent.atomic.AtomicReference<>();
        org.apache.kafka.clients.producer.Callback check = (metadata, e) -> {
            if (e != null) {
                failed.compareAndSet(null, e);
            }
        };
        try (KafkaProducer<String, String> producer = producer(bootstrap)) {
            for (int c = 0; c < compounds; c++) {
                CatalogEntry entry = new CatalogEntry(SchemaIds.CATALOG_ENTRY, compoundId(c), "compound " + c,
                        List.of("T:" + c), c % 50 == 0 ? List.of("controlled") : List.of(), List.of("H225"), true);
                producer.send(new ProducerRecord<>(topics.catalog().name(), entry.compoundId(),
                        text(topics.catalog().valueSerde().serializer().serialize("", entry))), check);
            }
            for (int r = 0; r < researchers; r++) {
                Researcher researcher = new Researcher(SchemaIds.RESEARCHER, researcherId(r), "Researcher " + r,
                        "g" + (r / 20), r % 3 == 0 ? List.of("controlled") : List.of(), true);
                producer.send(new ProducerRecord<>(topics.researchers().name(), researcher.researcherId(),
                        text(topics.researchers().valueSerde().serializer().serialize("", researcher))), check);
            }
        }
        if (failed.get() != null) {
            throw new IllegalStateException("publishing the catalogue and researchers failed", failed.get());
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

    /** Bytes of record batches per topic (log segments only: index files are preallocated). */
    private static void printTopicBytes(Path brokerDir) throws java.io.IOException {
        Map<String, Long> bytes = new java.util.TreeMap<>();
        try (var files = Files.walk(brokerDir)) {
            files.filter(f -> f.getFileName().toString().endsWith(".log") && Files.isRegularFile(f)).forEach(f -> {
                String partitionDir = f.getParent().getFileName().toString();
                String topic = partitionDir.substring(0, Math.max(0, partitionDir.lastIndexOf('-')));
                bytes.merge(topic, f.toFile().length(), Long::sum);
            });
        }
        bytes.entrySet().stream().sorted(Map.Entry.<String, Long>comparingByValue().reversed()).limit(12)
                .forEach(e -> System.out.printf(Locale.ROOT, "  topic %s: %.1f MB%n", e.getKey(), e.getValue() / 1e6));
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
