package org.congener.schemas;

import java.util.List;

/**
 * The top-K ontology neighbours of one compound under one model version, most similar first.
 *
 * @param measure similarity measure used (lin, resnik, jc)
 */
public record ItemNeighbours(String schema, String version, String compoundId, String measure,
                             List<Neighbour> neighbours) {
}
