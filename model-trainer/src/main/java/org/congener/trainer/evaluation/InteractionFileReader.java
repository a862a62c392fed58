package org.congener.trainer.evaluation;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.BufferedReader;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.congener.core.interactions.IdIndex;
import org.congener.core.interactions.Interaction;
import org.congener.core.interactions.InteractionLog;
import org.congener.core.interactions.InteractionWeights;
import org.congener.schemas.SchemaIds;
import org.congener.schemas.UsageEvent;
import org.congener.schemas.UsageKind;

/**
 * Reads {@code --events}: either JSON lines of usage events (the {@code usage-events} value shape) or a
 * TSV of {@code researcher<TAB>compound<TAB>strength[<TAB>time]} (time as ISO-8601 instant or epoch
 * milliseconds). The form is told by the first non-blank character ({@code {} means JSON lines).
 * Blank lines and lines starting with {@code #} are skipped; any other bad line stops the read with
 * an {@link InputFileException} naming the line.
 */
public final class InteractionFileReader {
    private static final ObjectMapper JSON = new ObjectMapper();

    private InteractionFileReader() {
    }

    public static InteractionLog read(Path file, InteractionWeights weights, List<String> knownItems) {
        List<String> lines;
        try {
            lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new InputFileException(file, 0, "cannot read: " + e.getMessage());
        }
        boolean json = lines.stream().map(String::strip).filter(l -> !l.isEmpty() && !l.startsWith("#"))
                .findFirst().map(l -> l.startsWith("{")).orElseThrow(
                        () -> new InputFileException(file, 0, "no interactions in the file"));
        return json ? readJsonLines(file, lines, weights, knownItems) : readTsv(file, lines, knownItems);
    }

    private static InteractionLog readJsonLines(Path file, List<String> lines, InteractionWeights weights,
                                                List<String> knownItems) {
        List<UsageEvent> events = new ArrayList<>();
        Instant latest = Instant.EPOCH;
        for (int n = 0; n < lines.size(); n++) {
            String line = lines.get(n).strip();
            if (line.isEmpty() || line.startsWith("#")) {
                continue;
            }
            UsageEvent event = parseEvent(file, n + 1, line);
            events.add(event);
            Instant at = Instant.parse(event.occurredAt());
            if (at.isAfter(latest)) {
                latest = at;
            }
        }
        return InteractionLog.fromEvents(events, weights, latest, knownItems);
    }

    static UsageEvent parseEvent(Path file, long lineNumber, String line) {
        JsonNode node;
        try {
            node = JSON.readTree(line);
        } catch (IOException e) {
            throw new InputFileException(file, lineNumber, "not valid JSON: " + e.getMessage().lines().findFirst().orElse(""));
        }
        String researcher = text(file, lineNumber, node, "researcherId");
        String compound = text(file, lineNumber, node, "compoundId");
        String kindText = text(file, lineNumber, node, "kind");
        UsageKind kind;
        try {
            kind = UsageKind.valueOf(kindText.toUpperCase(Locale.ROOT).replace('-', '_'));
        } catch (IllegalArgumentException e) {
            throw new InputFileException(file, lineNumber, "unknown kind '" + kindText + "' (order, withdrawal, "
                    + "usage-log or view)");
        }
        String occurredAt = text(file, lineNumber, node, "occurredAt");
        try {
            Instant.parse(occurredAt);
        } catch (DateTimeParseException e) {
            throw new InputFileException(file, lineNumber, "occurredAt '" + occurredAt + "' is no ISO-8601 instant");
        }
        double quantity = node.path("quantity").asDouble(0.0);
        if (!Double.isFinite(quantity) || quantity < 0) {
            throw new InputFileException(file, lineNumber, "quantity must be finite and >= 0");
        }
        return new UsageEvent(node.path("schema").asText(SchemaIds.USAGE_EVENT), node.path("eventId").asText(""),
                researcher, compound, kind, quantity, node.path("unit").asText(""), occurredAt);
    }

    private static String text(Path file, long lineNumber, JsonNode node, String field) {
        JsonNode value = node.get(field);
        if (value == null || !value.isTextual() || value.asText().isBlank()) {
            throw new InputFileException(file, lineNumber, "missing or empty field '" + field + "'");
        }
        return value.asText();
    }

    private static InteractionLog readTsv(Path file, List<String> lines, List<String> knownItems) {
        IdIndex users = new IdIndex();
        IdIndex items = new IdIndex();
        knownItems.forEach(items::indexOrAdd);
        java.util.Map<Long, double[]> cells = new java.util.LinkedHashMap<>();
        for (int n = 0; n < lines.size(); n++) {
            String line = lines.get(n);
            if (line.isBlank() || line.startsWith("#")) {
                continue;
            }
            String[] f = line.split("\t", -1);
            if (f.length < 3 || f.length > 4) {
                throw new InputFileException(file, n + 1, "expected researcher<TAB>compound<TAB>strength[<TAB>time], got "
                        + f.length + " fields");
            }
            if (f[0].isBlank() || f[1].isBlank()) {
                throw new InputFileException(file, n + 1, "empty researcher or compound id");
            }
            double strength;
            try {
                strength = Double.parseDouble(f[2].strip());
            } catch (NumberFormatException e) {
                throw new InputFileException(file, n + 1, "strength '" + f[2] + "' is not a number");
            }
            if (!Double.isFinite(strength) || strength < 0) {
                throw new InputFileException(file, n + 1, "strength must be finite and >= 0: " + f[2]);
            }
            long time = f.length == 4 ? parseTime(file, n + 1, f[3].strip()) : n;
            int u = users.indexOrAdd(f[0].strip());
            int i = items.indexOrAdd(f[1].strip());
            long key = ((long) u << 32) | i;
            double[] cell = cells.computeIfAbsent(key, k -> new double[] {0, Long.MIN_VALUE});
            cell[0] += strength;
            cell[1] = Math.max(cell[1], time);
        }
        if (cells.isEmpty()) {
            throw new InputFileException(file, 0, "no interactions in the file");
        }
        List<Interaction> out = new ArrayList<>(cells.size());
        cells.forEach((key, cell) -> out.add(new Interaction((int) (key >>> 32), (int) (long) key, cell[0], (long) cell[1])));
        return new InteractionLog(users, items, out);
    }

    private static long parseTime(Path file, long lineNumber, String text) {
        if (text.isEmpty()) {
            return lineNumber;
        }
        try {
            return Long.parseLong(text);
        } catch (NumberFormatException ignored) {
            try {
                return Instant.parse(text).toEpochMilli();
            } catch (DateTimeParseException e) {
                throw new InputFileException(file, lineNumber, "time '" + text + "' is neither epoch milliseconds nor ISO-8601");
            }
        }
    }
}
