package org.congener.streams.model;

import java.util.List;
import java.util.Map;
import java.util.function.Supplier;

import org.congener.core.ontology.Ontology;
import org.congener.core.ontology.ic.InformationContent;
import org.congener.core.ontology.neighbours.CatalogueNeighbours;
import org.congener.core.ontology.neighbours.NeighbourCache;
import org.congener.streams.scoring.SimilarCompounds;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * The ontology's neighbour lists over the current catalogue, for the time before any model version is
 * live (a live version brings the trainer's lists). Built on first use from the catalogue as the
 * global table holds it, then rebuilt at most once per refresh interval, so compounds added to the
 * catalogue join within that interval while a cold start lasts; the lists are the trainer's (same
 * measure, same K), computed by {@link CatalogueNeighbours}. Building 20,000 compounds takes about a
 * second (BENCHMARKS.md, "Neighbour cache"), which the triggering event waits for once.
 */
public final class CatalogueSimilarity {

    private static final Logger LOG = LoggerFactory.getLogger(CatalogueSimilarity.class);
    static final long REFRESH_MS = 5 * 60_000L;

    private final Ontology ontology;
    private final InformationContent ic;
    private final int k;
    private NeighbourCache cache;
    private long builtAtMs;

    public CatalogueSimilarity(Ontology ontology, InformationContent ic, int k) {
        this.ontology = ontology;
        this.ic = ic;
        this.k = k;
    }

    /**
     * The lists, (re)built from {@code catalogueTerms} (compound id → ontology term ids) when none exist
     * or they are older than the refresh interval at {@code nowMs}. One caller thread at a time.
     */
    public SimilarCompounds current(Supplier<Map<String, List<String>>> catalogueTerms, long nowMs) {
        if (cache == null || nowMs - builtAtMs >= REFRESH_MS) {
            long t0 = System.nanoTime();
            CatalogueNeighbours.Result built = CatalogueNeighbours.build(ontology, ic, catalogueTerms.get(), k, 1);
            cache = built.cache();
            builtAtMs = nowMs;
            LOG.info("no model version is live: ontology neighbour lists over {} catalogue compounds built in {} ms"
                            + " ({} without a known term, {} unknown term ids)", cache.size(),
                    (System.nanoTime() - t0) / 1_000_000, built.compoundsWithoutTerms(), built.unknownTermIds());
        }
        NeighbourCache lists = cache;
        return lists::neighbours;
    }
}
