package org.congener.schemas;

/**
 * The schema identifier each topic value carries in its {@code schema} field, as
 * {@code congener/<name>/v<version>}. A consumer rejects a value whose identifier it does not know,
 * so a change of shape is always a new version, never a silent reinterpretation.
 */
public final class SchemaIds {
    public static final String USAGE_EVENT = "congener/usage-event/v1";
    public static final String INVENTORY_EVENT = "congener/inventory-event/v1";
    public static final String CATALOG_ENTRY = "congener/catalog-entry/v1";
    public static final String RESEARCHER = "congener/researcher/v1";
    public static final String MODEL_MANIFEST = "congener/model-manifest/v1";
    public static final String ITEM_FACTORS = "congener/item-factors/v1";
    public static final String ITEM_NEIGHBOURS = "congener/item-neighbours/v1";
    public static final String SUGGESTIONS = "congener/suggestions/v1";
    public static final String ARRIVAL_ALERT = "congener/arrival-alert/v1";
    public static final String DRIFT_METRICS = "congener/drift-metrics/v1";
    public static final String DEAD_LETTER = "congener/dead-letter/v1";

    private SchemaIds() {
    }
}
