package org.congener.streams.scoring;

import java.util.List;

import org.congener.schemas.Neighbour;

/** A compound's most similar compounds in the ontology, most similar first; empty when it has none. */
@FunctionalInterface
public interface SimilarCompounds {

    List<Neighbour> of(String compoundId);
}
