package org.congener.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import java.time.Instant;
import org.congener.demo.DemoData;
import org.congener.schemas.CatalogEntry;
import org.congener.schemas.UsageEvent;
import org.congener.schemas.UsageKind;
import org.congener.core.fusion.NeighbourLists;
import org.congener.core.interactions.InteractionLog;
import org.congener.core.interactions.InteractionWeights;
import org.congener.core.split.LeaveKOut;
import org.congener.core.split.Splitter;
import org.congener.core.split.TimeSplit;
import org.congener.trainer.evaluation.CatalogFileReader;
import org.congener.trainer.evaluation.ExperimentReport;
import org.congener.trainer.evaluation.ExperimentSettings;
import org.congener.trainer.evaluation.InputFileException;
import org.congener.trainer.evaluation.InteractionFileReader;
import org.congener.trainer.evaluation.OfflineExperiment;
import org.congener.trainer.evaluation.Progress;
import org.congener.trainer.evaluation.ReportWriter;
import org.congener.trainer.evaluation.OntologyNeighbours;
import org.congener.core.ontology.Ontology;
import org.congener.core.ontology.OntologyFormatException;
import org.congener.core.ontology.io.EdgeListReader;
import org.congener.core.ontology.io.OboReader;
import java.io.InputStreamReader;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** {@code congener evaluate}: the offline experiment over every model and fusion rule, with a report. */
@Command(name = "evaluate", mixinStandardHelpOptions = true,
        description = {"Trains ALS, BPR, semantic-only, popularity and the fused models on one held-out split,",
            "picks their settings on a validation part of the training data, prints a table and writes",
            "report.json and report.html. Suggestions are no safety review."})
