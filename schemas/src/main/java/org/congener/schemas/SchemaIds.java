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

    private static final String SCHEMA_URI_BASE = "https://schemas.congener.org/";

    private SchemaIds() {
    }

    /** The identifier that values on {@code topic} carry. */
    public static String of(TopicName topic) {
        return switch (topic) {
            case USAGE_EVENTS -> USAGE_EVENT;
            case INVENTORY_EVENTS -> INVENTORY_EVENT;
            case CATALOG -> CATALOG_ENTRY;
            case RESEARCHERS -> RESEARCHER;
            case MODEL_ITEM_FACTORS -> ITEM_FACTORS;
            case MODEL_MANIFESTS -> MODEL_MANIFEST;
            case ITEM_NEIGHBOURS -> ITEM_NEIGHBOURS;
            case SUGGESTIONS -> SUGGESTIONS;
            case ARRIVAL_ALERTS -> ARRIVAL_ALERT;
            case DRIFT_METRICS -> DRIFT_METRICS;
            case DEAD_LETTERS -> DEAD_LETTER;
        };
    }

    /** The value's name inside an identifier: {@code congener/usage-event/v1} gives {@code usage-event}. */
    public static String valueName(String schemaId) {
        String[] parts = schemaId.split("/");
        if (parts.length != 3 || !parts[0].equals("congener") || !parts[2].matches("v[1-9][0-9]*")) {
            throw new IllegalArgumentException("not a Congener schema id: " + schemaId);
        }
        return parts[1];
    }

    /** The JSON Schema {@code $id} of an identifier: {@code https://schemas.congener.org/usage-event/v1}. */
    public static String schemaUri(String schemaId) {
        valueName(schemaId);
        return SCHEMA_URI_BASE + schemaId.substring("congener/".length());
    }
}
