package org.congener.trainer.evaluation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.congener.core.fusion.NeighbourLists;
import org.congener.core.interactions.InteractionLog;
import org.congener.core.interactions.InteractionWeights;
import org.congener.core.split.TimeSplit;
import org.congener.core.ontology.io.EdgeListReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class OfflineExperimentTest {

    @Test
    void shouldReportEveryModelWithIntervalsAndTheDocumentedJsonStructure(@TempDir Path dir) throws Exception {
        Path edges = dir.resolve("taxonomy.tsv");
        Path events = dir.resolve("interactions.tsv");
        TaxonomyScenario.writeEdges(edges);
        TaxonomyScenario.writeInteractions(events, 150, 14, 5L);
        InteractionLog log = InteractionFileReader.read(events, InteractionWeights.defaults(), List.of());
        NeighbourLists neighbours = OntologyNeighbours.build(new EdgeListReader().read(edges), log.items(), null, 30, 2)
                .neighbours();
        ExperimentSettings settings = ExperimentSettings.defaults(new TimeSplit(0.2), new int[] {1, 5, 10})
                .withGrid(List.of(8), List.of(0.1), List.of(5.0)).withThreads(2);
        ExperimentReport report = new OfflineExperiment(settings, Progress.silent()).run(log, neighbours, java.util.Map.of());

        assertEquals(List.of("ALS", "BPR", "popularity", "semantic-only", "ALS×semantic", "BPR×semantic", "blend",
                "rank-fusion"), report.models().stream().map(ModelResult::name).toList());
        for (ModelResult m : report.models()) {
            m.metrics().forEach((name, ci) -> {
                assertTrue(ci.lower() <= ci.mean() + 1e-12 && ci.mean() <= ci.upper() + 1e-12, m.name() + " " + name);
                assertTrue(ci.mean() >= 0 && ci.mean() <= 1, m.name() + " " + name + " " + ci.mean());
            });
        }
        List<Double> objective = report.alsObjective();
        assertEquals(10, objective.size());
        assertTrue(objective.get(9) < objective.get(0));
        // the researchers here work inside taxonomy groups: the semantic baseline must beat popularity
        double semantic = metric(report, "semantic-only", "ndcg@10");
        double popularity = metric(report, "popularity", "ndcg@10");
        assertTrue(semantic > popularity, semantic + " vs " + popularity);

        ReportWriter.writeAll(report, dir.resolve("out"));
        JsonNode json = new ObjectMapper().readTree(dir.resolve("out/report.json").toFile());
        assertEquals(ReportWriter.SCHEMA, json.get("schema").asText());
        assertEquals(150, json.get("data").get("researchers").asInt());
        JsonNode first = json.get("models").get(0);
        assertEquals("ALS", first.get("name").asText());
        assertTrue(first.get("configuration").has("rank"));
        JsonNode ndcg10 = null;
        for (JsonNode m : first.get("metrics")) {
            if (m.get("metric").asText().equals("ndcg") && m.get("k").asInt() == 10) {
                ndcg10 = m;
            }
        }
        assertTrue(ndcg10 != null && ndcg10.has("value") && ndcg10.has("lower") && ndcg10.has("upper"));
        assertTrue(json.get("comparisons").size() >= 1);
        String html = Files.readString(dir.resolve("out/report.html"));
        assertTrue(html.contains("<svg") && html.contains("ndcg@k") && html.contains("safety data sheet"));
    }

    @Test
    void shouldNameTheLineWhenATsvLineIsBad(@TempDir Path dir) throws Exception {
        Path events = dir.resolve("bad.tsv");
        Files.write(events, List.of("r1\tc1\t1", "r1\tc2\tmany"));
        InputFileException e = org.junit.jupiter.api.Assertions.assertThrows(InputFileException.class,
                () -> InteractionFileReader.read(events, InteractionWeights.defaults(), List.of()));
        assertTrue(e.getMessage().contains("bad.tsv:2") && e.getMessage().contains("many"), e.getMessage());
    }

    @Test
    void shouldNameTheLineWhenAJsonEventLacksAField(@TempDir Path dir) throws Exception {
        Path events = dir.resolve("events.jsonl");
        Files.write(events, List.of(
                "{\"researcherId\":\"r1\",\"compoundId\":\"c1\",\"kind\":\"order\",\"quantity\":2,\"occurredAt\":\"2026-01-01T00:00:00Z\"}",
                "{\"researcherId\":\"r1\",\"kind\":\"view\",\"occurredAt\":\"2026-01-02T00:00:00Z\"}"));
        InputFileException e = org.junit.jupiter.api.Assertions.assertThrows(InputFileException.class,
                () -> InteractionFileReader.read(events, InteractionWeights.defaults(), List.of()));
        assertTrue(e.getMessage().contains("events.jsonl:2") && e.getMessage().contains("compoundId"), e.getMessage());
    }

    @Test
    void shouldReadUsageEventLinesWithKindWeights(@TempDir Path dir) throws Exception {
        Path events = dir.resolve("events.jsonl");
        Files.write(events, List.of(
                "{\"researcherId\":\"r1\",\"compoundId\":\"c1\",\"kind\":\"order\",\"quantity\":0,\"occurredAt\":\"2026-01-01T00:00:00Z\"}",
                "{\"researcherId\":\"r1\",\"compoundId\":\"c1\",\"kind\":\"usage-log\",\"quantity\":0,\"occurredAt\":\"2026-01-02T00:00:00Z\"}"));
        InteractionLog log = InteractionFileReader.read(events, InteractionWeights.defaults(), List.of());
        assertEquals(1, log.interactions().size());
        // order 1.0 + usage-log 0.4 (InteractionWeights defaults)
        assertEquals(1.4, log.interactions().get(0).strength(), 1e-12);
    }

    @Test
    void shouldTurnTheOntologysNeighbourCacheIntoListsOverTheExperimentsItems(@TempDir Path dir) throws Exception {
        Path edges = dir.resolve("t.tsv");
        // root ← a ← {x, y}; root ← b: 5 terms; hypo(a) = 2
        Files.write(edges, List.of("a\troot", "b\troot", "x\ta", "y\ta"));
        org.congener.core.interactions.IdIndex items = new org.congener.core.interactions.IdIndex();
        for (String id : List.of("x", "y", "b", "not-a-term")) {
            items.indexOrAdd(id);
        }
        OntologyNeighbours.Result result = OntologyNeighbours.build(new EdgeListReader().read(edges), items, null, 5, 1);
        // Lin on Seco et al. 2004 intrinsic IC: IC = 1 − ln(hypo + 1)/ln N; Lin(x, y) = 2·IC(a)/(IC(x) + IC(y))
        // = IC(a) = 1 − ln 3 / ln 5 (leaves have IC 1); x and b share only the root (IC 0)
        double icA = 1 - Math.log(3) / Math.log(5);
        assertEquals(icA, result.neighbours().similarity(0, 1), 1e-9);
        assertEquals(0.0, result.neighbours().similarity(0, 2), 1e-12);
        assertEquals(1, result.itemsWithoutTerms());
        assertEquals(0, result.neighbours().neighbours(3).length);
    }

    private static double metric(ExperimentReport report, String model, String metric) {
        return report.models().stream().filter(m -> m.name().equals(model)).findFirst().orElseThrow()
                .metrics().get(metric).mean();
    }
}
