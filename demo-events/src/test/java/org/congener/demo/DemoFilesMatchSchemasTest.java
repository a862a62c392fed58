package org.congener.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import org.congener.schemas.Json;
import org.congener.schemas.TopicName;
import org.congener.schemas.validation.SchemaValidator;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/** The shipped demo files are what the topics accept: every line passes its topic's JSON Schema. */
class DemoFilesMatchSchemasTest {

    @ParameterizedTest(name = "{0} lines pass the {1} schema")
    @CsvSource({
            "catalog.jsonl, CATALOG",
            "researchers.jsonl, RESEARCHERS",
            "usage-events.jsonl, USAGE_EVENTS",
            "inventory-events.jsonl, INVENTORY_EVENTS",
    })
    void shouldPassTheTopicSchemaOnEveryLine(String file, TopicName topic) throws IOException {
        SchemaValidator validator = SchemaValidator.forTopic(topic);
        List<String> failures = new ArrayList<>();
        int lines = 0;
        try (BufferedReader reader = open(file)) {
            String line;
            while ((line = reader.readLine()) != null) {
                lines++;
                JsonNode node = Json.mapper().readTree(line);
                var violations = validator.check(node);
                if (!violations.isEmpty()) {
                    failures.add(file + ":" + lines + " " + violations);
                }
            }
        }
        assertTrue(lines > 0, file + " is empty");
        assertEquals(List.of(), failures.subList(0, Math.min(5, failures.size())));
    }

    @Test
    void shouldFailTheSchemaOrParseOnEveryDeliberatelyBrokenLine() {
        SchemaValidator validator = SchemaValidator.forTopic(TopicName.USAGE_EVENTS);
        var known = new java.util.HashSet<String>();
        DemoData.catalog().forEach(entry -> known.add(entry.compoundId()));
        List<String> bad = DemoData.badUsageEventLines();
        assertFalse(bad.isEmpty());
        for (String line : bad) {
            boolean rejected;
            try {
                JsonNode node = Json.mapper().readTree(line);
                // The unknown-compound line is valid JSON Schema-wise: the stream rejects it against the catalogue.
                rejected = !validator.check(node).isEmpty()
                        || !known.contains(node.path("compoundId").asText());
            } catch (IOException parseFailure) {
                rejected = true;
            }
            assertTrue(rejected, "expected a rejection for: " + line);
        }
    }

    private static BufferedReader open(String file) {
        InputStream in = DemoData.class.getResourceAsStream(file);
        if (in == null) {
            throw new IllegalStateException("demo resource missing: " + file);
        }
        return new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
    }
}
