package org.congener.schemas;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** One valid record of every topic value, built in Java, for round trips. Invented data. */
public final class RecordSamples {
    public static final String CAUTION = "Suggestions are no safety review: read the safety data sheet, follow the "
            + "chemical hygiene plan; local regulations and licensed practice govern.";
    static final String AT = "2026-03-14T09:26:53.125Z";

    private RecordSamples() {
    }

    public static UsageEvent usageEvent() {
        return new UsageEvent(SchemaIds.USAGE_EVENT, "ord-2026-000481", "r-0007", "cmp-0042", UsageKind.WITHDRAWAL,
                12.5, "mL", AT);
    }

    /** Every topic's sample, in {@link TopicName} order. */
    public static Map<TopicName, Object> all() {
        Map<TopicName, Object> samples = new LinkedHashMap<>();
        samples.put(TopicName.USAGE_EVENTS, usageEvent());
        samples.put(TopicName.INVENTORY_EVENTS, new InventoryEvent(SchemaIds.INVENTORY_EVENT, "inv-000913",
                "cmp-0042", InventoryKind.DEPLETED, 0.0, "g", "Stores B, shelf 4", AT));
        samples.put(TopicName.CATALOG, new CatalogEntry(SchemaIds.CATALOG_ENTRY, "cmp-0042", "Velorin chloride",
                List.of("CGO:0000101"), List.of("toxic-gas", "controlled-precursor"),
                List.of("H225", "H300+H310+H330"), true));
        samples.put(TopicName.RESEARCHERS, new Researcher(SchemaIds.RESEARCHER, "r-0007", "Ilse Marwick",
                "grp-synthesis-2", List.of(), false));
        samples.put(TopicName.MODEL_ITEM_FACTORS, new ItemFactors(SchemaIds.ITEM_FACTORS, "m-7", "cmp-0042",
                new float[] {0.1f, -1.0e-7f, 3.4028235e38f, 1.4e-45f, (float) Math.PI}));
        samples.put(TopicName.MODEL_MANIFESTS, new ModelManifest(SchemaIds.MODEL_MANIFEST, "m-7", AT, 2, 0.1, 40.0,
                120, 118, List.of(4.0, 1.5, 1.5, 1.0 / 3.0), FusionRule.RANK_FUSION, Map.of("k", 60.0),
                Map.of("ndcg@10", 0.31, "auc", 0.87),
                "9f86d081884c7d659a2feaa0c55ad015a3bf4f1b2b0b822cd15d6c15b0f00a08"));
        samples.put(TopicName.ITEM_NEIGHBOURS, new ItemNeighbours(SchemaIds.ITEM_NEIGHBOURS, "m-7", "cmp-0042", "jc",
                List.of(new Neighbour("cmp-0043", 1.0), new Neighbour("cmp-0107", 0.0))));
        samples.put(TopicName.SUGGESTIONS, new Suggestions(SchemaIds.SUGGESTIONS, "r-0007", null,
                SuggestionSource.SEMANTIC_AND_POPULARITY, "ord-2026-000481", AT, List.of(
                new Suggestion(1, "cmp-0043", "Velorin bromide", -0.25, 0.9, 0.5,
                        List.of(new Contribution("cmp-0042", 0.75), new Contribution("cmp-0107", -0.125)),
                        "CGO:0000101", "velorin halide", List.of("H302"), true),
                new Suggestion(2, "cmp-0011", "Tessamine", 0.0, 0.4, 0.1, List.of(), null, null, List.of(), false)),
                CAUTION));
        samples.put(TopicName.ARRIVAL_ALERTS, new ArrivalAlert(SchemaIds.ARRIVAL_ALERT, "r-0007", "cmp-0043",
                "Velorin bromide", 0.71, List.of(new Contribution("cmp-0042", 1.0)), "inv-000913",
                "Stores B, shelf 4", AT, CAUTION));
        samples.put(TopicName.DRIFT_METRICS, new DriftMetrics(SchemaIds.DRIFT_METRICS, "2026-03-14T09:00:00Z",
                "2026-03-14T10:00:00Z", "m-7", 10, 5_000_000_000L, 0.18, 0.04, 1.0, 1987));
        samples.put(TopicName.DEAD_LETTERS, DeadLetters.of("lab1.usage-events", 3, 40211L,
                "usage-events: unreadable value", new byte[] {(byte) 0xC3, 0x28}, java.time.Instant.parse(AT)));
        return samples;
    }
}
