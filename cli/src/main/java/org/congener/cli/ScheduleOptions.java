package org.congener.cli;

import java.time.Duration;
import java.time.format.DateTimeParseException;
import java.util.Locale;
import org.congener.trainer.service.TrainingSchedule;
import picocli.CommandLine.Option;

/** {@code --once | --every 30m | --after-events N}; at most one, {@code --once} when none is given. */
final class ScheduleOptions {
    @Option(names = "--once", description = "train once and exit (the default)")
    boolean once;

    @Option(names = "--every", paramLabel = "PERIOD", description = "train now and then every PERIOD (e.g. 90s, 30m, 6h, PT1H)")
    String every;

    @Option(names = "--after-events", paramLabel = "N",
            description = "train now and again whenever N more usage events have arrived")
    Long afterEvents;

    TrainingSchedule schedule() {
        if (every != null) {
            return new TrainingSchedule.Every(period(every));
        }
        if (afterEvents != null) {
            if (afterEvents < 1) {
                throw new IllegalArgumentException("--after-events must be >= 1, not " + afterEvents);
            }
            return new TrainingSchedule.AfterEvents(afterEvents, Duration.ofSeconds(5));
        }
        return new TrainingSchedule.Once();
    }

    /** {@code 90s}, {@code 30m}, {@code 6h}, {@code 1d} or an ISO-8601 duration. */
    static Duration period(String text) {
        String t = text.strip().toLowerCase(Locale.ROOT);
        Duration d;
        try {
            if (t.matches("\\d+[smhd]")) {
                long n = Long.parseLong(t.substring(0, t.length() - 1));
                d = switch (t.charAt(t.length() - 1)) {
                    case 's' -> Duration.ofSeconds(n);
                    case 'm' -> Duration.ofMinutes(n);
                    case 'h' -> Duration.ofHours(n);
                    default -> Duration.ofDays(n);
                };
            } else {
                d = Duration.parse(text.strip().toUpperCase(Locale.ROOT));
            }
        } catch (DateTimeParseException | NumberFormatException e) {
            throw new IllegalArgumentException("period '" + text + "' is neither like 30m, 6h, 90s nor ISO-8601 (PT30M)");
        }
        if (d.isZero() || d.isNegative()) {
            throw new IllegalArgumentException("period must be positive: " + text);
        }
        return d;
    }
}
