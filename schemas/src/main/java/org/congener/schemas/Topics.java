package org.congener.schemas;

import java.util.List;
import java.util.Objects;
import org.apache.kafka.common.serialization.Serde;
import org.apache.kafka.common.serialization.Serdes;
import org.congener.schemas.serde.ValidatingJsonSerde;

/**
 * Every Congener topic of one deployment, named {@code prefix + baseName}. Keys are strings; values
 * use {@link ValidatingJsonSerde}, so a consumer rejects what its schema does not allow.
 */
public final class Topics {
    /** Kafka allows these characters and at most 249 of them in a topic name. */
    private static final String LEGAL_NAME = "[A-Za-z0-9._-]*";
    private static final int MAX_NAME_LENGTH = 249;

    private final String prefix;
    private final Topic<UsageEvent> usageEvents;
    private final Topic<InventoryEvent> inventoryEvents;
    private final Topic<CatalogEntry> catalog;
    private final Topic<Researcher> researchers;
    private final Topic<ItemFactors> modelItemFactors;
    private final Topic<ModelManifest> modelManifests;
    private final Topic<ItemNeighbours> itemNeighbours;
    private final Topic<Suggestions> suggestions;
    private final Topic<ArrivalAlert> arrivalAlerts;
    private final Topic<DriftMetrics> driftMetrics;
    private final Topic<DeadLetter> deadLetters;

    /** @param prefix put before every base name, e.g. {@code ""} or {@code "lab1."} */
    public Topics(String prefix) {
        Objects.requireNonNull(prefix, "prefix");
        if (!prefix.matches(LEGAL_NAME)) {
            throw new IllegalArgumentException("topic prefix '" + prefix
                    + "' may hold only letters, digits, '.', '_' and '-'");
        }
        this.prefix = prefix;
        this.usageEvents = topic(TopicName.USAGE_EVENTS, UsageEvent.class);
        this.inventoryEvents = topic(TopicName.INVENTORY_EVENTS, InventoryEvent.class);
        this.catalog = topic(TopicName.CATALOG, CatalogEntry.class);
        this.researchers = topic(TopicName.RESEARCHERS, Researcher.class);
        this.modelItemFactors = topic(TopicName.MODEL_ITEM_FACTORS, ItemFactors.class);
        this.modelManifests = topic(TopicName.MODEL_MANIFESTS, ModelManifest.class);
        this.itemNeighbours = topic(TopicName.ITEM_NEIGHBOURS, ItemNeighbours.class);
        this.suggestions = topic(TopicName.SUGGESTIONS, Suggestions.class);
        this.arrivalAlerts = topic(TopicName.ARRIVAL_ALERTS, ArrivalAlert.class);
        this.driftMetrics = topic(TopicName.DRIFT_METRICS, DriftMetrics.class);
        this.deadLetters = topic(TopicName.DEAD_LETTERS, DeadLetter.class);
    }

    private <V> Topic<V> topic(TopicName id, Class<V> valueType) {
        String name = id.withPrefix(prefix);
        if (name.length() > MAX_NAME_LENGTH) {
            throw new IllegalArgumentException("topic name " + name + " is longer than " + MAX_NAME_LENGTH);
        }
        Serde<V> values = ValidatingJsonSerde.of(id, valueType);
        return new Topic<>(id, name, Serdes.String(), values);
    }

    public String prefix() {
        return prefix;
    }

    public Topic<UsageEvent> usageEvents() {
        return usageEvents;
    }

    public Topic<InventoryEvent> inventoryEvents() {
        return inventoryEvents;
    }

    public Topic<CatalogEntry> catalog() {
        return catalog;
    }

    public Topic<Researcher> researchers() {
        return researchers;
    }

    public Topic<ItemFactors> modelItemFactors() {
        return modelItemFactors;
    }

    public Topic<ModelManifest> modelManifests() {
        return modelManifests;
    }

    public Topic<ItemNeighbours> itemNeighbours() {
        return itemNeighbours;
    }

    public Topic<Suggestions> suggestions() {
        return suggestions;
    }

    public Topic<ArrivalAlert> arrivalAlerts() {
        return arrivalAlerts;
    }

    public Topic<DriftMetrics> driftMetrics() {
        return driftMetrics;
    }

    public Topic<DeadLetter> deadLetters() {
        return deadLetters;
    }

    /** Every topic, in {@link TopicName} order. */
    public List<Topic<?>> all() {
        return List.of(usageEvents, inventoryEvents, catalog, researchers, modelItemFactors, modelManifests,
                itemNeighbours, suggestions, arrivalAlerts, driftMetrics, deadLetters);
    }

    /** The topic with this id. */
    public Topic<?> get(TopicName id) {
        return all().get(id.ordinal());
    }
}
