package org.congener.core.ontology.neighbours;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.stream.Collectors;

import org.congener.core.ontology.Ontology;
import org.congener.core.ontology.RandomDag;
import org.congener.core.ontology.SmallDag;
import org.congener.core.ontology.ic.InformationContent;
import org.congener.core.ontology.ic.SanchezIntrinsicIc;
import org.congener.core.ontology.ic.SecoIntrinsicIc;
import org.congener.core.ontology.similarity.Aggregation;
import org.congener.core.ontology.similarity.CompoundSimilarity;
import org.congener.core.ontology.similarity.MeasureKind;
import org.congener.core.ontology.similarity.SimilarityMeasure;
import org.congener.schemas.ItemNeighbours;
import org.congener.schemas.Neighbour;
import org.congener.schemas.SchemaIds;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

class NeighbourCacheTest {

    private static Map<String, int[]> randomCatalogue(Ontology ontology, int compounds, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        Map<String, int[]> catalogue = new LinkedHashMap<>();
        for (int c = 0; c < compounds; c++) {
            int[] terms = new int[1 + random.nextInt(3)];
            for (int i = 0; i < terms.length; i++) {
                terms[i] = random.nextInt(ontology.termCount());
            }
            // the cache treats a compound's terms as a set; give the reference the same sorted set
            catalogue.put(String.format("CMP-%04d", (c * 7919) % compounds),
                    java.util.Arrays.stream(terms).sorted().distinct().toArray());
        }
        catalogue.put("CMP-no-terms", new int[0]);
        return catalogue;
    }

    /** The definition: score every other compound, keep positive scores, best first, ties by id. */
    private static List<Neighbour> bruteForce(String query, Map<String, int[]> catalogue,
                                              CompoundSimilarity similarity, int k) {
        List<Neighbour> all = new ArrayList<>();
        for (Map.Entry<String, int[]> other : catalogue.entrySet()) {
            if (!other.getKey().equals(query)) {
                double s = similarity.similarity(catalogue.get(query), other.getValue());
                if (s > 0) {
                    all.add(new Neighbour(other.getKey(), s));
                }
            }
        }
        all.sort(Comparator.comparingDouble(Neighbour::similarity).reversed()
                .thenComparing(Neighbour::compoundId));
        return all.subList(0, Math.min(k, all.size()));
    }

    @ParameterizedTest
    @EnumSource(MeasureKind.class)
    void shouldEqualTheAllPairsScanForEveryMeasureAndAggregation(MeasureKind kind) {
        Ontology ontology = RandomDag.generate(3_000, 0.3, 11);
        Map<String, int[]> catalogue = randomCatalogue(ontology, 250, 5);
        for (InformationContent ic : List.of(SecoIntrinsicIc.compute(ontology), SanchezIntrinsicIc.compute(ontology))) {
            SimilarityMeasure measure = kind.create(ontology, ic);
            for (Aggregation aggregation : Aggregation.values()) {
                CompoundSimilarity similarity = new CompoundSimilarity(measure, aggregation);
                NeighbourCache cache = NeighbourCache.build(catalogue, similarity, new NeighbourCacheSettings(7, 2));
                for (String compound : catalogue.keySet()) {
                    assertEquals(bruteForce(compound, catalogue, similarity, 7), cache.neighbours(compound),
                            measure + " " + aggregation + " " + compound);
                }
            }
        }
    }

    @Test
    void shouldScoreFarFewerPairsThanAnAllPairsScanWithLin() {
        Ontology ontology = RandomDag.generate(20_000, 0.2, 3);
        Map<String, int[]> catalogue = randomCatalogue(ontology, 2_000, 9);
        SimilarityMeasure lin = MeasureKind.LIN.create(ontology, SecoIntrinsicIc.compute(ontology));
        NeighbourCache cache = NeighbourCache.build(catalogue,
                new CompoundSimilarity(lin, Aggregation.MAX), new NeighbourCacheSettings(10, 2));
        long allPairs = (long) catalogue.size() * (catalogue.size() - 1);
        assertTrue(cache.pairsScored() < allPairs / 4, cache.pairsScored() + " of " + allPairs);
        assertEquals(10, cache.neighbours("CMP-0001").size());
    }

    @Test
    void shouldGiveTheSameResultWithOneThreadOrSeveral() {
        Ontology ontology = RandomDag.generate(2_000, 0.3, 21);
        Map<String, int[]> catalogue = randomCatalogue(ontology, 300, 2);
        CompoundSimilarity similarity = new CompoundSimilarity(
                MeasureKind.LIN.create(ontology, SecoIntrinsicIc.compute(ontology)), Aggregation.BEST_MATCH_AVERAGE);
        NeighbourCache one = NeighbourCache.build(catalogue, similarity, new NeighbourCacheSettings(5, 1));
        NeighbourCache three = NeighbourCache.build(catalogue, similarity, new NeighbourCacheSettings(5, 3));
        Map<String, List<Neighbour>> a = new HashMap<>();
        Map<String, List<Neighbour>> b = new HashMap<>();
        for (String compound : catalogue.keySet()) {
            a.put(compound, one.neighbours(compound));
            b.put(compound, three.neighbours(compound));
        }
        assertEquals(a, b);
    }

    @Test
    void shouldExportEachListAsAnItemNeighboursRecord() {
        SmallDag dag = SmallDag.load();
        SimilarityMeasure lin = MeasureKind.LIN.create(dag.ontology, SecoIntrinsicIc.compute(dag.ontology));
        Map<String, int[]> catalogue = Map.of(
                "acid-1", new int[] {dag.term("E")},
                "acid-2", new int[] {dag.term("F")},
                "base-1", new int[] {dag.term("G")},
                "other", new int[] {dag.term("B")});
        NeighbourCache cache = NeighbourCache.build(catalogue, new CompoundSimilarity(lin, Aggregation.MAX),
                NeighbourCacheSettings.defaults());
        // Lin(E,F) = 0.4717 (MICA C), Lin(E,G) = 0.1383 (MICA A), Lin(E,B) = 0 (MICA R: left out)
        assertEquals(List.of(new Neighbour("acid-2", 0.47167916642628116), new Neighbour("base-1", 0.1383458330929479)),
                cache.neighbours("acid-1"));
        ItemNeighbours record = cache.itemNeighbours("acid-1", "v7");
        assertEquals(SchemaIds.ITEM_NEIGHBOURS, record.schema());
        assertEquals("v7", record.version());
        assertEquals("lin", record.measure());
        assertEquals(cache.neighbours("acid-1"), record.neighbours());
        assertEquals(List.of("acid-1", "acid-2", "base-1", "other"),
                cache.allItemNeighbours("v7").map(ItemNeighbours::compoundId).collect(Collectors.toList()));
        assertEquals(List.of(), cache.neighbours("not-in-catalogue"));
        assertThrows(IllegalArgumentException.class, () -> cache.itemNeighbours("not-in-catalogue", "v7"));
    }

    @Test
    void shouldRejectATermIndexOutsideTheOntology() {
        SmallDag dag = SmallDag.load();
        SimilarityMeasure lin = MeasureKind.LIN.create(dag.ontology, SecoIntrinsicIc.compute(dag.ontology));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> NeighbourCache.build(
                Map.of("x", new int[] {99}), new CompoundSimilarity(lin, Aggregation.MAX),
                NeighbourCacheSettings.defaults()));
        assertTrue(e.getMessage().contains("x"));
        assertThrows(IllegalArgumentException.class, () -> new NeighbourCacheSettings(0, 1));
    }
}
