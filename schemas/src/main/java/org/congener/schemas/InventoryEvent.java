package org.congener.schemas;

/**
 * A stock change of one compound at one location. Key on {@code inventory-events}: {@code compoundId}.
 *
 * @param quantityOnHand stock at {@code location} after this event, in {@code unit}
 */
public record InventoryEvent(String schema, String eventId, String compoundId, InventoryKind kind,
                             double quantityOnHand, String unit, String location, String occurredAt) {
}
