package org.congener.trainer.service;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;
import org.congener.core.factorisation.AlsConfig;
import org.congener.core.factorisation.AlsModel;
import org.congener.core.factorisation.ImplicitAls;
import org.congener.core.fusion.FusionSettings;
import org.congener.core.fusion.ManifestSettings;
import org.congener.core.fusion.NeighbourLists;
import org.congener.core.interactions.InteractionLog;
import org.congener.core.ontology.Ontology;
import org.congener.schemas.CatalogEntry;
import org.congener.schemas.ModelManifest;
import org.congener.schemas.Topics;
import org.congener.schemas.UsageEvent;
import org.congener.trainer.evaluation.ExperimentReport;
import org.congener.trainer.evaluation.OfflineExperiment;
import org.congener.trainer.evaluation.OntologyNeighbours;
import org.congener.trainer.evaluation.Progress;
import org.congener.trainer.evaluation.ReportWriter;
import org.congener.trainer.publish.ModelPublisher;
import org.congener.trainer.publish.ModelVersion;
import org.congener.trainer.publish.ModelVersionBuilder;
import org.congener.trainer.publish.PublishHook;
import org.congener.trainer.publish.VersionNames;
import org.congener.trainer.registry.ModelRegistry;
import org.congener.trainer.registry.PublishedModels;

/**
 * One training run against a broker: read the history, evaluate every model and fusion rule with the
 * offline experiment, pick the best servable one on the gate metric, measure the live version's
 * configuration on the same split, and — if the gate lets it — refit on the whole history, publish the
 * new version in one transaction and drop versions past the retention count.
 */
public final class TrainerService {
    private final String bootstrapServers;
    private final Topics topics;
    private final TrainerSettings settings;
    private final Ontology ontology;
    private final Consumer<String> log;
    private final PrintStream progressOut;
    private final PublishHook hook;

    /**
     * @param ontology    null to train without the semantic models
     * @param progressOut where progress bars go (a terminal stream), or a null stream
     */
    public TrainerService(String bootstrapServers, Topics topics, TrainerSettings settings, Ontology ontology,
                          Consumer<String> log, PrintStream progressOut, PublishHook hook) {
        this.bootstrapServers = bootstrapServers;
        this.topics = topics;
        this.settings = settings;
        this.ontology = ontology;
        this.log = log;
        this.progressOut = progressOut;
        this.hook = hook;
    }

    public TrainingOutcome runOnce() {
        long started = System.nanoTime();
        TopicSnapshotReader reader = new TopicSnapshotReader(bootstrapServers, settings.readTimeout(), log);
        TrainingHistory history = new HistoryReader(reader, topics).read(n -> {
            if (n % 5000 == 0) {
                progressOut.print("\rreading " + topics.usageEvents().name() + ": " + n + " events");
                progressOut.flush();
            }
        });
        progressOut.println("\rread " + history.events().size() + " events, " + history.catalogue().size()
                + " catalogue entries, " + history.researchers().size() + " researchers, " + history.skipped()
                + " unreadable records skipped");
        if (history.events().isEmpty()) {
            throw new TrainerException("no usage events on " + topics.usageEvents().name() + "; nothing to train on");
        }
        Map<String, List<String>> terms = null;
        if (!history.catalogue().isEmpty()) {
            terms = new LinkedHashMap<>();
            for (CatalogEntry e : history.catalogue().values()) {
                terms.put(e.compoundId(), e.termIds() == null ? List.of() : e.termIds());
            }
        }
        InteractionLog interactions = interactionLog(history, terms);
        Map<String, Object> extra = new LinkedHashMap<>();
        extra.put("skippedRecords", history.skipped());
        NeighbourLists neighbours = null;
        if (ontology != null) {
            OntologyNeighbours.Result r = OntologyNeighbours.build(ontology, interactions.items(), terms,
                    settings.experiment().neighbours(), settings.experiment().threads());
            neighbours = r.neighbours();
            extra.put("ontologyTerms", ontology.termCount());
            extra.put("itemsWithoutTerms", r.itemsWithoutTerms());
            extra.put("unknownTermIds", r.unknownTermIds());
        }
        Progress progress = new Progress(progressOut, OfflineExperiment.steps(settings.experiment(), neighbours != null));
        ExperimentReport report = new OfflineExperiment(settings.experiment(), progress).run(interactions, neighbours, extra);
        AlsConfig base = AlsConfig.defaults().withIterations(settings.experiment().iterations())
                .withThreads(settings.experiment().threads()).withSeed(settings.experiment().seed());
        ChosenModel candidate = ChosenModel.pick(report, settings.gateMetric(), base);
        log.accept("candidate " + String.join(", ", candidate.describe()) + ": " + settings.gateMetric() + " "
                + candidate.figure());

        ModelRegistry registry = new ModelRegistry(reader, topics);
        PublishedModels published = registry.read();
        GateDecision gate = gate(published, interactions, candidate, neighbours, base);
        log.accept("gate " + gate.reason());

        String version = null;
        List<String> removed = List.of();
        if (gate.publish()) {
            version = VersionNames.next(published.versions().keySet());
            AlsModel full = new ImplicitAls(candidate.als()).fit(interactions.toMatrix(interactions.interactions()));
            ModelVersion model = ModelVersionBuilder.build(version, interactions, full, neighbours,
                    candidate.fusion(), settings.weights(), candidate.metrics());
            try (ModelPublisher publisher = new ModelPublisher(bootstrapServers, topics, hook)) {
                publisher.publish(model);
                log.accept("published " + version + ": " + model.factors().size() + " factor records, "
                        + model.neighbours().size() + " neighbour lists, checksum " + model.manifest().checksum());
                removed = Retention.apply(registry.read(), settings.keepVersions(), publisher);
                if (!removed.isEmpty()) {
                    log.accept("retention dropped " + removed);
                }
            }
        }
        Path reportPath = writeReport(report, gate, version);
        long millis = (System.nanoTime() - started) / 1_000_000;
        return new TrainingOutcome(version, candidate.name(), candidate, gate, history.events().size(),
                interactions.users().size(), interactions.items().size(), history.skipped(), removed, reportPath,
                millis);
    }

