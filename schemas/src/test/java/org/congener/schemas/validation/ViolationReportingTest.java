package org.congener.schemas.validation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.congener.schemas.Examples;
import org.congener.schemas.Json;
import org.congener.schemas.TopicName;
import org.junit.jupiter.api.Test;

class ViolationReportingTest {

    @Test
    void shouldReadAsPointerValueMessageAndRule() {
        assertEquals("/quantity = -2: must be >= 0 (minimum)",
                new Violation("/quantity", "-2", "minimum", "must be >= 0").toString());
        assertEquals("/unit: is required (required)", new Violation("/unit", null, "required", "is required").toString());
    }

    @Test
    void shouldShortenALongOffendingValueToOneLine() {
        ObjectNode value = (ObjectNode) Examples.read(Examples.folderOf(TopicName.CATALOG).resolve("valid-typical.json"));
        value.put("name", "Velorin\n" + "x".repeat(500));
        List<Violation> violations = SchemaValidator.forTopic(TopicName.CATALOG).check(value);
        String shown = violations.stream().filter(v -> v.rule().equals("maxLength")).findFirst().orElseThrow().value();
        assertEquals(Violation.MAX_VALUE_LENGTH, shown.length());
        assertTrue(shown.startsWith("\"Velorin\\nxxx") && shown.endsWith("…"), shown);
    }

    @Test
    void shouldEscapeSlashAndTildeInThePointerOfAnUnknownProperty() {
        ObjectNode value = (ObjectNode) Examples.read(Examples.folderOf(TopicName.RESEARCHERS).resolve("valid-typical.json"));
        value.put("a/b~c", 1);
        Violation only = SchemaValidator.forTopic(TopicName.RESEARCHERS).check(value).get(0);
        assertEquals("/a~1b~0c", only.field());
        assertEquals("1", only.value());
    }

    @Test
    void shouldListFiveViolationsInTheReasonAndCountTheRest() {
        List<Violation> seven = new ArrayList<>();
        for (int i = 0; i < 7; i++) {
            seven.add(new Violation("/f" + i, null, "required", "is required"));
        }
        String reason = InvalidRecordException.violating(TopicName.RESEARCHERS, seven).reason();
        assertTrue(reason.startsWith("researchers: 7 violations: /f0: is required (required); "), reason);
        assertTrue(reason.contains("/f4") && !reason.contains("/f5"), reason);
        assertTrue(reason.endsWith("; and 2 more"), reason);
    }

    @Test
    void shouldRefuseAnInvalidRecordExceptionWithoutViolations() {
        assertThrows(IllegalArgumentException.class, () -> InvalidRecordException.violating(TopicName.CATALOG, List.of()));
    }

    @Test
    void shouldGiveTheSameAnswersFromManyThreadsAtOnce() throws Exception {
        JsonNode valid = Examples.read(Examples.folderOf(TopicName.SUGGESTIONS).resolve("valid-typical.json"));
        JsonNode invalid = Examples.read(Examples.folderOf(TopicName.SUGGESTIONS).resolve("invalid-ranks-with-gap.json"));
        SchemaValidator validator = SchemaValidator.forTopic(TopicName.SUGGESTIONS);
        List<Violation> expected = validator.check(invalid);
        ExecutorService pool = Executors.newFixedThreadPool(4);
        try {
            List<Future<Boolean>> runs = new ArrayList<>();
            for (int t = 0; t < 4; t++) {
                runs.add(pool.submit(() -> {
                    boolean same = true;
                    for (int i = 0; i < 500; i++) {
                        same &= validator.check(valid).isEmpty() && validator.check(invalid).equals(expected);
                    }
                    return same;
                }));
            }
            for (Future<Boolean> run : runs) {
                assertTrue(run.get());
            }
        } finally {
            pool.shutdownNow();
        }
        assertEquals(1, expected.size());
    }

    @Test
    void shouldRunCrossFieldRulesOnlyOnValuesThatPassedTheSchema() throws Exception {
        // rank is broken, so the gram size cannot be judged and is not reported
        JsonNode manifest = Json.mapper().readTree(
                Examples.bytes(Examples.folderOf(TopicName.MODEL_MANIFESTS).resolve("invalid-rank-fractional.json")));
        List<Violation> violations = SchemaValidator.forTopic(TopicName.MODEL_MANIFESTS).check(manifest);
        assertEquals(List.of("type"), violations.stream().map(Violation::rule).toList());
    }
}
