package org.congener.bench.ontology;

import java.io.IOException;
import java.util.concurrent.TimeUnit;

import org.congener.core.ontology.ic.InformationContent;
import org.congener.core.ontology.ic.SecoIntrinsicIc;
import org.congener.core.ontology.io.WordNetNounReader;
import org.congener.core.ontology.io.WordNetNouns;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Reads WordNet 3.0's noun hierarchy ({@code /usr/share/wordnet/data.noun}, 82,115 synsets, 15 MB) and computes
 * Seco's intrinsic IC. Single-shot in fresh forks: with no warm-up each measurement is the first call in a new
 * JVM, so JVM start is excluded and class loading plus JIT warm-up are included ({@code -wi 0 -i 1 -f 10}).
 * With warm-up iterations ({@code -wi 5 -i 10}) it gives the steady-state figure.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 0)
@Measurement(iterations = 1)
// the heap the ./congener launcher gives (CONGENER_JAVA_OPTS defaults to -Xmx4g)
@Fork(value = 10, jvmArgsAppend = {"-Xmx4g"})
public class WordNetLoadBenchmark {

    @Benchmark
    public InformationContent loadNounsAndIntrinsicIc() throws IOException {
        WordNetNouns nouns = new WordNetNounReader().read(WordNetNounReader.DEBIAN_DATA_NOUN);
        return SecoIntrinsicIc.compute(nouns.ontology());
    }
}
