package org.congener.cli.demo;

import java.io.IOException;
import java.io.InputStreamReader;
import java.io.OutputStream;
import java.io.PrintStream;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.atomic.AtomicBoolean;
import org.congener.core.interactions.InteractionWeights;
import org.congener.core.ontology.Ontology;
import org.congener.core.ontology.io.OboReader;
import org.congener.core.split.TimeSplit;
import org.congener.demo.DemoData;
import org.congener.schemas.Topics;
import org.congener.trainer.evaluation.ExperimentSettings;
import org.congener.trainer.publish.PublishHook;
import org.congener.trainer.service.TrainerService;
import org.congener.trainer.service.TrainerSettings;
import org.congener.trainer.service.TrainingOutcome;
import org.congener.trainer.service.TrainingSchedule;

/**
 * The trainer inside {@code congener demo}: once on the demo history before the replay, then in the
 * background whenever enough new usage events have arrived, so a second version goes live while the
 * demo runs. A small grid keeps each run to seconds; a failed run is reported and the demo goes on.
 */
public final class DemoTrainer {
    private final TrainerService service;
    private final String bootstrapServers;
    private final Topics topics;
    private final PrintStream out;
    private final List<TrainingOutcome> outcomes = new ArrayList<>();
    private final AtomicBoolean stop = new AtomicBoolean();
    private Thread scheduled;

    public DemoTrainer(String bootstrapServers, String topicPrefix, Path reportDir, PrintStream out) {
        this.bootstrapServers = bootstrapServers;
        this.topics = new Topics(topicPrefix);
        this.out = out;
        ExperimentSettings e = ExperimentSettings.defaults(new TimeSplit(0.2), new int[] {5, 10});
        e = new ExperimentSettings(e.splitter(), e.ks(), e.aucLimit(), e.selectMetric(), List.of(16), List.of(0.1),
                List.of(10.0), List.of(0.5, 0.7), List.of(60.0), 8, 20, e.neighbours(), 200, e.level(), e.seed(),
                Math.max(1, Math.min(2, e.threads())));
        TrainerSettings settings = new TrainerSettings(e, InteractionWeights.defaults(), 0.02, 3, reportDir,
                Duration.ofSeconds(60));
        this.service = new TrainerService(bootstrapServers, topics, settings, demoOntology(),
                line -> { }, new PrintStream(OutputStream.nullOutputStream()), PublishHook.NONE);
    }

    /** One run now; prints one line and returns the outcome, or null when the run failed. */
    public synchronized TrainingOutcome trainOnce(String when) {
        try {
            TrainingOutcome o = service.runOnce();
            outcomes.add(o);
            out.println(line(o, when));
            return o;
        } catch (RuntimeException e) {
            out.println("trainer (" + when + "): failed: " + e.getMessage());
            return null;
        }
    }

    /** Trains again in the background each time {@code events} more usage events are on the topic. */
    public void startSchedule(long events) {
        TrainingSchedule.AfterEvents plan = new TrainingSchedule.AfterEvents(events, Duration.ofSeconds(1));
        long[] base = {TrainingSchedule.endOffsetSum(bootstrapServers, topics.usageEvents().name(), Duration.ofSeconds(30))};
        scheduled = new Thread(() -> {
            long last = base[0];
            while (!stop.get()) {
                sleep(1000);
                long now = TrainingSchedule.endOffsetSum(bootstrapServers, topics.usageEvents().name(),
                        Duration.ofSeconds(30));
                if (now - last >= plan.events()) {
                    trainOnce("after " + (now - last) + " new events");
                    last = now;
                }
            }
        }, "demo-trainer");
        scheduled.setDaemon(true);
        scheduled.start();
    }

    /**
     * Waits until at least {@code runs} runs have finished (or {@code timeout} passed), then stops the
     * schedule and waits for a run in progress.
     */
    public List<TrainingOutcome> stop(int runs, Duration timeout) throws InterruptedException {
        long deadline = System.nanoTime() + timeout.toNanos();
        while (runsDone() < runs && System.nanoTime() < deadline) {
            Thread.sleep(200);
        }
        stop.set(true);
        if (scheduled != null) {
            scheduled.join(timeout.toMillis());
        }
        synchronized (this) {
            return List.copyOf(outcomes);
        }
    }

    private synchronized int runsDone() {
        return outcomes.size();
    }

    /** {@code v0001 (before the replay) → v0002 (after 1,200 new events), v0002 live}. */
    public static String versionsLine(List<TrainingOutcome> outcomes) {
        List<String> parts = new ArrayList<>();
        String live = null;
        for (TrainingOutcome o : outcomes) {
            if (o.published()) {
                parts.add(o.version());
                live = o.version();
            } else {
                parts.add("(refused)");
            }
        }
        return parts.isEmpty() ? "none trained" : String.join(" → ", parts) + (live == null ? "" : ", " + live + " live");
    }

    private static String line(TrainingOutcome o, String when) {
        return String.format(Locale.ROOT, "trainer (%s): %s; %s, %d events, %.1f s%s", when,
                o.published() ? o.version() + " live" : "nothing published", o.gate().reason(), o.events(),
                o.millis() / 1000.0, o.report() == null ? "" : ", report " + o.report().resolve("report.html"));
    }

    private static void sleep(long millis) {
        try {
            Thread.sleep(millis);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    private static Ontology demoOntology() {
        try (Reader reader = new InputStreamReader(DemoData.openOntology(), StandardCharsets.UTF_8)) {
            return new OboReader().read(reader);
        } catch (IOException e) {
            throw new IllegalStateException("the demo ontology is part of the build: " + e.getMessage(), e);
        }
    }
}
