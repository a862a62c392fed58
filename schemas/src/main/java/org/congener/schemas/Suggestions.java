package org.congener.schemas;

import java.util.List;

/**
 * The current top-N of one researcher; key {@code researcherId} on {@code suggestions}.
 *
 * @param modelVersion    version that scored it, or null before any model is live
 * @param causedByEventId the usage event whose processing produced this list
 * @param caution         the safety caution; suggestions are no safety review
 */
public record Suggestions(String schema, String researcherId, String modelVersion, SuggestionSource source,
                          String causedByEventId, String generatedAt, List<Suggestion> items,
                          String caution) {
}
