package org.congener.trainer.service;

import java.util.List;
import java.util.Map;
import org.congener.schemas.CatalogEntry;
import org.congener.schemas.Researcher;
import org.congener.schemas.UsageEvent;

/**
 * What the trainer read from the broker: every usage event, the latest catalogue entry and researcher
 * record per key (tombstones remove), and how many records of each topic were unreadable and skipped.
 */
public record TrainingHistory(List<UsageEvent> events, Map<String, CatalogEntry> catalogue,
                              Map<String, Researcher> researchers, int skippedEvents, int skippedCatalogue,
                              int skippedResearchers) {
    public int skipped() {
        return skippedEvents + skippedCatalogue + skippedResearchers;
    }
}
