package org.congener.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.net.InetAddress;
import java.net.ServerSocket;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code congener demo --replay-only} end to end on a subset of the demo events, and its error paths. */
class DemoCommandTest {

    private static final int SUBSET = 1500;

    @TempDir
    Path dir;

    private record Run(int exitCode, String out, String err) {
    }

    private static Run run(String... args) {
        PrintStream oldOut = System.out;
        PrintStream oldErr = System.err;
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        try {
            System.setOut(new PrintStream(out, true, StandardCharsets.UTF_8));
            System.setErr(new PrintStream(err, true, StandardCharsets.UTF_8));
            int code = CongenerMain.run(args);
            return new Run(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
        } finally {
            System.setOut(oldOut);
            System.setErr(oldErr);
        }
    }

    @Test
    void shouldReplaySubsetAndReportEveryEventWhenReplayOnly() throws Exception {
        Path data = dir.resolve("demo-data");
        Run run = run("demo", "--replay-only", "--limit", String.valueOf(SUBSET), "--http-port", "0",
                "--data-dir", data.toString());
        assertEquals(0, run.exitCode(), run.out() + run.err());

        int usage = number(run.out(), "events in: +([\\d,]+) usage");
        int bad = number(run.out(), "\\+ ([\\d,]+) broken lines");
        int lists = number(run.out(), "suggestions out: +([\\d,]+) lists");
        int letters = number(run.out(), "dead letters: +([\\d,]+) on the dead-letters topic");
        assertEquals(SUBSET, usage);
        assertTrue(bad > 0, "broken lines are mixed in");
        assertEquals(usage + bad, lists + letters, "every usage-topic record gave one list or one dead letter");
        assertTrue(letters >= bad, "every broken line is a dead letter");
        assertTrue(number(run.out(), "for ([\\d,]+) researchers") > 0);
        assertEquals(lists, number(run.out(), "over ([\\d,]+) events"), "the list of every accepted event was seen");
        assertTrue(run.out().contains("/researchers/"), "prints a query URL");
        assertTrue(run.out().contains("safety data sheet"), "prints the caution");
        assertTrue(Files.exists(data.resolve("kafka")), "broker data kept under --data-dir");
        assertTrue(run.out().contains("trainer (before the replay"), run.out());
        assertTrue(run.out().matches("(?s).*model versions: +v0001 → v0002, v0002 live.*"),
                "a second version goes live during the demo: " + run.out());
        assertTrue(Files.exists(data.resolve("trainer-reports/v0002/report.html")));
    }

    @Test
    void shouldStopWithOneLineWhenHttpPortIsTaken() throws Exception {
        try (ServerSocket squatter = new ServerSocket(0, 1, InetAddress.getByName("127.0.0.1"))) {
            int port = squatter.getLocalPort();
            Run run = run("demo", "--replay-only", "--http-port", String.valueOf(port));
            assertEquals(1, run.exitCode());
            assertEquals("congener demo: port " + port + " on 127.0.0.1 is already in use (needed for the query API);"
                    + " stop what uses it or choose another with --http-port", run.err().strip());
        }
    }

    @Test
    void shouldStopWithOneLineWhenKafkaPortIsTaken() throws Exception {
        try (ServerSocket squatter = new ServerSocket(0, 1, InetAddress.getByName("127.0.0.1"))) {
            int port = squatter.getLocalPort();
            Run run = run("demo", "--replay-only", "--http-port", "0", "--kafka-port", String.valueOf(port));
            assertEquals(1, run.exitCode());
            assertTrue(run.err().strip().startsWith("congener demo: port " + port + " on 127.0.0.1 is already in use"),
                    run.err());
            assertEquals(1, run.err().strip().lines().count(), run.err());
        }
    }

    @Test
    void shouldNameMissingConfigFileInOneLine() {
        Path missing = dir.resolve("absent.properties");
        Run run = run("demo", "--replay-only", "--config", missing.toString());
        assertEquals(1, run.exitCode());
        assertEquals("congener demo: config file " + missing + " does not exist", run.err().strip());
    }

    @Test
    void shouldNameUnknownFlagInOneLineWithNonZeroExit() {
        Run run = run("demo", "--replay-twice");
        assertEquals(2, run.exitCode());
        assertEquals(1, run.err().strip().lines().count(), run.err());
        assertTrue(run.err().contains("Unknown option: '--replay-twice'"), run.err());
        assertFalse(run.out().contains("replaying"), "nothing started");
    }

    @Test
    void shouldNameFileLineWhenConfigHasUnknownKey() throws Exception {
        Path file = dir.resolve("demo.properties");
        Files.writeString(file, "suggestions.top.n=5\nsuggestion.top.n=6\n");
        Run run = run("streams", "--config", file.toString());
        assertEquals(1, run.exitCode());
        assertTrue(run.err().strip().startsWith("congener streams: " + file + " line 2: unknown setting 'suggestion.top.n'"),
                run.err());
    }

    private static int number(String text, String regex) {
        Matcher m = Pattern.compile(regex).matcher(text);
        assertTrue(m.find(), "output has /" + regex + "/:\n" + text);
        return Integer.parseInt(m.group(1).replace(",", ""));
    }
}
