package org.congener.streams;

/** The caution every suggestion list and every API response carries: suggestions are no safety review. */
public final class SafetyCaution {

    public static final String TEXT = "Suggestions come from usage patterns and ontology similarity, not from any"
            + " safety review. Read the safety data sheet before use, follow your institution's chemical hygiene"
            + " plan, and let local regulations and licensed practice govern restricted substances.";

    private SafetyCaution() {
    }
}
