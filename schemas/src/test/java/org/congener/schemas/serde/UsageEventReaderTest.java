package org.congener.schemas.serde;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Set;
import java.util.TreeSet;
import org.apache.kafka.common.serialization.Deserializer;
import org.congener.schemas.Examples;
import org.congener.schemas.SchemaIds;
import org.congener.schemas.TopicName;
import org.congener.schemas.Topics;
import org.congener.schemas.UsageEvent;
import org.congener.schemas.UsageKind;
import org.congener.schemas.validation.InvalidRecordException;
import org.congener.schemas.validation.Violation;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The token-stream reader against the tree path it stands in front of: the same verdict and the
 * same record for every example file and for a seeded corpus of mutated events.
 */
class UsageEventReaderTest {
    private static final long SEED = 20260314L;
    private static final int CORPUS_SIZE = 4000;
    private static final String TOPIC = "lab1.usage-events";

    private final ValidatingJsonSerde<UsageEvent> serde =
            ValidatingJsonSerde.of(TopicName.USAGE_EVENTS, UsageEvent.class);

    /** What the tree path makes of a payload: the record, or the exception it throws. */
    private record Outcome(UsageEvent event, InvalidRecordException rejection) {
        String shown() {
            return event != null ? event.toString() : rejection.reason();
        }
    }

    private Outcome treePath(byte[] data) {
        try {
            return new Outcome(serde.readValidated(data), null);
        } catch (InvalidRecordException e) {
            return new Outcome(null, e);
        }
    }

    @Test
    void shouldGiveTheTreePathVerdictAndRecordWhenReadingEveryUsageEventExample() {
        List<Path> valid = Examples.files(TopicName.USAGE_EVENTS, "valid-");
        List<Path> invalid = Examples.files(TopicName.USAGE_EVENTS, "invalid-");
        assertTrue(valid.size() >= 2 && invalid.size() >= 10, valid + " " + invalid);
        for (Path file : valid) {
            byte[] bytes = Examples.bytes(file);
            UsageEvent expected = treePath(bytes).event();
            assertTrue(expected != null, file::toString);
            assertEquals(expected, UsageEventReader.read(bytes), file::toString);
        }
        for (Path file : invalid) {
            byte[] bytes = Examples.bytes(file);
            assertTrue(treePath(bytes).rejection() != null, file::toString);
            assertNull(UsageEventReader.read(bytes), file::toString);
        }
    }

    @Test
    void shouldGiveTheTreePathVerdictAndRecordWhenReadingEachGeneratedPayload() {
        List<UsageEventCorpus.Payload> corpus = UsageEventCorpus.generate(SEED, CORPUS_SIZE);
        List<String> mismatches = new ArrayList<>();
        Set<String> rulesBroken = new TreeSet<>();
        int accepted = 0;
        for (UsageEventCorpus.Payload payload : corpus) {
            UsageEvent fast = UsageEventReader.read(payload.bytes());
            Outcome tree = treePath(payload.bytes());
            if (!Objects.equals(fast, tree.event())) {
                mismatches.add(payload.shown() + "\n    fast: " + fast + "\n    tree: " + tree.shown());
            }
            if (tree.event() != null) {
                accepted++;
            } else if (tree.rejection().parseError() != null) {
                rulesBroken.add("unreadable");
            } else {
                tree.rejection().violations().forEach(v -> rulesBroken.add(v.rule()));
            }
        }
        assertTrue(mismatches.isEmpty(), () -> mismatches.size() + " of " + CORPUS_SIZE + " payloads (seed " + SEED
                + ") differ, first ones:\n" + String.join("\n", mismatches.stream().limit(20).toList()));
        int acceptedCount = accepted;
        assertTrue(accepted >= CORPUS_SIZE / 10 && CORPUS_SIZE - accepted >= CORPUS_SIZE / 10,
                () -> acceptedCount + " of " + CORPUS_SIZE + " accepted: the corpus should hold plenty of both");
        assertTrue(rulesBroken.containsAll(Set.of("unreadable", "required", "additionalProperties", "type", "const",
                "pattern", "minLength", "maxLength", "enum", "minimum", "format", "finite")), rulesBroken::toString);
    }

