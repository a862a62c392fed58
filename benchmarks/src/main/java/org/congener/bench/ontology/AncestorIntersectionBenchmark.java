package org.congener.bench.ontology;

import java.io.IOException;
import java.util.BitSet;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;

import org.congener.core.ontology.Ontology;
import org.congener.core.ontology.ic.InformationContent;
import org.congener.core.ontology.ic.SecoIntrinsicIc;
import org.congener.core.ontology.io.WordNetNounReader;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * The choice of ancestor-set layout: finding the MICA of a random pair by merging two sorted int arrays (what
 * {@link Ontology} stores) against bitsets. A bitset per term is out of reach for large ontologies (N/8 bytes
 * each: 10 kB per term for WordNet, 25 kB for a 200,000-term DAG), so the bitset variants use what memory
 * allows: {@code bitsetPerTerm} precomputes bitsets for the pair's first terms only (an upper bound on bitset
 * speed), {@code bitsetMarkAndScan} sets a's ancestors in one reusable bitset, scans b's, and clears.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(value = 1, jvmArgsAppend = {"-Xmx2g"})
public class AncestorIntersectionBenchmark {
    private static final int PAIRS = 1024;

    @Param({"wordnet", "synthetic-200k"})
    public String graph;

    private Ontology ontology;
    private InformationContent ic;
    private int[] first;
    private int[] second;
    private BitSet[] firstBits;
    private BitSet scratch;
    private int next;

    @Setup
    public void setUp() throws IOException {
        ontology = graph.equals("wordnet")
                ? new WordNetNounReader().read(WordNetNounReader.DEBIAN_DATA_NOUN).ontology()
                : SyntheticCatalogue.dag(200_000, 0.3, 7);
        ic = SecoIntrinsicIc.compute(ontology);
        SplittableRandom random = new SplittableRandom(42);
        first = random.ints(PAIRS, 0, ontology.termCount()).toArray();
        second = random.ints(PAIRS, 0, ontology.termCount()).toArray();
        firstBits = new BitSet[PAIRS];
        for (int i = 0; i < PAIRS; i++) {
            firstBits[i] = new BitSet(ontology.size());
            for (int a : ontology.ancestors(first[i])) {
                firstBits[i].set(a);
            }
        }
        scratch = new BitSet(ontology.size());
    }

    @Benchmark
    public int sortedArrayMerge() {
        int i = next++ & (PAIRS - 1);
        int a = first[i];
        int b = second[i];
        int x = ontology.ancestorsFrom(a);
        int xEnd = ontology.ancestorsTo(a);
        int y = ontology.ancestorsFrom(b);
        int yEnd = ontology.ancestorsTo(b);
        int best = -1;
        double bestIc = -1;
        while (x < xEnd && y < yEnd) {
            int u = ontology.ancestorAt(x);
            int v = ontology.ancestorAt(y);
            if (u < v) {
                x++;
            } else if (v < u) {
                y++;
            } else {
                if (ic.of(u) > bestIc) {
                    bestIc = ic.of(u);
                    best = u;
                }
                x++;
                y++;
            }
        }
        return best;
    }

    @Benchmark
    public int bitsetPerTerm() {
        int i = next++ & (PAIRS - 1);
        BitSet bits = firstBits[i];
        int b = second[i];
        int best = -1;
        double bestIc = -1;
        for (int k = ontology.ancestorsFrom(b); k < ontology.ancestorsTo(b); k++) {
            int m = ontology.ancestorAt(k);
            if (bits.get(m) && ic.of(m) > bestIc) {
                bestIc = ic.of(m);
                best = m;
            }
        }
        return best;
    }

    @Benchmark
    public int bitsetMarkAndScan() {
        int i = next++ & (PAIRS - 1);
        int a = first[i];
        int b = second[i];
        for (int k = ontology.ancestorsFrom(a); k < ontology.ancestorsTo(a); k++) {
            scratch.set(ontology.ancestorAt(k));
        }
        int best = -1;
        double bestIc = -1;
        for (int k = ontology.ancestorsFrom(b); k < ontology.ancestorsTo(b); k++) {
            int m = ontology.ancestorAt(k);
            if (scratch.get(m) && ic.of(m) > bestIc) {
                bestIc = ic.of(m);
                best = m;
            }
        }
        for (int k = ontology.ancestorsFrom(a); k < ontology.ancestorsTo(a); k++) {
            scratch.clear(ontology.ancestorAt(k));
        }
        return best;
    }
}
