package org.congener.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class EvaluateCommandTest {

    /** Invented interactions: 60 researchers each drawing from one of four groups of a two-level taxonomy. */
    private static void writeScenario(Path events, Path edges) throws Exception {
        List<String> taxonomy = new ArrayList<>();
        for (int g = 0; g < 4; g++) {
            taxonomy.add("group-" + g + "\troot");
            for (int l = 0; l < 6; l++) {
                taxonomy.add("item-" + g + "-" + l + "\tgroup-" + g);
            }
        }
        Files.write(edges, taxonomy);
        SplittableRandom random = new SplittableRandom(4);
        List<String> lines = new ArrayList<>();
        for (int r = 0; r < 60; r++) {
            int g = r % 4;
            for (int n = 0; n < 8; n++) {
                int group = random.nextDouble() < 0.8 ? g : random.nextInt(4);
                lines.add("r" + r + "\titem-" + group + "-" + random.nextInt(6) + "\t1\t" + (1000L * n));
            }
        }
        Files.write(events, lines);
    }

    @Test
    void shouldWriteBothReportsWhenEvaluatingATsvWithAnEdgeListTaxonomy(@TempDir Path dir) throws Exception {
        Path events = dir.resolve("interactions.tsv");
        Path edges = dir.resolve("taxonomy.tsv");
        writeScenario(events, edges);
        PrintStream original = System.out;
        ByteArrayOutputStream captured = new ByteArrayOutputStream();
        int code;
        try {
            System.setOut(new PrintStream(captured, true, StandardCharsets.UTF_8));
            code = CongenerMain.run("evaluate", "--events", events.toString(), "--ontology", edges.toString(),
                    "--format", "edges", "--k", "1,5", "--ranks", "4", "--lambdas", "0.1", "--alphas", "5",
                    "--threads", "2", "--out", dir.resolve("report").toString());
        } finally {
            System.setOut(original);
        }
        String table = captured.toString(StandardCharsets.UTF_8);
        assertEquals(0, code, table);
        assertTrue(table.contains("ALS×semantic") && table.contains("ndcg@5"), table);
        assertTrue(Files.size(dir.resolve("report/report.json")) > 0);
        assertTrue(Files.readString(dir.resolve("report/report.html")).contains("<svg"));
    }

    @Test
    void shouldExitNonZeroNamingTheLineWhenTheEventsFileIsBad(@TempDir Path dir) throws Exception {
        Path events = dir.resolve("bad.tsv");
        Files.write(events, List.of("r1\tc1\t1", "r2\tc2"));
        PrintStream original = System.err;
        ByteArrayOutputStream captured = new ByteArrayOutputStream();
        int code;
        try {
            System.setErr(new PrintStream(captured, true, StandardCharsets.UTF_8));
            code = CongenerMain.run("evaluate", "--events", events.toString(), "--out", dir.resolve("o").toString());
        } finally {
            System.setErr(original);
        }
        assertEquals(1, code);
        assertTrue(captured.toString(StandardCharsets.UTF_8).contains("bad.tsv:2"), captured.toString());
    }

    @Test
    void shouldEvaluateTheCollaborativeModelsOnTheDemoScenario(@TempDir Path dir) throws Exception {
        PrintStream original = System.out;
        ByteArrayOutputStream captured = new ByteArrayOutputStream();
        int code;
        try {
            System.setOut(new PrintStream(captured, true, StandardCharsets.UTF_8));
            code = CongenerMain.run("evaluate", "--demo", "--k", "10", "--ranks", "8", "--lambdas", "0.1",
                    "--alphas", "5", "--threads", "2", "--out", dir.toString());
        } finally {
            System.setOut(original);
        }
        String table = captured.toString(StandardCharsets.UTF_8);
        assertEquals(0, code, table);
        assertTrue(table.contains("ALS") && table.contains("popularity"), table);
        String json = Files.readString(dir.resolve("report.json"));
        // the demo has 300 researchers (demo-events' researchers.jsonl)
        assertTrue(json.contains("\"researchers\" : 300"), json.substring(0, Math.min(400, json.length())));
    }

    @Test
    void shouldRefuseBothEventsAndDemo(@TempDir Path dir) throws Exception {
        Path events = dir.resolve("e.tsv");
        Files.write(events, List.of("r1\tc1\t1"));
        assertEquals(2, CongenerMain.run("evaluate", "--events", events.toString(), "--demo"));
        assertEquals(2, CongenerMain.run("evaluate"));
        assertEquals(2, CongenerMain.run("evaluate", "--demo", "--half-life", "ninety days"));
        assertEquals(2, CongenerMain.run("evaluate", "--demo", "--weights", "purchase=1"));
    }

    @Test
    void shouldRejectAMalformedSplitFlag(@TempDir Path dir) throws Exception {
        Path events = dir.resolve("e.tsv");
        Files.write(events, List.of("r1\tc1\t1"));
        int code = CongenerMain.run("evaluate", "--events", events.toString(), "--split", "random");
        assertEquals(2, code);
    }
}