    private InteractionLog interactionLog(TrainingHistory history, Map<String, List<String>> terms) {
        Instant latest = Instant.EPOCH;
        for (UsageEvent e : history.events()) {
            Instant at = Instant.parse(e.occurredAt());
            if (at.isAfter(latest)) {
                latest = at;
            }
        }
        List<String> known = terms == null ? List.of() : new ArrayList<>(terms.keySet());
        return InteractionLog.fromEvents(history.events(), settings.weights(), latest, known);
    }

    private GateDecision gate(PublishedModels published, InteractionLog interactions, ChosenModel candidate,
                              NeighbourLists neighbours, AlsConfig base) {
        ModelManifest live = published.current();
        if (live == null) {
            return GateDecision.decide(settings.gateMetric(), candidate.figure(), null, Double.NaN,
                    settings.gateMargin());
        }
        ManifestSettings read = ManifestSettings.of(live);
        ManifestSettings.FoldInSettings f = read.foldIn();
        // the live version's configuration, trained the way this run trains (iterations, seed, threads)
        AlsConfig liveAls = new AlsConfig(live.rank(), live.lambda(), live.alpha(), f.epsilon(), f.confidence(),
                f.regularisation(), base.solver(), f.cgSteps(), base.iterations(), base.seed(), base.threads());
        FusionSettings liveFusion = read.fusion();
        double liveFigure = new HeldOutEvaluator(settings.experiment()).evaluate(interactions, liveAls, liveFusion,
                neighbours, candidate.aggregation(), settings.gateMetric());
        return GateDecision.decide(settings.gateMetric(), candidate.figure(), live.version(), liveFigure,
                settings.gateMargin());
    }

    private Path writeReport(ExperimentReport report, GateDecision gate, String version) {
        if (settings.reportDir() == null) {
            return null;
        }
        Map<String, Object> data = new LinkedHashMap<>(report.data());
        data.putAll(gate.toReport());
        data.put("publishedVersion", version == null ? "none" : version);
        ExperimentReport withGate = new ExperimentReport(data, report.split(), report.ks(), report.selectMetric(),
                report.selection(), report.models(), report.comparisons(), report.alsObjective());
        String name = version != null ? version : "refused-" + Instant.now().toString().replace(':', '-');
        Path dir = settings.reportDir().resolve(name);
        try {
            ReportWriter.writeAll(withGate, dir);
            return dir;
        } catch (IOException e) {
            log.accept("cannot write the report to " + dir + ": " + e.getMessage());
            return null;
        }
    }
}
