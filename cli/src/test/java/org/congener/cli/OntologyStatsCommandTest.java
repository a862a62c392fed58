package org.congener.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class OntologyStatsCommandTest {
    @TempDir
    Path dir;

    @Test
    void shouldPrintCountsOfTheFixture() throws Exception {
        Path obo = Path.of(getClass().getResource("/ontology/small-dag.obo").toURI());
        CliRun run = CliRun.of("ontology-stats", "--ontology", obo.toString());
        assertEquals(0, run.exitCode(), run.err());
        assertTrue(run.out().startsWith("terms\t8\nedges\t8\nroots\t1\nvirtual_root\tno\nmax_depth\t3\n"
                + "obsolete_left_out\t1\nalias_ids\t2\nload_ms\t"), run.out());
    }

    @Test
    void shouldCountRelationsAsEdgesWhenAsked() throws Exception {
        Path obo = Path.of(getClass().getResource("/ontology/small-dag.obo").toURI());
        CliRun run = CliRun.of("ontology-stats", "--ontology", obo.toString(), "--relation", "part_of");
        assertTrue(run.out().contains("edges\t9\n"), run.out());
    }

    @Test
    void shouldReportSeveralRootsOfAnEdgeList() throws IOException {
        Path edges = Files.writeString(dir.resolve("e.tsv"), "a\tb\nc\td\n");
        CliRun run = CliRun.of("ontology-stats", "--ontology", edges.toString(), "--format", "edges");
        assertEquals(0, run.exitCode(), run.err());
        assertTrue(run.out().contains("roots\t2\nvirtual_root\tyes\n"), run.out());
    }

    @Test
    void shouldNameTheCycleAndFailWhenEdgesLoop() throws IOException {
        Path edges = Files.writeString(dir.resolve("loop.tsv"), "a\tb\nb\ta\n");
        CliRun run = CliRun.of("ontology-stats", "--ontology", edges.toString(), "--format", "edges");
        assertEquals(1, run.exitCode());
        assertTrue(run.err().contains("cycle of 2 terms"), run.err());
    }

    @Test
    void shouldSayWhenTheFileIsMissing() {
        CliRun run = CliRun.of("ontology-stats", "--ontology", dir.resolve("nope.obo").toString());
        assertEquals(1, run.exitCode());
        assertTrue(run.err().contains("no such file"), run.err());
    }
}
