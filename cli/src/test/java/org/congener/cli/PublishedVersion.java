package org.congener.cli;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.function.Predicate;

import org.congener.core.factorisation.FactorMatrix;
import org.congener.core.factorisation.FixedFactors;
import org.congener.core.factorisation.FoldIn;
import org.congener.core.fusion.ManifestSettings;
import org.congener.core.fusion.NeighbourLists;
import org.congener.core.fusion.OneResearcherScoring;
import org.congener.schemas.ItemFactors;
import org.congener.schemas.ItemNeighbours;
import org.congener.schemas.ModelManifest;
import org.congener.schemas.Neighbour;
import org.congener.schemas.Topics;
import org.congener.schemas.UsageEvent;
import org.congener.trainer.service.TopicSnapshotReader;

/**
 * One model version rebuilt outside the stream from its records on the broker (manifest, factor
 * records, neighbour lists), scoring one researcher at a time the way a batch top-N does: strengths
 * summed from the researcher's events with the version's interaction weights, then core's
 * {@link OneResearcherScoring}. Compounds are indexed in id order over every compound the version's
 * records name; a compound with neighbours but no factors has a zero factor row.
 */
final class PublishedVersion {

    /** One compound of a batch list with its scores. */
    record Ranked(String compoundId, double cf, double semantic, double fused) {
    }

    /** A batch top-N and the scores of every compound it was chosen from. */
    record Batch(List<Ranked> top, Map<String, Ranked> all) {
        List<String> ids() {
            return top.stream().map(Ranked::compoundId).toList();
        }
    }

    private final ModelManifest manifest;
    private final ManifestSettings settings;
    private final int factorRecords;
    private final int neighbourRecords;
    private final String[] compoundIds;
    private final Map<String, Integer> index;
    private final FactorMatrix factors;
    private final NeighbourLists neighbours;
    private final FoldIn foldIn;

    private PublishedVersion(ModelManifest manifest, List<ItemFactors> factorList, List<ItemNeighbours> neighbourList) {
        this.manifest = manifest;
        this.settings = ManifestSettings.of(manifest);
        this.factorRecords = factorList.size();
        this.neighbourRecords = neighbourList.size();
        TreeSet<String> ids = new TreeSet<>();
        factorList.forEach(f -> ids.add(f.compoundId()));
        for (ItemNeighbours n : neighbourList) {
            ids.add(n.compoundId());
            n.neighbours().forEach(nb -> ids.add(nb.compoundId()));
        }
        this.compoundIds = ids.toArray(String[]::new);
        this.index = new HashMap<>();
        for (int i = 0; i < compoundIds.length; i++) {
            index.put(compoundIds[i], i);
        }
        int rank = manifest.rank();
        this.factors = new FactorMatrix(compoundIds.length, rank);
        for (ItemFactors f : factorList) {
            double[] row = new double[rank];
            for (int k = 0; k < rank; k++) {
                row[k] = f.factors()[k];
            }
            factors.setRow(index.get(f.compoundId()), row);
        }
        int[][] neighbourIds = new int[compoundIds.length][0];
        double[][] similarities = new double[compoundIds.length][0];
        for (ItemNeighbours n : neighbourList) {
            int row = index.get(n.compoundId());
            List<Neighbour> list = n.neighbours();
            neighbourIds[row] = list.stream().mapToInt(nb -> index.get(nb.compoundId())).toArray();
            similarities[row] = list.stream().mapToDouble(Neighbour::similarity).toArray();
        }
        this.neighbours = new NeighbourLists(neighbourIds, similarities);
        double[] gram = manifest.gram().stream().mapToDouble(Double::doubleValue).toArray();
        this.foldIn = new FoldIn(new FixedFactors(factors, gram),
                settings.foldIn().toConfig(rank, manifest.lambda(), manifest.alpha()));
    }