    @Test
    void shouldReturnTheTreePathRecordOrReasonWhenReadThroughTheTopicSerde() {
        Deserializer<UsageEvent> deserializer = new Topics("lab1.").usageEvents().valueSerde().deserializer();
        List<byte[]> payloads = new ArrayList<>();
        Examples.files(TopicName.USAGE_EVENTS, "").stream()
                .filter(file -> !file.getFileName().toString().startsWith("expected-"))
                .forEach(file -> payloads.add(Examples.bytes(file)));
        UsageEventCorpus.generate(SEED + 1, CORPUS_SIZE / 4).forEach(payload -> payloads.add(payload.bytes()));
        int rejected = 0;
        for (byte[] payload : payloads) {
            Outcome tree = treePath(payload);
            if (tree.event() != null) {
                assertEquals(tree.event(), deserializer.deserialize(TOPIC, payload));
                continue;
            }
            rejected++;
            InvalidRecordException e = assertThrows(InvalidRecordException.class,
                    () -> deserializer.deserialize(TOPIC, payload));
            assertEquals(tree.rejection().reason(), e.reason());
            assertEquals(tree.rejection().violations(), e.violations());
            assertEquals(tree.rejection().parseError(), e.parseError());
        }
        assertTrue(rejected >= payloads.size() / 10, rejected + " of " + payloads.size() + " rejected");
    }

    @Test
    void shouldWordTheRejectionAsBeforeWhenTheLastOfARepeatedNameIsBad() {
        InvalidRecordException e = assertThrows(InvalidRecordException.class,
                () -> serde.read(event("\"kind\":\"VIEW\",\"kind\":\"BUY\"")));
        assertEquals(List.of(new Violation("/kind", "\"BUY\"", "enum",
                "must be one of [\"ORDER\",\"WITHDRAWAL\",\"USAGE_LOG\",\"VIEW\"]")), e.violations());
        assertEquals("usage-events: 1 violation: " + e.violations().get(0), e.reason());
    }

    @Test
    void shouldTakeTheLastValueWhenANameRepeats() {
        UsageEvent read = UsageEventReader.read(event("\"kind\":{\"a\":[\"BUY\"]},\"kind\":\"VIEW\""));
        assertEquals(new UsageEvent(SchemaIds.USAGE_EVENT, "e-1", "r-1", "c-1", UsageKind.VIEW, 2.5, "mL",
                "2026-03-14T09:26:53Z"), read);
    }

    @ParameterizedTest
    @CsvSource({
        "2026-03-14T09:26:53Z, true",
        "0000-02-29T00:00:00Z, true",
        "1900-02-29T00:00:00Z, false",
        "2000-02-29T00:00:00Z, true",
        "2026-04-31T00:00:00Z, false",
        "2026-03-14T09:26:53.123456789+18:00, true",
        "2026-03-14T09:26:53.1234567890Z, false",
        "2026-03-14T09:26:53-18:00, true",
        "2026-03-14T09:26:53+18:01, false",
        "2026-03-14T09:26:53-00:00, false",
        "2026-03-14T09:26:53-00:01, true",
        "2016-12-31T23:59:60Z, false",
        "2026-03-14t09:26:53Z, false",
        "2026-03-14T09:26:53, false",
    })
    void shouldGiveTheSchemaVerdictWhenAnInstantIsAtAnEdge(String instant, boolean valid) {
        byte[] payload = event("\"occurredAt\":\"" + instant + "\"");
        assertEquals(valid, treePath(payload).event() != null, "tree path");
        assertEquals(valid, UsageEventReader.read(payload) != null, "token stream");
    }

    @ParameterizedTest
    @CsvSource({
        "0, 0.0",
        "-0, 0.0",
        "-0.0, -0.0",
        "-1e-400, -0.0",
        "1E2, 100.0",
        "1.7976931348623157e308, 1.7976931348623157e308",
        "1e400, NaN",
        "-1e400, NaN",
        "-4.9e-324, NaN",
        "123456789012345678901234567890, 1.2345678901234568E29",
        "-1, NaN",
    })
    void shouldGiveTheSchemaVerdictWhenAQuantityIsAtAnEdge(String literal, double quantity) {
        byte[] payload = event("\"quantity\":" + literal);
        UsageEvent tree = treePath(payload).event();
        UsageEvent fast = UsageEventReader.read(payload);
        if (Double.isNaN(quantity)) {
            assertNull(tree, "tree path");
            assertNull(fast, "token stream");
        } else {
            assertEquals(quantity, tree.quantity(), "tree path");
            assertEquals(tree, fast);
        }
    }

    /** A valid event, with {@code fields} written after the usual ones (a repeated name takes the last). */
    private static byte[] event(String fields) {
        return ("{\"schema\":\"congener/usage-event/v1\",\"eventId\":\"e-1\",\"researcherId\":\"r-1\","
                + "\"compoundId\":\"c-1\",\"kind\":\"ORDER\",\"quantity\":2.5,\"unit\":\"mL\","
                + "\"occurredAt\":\"2026-03-14T09:26:53Z\"," + fields + "}").getBytes(StandardCharsets.UTF_8);
    }
}
