package org.congener.bench.ontology;

import java.io.IOException;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;

import org.congener.core.ontology.Ontology;
import org.congener.core.ontology.ic.InformationContent;
import org.congener.core.ontology.ic.SecoIntrinsicIc;
import org.congener.core.ontology.io.WordNetNounReader;
import org.congener.core.ontology.similarity.MeasureKind;
import org.congener.core.ontology.similarity.SimilarityMeasure;
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

/** Nanoseconds for one similarity of a random pair of WordNet noun synsets (MICA by merging ancestor sets). */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(value = 1, jvmArgsAppend = {"-Xmx1g"})
public class PairSimilarityBenchmark {
    private static final int PAIRS = 4096;

    @Param({"lin", "resnik", "jc"})
    public String measure;

    private SimilarityMeasure similarity;
    private int[] first;
    private int[] second;
    private int next;

    @Setup
    public void setUp() throws IOException {
        Ontology ontology = new WordNetNounReader().read(WordNetNounReader.DEBIAN_DATA_NOUN).ontology();
        InformationContent ic = SecoIntrinsicIc.compute(ontology);
        similarity = MeasureKind.fromLabel(measure).create(ontology, ic);
        SplittableRandom random = new SplittableRandom(42);
        first = random.ints(PAIRS, 0, ontology.termCount()).toArray();
        second = random.ints(PAIRS, 0, ontology.termCount()).toArray();
    }

    @Benchmark
    public double similarityOfOnePair() {
        int i = next++ & (PAIRS - 1);
        return similarity.similarity(first[i], second[i]);
    }
}
