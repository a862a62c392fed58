package org.congener.schemas;

/**
 * Every topic Congener reads or writes, with the value record it carries and its clean-up policy.
 * The name on the broker is {@code prefix + baseName}; the prefix is configurable so that several
 * deployments can share a cluster.
 */
public enum TopicName {
    USAGE_EVENTS("usage-events", UsageEvent.class, false),
    INVENTORY_EVENTS("inventory-events", InventoryEvent.class, false),
    CATALOG("catalog", CatalogEntry.class, true),
    RESEARCHERS("researchers", Researcher.class, true),
    MODEL_ITEM_FACTORS("model-item-factors", ItemFactors.class, true),
    MODEL_MANIFESTS("model-manifests", ModelManifest.class, true),
    ITEM_NEIGHBOURS("item-neighbours", ItemNeighbours.class, true),
    SUGGESTIONS("suggestions", Suggestions.class, false),
    ARRIVAL_ALERTS("arrival-alerts", ArrivalAlert.class, false),
    DRIFT_METRICS("drift-metrics", DriftMetrics.class, false),
    DEAD_LETTERS("dead-letters", DeadLetter.class, false);

    private final String baseName;
    private final Class<?> valueType;
    private final boolean compacted;

    TopicName(String baseName, Class<?> valueType, boolean compacted) {
        this.baseName = baseName;
        this.valueType = valueType;
        this.compacted = compacted;
    }

    public String baseName() {
        return baseName;
    }

    public String withPrefix(String prefix) {
        return prefix + baseName;
    }

    public Class<?> valueType() {
        return valueType;
    }

    /** Compacted topics hold the latest value per key (catalogue, researchers, model versions). */
    public boolean compacted() {
        return compacted;
    }
}
