package org.congener.cli;

import java.io.InputStreamReader;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;
import org.congener.core.interactions.InteractionWeights;
import org.congener.core.ontology.Ontology;
import org.congener.core.ontology.io.OboReader;
import org.congener.core.split.TimeSplit;
import org.congener.demo.DemoData;
import org.congener.trainer.evaluation.ExperimentSettings;
import org.congener.trainer.publish.PublishHook;
import org.congener.trainer.service.TrainerService;
import org.congener.trainer.service.TrainerSettings;
import org.congener.trainer.service.TrainingOutcome;
import org.congener.trainer.service.TrainingSchedule;
import org.congener.trainer.service.TrainingSummary;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * {@code congener train}: reads the history from the broker, evaluates every model and fusion rule on
 * a held-out split, and publishes a new model version when the gate lets it; once or on a schedule.
 */
@Command(name = "train", mixinStandardHelpOptions = true,
        description = {"Trains ALS and BPR on the usage history in Kafka, evaluates them with the ontology",
                "similarity on a held-out split and publishes the best servable model as a new version,",
                "unless it is worse than the live one by more than --margin."})
public final class TrainCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Mixin
    TrainerConnection connection;

    @ArgGroup(exclusive = true, multiplicity = "0..1")
    ScheduleOptions schedule = new ScheduleOptions();

    @Option(names = "--ontology", paramLabel = "FILE",
            description = "ontology file (OBO, or edge list with --format edges); default: the demo ontology")
    Path ontology;

    @Option(names = "--format", paramLabel = "obo|edges", defaultValue = "obo", description = "format of --ontology")
    OntologyFileOptions.Format format;

    @Option(names = "--no-ontology", description = "train without the semantic models")
    boolean noOntology;

    @Option(names = "--margin", paramLabel = "X", defaultValue = "0.01",
            description = "publish unless worse than the live version by more than X on --metric (default: ${DEFAULT-VALUE})")
    double margin;

    @Option(names = "--metric", paramLabel = "NAME", defaultValue = "ndcg@10",
            description = "metric of model selection and the gate: ndcg@K, precision@K, recall@K, f1@K, mrr, auc (default: ${DEFAULT-VALUE})")
    String metric;

    @Option(names = "--keep", paramLabel = "N", defaultValue = "3",
            description = "versions kept on the broker; older ones get tombstones (default: ${DEFAULT-VALUE})")
    int keep;

    @Option(names = "--ranks", split = ",", paramLabel = "R,...", description = "ALS/BPR rank grid (default: 16,32)")
    List<Integer> ranks;

    @Option(names = "--iterations", defaultValue = "10", description = "ALS iterations (default: ${DEFAULT-VALUE})")
    int iterations;

    @Option(names = "--report-dir", paramLabel = "DIR", defaultValue = "trainer-reports",
            description = "report.html and report.json per run under DIR/<version> (default: ${DEFAULT-VALUE})")
    Path reportDir;

    @Option(names = "--threads", defaultValue = "0", description = "worker threads; 0 = all cores")
    int threads;

    @Override
    public Integer call() {
        if (keep < 1) {
            throw new ParameterException(spec.commandLine(), "--keep must be >= 1, not " + keep);
        }
        if (!(margin >= 0)) {
            throw new ParameterException(spec.commandLine(), "--margin must be >= 0, not " + margin);
        }
        TrainingSchedule plan;
        try {
            plan = schedule.schedule();
        } catch (IllegalArgumentException e) {
            throw new ParameterException(spec.commandLine(), e.getMessage());
        }
        Ontology read = null;
        if (!noOntology) {
            read = ontology == null ? demoOntology() : loadOntology();
            if (read == null) {
                return CliErrors.FAILED;
            }
        }
        TrainerSettings settings = settings(metric, margin, keep, reportDir, threads, iterations, ranks);
        java.io.PrintWriter out = spec.commandLine().getOut();
        java.io.PrintWriter err = spec.commandLine().getErr();
        TrainerService service = new TrainerService(connection.bootstrapServers, connection.topics(), settings, read,
                line -> err.println("trainer: " + line), System.err, PublishHook.NONE);
        AtomicBoolean stop = new AtomicBoolean();
        AtomicInteger failures = new AtomicInteger();
        Thread hook = new Thread(() -> stop.set(true), "train-stop");
        Runtime.getRuntime().addShutdownHook(hook);
        try {
            TrainingSchedule.loop(plan, service::runOnce, o -> {
                out.print(TrainingSummary.render(o));
                out.flush();
            }, e -> {
                failures.incrementAndGet();
                err.println("congener train: " + e.getMessage());
            }, stop::get, () -> TrainingSchedule.endOffsetSum(connection.bootstrapServers,
                    connection.topics().usageEvents().name(), connection.readTimeout()));
        } finally {
            try {
                Runtime.getRuntime().removeShutdownHook(hook);
            } catch (IllegalStateException shuttingDown) {
                // the JVM is already stopping
            }
        }
        return plan instanceof TrainingSchedule.Once && failures.get() > 0 ? CliErrors.FAILED : 0;
    }

    /** The trainer's settings with the command's defaults; the demo uses them too. */
    static TrainerSettings settings(String metric, double margin, int keep, Path reportDir, int threads, int iterations,
                                    List<Integer> ranks) {
        ExperimentSettings e = ExperimentSettings.defaults(new TimeSplit(0.2), new int[] {5, 10, 20})
                .withIterations(iterations);
        e = new ExperimentSettings(e.splitter(), e.ks(), e.aucLimit(), metric, e.ranks(), e.lambdas(), e.alphas(),
                e.blendWeights(), e.rrfKs(), e.iterations(), e.bprEpochs(), e.neighbours(), e.resamples(), e.level(),
                e.seed(), e.threads());
        if (threads > 0) {
            e = e.withThreads(threads);
        }
        if (ranks != null && !ranks.isEmpty()) {
            e = e.withGrid(ranks, e.lambdas(), e.alphas());
        }
        return new TrainerSettings(e, InteractionWeights.defaults(), margin, keep, reportDir,
                java.time.Duration.ofSeconds(120));
    }

    static Ontology demoOntology() {
        try (Reader reader = new InputStreamReader(DemoData.openOntology(), StandardCharsets.UTF_8)) {
            return new OboReader().read(reader);
        } catch (java.io.IOException e) {
            throw new IllegalStateException("the demo ontology is part of the build: " + e.getMessage(), e);
        }
    }

    private Ontology loadOntology() {
        OntologyFileOptions options = new OntologyFileOptions();
        options.file = ontology;
        options.format = format;
        return options.load(spec.commandLine().getErr(), "congener train");
    }
}
