package org.congener.schemas;

import java.util.List;

/**
 * One suggested compound with its scores and why it was suggested.
 *
 * @param contributors    the researcher's past compounds that contributed most
 * @param sharedTermId    most informative ontology class shared with the top contributor, or null
 * @param sharedTermName  that class's name, or null
 * @param hazardCodes     GHS hazard statements of the compound, repeated so a reader sees them
 */
public record Suggestion(int rank, String compoundId, String name, double cfScore, double semanticScore,
                         double fusedScore, List<Contribution> contributors, String sharedTermId,
                         String sharedTermName, List<String> hazardCodes, boolean inStock) {
}
