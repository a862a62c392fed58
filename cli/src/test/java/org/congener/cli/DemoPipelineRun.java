package org.congener.cli;

import java.io.OutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.TimeUnit;

import org.apache.kafka.clients.admin.Admin;
import org.apache.kafka.clients.admin.AdminClientConfig;
import org.apache.kafka.clients.admin.AlterConfigOp;
import org.apache.kafka.clients.admin.Config;
import org.apache.kafka.clients.admin.ConfigEntry;
import org.apache.kafka.common.config.ConfigResource;
import org.apache.kafka.common.config.TopicConfig;
import org.congener.broker.TopicAdmin;
import org.congener.cli.demo.DemoTrainer;
import org.congener.cli.demo.EventReplay;
import org.congener.cli.demo.OutputCounter;
import org.congener.cli.demo.ProgressLine;
import org.congener.cli.demo.ReplayScenario;
import org.congener.demo.DemoData;
import org.congener.streams.StreamsApp;
import org.congener.streams.config.AppConfig;
import org.congener.trainer.service.TrainingOutcome;

/**
 * The steps of {@code congener demo --replay-only} on the shared test broker: the demo's topics and
 * settings, the streams app, the reference data, the history replay, a training run before the rest is
 * replayed, the background trainer during it, and the wait until every usage record gave an output.
 *
 * <p>{@code DemoRuntime} starts a broker of its own, so the same steps are taken here from the public
 * classes the demo command uses ({@link EventReplay}, {@link DemoTrainer}, {@link OutputCounter},
 * {@link StreamsApp}). The demo's broker keeps records forever and accepts the whole demo year whatever
 * today's date; the shared broker has Kafka's defaults, so this run's topics get those two settings
 * per topic instead.
 */
final class DemoPipelineRun {

    /** What the run left behind for the checks. */
    record Result(ReplayScenario scenario, AppConfig config, List<TrainingOutcome> outcomes,
                  OutputCounter.Counts counts, EventReplay.Sent sent, Duration took) {
    }

    private static final Duration STARTUP = Duration.ofMinutes(2);
    private static final Duration PROCESSING = Duration.ofMinutes(5);
    private static final Duration TRAINER_STOP = Duration.ofMinutes(2);

    private DemoPipelineRun() {
    }

