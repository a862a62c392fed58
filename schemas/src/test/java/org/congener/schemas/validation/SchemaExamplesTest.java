package org.congener.schemas.validation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.DynamicTest.dynamicTest;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;
import org.congener.schemas.Examples;
import org.congener.schemas.TopicName;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;

/**
 * Every example file of every topic value: each valid one passes, each invalid one yields exactly
 * the violations (field pointer and rule) listed for it in the folder's {@code expected-violations.json}.
 */
class SchemaExamplesTest {

    @TestFactory
    List<DynamicTest> shouldAcceptEveryValidExample() {
        List<DynamicTest> tests = new ArrayList<>();
        for (TopicName topic : TopicName.values()) {
            List<Path> valid = Examples.files(topic, "valid-");
            tests.add(dynamicTest(topic.baseName() + " has a valid example", () -> assertFalse(valid.isEmpty())));
            for (Path file : valid) {
                tests.add(dynamicTest(topic.baseName() + " accepts " + file.getFileName(), () ->
                        assertEquals(List.of(), SchemaValidator.forTopic(topic).check(Examples.read(file)))));
            }
        }
        return tests;
    }

    @TestFactory
    List<DynamicTest> shouldNameFieldAndRuleOfEveryInvalidExample() {
        List<DynamicTest> tests = new ArrayList<>();
        for (TopicName topic : TopicName.values()) {
            JsonNode expected = Examples.read(Examples.folderOf(topic).resolve("expected-violations.json"));
            List<Path> invalid = Examples.files(topic, "invalid-");
            Set<String> fileNames = invalid.stream().map(p -> p.getFileName().toString())
                    .collect(Collectors.toCollection(TreeSet::new));
            Set<String> listed = new TreeSet<>();
            expected.fieldNames().forEachRemaining(listed::add);
            tests.add(dynamicTest(topic.baseName() + " lists expectations for exactly its invalid examples",
                    () -> assertEquals(fileNames, listed)));
            tests.add(dynamicTest(topic.baseName() + " has several invalid examples",
                    () -> assertTrue(invalid.size() >= 6, "only " + invalid.size())));
            for (Path file : invalid) {
                String name = file.getFileName().toString();
                tests.add(dynamicTest(topic.baseName() + " rejects " + name, () -> {
                    List<Violation> violations = SchemaValidator.forTopic(topic).check(Examples.read(file));
                    assertEquals(fieldsAndRules(expected.get(name)), fieldsAndRules(violations), violations::toString);
                    for (Violation violation : violations) {
                        assertFalse(violation.message().isBlank(), violation::toString);
                    }
                }));
            }
        }
        return tests;
    }

    @TestFactory
    List<DynamicTest> shouldCoverEveryKindOfMistakeForEveryValue() {
        List<DynamicTest> tests = new ArrayList<>();
        for (TopicName topic : TopicName.values()) {
            tests.add(dynamicTest(topic.baseName() + " has missing, mistyped, out-of-range, malformed, "
                    + "wrong-version and unknown-property examples", () -> {
                Set<String> rules = new TreeSet<>();
                Examples.read(Examples.folderOf(topic).resolve("expected-violations.json"))
                        .forEach(list -> list.forEach(v -> rules.add(v.get("rule").asText())));
                assertTrue(rules.containsAll(Set.of("required", "type", "pattern", "const", "additionalProperties")),
                        rules::toString);
                assertTrue(rules.stream().anyMatch(OUT_OF_RANGE::contains), rules::toString);
            }));
        }
        return tests;
    }

    private static final Set<String> OUT_OF_RANGE = Set.of("minimum", "maximum", "minItems", "minLength", "enum");

    private static Set<String> fieldsAndRules(JsonNode expected) {
        Set<String> pairs = new HashSet<>();
        if (expected != null) {
            expected.forEach(v -> pairs.add(v.get("field").asText() + " " + v.get("rule").asText()));
        }
        return pairs;
    }

    private static Set<String> fieldsAndRules(List<Violation> violations) {
        return violations.stream().map(v -> v.field() + " " + v.rule()).collect(Collectors.toSet());
    }
}
