package org.congener.core.ontology.ic;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.congener.core.ontology.Ontology;
import org.congener.core.ontology.SmallDag;
import org.junit.jupiter.api.Test;

/**
 * Worked examples on the eight-term DAG of {@link SmallDag}, following each paper's definition by hand.
 * Expected values come from this Python snippet (a direct transcription of the definitions):
 * <pre>
 * from math import log
 * par={'A':['R'],'B':['R'],'C':['A'],'D':['A','B'],'E':['C'],'F':['C'],'G':['D'],'R':[]}
 * def anc(t): return {t}.union(*[anc(p) for p in par[t]])
 * T=list(par); N=len(T)
 * hypo={t:sum(1 for u in T if u!=t and t in anc(u)) for t in T}
 * seco={t:1-log(hypo[t]+1)/log(N) for t in T}
 * leaf=[t for t in T if not any(t in par[u] for u in T)]
 * lv={t:sum(1 for l in leaf if l!=t and t in anc(l)) for t in T}
 * sanchez={t:-log((lv[t]/len(anc(t))+1)/(len(leaf)+1)) for t in T}
 * w={t:{'E':3,'F':1,'G':2}.get(t,0)+1 for t in T}         # add-one smoothing
 * fr={t:sum(w[u] for u in T if t in anc(u)) for t in T}
 * corpus={t:-log(fr[t]/fr['R']) for t in T}
 * </pre>
 */
class InformationContentTest {
    private static final double TOLERANCE = 1e-12;

    private final SmallDag dag = SmallDag.load();

    @Test
    void shouldFollowSecoVealeHayesWhenComputingIntrinsicIc() {
        InformationContent ic = SecoIntrinsicIc.compute(dag.ontology);
        // hypo: R 7 (G counted once although it is reached by two paths), A 5, B 2, C 2, D 1, leaves 0; N = 8
        assertEquals(0.0, ic.of(dag.term("R")), TOLERANCE);
        assertEquals(1 - Math.log(6) / Math.log(8), ic.of(dag.term("A")), TOLERANCE);
        assertEquals(0.1383458330929479, ic.of(dag.term("A")), TOLERANCE);
        assertEquals(0.47167916642628116, ic.of(dag.term("B")), TOLERANCE);
        assertEquals(0.47167916642628116, ic.of(dag.term("C")), TOLERANCE);
        assertEquals(2.0 / 3.0, ic.of(dag.term("D")), TOLERANCE);
        assertEquals(1.0, ic.of(dag.term("G")), TOLERANCE);
        assertEquals(1.0, ic.max(), TOLERANCE);
        assertEquals(SecoIntrinsicIc.METHOD, ic.method());
    }

    @Test
    void shouldFollowSanchezBatetIsernWhenComputingIntrinsicIc() {
        InformationContent ic = SanchezIntrinsicIc.compute(dag.ontology);
        // leaves E, F, G (max_leaves 3); D: 1 leaf, 4 subsumers -> -log((1/4 + 1) / 4)
        assertEquals(0.0, ic.of(dag.term("R")), TOLERANCE);
        assertEquals(0.4700036292457356, ic.of(dag.term("A")), TOLERANCE);
        assertEquals(0.9808292530117262, ic.of(dag.term("B")), TOLERANCE);
        assertEquals(0.8754687373539001, ic.of(dag.term("C")), TOLERANCE);
        assertEquals(-Math.log(1.25 / 4), ic.of(dag.term("D")), TOLERANCE);
        assertEquals(Math.log(4), ic.of(dag.term("E")), TOLERANCE);
    }

    @Test
    void shouldPropagateUsageCountsToAncestorsWhenComputingCorpusIc() {
        Ontology o = dag.ontology;
        double[] counts = new double[o.size()];
        counts[dag.term("E")] = 3;
        counts[dag.term("F")] = 1;
        counts[dag.term("G")] = 2;
        InformationContent ic = ResnikCorpusIc.compute(o, counts, 1.0);
        // freq with add-one: R 14, A 12, B 5, C 7, D 4, E 4, F 2, G 3
        assertEquals(0.0, ic.of(dag.term("R")), TOLERANCE);
        assertEquals(-Math.log(12.0 / 14), ic.of(dag.term("A")), TOLERANCE);
        assertEquals(1.0296194171811581, ic.of(dag.term("B")), TOLERANCE);
        assertEquals(Math.log(2), ic.of(dag.term("C")), TOLERANCE);
        assertEquals(1.252762968495368, ic.of(dag.term("D")), TOLERANCE);
        assertEquals(1.9459101490553135, ic.of(dag.term("F")), TOLERANCE);
        assertEquals(1.540445040947149, ic.of(dag.term("G")), TOLERANCE);
        assertEquals(1.9459101490553135, ic.max(), TOLERANCE);
    }

    @Test
    void shouldNeverRiseFromATermToItsParentsForAnyMethod() {
        Ontology o = dag.ontology;
        double[] counts = new double[o.size()];
        counts[dag.term("D")] = 5;
        for (InformationContent ic : new InformationContent[] {SecoIntrinsicIc.compute(o),
                SanchezIntrinsicIc.compute(o), ResnikCorpusIc.compute(o, counts, 0.5)}) {
            for (int t = 0; t < o.size(); t++) {
                for (int p : o.parents(t)) {
                    assertTrue(ic.of(p) < ic.of(t), ic.method() + ": parent " + o.name(p) + " of " + o.name(t));
                }
            }
        }
    }

    @Test
    void shouldRejectCountsOfTheWrongLengthOrNoSmoothing() {
        Ontology o = dag.ontology;
        assertThrows(IllegalArgumentException.class, () -> ResnikCorpusIc.compute(o, new double[3], 1.0));
        assertThrows(IllegalArgumentException.class, () -> ResnikCorpusIc.compute(o, new double[o.size()], 0.0));
    }
}
