package org.congener.bench.ontology;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.Locale;

import org.congener.core.ontology.ic.InformationContent;
import org.congener.core.ontology.ic.SecoIntrinsicIc;
import org.congener.core.ontology.io.WordNetNounReader;
import org.congener.core.ontology.io.WordNetNouns;

/**
 * One cold WordNet load plus Seco IC in a fresh JVM, without JMH around it: prints the wall time of the call,
 * the CPU time of the calling thread (which a busy machine does not inflate the way it inflates wall time) and
 * the JVM's uptime when the call began (JVM start, reported apart).
 */
public final class WordNetLoadHarness {
    private WordNetLoadHarness() {
    }

    public static void main(String[] args) throws IOException {
        ThreadMXBean threads = ManagementFactory.getThreadMXBean();
        long startedAfter = ManagementFactory.getRuntimeMXBean().getUptime();
        long cpu0 = threads.getCurrentThreadCpuTime();
        long wall0 = System.nanoTime();
        WordNetNouns nouns = new WordNetNounReader().read(WordNetNounReader.DEBIAN_DATA_NOUN);
        InformationContent ic = SecoIntrinsicIc.compute(nouns.ontology());
        long wall1 = System.nanoTime();
        long cpu1 = threads.getCurrentThreadCpuTime();
        System.out.printf(Locale.ROOT, "load + intrinsic IC of %d synsets: %.0f ms wall, %.0f ms cpu of the "
                        + "calling thread; JVM start before the call: %d ms (max IC %.1f)%n",
                nouns.ontology().termCount(), (wall1 - wall0) / 1e6, (cpu1 - cpu0) / 1e6, startedAfter, ic.max());
    }
}
