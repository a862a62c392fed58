package org.congener.streams.scoring;

import java.util.HashSet;
import java.util.Set;
import java.util.function.Function;

import org.congener.schemas.CatalogEntry;
import org.congener.schemas.Researcher;
import org.congener.streams.state.InteractionProfile;

/** Whether a compound may be offered to one researcher. */
@FunctionalInterface
public interface CandidateFilter {

    boolean eligible(String compoundId);

    /** Both this filter and {@code other}. */
    default CandidateFilter and(CandidateFilter other) {
        return compoundId -> eligible(compoundId) && other.eligible(compoundId);
    }

    /**
     * The filters of the design: the compound is in the catalogue and active, the researcher holds an
     * authorisation for every one of its restriction tags, and has not used it already.
     */
    static CandidateFilter forResearcher(Researcher researcher, InteractionProfile profile,
                                         Function<String, CatalogEntry> catalog) {
        Set<String> authorisations = new HashSet<>(researcher.authorisations());
        return compoundId -> {
            CatalogEntry entry = catalog.apply(compoundId);
            return entry != null
                    && entry.active()
                    && authorisations.containsAll(entry.restrictionTags())
                    && !profile.hasUsed(compoundId);
        };
    }
}
