package org.congener.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Runs {@code congener similarity} on the eight-term DAG of {@code small-dag.obo} (R ← A, R ← B, A ← C, A ← D,
 * B ← D, C ← E, C ← F, D ← G). Expected similarities are the worked examples of recommender-core's
 * SimilarityMeasureTest: Lin(E,F) = 2·IC(C)/2 = 1 − log 3/log 8 with Seco's IC.
 */
class SimilarityCommandTest {
    private static final String E = "CGT:0000006";
    private static final String F = "CGT:0000007";
    private static final String G = "CGT:0000008";
    private static final String B = "CGT:0000003";

    @TempDir
    Path dir;
    private Path obo;

    @BeforeEach
    void copyFixture() throws IOException {
        obo = dir.resolve("small-dag.obo");
        try (InputStream in = getClass().getResourceAsStream("/ontology/small-dag.obo")) {
            Files.copy(in, obo, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    private Path write(String name, String content) throws IOException {
        return Files.writeString(dir.resolve(name), content);
    }

    @Test
    void shouldPrintOneLinePerPairWithLinByDefault() throws IOException {
        Path pairs = write("pairs.tsv", E + "\t" + F + "\n" + G + "\t" + B + "\n");
        CliRun run = CliRun.of("similarity", "--ontology", obo.toString(), "--pairs", pairs.toString());
        assertEquals(0, run.exitCode(), run.err());
        assertEquals(E + "\t" + F + "\t" + (1 - Math.log(3) / Math.log(8)) + "\n"
                + G + "\t" + B + "\t0.6410081452354491\n", run.out());
        assertEquals("", run.err());
    }

    @Test
    void shouldReportAnUnknownIdWithItsLineAndGoOn() throws IOException {
        Path pairs = write("pairs.tsv", "# header comment\n" + E + "\tCGT:404\n" + E + "\t" + E + "\nbroken line\n"
                + G + "\t" + B + "\n");
        CliRun run = CliRun.of("similarity", "--ontology", obo.toString(), "--pairs", pairs.toString(),
                "--measure", "resnik");
        assertEquals(1, run.exitCode());
        assertEquals(E + "\t" + E + "\t1.0\n" + G + "\t" + B + "\t0.47167916642628116\n", run.out());
        assertTrue(run.err().contains(pairs + ":2: unknown term 'CGT:404'"), run.err());
        assertTrue(run.err().contains(pairs + ":4: expected 'a<TAB>b'"), run.err());
    }

    @Test
    void shouldUseCorpusCountsWhenAskedFor() throws IOException {
        // counts E 3, F 1, G 2 with add-one smoothing: Lin(G,B) = 2·IC(B)/(IC(G)+IC(B)) = 0.8012401509423587
        Path counts = write("counts.tsv", E + "\t3\n" + F + "\t1\n" + G + "\t2\n");
        Path pairs = write("pairs.tsv", G + "\t" + B + "\n");
        CliRun run = CliRun.of("similarity", "--ontology", obo.toString(), "--pairs", pairs.toString(),
                "--ic", "corpus", "--counts", counts.toString());
        assertEquals(0, run.exitCode(), run.err());
        assertEquals(G + "\t" + B + "\t0.8012401509423587\n", run.out());
    }

    @Test
    void shouldReadEdgeListsAndAcceptJiangConrath() throws IOException {
        Path edges = write("tree.tsv", "b\ta\nc\ta\n");
        Path pairs = write("pairs.tsv", "b\tc\n");
        CliRun run = CliRun.of("similarity", "--ontology", edges.toString(), "--format", "edges",
                "--pairs", pairs.toString(), "--measure", "jc");
        // IC(b) = IC(c) = 1, IC(a) = 0: dist = 2, sim = 1 − 2/2 = 0
        assertEquals(0, run.exitCode(), run.err());
        assertEquals("b\tc\t0.0\n", run.out());
    }

    @Test
    void shouldNameTheLineAndFailWhenTheOntologyIsBroken() throws IOException {
        Path broken = write("broken.obo", "[Term]\nid: X:1\nis_a: X:2\n");
        Path pairs = write("pairs.tsv", "X:1\tX:1\n");
        CliRun run = CliRun.of("similarity", "--ontology", broken.toString(), "--pairs", pairs.toString());
        assertEquals(1, run.exitCode());
        assertTrue(run.err().contains("line 3: term X:1: dangling parent: X:2"), run.err());
        assertEquals("", run.out());
    }

    @Test
    void shouldRejectAnUnknownMeasureWithUsageExitCode() throws IOException {
        Path pairs = write("pairs.tsv", E + "\t" + F + "\n");
        CliRun run = CliRun.of("similarity", "--ontology", obo.toString(), "--pairs", pairs.toString(),
                "--measure", "cosine");
        assertEquals(2, run.exitCode());
        assertTrue(run.err().contains("unknown measure 'cosine'"), run.err());
    }

    @Test
    void shouldRequireCountsForCorpusIc() throws IOException {
        Path pairs = write("pairs.tsv", E + "\t" + F + "\n");
        CliRun run = CliRun.of("similarity", "--ontology", obo.toString(), "--pairs", pairs.toString(),
                "--ic", "corpus");
        assertEquals(2, run.exitCode());
        assertTrue(run.err().contains("--counts"), run.err());
    }
}