    /**
     * Runs the scenario through the pipeline under {@code prefix} and {@code applicationId}; the streams
     * app is stopped before this returns, so what is on the topics is final.
     *
     * @param dir folder for the streams state, the ontology file and the trainer's reports
     */
    static Result run(String bootstrap, String prefix, String applicationId, ReplayScenario scenario, Path dir,
                      PrintStream log) throws Exception {
        long started = System.nanoTime();
        // the settings DemoCommand and DemoRuntime give the streams app
        AppConfig settings = AppConfig.defaults().with(Map.of(AppConfig.APPLICATION_ID, applicationId,
                AppConfig.TOPIC_PARTITIONS, "2", AppConfig.HTTP_PORT, "0"));
        Path ontology = dir.resolve("demo-ontology.obo");
        Files.writeString(ontology, DemoData.ontologyObo(), StandardCharsets.UTF_8);
        AppConfig config = settings.with(Map.of(AppConfig.BOOTSTRAP_SERVERS, bootstrap,
                AppConfig.TOPIC_PREFIX, prefix,
                AppConfig.STATE_DIR, dir.resolve("streams-state").toString(),
                AppConfig.ONTOLOGY_FILE, ontology.toString()));

        try (Admin admin = Admin.create(Map.of(AdminClientConfig.BOOTSTRAP_SERVERS_CONFIG, bootstrap))) {
            TopicAdmin.createAll(admin, prefix, config.topicPartitions(), (short) 1);
            keepTheDemoYear(admin, TopicAdmin.allNames(prefix));
            EventReplay replay = new EventReplay(bootstrap, prefix);
            replay.loadReferenceData(scenario);
            List<TrainingOutcome> outcomes;
            OutputCounter.Counts counts;
            try (StreamsApp app = StreamsApp.start(config)) {
                if (!app.awaitRunning(STARTUP)) {
                    throw new IllegalStateException("the streams app did not reach RUNNING: " + app.kafkaStreams().state());
                }
                // the app's own topics exist once it runs; the demo year has to fit in them too
                keepTheDemoYear(admin, admin.listTopics().names().get().stream()
                        .filter(name -> name.startsWith(applicationId + "-")).toList());

                int expected = scenario.usageEvents().size() + scenario.badUsageLines().size();
                DemoTrainer trainer = new DemoTrainer(bootstrap, prefix, dir.resolve("trainer-reports"), log);
                Map<String, Long> ackedAt = new ConcurrentHashMap<>();
                try (OutputCounter counter = new OutputCounter(bootstrap, prefix)) {
                    CompletableFuture<OutputCounter.Counts> counting = CompletableFuture.supplyAsync(() ->
                            counter.awaitTotal(expected, PROCESSING, quiet()));
                    try {
                        ReplayScenario history = scenario.history(scenario.historySize());
                        ReplayScenario rest = scenario.after(scenario.historySize());
                        replay.replayEvents(history, quiet(), 0, ackedAt);
                        trainer.trainOnce("before the replay, on " + history.usageEvents().size() + " history events");
                        trainer.startSchedule(Math.max(1, rest.usageEvents().size() / 3));
                        replay.replayEvents(rest, quiet(), 0, ackedAt);
                        counts = counting.get(PROCESSING.toSeconds() + 30, TimeUnit.SECONDS);
                    } catch (Exception e) {
                        counting.cancel(true);
                        trainer.stop(0, Duration.ofSeconds(30));
                        throw e;
                    }
                    // as the demo does: the second run starts once a third of the rest is in
                    outcomes = trainer.stop(2, TRAINER_STOP);
                }
            }
            EventReplay.Sent sent = new EventReplay.Sent(scenario.usageEvents().size(),
                    scenario.inventoryEvents().size(), scenario.badUsageLines().size());
            return new Result(scenario, config, outcomes, counts, sent,
                    Duration.ofNanos(System.nanoTime() - started));
        }
    }

    /**
     * Sets on each topic what the demo broker sets for all: keep every record (the year starts long
     * before a retention period ends) and accept timestamps ahead of the broker's clock (the demo year
     * may lie partly in the future of the machine that runs it).
     */
    private static void keepTheDemoYear(Admin admin, Collection<String> topics) throws Exception {
        Map<ConfigResource, Collection<AlterConfigOp>> changes = new HashMap<>();
        List<ConfigResource> resources = new ArrayList<>();
        for (String topic : topics) {
            ConfigResource resource = new ConfigResource(ConfigResource.Type.TOPIC, topic);
            resources.add(resource);
            changes.put(resource, List.of(
                    new AlterConfigOp(new ConfigEntry(TopicConfig.RETENTION_MS_CONFIG, "-1"), AlterConfigOp.OpType.SET),
                    new AlterConfigOp(new ConfigEntry(TopicConfig.MESSAGE_TIMESTAMP_AFTER_MAX_MS_CONFIG,
                            String.valueOf(Long.MAX_VALUE)), AlterConfigOp.OpType.SET)));
        }
        admin.incrementalAlterConfigs(changes).all().get(1, TimeUnit.MINUTES);
        // the controller has the change; wait until the broker serving the topics reports it as well
        long deadline = System.nanoTime() + STARTUP.toNanos();
        while (!applied(admin.describeConfigs(resources).all().get(1, TimeUnit.MINUTES))) {
            if (System.nanoTime() > deadline) {
                throw new IllegalStateException("topic settings of " + topics + " were not applied in time");
            }
            Thread.sleep(50);
        }
    }

    private static ProgressLine quiet() {
        return new ProgressLine(new PrintStream(OutputStream.nullOutputStream()), "", 1);
    }

    private static boolean applied(Map<ConfigResource, Config> configs) {
        for (Config config : configs.values()) {
            ConfigEntry after = config.get(TopicConfig.MESSAGE_TIMESTAMP_AFTER_MAX_MS_CONFIG);
            if (after == null || !String.valueOf(Long.MAX_VALUE).equals(after.value())) {
                return false;
            }
        }
        return true;
    }
}
