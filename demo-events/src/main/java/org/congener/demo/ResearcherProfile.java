package org.congener.demo;

import org.congener.schemas.Researcher;

import java.util.Map;
import java.util.Set;

/**
 * A researcher and the hidden preferences the simulation draws their events from.
 *
 * @param branchWeights personal mix over ontology branches (the group's, re-weighted, maybe plus a
 *                      side interest from another group)
 * @param eventCount    how many usage events this person produces in the year
 * @param firstDay      first active day of the year (0-based; later for people who join mid-year)
 * @param untilDay      day after the last active day
 */
record ResearcherProfile(Researcher researcher, GroupProfile group, Map<String, Double> branchWeights,
                         int eventCount, int firstDay, int untilDay) {

    Set<String> authorisations() {
        return Set.copyOf(researcher.authorisations());
    }
}
