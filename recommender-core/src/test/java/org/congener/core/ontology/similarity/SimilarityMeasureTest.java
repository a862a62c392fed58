package org.congener.core.ontology.similarity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.congener.core.ontology.Ontology;
import org.congener.core.ontology.SmallDag;
import org.congener.core.ontology.ic.InformationContent;
import org.congener.core.ontology.ic.SecoIntrinsicIc;
import org.junit.jupiter.api.Test;

/**
 * Worked examples on {@link SmallDag} with Seco's intrinsic IC (values in {@link
 * org.congener.core.ontology.ic.InformationContentTest}). Expected similarities come from, continuing that
 * snippet:
 * <pre>
 * def mica(a,b,ic): return max(anc(a)&amp;anc(b), key=lambda m: ic[m])
 * def lin(a,b,ic): return 1.0 if a==b else 2*ic[mica(a,b,ic)]/(ic[a]+ic[b])
 * def res(a,b,ic): return ic[mica(a,b,ic)]/max(ic.values())
 * def jc(a,b,ic): return 1-(ic[a]+ic[b]-2*ic[mica(a,b,ic)])/(2*max(ic.values()))
 * </pre>
 */
class SimilarityMeasureTest {
    private static final double TOLERANCE = 1e-12;

    private final SmallDag dag = SmallDag.load();
    private final Ontology o = dag.ontology;
    private final InformationContent ic = SecoIntrinsicIc.compute(o);
    private final SimilarityMeasure lin = new LinSimilarity(o, ic);
    private final SimilarityMeasure resnik = new ResnikSimilarity(o, ic);
    private final SimilarityMeasure jc = new JiangConrathSimilarity(o, ic);

    private double lin(String a, String b) {
        return lin.similarity(dag.term(a), dag.term(b));
    }

    @Test
    void shouldFindTheMostInformativeCommonAncestorByIc() {
        assertEquals(dag.term("C"), lin.mostInformativeCommonAncestor(dag.term("E"), dag.term("F")));
        // E and G share A and R; A is more informative
        assertEquals(dag.term("A"), lin.mostInformativeCommonAncestor(dag.term("E"), dag.term("G")));
        assertEquals(dag.term("R"), lin.mostInformativeCommonAncestor(dag.term("E"), dag.term("B")));
        // G lies below both A and B; B (IC 0.47) beats A (IC 0.14)
        assertEquals(dag.term("B"), lin.mostInformativeCommonAncestor(dag.term("G"), dag.term("B")));
    }

    @Test
    void shouldMatchLin1998OnWorkedPairs() {
        assertEquals(0.47167916642628116, lin("E", "F"), TOLERANCE); // 2·IC(C) / (1 + 1)
        assertEquals(0.1383458330929479, lin("E", "G"), TOLERANCE);  // 2·IC(A) / (1 + 1)
        assertEquals(0.24306468047070498, lin("D", "C"), TOLERANCE); // 2·0.1383 / (0.6667 + 0.4717)
        assertEquals(0.6410081452354491, lin("G", "B"), TOLERANCE);  // 2·0.4717 / (1 + 0.4717)
        assertEquals(0.0, lin("E", "B"), TOLERANCE);                 // MICA is the root, IC 0
    }

    @Test
    void shouldMatchResnik1995OnWorkedPairs() {
        assertEquals(0.47167916642628116, resnik.similarity(dag.term("E"), dag.term("F")), TOLERANCE);
        assertEquals(0.1383458330929479, resnik.similarity(dag.term("D"), dag.term("C")), TOLERANCE);
        assertEquals(0.47167916642628116, resnik.similarity(dag.term("G"), dag.term("B")), TOLERANCE);
    }

    @Test
    void shouldMatchJiangConrath1997AsOneMinusHalfTheDistance() {
        assertEquals(0.5691729165464741, jc.similarity(dag.term("D"), dag.term("C")), TOLERANCE);
        assertEquals(0.7358395832131406, jc.similarity(dag.term("G"), dag.term("B")), TOLERANCE);
        assertEquals(0.2641604167868594, jc.similarity(dag.term("E"), dag.term("B")), TOLERANCE);
    }

    @Test
    void shouldBeSymmetricAndInTheUnitIntervalForEveryPair() {
        for (SimilarityMeasure m : new SimilarityMeasure[] {lin, resnik, jc}) {
            for (int a = 0; a < o.size(); a++) {
                for (int b = 0; b < o.size(); b++) {
                    double s = m.similarity(a, b);
                    assertEquals(s, m.similarity(b, a), 0.0, m + " symmetric");
                    assertEquals(m.mostInformativeCommonAncestor(a, b), m.mostInformativeCommonAncestor(b, a));
                    assertTrue(s >= 0 && s <= 1, m + " range: " + s);
                }
            }
        }
    }

    @Test
    void shouldGiveLinOfATermWithItselfOne() {
        for (int c = 0; c < o.size(); c++) {
            assertEquals(1.0, lin.similarity(c, c), 0.0);
            assertEquals(1.0, jc.similarity(c, c), 0.0);
        }
    }

    @Test
    void shouldReturnTheAncestorAsMicaOfATermAndItsAncestor() {
        for (int t = 0; t < o.size(); t++) {
            for (int a : o.ancestors(t)) {
                assertEquals(a, lin.mostInformativeCommonAncestor(t, a));
                assertEquals(a, lin.mostInformativeCommonAncestor(a, t));
            }
        }
    }

    @Test
    void shouldNeverExceedItsBoundForAnyTermBelowTheCommonAncestor() {
        for (SimilarityMeasure m : new SimilarityMeasure[] {lin, resnik, jc}) {
            for (int a = 0; a < o.size(); a++) {
                for (int b = 0; b < o.size(); b++) {
                    int mica = m.mostInformativeCommonAncestor(a, b);
                    assertTrue(m.similarity(a, b) <= m.upperBound(a, mica) + 1e-15, m + " bound");
                }
            }
        }
    }

    @Test
    void shouldCreateMeasuresByLabelAndRejectUnknownLabels() {
        assertEquals("lin", MeasureKind.fromLabel("LIN").create(o, ic).name());
        assertEquals("jc", MeasureKind.fromLabel("jc").create(o, ic).name());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> MeasureKind.fromLabel("cos"));
        assertTrue(e.getMessage().contains("lin, resnik, jc"));
    }
}
