package org.congener.bench.ontology;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.SplittableRandom;

import org.congener.core.ontology.Ontology;
import org.congener.core.ontology.io.OboReader;

/**
 * Writes a synthetic OBO file of about the given size (default 200 MB) whose stanzas carry the tags a
 * chemical-entity ontology has (def, synonyms, xrefs, property values, relationships, alt_ids, some obsolete
 * terms), then reads it and prints the time and the heap used. Run it under a small -Xmx to show the reader
 * streams: e.g. {@code -Xmx600m} is three times the file size.
 *
 * <p>Arguments (optional): target megabytes, output file.
 */
public final class OboLoadHarness {
    private OboLoadHarness() {
    }

    public static void main(String[] args) throws IOException {
        long targetBytes = (args.length > 0 ? Long.parseLong(args[0]) : 200) * 1_000_000L;
        Path file = args.length > 1 ? Path.of(args[1]) : Files.createTempFile("synthetic-", ".obo");
        try {
            long terms = write(file, targetBytes);
            System.out.printf(Locale.ROOT, "wrote %s: %.1f MB, %d stanzas%n", file, Files.size(file) / 1e6, terms);
            HeapPeaks.reset();
            long start = System.nanoTime();
            Ontology ontology = new OboReader().read(file);
            long elapsed = System.nanoTime() - start;
            long peak = HeapPeaks.peak();
            System.gc();
            Runtime runtime = Runtime.getRuntime();
            System.out.printf(Locale.ROOT, "read %d terms, %d edges, %d obsolete left out in %.2f s; "
                            + "peak heap %.1f MB, live heap after %.1f MB, max heap %.1f MB%n",
                    ontology.termCount(), ontology.edgeCount(), ontology.obsoleteTermsLeftOut(), elapsed / 1e9,
                    peak / 1e6, (runtime.totalMemory() - runtime.freeMemory()) / 1e6, runtime.maxMemory() / 1e6);
        } finally {
            if (args.length < 2) {
                Files.deleteIfExists(file);
            }
        }
    }

    private static long write(Path file, long targetBytes) throws IOException {
        SplittableRandom random = new SplittableRandom(1);
        long written = 0;
        long t = 0;
        try (BufferedWriter out = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            out.write("format-version: 1.4\nontology: syn\n\n[Typedef]\nid: part_of\nname: part of\n\n");
            while (written < targetBytes) {
                StringBuilder s = new StringBuilder(1024);
                s.append("[Term]\nid: SYN:").append(t).append('\n');
                s.append("name: synthetic entity ").append(t).append('\n');
                if (t > 0 && t % 50 == 0) {
                    s.append("alt_id: SYNALT:").append(t).append('\n');
                }
                s.append("def: \"A generated definition for entity ").append(t)
                        .append(" that is long enough to look like a curated one, with words and words.\" []\n");
                for (int k = 0; k < 4; k++) {
                    s.append("synonym: \"entity ").append(t).append(" synonym ").append(k)
                            .append("\" RELATED [SYN:curators]\n");
                }
                for (int k = 0; k < 3; k++) {
                    s.append("xref: DB").append(k).append(':').append(random.nextInt(1_000_000)).append('\n');
                }
                s.append("property_value: http://example.org/mass \"").append(random.nextInt(1000))
                        .append(".0\" xsd:string\n");
                boolean obsolete = t > 10 && t % 97 == 0;
                if (obsolete) {
                    s.append("is_obsolete: true\nreplaced_by: SYN:").append(t - 1).append('\n');
                } else if (t > 0) {
                    s.append("is_a: SYN:").append(parentOf(t, random)).append(" ! parent\n");
                    if (random.nextInt(4) == 0) {
                        s.append("is_a: SYN:").append(parentOf(t, random)).append(" ! second parent\n");
                    }
                    s.append("relationship: part_of SYN:").append(parentOf(t, random)).append('\n');
                }
                s.append('\n');
                out.write(s.toString());
                written += s.length();
                t++;
            }
        }
        return t;
    }

    /** A non-obsolete earlier term. */
    private static long parentOf(long t, SplittableRandom random) {
        long p;
        do {
            p = random.nextLong(t);
        } while (p > 10 && p % 97 == 0);
        return p;
    }
}
