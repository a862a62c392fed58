package org.congener.schemas;

/**
 * One researcher's action on one compound. Key on {@code usage-events}: {@code researcherId}.
 *
 * @param schema       always {@link SchemaIds#USAGE_EVENT}
 * @param eventId      unique id from the ordering system, for de-duplication and tracing
 * @param researcherId who acted
 * @param compoundId   catalogue id of the compound
 * @param kind         order, withdrawal, usage-log entry or catalogue view
 * @param quantity     amount in {@code unit}; 0 for a view
 * @param unit         unit of quantity (g, mL, mg, …)
 * @param occurredAt   ISO-8601 instant when it happened in the ordering system
 */
public record UsageEvent(String schema, String eventId, String researcherId, String compoundId,
                         UsageKind kind, double quantity, String unit, String occurredAt) {
}
