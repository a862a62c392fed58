package org.congener.cli.demo;

import java.io.PrintStream;
import java.time.Duration;

/** The numbers {@code congener demo} reports after its replay. */
public record DemoSummary(EventReplay.Sent sent, OutputCounter.Counts outputs, long deadLetterMetric,
                          Duration replayAndProcessing, LatencyStats latency, double ratePerSecond) {

    public void print(PrintStream out) {
        double seconds = replayAndProcessing.toMillis() / 1000.0;
        out.println("summary");
        out.printf("  events in:        %,d usage + %,d inventory + %,d broken lines = %,d%n",
                sent.usageEvents(), sent.inventoryEvents(), sent.badLines(), sent.total());
        out.printf("  suggestions out:  %,d lists for %,d researchers%n",
                outputs.suggestions(), outputs.researchersWithSuggestions().size());
        out.printf("  dead letters:     %,d on the dead-letters topic (%,d counted by the app's metric)%n",
                outputs.deadLetters(), deadLetterMetric);
        out.printf("  time taken:       %.1f s for replay and processing (%,.0f events/s)%n",
                seconds, seconds > 0 ? sent.total() / seconds : 0.0);
        out.printf("  event → list:     p50 %.0f ms, p95 %.0f ms, p99 %.0f ms, max %.0f ms over %,d events (%s)%n",
                latency.p50Ms(), latency.p95Ms(), latency.p99Ms(), latency.maxMs(), latency.count(),
                ratePerSecond > 0 ? String.format("paced at %.0f records/s", ratePerSecond)
                        : "replayed as fast as possible, so this includes queueing behind the backlog");
    }
}
