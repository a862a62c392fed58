package org.congener.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.congener.core.ontology.Ontology;
import org.congener.core.ontology.ic.SecoIntrinsicIc;
import org.congener.core.ontology.io.WordNetNounReader;
import org.congener.core.ontology.similarity.LinSimilarity;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The ontology subcommands on an outside taxonomy: WordNet 3.0's noun hierarchy (Debian's wordnet-base) written
 * as an edge list. Counts are those of {@code shared/data/README.md}; similarities must equal what the library
 * computes from {@code data.noun} directly.
 */
class WordNetEdgeListCliTest {
    private static final String CAR = "02958343";           // car, auto, automobile, machine, motorcar
    private static final String MOTOR_VEHICLE = "03791235"; // its hypernym

    @TempDir
    static Path dir;
    private static Path edges;
    private static Ontology direct;

    @BeforeAll
    static void writeEdgeList() throws IOException {
        assertTrue(Files.isReadable(WordNetNounReader.DEBIAN_DATA_NOUN),
                WordNetNounReader.DEBIAN_DATA_NOUN + " is missing: install Debian's wordnet-base package "
                        + "(apt-get install -y wordnet-base), as .ci/run does");
        direct = new WordNetNounReader().read(WordNetNounReader.DEBIAN_DATA_NOUN).ontology();
        edges = dir.resolve("wordnet-nouns.tsv");
        try (BufferedWriter out = Files.newBufferedWriter(edges, StandardCharsets.UTF_8)) {
            out.write("# WordNet 3.0 nouns: synset<TAB>hypernym synset\n");
            for (int t = 0; t < direct.termCount(); t++) {
                if (direct.parentCount(t) == 0) {
                    out.write(direct.termId(t) + "\n");
                }
                for (int p : direct.parents(t)) {
                    out.write(direct.termId(t) + "\t" + direct.termId(p) + "\n");
                }
            }
        }
    }

    @Test
    void shouldCountTheNounHierarchy() {
        CliRun run = CliRun.of("ontology-stats", "--ontology", edges.toString(), "--format", "edges");
        assertEquals(0, run.exitCode(), run.err());
        assertTrue(run.out().startsWith("terms\t82115\nedges\t84427\nroots\t1\nvirtual_root\tno\n"), run.out());
    }

    @Test
    void shouldScorePairsAsTheLibraryDoesOnDataNoun() throws IOException {
        Path pairs = Files.writeString(dir.resolve("pairs.tsv"), CAR + "\t" + MOTOR_VEHICLE + "\n" + CAR + "\tnope\n");
        CliRun run = CliRun.of("similarity", "--ontology", edges.toString(), "--format", "edges",
                "--pairs", pairs.toString());
        LinSimilarity lin = new LinSimilarity(direct, SecoIntrinsicIc.compute(direct));
        double expected = lin.similarity(direct.termIndex(CAR), direct.termIndex(MOTOR_VEHICLE));
        assertEquals(CAR + "\t" + MOTOR_VEHICLE + "\t" + expected + "\n", run.out());
        assertTrue(run.err().contains(":2: unknown term 'nope'"), run.err());
        assertEquals(1, run.exitCode());
    }
}
