package org.congener.cli;

import java.io.BufferedReader;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;

import org.congener.core.ontology.Ontology;

/** Reads {@code term<TAB>count} lines into a usage count per dense term id; bad lines are reported and skipped. */
final class UsageCountsFile {
    private UsageCountsFile() {
    }

    /** @return the counts, or null when the file cannot be read (reported) */
    static double[] read(Path file, Ontology ontology, LineProblems problems) throws IOException {
        double[] counts = new double[ontology.size()];
        try (BufferedReader reader = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            String line;
            int number = 0;
            while ((line = reader.readLine()) != null) {
                number++;
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                String[] fields = line.split("\t", -1);
                if (fields.length != 2) {
                    problems.report(file, number, "expected 'term<TAB>count', found '" + line + "'");
                    continue;
                }
                int term = ontology.termIndex(fields[0].strip());
                if (term < 0) {
                    problems.report(file, number, "unknown term '" + fields[0].strip() + "'");
                    continue;
                }
                double count;
                try {
                    count = Double.parseDouble(fields[1].strip());
                } catch (NumberFormatException e) {
                    count = Double.NaN;
                }
                if (!(count >= 0) || Double.isInfinite(count)) {
                    problems.report(file, number, "count must be a number >= 0, found '" + fields[1] + "'");
                    continue;
                }
                counts[term] += count;
            }
        } catch (NoSuchFileException e) {
            problems.reportFile(file, "no such file");
            return null;
        }
        return counts;
    }
}
