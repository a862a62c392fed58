package org.congener.schemas;

/** A stock movement reported by the inventory system. */
public enum InventoryKind {
    RECEIVED, DEPLETED, ADJUSTED
}
