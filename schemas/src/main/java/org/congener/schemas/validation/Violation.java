package org.congener.schemas.validation;

/**
 * One broken rule of a topic value.
 *
 * @param field   JSON pointer of the offending field ({@code /items/2/rank}); empty for the whole value
 * @param value   the offending value as JSON, shortened; null when the field is missing
 * @param rule    the JSON Schema keyword ({@code minimum}, {@code required}, {@code pattern}, …) or the
 *                name of a cross-field rule ({@code gramSize}, {@code sortedDescending}, …)
 * @param message what the rule asks for, e.g. {@code must be >= 0}
 */
public record Violation(String field, String value, String rule, String message) {
    static final int MAX_VALUE_LENGTH = 60;

    /** Reads as {@code /quantity = -2: must be >= 0 (minimum)}. */
    @Override
    public String toString() {
        String where = field.isEmpty() ? "/" : field;
        String shown = value == null ? "" : " = " + value;
        return where + shown + ": " + message + " (" + rule + ")";
    }

    /** Cuts a rendered value to a length that keeps a reason on one readable line. */
    static String shorten(String rendered) {
        if (rendered == null) {
            return null;
        }
        String oneLine = rendered.replaceAll("[\\r\\n\\t]+", " ");
        if (oneLine.length() <= MAX_VALUE_LENGTH) {
            return oneLine;
        }
        return oneLine.substring(0, MAX_VALUE_LENGTH - 1) + "…";
    }
}
