package org.congener.cli.demo;

import java.io.PrintStream;
import java.time.Duration;

/** The numbers {@code congener demo} reports after its replay. */
public record DemoSummary(EventReplay.Sent sent, OutputCounter.Counts outputs, long deadLetterMetric,
                          Duration replayAndProcessing) {

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
    }
}
