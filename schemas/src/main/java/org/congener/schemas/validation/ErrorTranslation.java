package org.congener.schemas.validation;

import com.fasterxml.jackson.databind.JsonNode;
import com.networknt.schema.Error;

/** Turns one validator error into a {@link Violation}: pointer of the field itself, its value, a short message. */
final class ErrorTranslation {
    private ErrorTranslation() {
    }

    static Violation toViolation(Error error) {
        String keyword = error.getKeyword();
        String at = error.getInstanceLocation().toString();
        JsonNode instance = error.getInstanceNode();
        String property = error.getProperty();
        JsonNode rule = error.getSchemaNode();
        return switch (keyword) {
            // both report on the enclosing object; point at the property itself
            case "required" -> new Violation(child(at, property), null, keyword, "is required");
            case "additionalProperties" -> new Violation(child(at, property),
                    render(instance == null ? null : instance.get(property)), keyword, "is not an allowed property");
            default -> new Violation(at, render(instance), keyword, messageFor(keyword, rule, error));
        };
    }

    private static String messageFor(String keyword, JsonNode rule, Error error) {
        if (rule == null) {
            return libraryMessage(error);
        }
        return switch (keyword) {
            case "minimum" -> "must be >= " + rule.asText();
            case "maximum" -> "must be <= " + rule.asText();
            case "exclusiveMinimum" -> "must be > " + rule.asText();
            case "exclusiveMaximum" -> "must be < " + rule.asText();
            case "type" -> "must be of type " + (rule.isArray() ? rule.toString() : rule.asText());
            case "pattern" -> "must match " + rule.asText();
            case "const" -> "must be " + rule;
            case "enum" -> "must be one of " + rule;
            case "format" -> "must be a valid " + rule.asText();
            case "minLength" -> "must have at least " + rule.asText() + " characters";
            case "maxLength" -> "must have at most " + rule.asText() + " characters";
            case "minItems" -> "must have at least " + rule.asText() + " items";
            case "maxItems" -> "must have at most " + rule.asText() + " items";
            case "maxProperties" -> "must have at most " + rule.asText() + " properties";
            case "uniqueItems" -> "must not repeat an item";
            default -> libraryMessage(error);
        };
    }

    /** The validator's own wording, without the location it puts in front (the violation has it). */
    private static String libraryMessage(Error error) {
        String message = error.getMessage();
        String at = error.getInstanceLocation().toString();
        if (message.startsWith(at + ": ")) {
            return message.substring(at.length() + 2);
        }
        return message;
    }

    private static String render(JsonNode node) {
        return node == null || node.isMissingNode() ? null : Violation.shorten(node.toString());
    }

    /** RFC 6901: {@code ~} and {@code /} inside a name are escaped as {@code ~0} and {@code ~1}. */
    static String child(String pointer, String name) {
        if (name == null) {
            return pointer;
        }
        return pointer + "/" + name.replace("~", "~0").replace("/", "~1");
    }
}
