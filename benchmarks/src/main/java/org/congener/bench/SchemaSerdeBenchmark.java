package org.congener.bench;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.congener.schemas.Contribution;
import org.congener.schemas.Json;
import org.congener.schemas.SchemaIds;
import org.congener.schemas.Suggestion;
import org.congener.schemas.SuggestionSource;
import org.congener.schemas.Suggestions;
import org.congener.schemas.TopicName;
import org.congener.schemas.UsageEvent;
import org.congener.schemas.UsageKind;
import org.congener.schemas.serde.ValidatingJsonSerde;
import org.congener.schemas.validation.InvalidRecordException;
import org.congener.schemas.validation.SchemaValidator;
import org.congener.schemas.validation.Violation;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Per-record cost of reading topic values through {@link ValidatingJsonSerde} (parse, validate, map)
 * against plain Jackson mapping, for the main input (a usage event) and the largest output (a
 * top-10 suggestion list). A usage event goes through the serde's token-stream reader; the tree path
 * it stands in front of is timed on its own, and so is a rejected event, which takes both.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
@State(Scope.Benchmark)
public class SchemaSerdeBenchmark {
    private final ValidatingJsonSerde<UsageEvent> usageSerde =
            ValidatingJsonSerde.of(TopicName.USAGE_EVENTS, UsageEvent.class);
    private final ValidatingJsonSerde<Suggestions> suggestionsSerde =
            ValidatingJsonSerde.of(TopicName.SUGGESTIONS, Suggestions.class);
    private UsageEvent usageEvent;
    private byte[] usageBytes;
    private JsonNode usageTree;
    private byte[] suggestionBytes;
    private byte[] rejectedUsageBytes;

    @Setup
    public void setUp() throws IOException {
        usageEvent = new UsageEvent(SchemaIds.USAGE_EVENT, "ord-2026-000481", "r-0007", "cmp-0042",
                UsageKind.ORDER, 25.0, "g", "2026-03-14T09:26:53.125Z");
        usageBytes = usageSerde.write(usageEvent);
        usageTree = Json.mapper().readTree(usageBytes);
        rejectedUsageBytes = usageSerde.write(new UsageEvent(SchemaIds.USAGE_EVENT, "ord-2026-000481", "r-0007",
                "cmp-0042", UsageKind.ORDER, -2.0, "g", "2026-03-14T09:26:53.125Z"));
        List<Suggestion> items = new ArrayList<>();
        for (int rank = 1; rank <= 10; rank++) {
            items.add(new Suggestion(rank, "cmp-" + (100 + rank), "Velorin derivative " + rank, 0.9 - rank * 0.05,
                    0.8, 0.7 - rank * 0.03, List.of(new Contribution("cmp-0042", 0.5), new Contribution("cmp-0043", 0.25)),
                    "CGO:0000101", "velorin halide", List.of("H225", "H302"), rank % 2 == 0));
        }
        suggestionBytes = suggestionsSerde.write(new Suggestions(SchemaIds.SUGGESTIONS, "r-0007", "m-7",
                SuggestionSource.HYBRID, "ord-2026-000481", "2026-03-14T09:26:53.125Z", items,
                "Suggestions are no safety review; read the safety data sheet."));
        if (!new String(usageBytes, StandardCharsets.UTF_8).contains("ORDER")) {
            throw new IllegalStateException("unexpected usage event JSON");
        }
    }

    /** Through the serde, which reads a usage event off the token stream and skips the tree. */
    @Benchmark
    public UsageEvent readUsageEventValidated() {
        return usageSerde.read(usageBytes);
    }

    /** What the serde did for every usage event before the token-stream reader: tree, schema, mapping. */
    @Benchmark
    public UsageEvent readUsageEventTreePath() throws IOException {
        JsonNode tree = Json.mapper().readTree(usageBytes);
        List<Violation> violations = SchemaValidator.forTopic(TopicName.USAGE_EVENTS).check(tree);
        if (!violations.isEmpty()) {
            throw new IllegalStateException(violations.toString());
        }
        return Json.mapper().treeToValue(tree, UsageEvent.class);
    }

    /** The token-stream reader turns it down, then the tree path words the reason for the dead letter. */
    @Benchmark
    public String readRejectedUsageEvent() {
        try {
            usageSerde.read(rejectedUsageBytes);
        } catch (InvalidRecordException e) {
            return e.reason();
        }
        throw new IllegalStateException("a negative quantity was accepted");
    }

    @Benchmark
    public UsageEvent readUsageEventJacksonOnly() throws IOException {
        return Json.mapper().readValue(usageBytes, UsageEvent.class);
    }

    @Benchmark
    public List<Violation> validateUsageEventTree() {
        return SchemaValidator.forTopic(TopicName.USAGE_EVENTS).check(usageTree);
    }

    @Benchmark
    public byte[] writeUsageEvent() {
        return usageSerde.write(usageEvent);
    }

    @Benchmark
    public Suggestions readTopTenSuggestionsValidated() {
        return suggestionsSerde.read(suggestionBytes);
    }

    @Benchmark
    public Suggestions readTopTenSuggestionsJacksonOnly() throws IOException {
        return Json.mapper().readValue(suggestionBytes, Suggestions.class);
    }
}