    /** Every version whose manifest is on the broker under its own name, by version name. */
    static Map<String, PublishedVersion> readAll(String bootstrap, Topics topics, Duration timeout) {
        TopicSnapshotReader reader = new TopicSnapshotReader(bootstrap, timeout, line -> { });
        Map<String, ModelManifest> manifests = latest(reader.read(topics.modelManifests(), n -> { }));
        Map<String, List<ItemFactors>> factorsByVersion = new HashMap<>();
        latest(reader.read(topics.modelItemFactors(), n -> { })).values()
                .forEach(f -> factorsByVersion.computeIfAbsent(f.version(), v -> new ArrayList<>()).add(f));
        Map<String, List<ItemNeighbours>> neighboursByVersion = new HashMap<>();
        latest(reader.read(topics.itemNeighbours(), n -> { })).values()
                .forEach(n -> neighboursByVersion.computeIfAbsent(n.version(), v -> new ArrayList<>()).add(n));
        Map<String, PublishedVersion> out = new TreeMap<>();
        manifests.forEach((key, manifest) -> {
            if (key.equals(manifest.version())) {
                out.put(key, new PublishedVersion(manifest, factorsByVersion.getOrDefault(key, List.of()),
                        neighboursByVersion.getOrDefault(key, List.of())));
            }
        });
        return out;
    }

    /** The latest value per key in offset order; a tombstone removes its key. */
    private static <V> Map<String, V> latest(TopicSnapshotReader.Snapshot<V> snapshot) {
        if (snapshot.skipped() > 0) {
            throw new IllegalStateException(snapshot.skipped() + " unreadable model records");
        }
        Map<String, V> out = new LinkedHashMap<>();
        for (TopicSnapshotReader.KeyedValue<V> r : snapshot.records()) {
            if (r.value() == null) {
                out.remove(r.key());
            } else {
                out.put(r.key(), r.value());
            }
        }
        return out;
    }

    ModelManifest manifest() {
        return manifest;
    }

    /** Whether every record the manifest counts is on the broker. */
    boolean complete() {
        return factorRecords == manifest.itemCount() && neighbourRecords == manifest.neighbourCount();
    }

    /**
     * The batch top-{@code n} of one researcher from their events in processing order; compounds the
     * version does not know carry no strength into it, as they have no factors and no neighbours.
     *
     * @param eligible whether a compound may be offered (catalogue, authorisations, earlier use)
     */
    Batch topN(List<UsageEvent> events, Predicate<String> eligible, int n) {
        // r_ui at the precision the streams app keeps it (a float sum, docs/runtime.md "State"): a double
        // sum differs by about 1e-7, enough to swap two near-equal CF ranks under rank fusion
        Map<String, Float> strengths = new LinkedHashMap<>();
        for (UsageEvent e : events) {
            Instant at = Instant.parse(e.occurredAt());
            // each event counts as of its own time, as the stream adds it
            float contribution = (float) settings.weights().contribution(e.kind(), e.quantity(), at, at);
            strengths.merge(e.compoundId(), contribution, Float::sum);
        }
        int[] items = new int[strengths.size()];
        double[] values = new double[strengths.size()];
        int size = 0;
        for (Map.Entry<String, Float> s : strengths.entrySet()) {
            Integer i = index.get(s.getKey());
            if (i != null && s.getValue() > 0) {
                items[size] = i;
                values[size++] = s.getValue();
            }
        }
        OneResearcherScoring.Scores scores = OneResearcherScoring.score(foldIn, factors, neighbours, settings.fusion(),
                java.util.Arrays.copyOf(items, size), java.util.Arrays.copyOf(values, size));
        Map<String, Ranked> all = new HashMap<>();
        for (int i = 0; i < compoundIds.length; i++) {
            all.put(compoundIds[i], new Ranked(compoundIds[i], scores.cf()[i], scores.semantic()[i], scores.fused()[i]));
        }
        List<Ranked> top = new ArrayList<>();
        for (int i : OneResearcherScoring.topN(scores.fused(), n, i -> eligible.test(compoundIds[i]))) {
            top.add(all.get(compoundIds[i]));
        }
        return new Batch(top, all);
    }
}
