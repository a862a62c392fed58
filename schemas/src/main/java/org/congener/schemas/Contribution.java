package org.congener.schemas;

/** One of the researcher's past compounds that pushed a suggestion up, with its share of the score. */
public record Contribution(String compoundId, double weight) {
}
