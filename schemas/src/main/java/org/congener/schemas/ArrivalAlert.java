package org.congener.schemas;

import java.util.List;

/**
 * Tells a researcher that a compound related to their work has arrived or is back in stock;
 * key {@code researcherId} on {@code arrival-alerts}.
 */
public record ArrivalAlert(String schema, String researcherId, String compoundId, String name, double score,
                           List<Contribution> contributors, String inventoryEventId, String location,
                           String createdAt, String caution) {
}