public final class EvaluateCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Option(names = "--events", paramLabel = "FILE",
            description = "usage events as JSON lines, or a researcher<TAB>compound<TAB>strength[<TAB>time] TSV")
    private Path events;

    @Option(names = "--demo", description = "evaluate on the shipped demo scenario's events and catalogue "
            + "(instead of --events and --catalog)")
    private boolean demo;

    @Option(names = "--catalog", paramLabel = "FILE",
            description = "catalogue entries as JSON lines (compoundId, termIds); leave out when the item ids are "
                    + "ontology terms themselves")
    private Path catalog;

    @Option(names = "--ontology", paramLabel = "FILE",
            description = "the ontology (OBO 1.4, or child<TAB>parent edges); without it the semantic and fused "
                    + "models are left out (with --demo the demo ontology is the default)")
    private Path ontology;

    @Option(names = "--format", paramLabel = "obo|edges",
            description = "ontology format, as for similarity (default: obo for *.obo files, else edges)")
    private String format;

    @Option(names = "--split", defaultValue = "time:0.2", paramLabel = "SPLIT",
            description = "time:FRACTION (latest fraction per researcher) or leave-k-out:K[:SEED]; default ${DEFAULT-VALUE}")
    private String split;

    @Option(names = "--k", defaultValue = "1,5,10,20", split = ",", paramLabel = "K",
            description = "cut-offs of the @k metrics; default ${DEFAULT-VALUE}")
    private int[] ks;

    @Option(names = "--out", defaultValue = "evaluation-report", paramLabel = "DIR",
            description = "where report.json and report.html go; default ${DEFAULT-VALUE}")
    private Path out;

    @Option(names = "--ranks", split = ",", paramLabel = "R", description = "rank grid; default 16,32")
    private List<Integer> ranks;

    @Option(names = "--lambdas", split = ",", paramLabel = "L", description = "ALS λ grid; default 0.05,0.5")
    private List<Double> lambdas;

    @Option(names = "--alphas", split = ",", paramLabel = "A", description = "ALS α grid; default 5,20")
    private List<Double> alphas;

    @Option(names = "--half-life", paramLabel = "DURATION",
            description = "decay of event weights, ISO-8601 duration such as P90D; default none")
    private String halfLife;

    @Option(names = "--weights", paramLabel = "KIND=W,...", split = ",",
            description = "event-kind weights, e.g. order=1,withdrawal=0.6,usage-log=0.4,view=0.1 (the default)")
    private Map<String, Double> kindWeights;

    @Option(names = "--iterations", defaultValue = "10", description = "ALS iterations; default ${DEFAULT-VALUE}")
    private int iterations;

    @Option(names = "--seed", defaultValue = "42", description = "seed of models, split and bootstrap")
    private long seed;

    @Option(names = "--threads", defaultValue = "0", description = "worker threads; 0 = all cores")
    private int threads;

    @Override
    public Integer call() {
        int[] cutoffs = validKs();
        Splitter splitter = parseSplit();
        if (demo == (events != null)) {
            throw new ParameterException(spec.commandLine(), "give either --events FILE or --demo");
        }
        if (demo && catalog != null) {
            throw new ParameterException(spec.commandLine(), "--demo brings its own catalogue; leave out --catalog");
        }
        try {
            Map<String, List<String>> terms;
            InteractionLog log;
            if (demo) {
                terms = demoTerms();
                log = demoLog(terms, weights());
            } else {
                terms = catalog == null ? null : CatalogFileReader.termsByCompound(catalog);
                List<String> knownItems = terms == null ? List.of() : List.copyOf(terms.keySet());
                log = InteractionFileReader.read(events, weights(), knownItems);
            }
            ExperimentSettings settings = ExperimentSettings.defaults(splitter, cutoffs)
                    .withIterations(iterations).withSeed(seed);
            if (threads > 0) {
                settings = settings.withThreads(threads);
            }
            if (ranks != null || lambdas != null || alphas != null) {
                settings = settings.withGrid(ranks == null ? settings.ranks() : ranks,
                        lambdas == null ? settings.lambdas() : lambdas, alphas == null ? settings.alphas() : alphas);
            }
            Map<String, Object> extra = new LinkedHashMap<>();
            NeighbourLists neighbours = null;
            if (ontology != null || demo) {
                neighbours = neighbours(log, terms, settings.neighbours(), settings.threads(), extra);
            }
            var err = spec.commandLine().getErr();
            err.printf("%d researchers, %d items, %d interactions%n", log.users().size(), log.items().size(),
                    log.interactions().size());
            Progress progress = new Progress(System.err, OfflineExperiment.steps(settings, neighbours != null));
            ExperimentReport report = new OfflineExperiment(settings, progress).run(log, neighbours, extra);
            ReportWriter.printTable(report, System.out);
            ReportWriter.writeAll(report, out);
            System.out.println("wrote " + out.resolve("report.json") + " and " + out.resolve("report.html"));
            return 0;
        } catch (InputFileException e) {
            spec.commandLine().getErr().println("congener evaluate: " + e.getMessage());
            return 1;
        } catch (IOException e) {
            spec.commandLine().getErr().println("congener evaluate: cannot write the report to " + out + ": " + e.getMessage());
            return 1;
        }
    }

    private static Map<String, List<String>> demoTerms() {
        Map<String, List<String>> terms = new LinkedHashMap<>();
        for (CatalogEntry entry : DemoData.catalog()) {
            terms.put(entry.compoundId(), entry.termIds());
        }
        return terms;
    }

    private InteractionWeights weights() {
        InteractionWeights defaults = InteractionWeights.defaults();
        Map<UsageKind, Double> byKind = new java.util.EnumMap<>(defaults.kindWeights());
        if (kindWeights != null) {
            for (Map.Entry<String, Double> e : kindWeights.entrySet()) {
                try {
                    byKind.put(UsageKind.valueOf(e.getKey().toUpperCase(java.util.Locale.ROOT).replace('-', '_')),
                            e.getValue());
                } catch (IllegalArgumentException ex) {
                    throw new ParameterException(spec.commandLine(), "--weights: unknown kind '" + e.getKey()
                            + "' (order, withdrawal, usage-log, view)");
                }
            }
        }
        java.time.Duration decay = null;
        if (halfLife != null) {
            try {
                decay = java.time.Duration.parse(halfLife);
            } catch (java.time.format.DateTimeParseException ex) {
                throw new ParameterException(spec.commandLine(), "--half-life '" + halfLife
                        + "' is no ISO-8601 duration (e.g. P90D)");
            }
        }
        try {
            return new InteractionWeights(byKind, defaults.quantityScale(), decay);
        } catch (IllegalArgumentException ex) {
            throw new ParameterException(spec.commandLine(), ex.getMessage());
        }
    }

    private static InteractionLog demoLog(Map<String, List<String>> terms, InteractionWeights weights) {
        List<UsageEvent> usage = DemoData.usageEvents();
        Instant latest = usage.stream().map(e -> Instant.parse(e.occurredAt())).max(Instant::compareTo)
                .orElse(Instant.EPOCH);
        return InteractionLog.fromEvents(usage, weights, latest, terms.keySet());
    }

    private NeighbourLists neighbours(InteractionLog log, Map<String, List<String>> terms, int k, int threadCount,
                                      Map<String, Object> extra) {
        Ontology read = readOntology();
        OntologyNeighbours.Result result = OntologyNeighbours.build(read, log.items(), terms, k, threadCount);
        extra.put("ontologyTerms", read.termCount());
        extra.put("itemsWithoutTerms", result.itemsWithoutTerms());
        extra.put("unknownTermIds", result.unknownTermIds());
        return result.neighbours();
    }

    /** The --ontology file in its format, or for --demo without --ontology the demo's own OBO file. */
    private Ontology readOntology() {
        try {
            if (ontology == null) {
                try (Reader reader = new InputStreamReader(DemoData.openOntology(), StandardCharsets.UTF_8)) {
                    return new OboReader().read(reader);
                }
            }
            String kind = format != null ? format : ontology.toString().endsWith(".obo") ? "obo" : "edges";
            if (!Files.isRegularFile(ontology)) {
                throw new InputFileException(ontology, 0, "no such file");
            }
            return switch (kind) {
                case "obo" -> new OboReader().read(ontology);
                case "edges" -> new EdgeListReader().read(ontology);
                default -> throw new ParameterException(spec.commandLine(),
                        "--format must be obo or edges, not '" + kind + "'");
            };
        } catch (OntologyFormatException e) {
            throw new InputFileException(ontologySource(), 0, e.getMessage());
        } catch (IOException e) {
            throw new InputFileException(ontologySource(), 0, "cannot read: " + e.getMessage());
        }
    }

    private Path ontologySource() {
        return ontology != null ? ontology : Path.of("demo ontology.obo");
    }

    private int[] validKs() {
        if (ks.length == 0) {
            throw new ParameterException(spec.commandLine(), "--k needs at least one cut-off");
        }
        for (int k : ks) {
            if (k < 1) {
                throw new ParameterException(spec.commandLine(), "--k values must be >= 1, got " + k);
            }
        }
        return ks.clone();
    }

    private Splitter parseSplit() {
        String[] parts = split.split(":");
        try {
            if (parts[0].equals("time") && parts.length == 2) {
                return new TimeSplit(Double.parseDouble(parts[1]));
            }
            if (parts[0].equals("leave-k-out") && (parts.length == 2 || parts.length == 3)) {
                return new LeaveKOut(Integer.parseInt(parts[1]), parts.length == 3 ? Long.parseLong(parts[2]) : seed);
            }
        } catch (IllegalArgumentException e) {
            throw new ParameterException(spec.commandLine(), "--split '" + split + "': " + e.getMessage());
        }
        throw new ParameterException(spec.commandLine(),
                "--split must be time:FRACTION or leave-k-out:K[:SEED], not '" + split + "'");
    }
}
