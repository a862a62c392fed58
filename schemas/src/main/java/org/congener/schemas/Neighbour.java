package org.congener.schemas;

/** One entry of a neighbour list: a similar compound and its ontology similarity in [0, 1]. */
public record Neighbour(String compoundId, double similarity) {
}
