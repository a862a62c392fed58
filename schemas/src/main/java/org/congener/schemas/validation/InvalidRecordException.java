package org.congener.schemas.validation;

import java.util.List;
import java.util.Objects;
import java.util.stream.Collectors;
import org.congener.schemas.TopicName;

/**
 * A topic value that could not be used: either it is not JSON at all ({@link #parseError()}), or it
 * breaks its schema ({@link #violations()}). {@link #reason()} is the one line that goes into the
 * dead letter.
 */
public final class InvalidRecordException extends RuntimeException {
    private static final int MAX_VIOLATIONS_IN_REASON = 5;

    private final TopicName topic;
    private final List<Violation> violations;
    private final String parseError;

    private InvalidRecordException(TopicName topic, List<Violation> violations, String parseError,
                                   String reason, Throwable cause) {
        super(reason, cause);
        this.topic = Objects.requireNonNull(topic, "topic");
        this.violations = List.copyOf(violations);
        this.parseError = parseError;
    }

    /** The value parsed but broke one or more rules of its schema. */
    public static InvalidRecordException violating(TopicName topic, List<Violation> violations) {
        if (violations.isEmpty()) {
            throw new IllegalArgumentException("an invalid record needs at least one violation");
        }
        return new InvalidRecordException(topic, violations, null, reasonFor(topic, violations), null);
    }

    /** The value is not readable as JSON (broken, truncated, empty) or does not map to its record. */
    public static InvalidRecordException unreadable(TopicName topic, String problem, Throwable cause) {
        String oneLine = problem.replaceAll("\\s+", " ").trim();
        return new InvalidRecordException(topic, List.of(), oneLine,
                topic.baseName() + ": unreadable value: " + oneLine, cause);
    }

    public TopicName topic() {
        return topic;
    }

    /** The broken rules, empty when the value did not parse. */
    public List<Violation> violations() {
        return violations;
    }

    /** Why parsing failed, or null when the value parsed and broke its schema instead. */
    public String parseError() {
        return parseError;
    }

    /** One line naming the topic and every problem (at most five violations, then a count). */
    public String reason() {
        return getMessage();
    }

    private static String reasonFor(TopicName topic, List<Violation> violations) {
        String listed = violations.stream().limit(MAX_VIOLATIONS_IN_REASON)
                .map(Violation::toString).collect(Collectors.joining("; "));
        int more = violations.size() - MAX_VIOLATIONS_IN_REASON;
        String rest = more > 0 ? "; and " + more + " more" : "";
        String count = violations.size() == 1 ? "1 violation" : violations.size() + " violations";
        return topic.baseName() + ": " + count + ": " + listed + rest;
    }
}
