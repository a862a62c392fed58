package org.congener.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import org.congener.broker.SharedBroker;
import org.congener.broker.TopicAdmin;
import org.congener.cli.demo.EventReplay;
import org.congener.cli.demo.ProgressLine;
import org.congener.cli.demo.ReplayScenario;
import org.congener.cli.demo.StandardScenario;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;

/** {@code congener train}, {@code models} and {@code rollback} against the embedded broker, on part of the demo data. */
@ExtendWith(SharedBroker.class)
class TrainerCommandsTest {
    @TempDir
    Path dir;

    @Test
    void shouldTrainListAndRollBackVersionsWhenGivenABroker() throws Exception {
        String prefix = SharedBroker.uniquePrefix("train-cli");
        String bootstrap = SharedBroker.bootstrapServers();
        TopicAdmin.createAll(bootstrap, prefix, 2, (short) 1);
        ReplayScenario scenario = StandardScenario.load().history(1200);
        EventReplay replay = new EventReplay(bootstrap, prefix);
        replay.loadReferenceData(scenario);
        replay.replayEvents(scenario, new ProgressLine(new java.io.PrintStream(java.io.OutputStream.nullOutputStream()),
                "", 1), 0, new java.util.concurrent.ConcurrentHashMap<>());
        List<String> common = List.of("--bootstrap-servers", bootstrap, "--topic-prefix", prefix);

        CliRun first = CliRun.of(args(common, "train", "--once", "--ranks", "8", "--iterations", "4",
                "--report-dir", dir.toString()));
        assertEquals(0, first.exitCode(), first.out() + first.err());
        assertTrue(first.out().contains("published v0001"), first.out());
        assertTrue(first.out().contains("gate              publish: no live version"), first.out());
        assertTrue(Files.exists(dir.resolve("v0001/report.html")));
        CliRun second = CliRun.of(args(common, "train", "--ranks", "8", "--iterations", "4", "--margin", "0.05",
                "--report-dir", dir.toString()));
        assertEquals(0, second.exitCode(), second.out() + second.err());
        assertTrue(second.out().contains("published v0002"), second.out());

        CliRun models = CliRun.of(args(common, "models"));
        assertEquals(0, models.exitCode(), models.err());
        assertTrue(models.out().matches("(?s).*\\* v0002 .*complete.*"), models.out());
        assertTrue(models.out().matches("(?s).*\n  v0001 .*"), models.out());

        CliRun rollback = CliRun.of(args(common, "rollback", "--to", "v0001"));
        assertEquals(0, rollback.exitCode(), rollback.err());
        assertTrue(rollback.out().contains("live version: v0001 (was v0002)"), rollback.out());
        assertTrue(CliRun.of(args(common, "models")).out().matches("(?s).*\\* v0001 .*"));

        CliRun missing = CliRun.of(args(common, "rollback", "--to", "v0042"));
        assertEquals(CliErrors.FAILED, missing.exitCode());
        assertTrue(missing.err().contains("no version v0042 is published"), missing.err());
    }

    @Test
    void shouldRejectBadScheduleFlagsWithUsageError() {
        CliRun run = CliRun.of("train", "--bootstrap-servers", "127.0.0.1:1", "--every", "0m");
        assertEquals(CliErrors.USAGE, run.exitCode());
        assertTrue(run.err().contains("period must be positive"), run.err());
        CliRun both = CliRun.of("train", "--bootstrap-servers", "127.0.0.1:1", "--once", "--every", "5m");
        assertEquals(CliErrors.USAGE, both.exitCode());
        assertEquals(Duration.ofMinutes(30), ScheduleOptions.period("30m"));
        assertEquals(Duration.ofHours(1), ScheduleOptions.period("PT1H"));
    }

    private static String[] args(List<String> common, String... rest) {
        List<String> all = new ArrayList<>();
        all.add(rest[0]);
        all.addAll(common);
        all.addAll(List.of(rest).subList(1, rest.length));
        return all.toArray(String[]::new);
    }
}
