package org.congener.cli;

import java.io.PrintStream;
import java.nio.file.Path;
import java.time.Duration;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.CountDownLatch;

import org.congener.cli.demo.DemoRuntime;
import org.congener.cli.demo.DemoSummary;
import org.congener.cli.demo.DemoTrainer;
import org.congener.cli.demo.EventReplay;
import org.congener.cli.demo.LatencyStats;
import org.congener.cli.demo.OutputCounter;
import org.congener.cli.demo.ProgressLine;
import org.congener.cli.demo.ReplayScenario;
import org.congener.cli.demo.StandardScenario;
import org.congener.streams.SafetyCaution;
import org.congener.streams.StreamsApp;
import org.congener.streams.config.AppConfig;
import org.congener.streams.config.ConfigLoader;
import org.congener.trainer.service.TrainingOutcome;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * {@code congener demo}: the whole system on this machine. Starts an embedded broker, creates the
 * topics, loads the demo catalogue and researchers, starts the streams app, replays the first part of the
 * demo events as history, trains and publishes a model version on it, replays the rest in time order
 * (broken lines mixed in) while the trainer runs again after every so many events, prints a summary and
 * serves the query API until Ctrl-C.
 */
@Command(name = "demo",
        mixinStandardHelpOptions = true,
        description = {"Runs Congener on an embedded Kafka broker with the invented demo institute's data:",
                "replays a year of usage and inventory events, then serves suggestions on 127.0.0.1 until Ctrl-C."})
public final class DemoCommand implements Callable<Integer> {

    /** Demo defaults that differ from the app's; a config file, CONGENER_* variables or flags still win. */
    private static final Map<String, String> DEMO_DEFAULTS = Map.of(
            AppConfig.APPLICATION_ID, "congener-demo",
            AppConfig.TOPIC_PARTITIONS, "2");

    @Option(names = "--data-dir", paramLabel = "DIR",
            description = "keep broker data and state in DIR (default: a temp folder deleted at exit)")
    Path dataDir;

    @Option(names = "--kafka-port", paramLabel = "PORT", defaultValue = "0",
            description = "port of the embedded broker on 127.0.0.1 (default: a free port)")
    int kafkaPort;

    @Option(names = "--http-port", paramLabel = "PORT",
            description = "port of the query API on 127.0.0.1 (default: http.port, " + AppConfig.DEFAULT_HTTP_PORT + ")")
    Integer httpPort;

    @Option(names = "--config", paramLabel = "FILE", description = "properties file with streams app settings")
    Path configFile;

    @Option(names = "--limit", paramLabel = "N", description = "replay only the first N usage events (default: all)")
    Integer limit;

    @Option(names = "--rate", paramLabel = "RECORDS_PER_SECOND", defaultValue = "0",
            description = "replay at most this many records per second (default: as fast as possible)")
    double rate;

    @Option(names = "--replay-only", description = "exit after the summary instead of serving (for scripts)")
    boolean replayOnly;

    @Option(names = "--retrain-after", paramLabel = "N",
            description = "train again whenever N more usage events have arrived (default: a third of the replayed events)")
    Long retrainAfter;

    @Option(names = "--timeout", paramLabel = "SECONDS", defaultValue = "300",
            description = "longest wait for the streams app to process the replay (default: ${DEFAULT-VALUE})")
    int timeoutSeconds;

    @Override
    public Integer call() throws Exception {
        PrintStream out = System.out;
        AppConfig settings = settings();
        ReplayScenario scenario = StandardScenario.load();
        if (limit != null) {
            scenario = scenario.limitedTo(limit);
        }
        out.println("congener demo: " + scenario.institute() + " (an invented institute; all demo data is invented)");
        DemoRuntime runtime = DemoRuntime.start(dataDir, kafkaPort, settings, out);
        Thread stopper = new Thread(() -> {
            out.println("stopping: query API and Kafka Streams, then the broker ...");
            runtime.close();
            out.println("stopped");
        }, "congener-demo-stop");
        Runtime.getRuntime().addShutdownHook(stopper);
        try {
            run(runtime, scenario, out);
        } catch (RuntimeException e) {
            Runtime.getRuntime().removeShutdownHook(stopper);
            runtime.close();
            throw e;
        }
        if (replayOnly) {
            Runtime.getRuntime().removeShutdownHook(stopper);
            runtime.close();
            return 0;
        }
        out.println("serving until Ctrl-C");
        new CountDownLatch(1).await();
        return 0;
    }

