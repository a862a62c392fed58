package org.congener.schemas.validation;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;

/** A rule relating two or more fields of a value that already passed its JSON Schema. */
@FunctionalInterface
interface CrossFieldRule {
    /** Appends a violation to {@code out} for each breach found in {@code value}. */
    void check(JsonNode value, List<Violation> out);
}