    private void run(DemoRuntime runtime, ReplayScenario scenario, PrintStream out) throws Exception {
        EventReplay replay = new EventReplay(runtime.bootstrapServers(), runtime.config().topicPrefix());
        if (runtime.hadEarlierReplay()) {
            out.println("this folder holds an earlier replay: serving it as it is (use a new --data-dir to replay again)");
            StreamsApp app = runtime.startStreamsApp(Duration.ofMinutes(2));
            printUrls(out, app, null);
            return;
        }
        replay.loadReferenceData(scenario);
        out.printf("loaded %,d catalogue entries and %,d researchers%n", scenario.catalog().size(), scenario.researchers().size());
        StreamsApp app = runtime.startStreamsApp(Duration.ofMinutes(2));
        out.println("streams app running (" + runtime.config().processingGuarantee() + ")");

        int expected = scenario.usageEvents().size() + scenario.badUsageLines().size();
        Map<String, Long> ackedAt = new ConcurrentHashMap<>();
        OutputCounter.Counts counts;
        String example;
        Map<String, Long> seenAt;
        long started = System.nanoTime();
        DemoTrainer trainer = new DemoTrainer(runtime.bootstrapServers(), runtime.config().topicPrefix(),
                runtime.dataDir().resolve("trainer-reports"), out);
        List<TrainingOutcome> outcomes;
        try (OutputCounter counter = new OutputCounter(runtime.bootstrapServers(), runtime.config().topicPrefix())) {
            // count outputs while the replay runs, so that the time each list appears can be taken
            CompletableFuture<OutputCounter.Counts> counting = CompletableFuture.supplyAsync(() ->
                    counter.awaitTotal(expected, Duration.ofSeconds(timeoutSeconds), new ProgressLine(out, "processed", expected)));
            try {
                ReplayScenario history = scenario.history(scenario.historySize());
                ReplayScenario rest = scenario.after(scenario.historySize());
                replay.replayEvents(history, new ProgressLine(out, "replaying history",
                        EventReplay.timelineSize(history)), rate, ackedAt);
                trainer.trainOnce("before the replay, on " + history.usageEvents().size() + " history events");
                trainer.startSchedule(retrainAfter != null ? retrainAfter : Math.max(1, rest.usageEvents().size() / 3));
                replay.replayEvents(rest, new ProgressLine(out, "replaying events", EventReplay.timelineSize(rest)),
                        rate, ackedAt);
            } catch (RuntimeException | InterruptedException e) {
                counting.cancel(true);
                trainer.stop(0, Duration.ofSeconds(30));
                throw e;
            }
            counts = counting.get();
            // the second run starts once a third of the replay is in; a demo too short for it does not wait long
            outcomes = trainer.stop(2, Duration.ofSeconds(Math.min(timeoutSeconds, 120)));
            example = counter.firstResearcher();
            seenAt = counter.seenAtNanos();
        }
        EventReplay.Sent sent = new EventReplay.Sent(scenario.usageEvents().size(), scenario.inventoryEvents().size(),
                scenario.badUsageLines().size());
        Duration took = Duration.ofNanos(System.nanoTime() - started);
        if (counts.total() < sent.usageTopicRecords()) {
            throw new IllegalStateException("the streams app processed " + counts.total() + " of "
                    + sent.usageTopicRecords() + " usage records within " + timeoutSeconds + " s; raise --timeout");
        }
        runtime.markReplayed();
        new DemoSummary(sent, counts, app.deadLetterCount(), took, LatencyStats.of(ackedAt, seenAt), rate).print(out);
        out.println("  model versions:   " + DemoTrainer.versionsLine(outcomes));
        printUrls(out, app, example);
    }

    private static void printUrls(PrintStream out, StreamsApp app, String exampleResearcher) {
        String researcher = exampleResearcher == null ? "{researcherId}" : exampleResearcher;
        out.println("query API:");
        out.println("  " + app.baseUrl() + "/researchers/" + researcher + "/suggestions?n=5");
        out.println("  " + app.baseUrl() + "/health");
        out.println(SafetyCaution.TEXT);
    }

    private AppConfig settings() {
        Map<String, String> flags = new HashMap<>();
        if (httpPort != null) {
            flags.put(AppConfig.HTTP_PORT, String.valueOf(httpPort));
        }
        AppConfig loaded = ConfigLoader.load(configFile, System.getenv(), flags);
        Map<String, String> defaults = new HashMap<>();
        DEMO_DEFAULTS.forEach((key, value) -> {
            if (!loaded.originals().containsKey(key)) {
                defaults.put(key, value);
            }
        });
        return loaded.with(defaults);
    }
}
