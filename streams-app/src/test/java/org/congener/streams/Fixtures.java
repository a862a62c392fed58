package org.congener.streams;

import java.nio.charset.StandardCharsets;
import java.util.List;

import org.congener.schemas.CatalogEntry;
import org.congener.schemas.InventoryEvent;
import org.congener.schemas.InventoryKind;
import org.congener.schemas.Researcher;
import org.congener.schemas.SchemaIds;
import org.congener.schemas.Topics;
import org.congener.schemas.UsageEvent;
import org.congener.schemas.UsageKind;

/**
 * A tiny invented lab for topology tests: group g-a (ada, ben; cyd lacks the precursor clearance)
 * and group g-b (dee). Compounds: c-ethanol, c-acetone, c-toluene, c-precursor (restricted),
 * c-retired (inactive).
 */
public final class Fixtures {

    public static final String DAY0 = "2026-01-01T09:00:00Z";
    /** Serdes of every topic; the prefix does not change them. */
    public static final Topics TOPICS = new Topics("");

    private Fixtures() {
    }

    public static List<CatalogEntry> catalog() {
        return List.of(
                compound("c-ethanol", "ethanol", List.of(), true),
                compound("c-acetone", "acetone", List.of(), true),
                compound("c-toluene", "toluene", List.of(), true),
                compound("c-precursor", "listed precursor", List.of("controlled-precursor"), true),
                compound("c-retired", "retired solvent", List.of(), false));
    }

    public static CatalogEntry compound(String id, String name, List<String> tags, boolean active) {
        return new CatalogEntry(SchemaIds.CATALOG_ENTRY, id, name, List.of("term:" + id), tags,
                List.of("H225"), active);
    }

    public static List<Researcher> researchers() {
        return List.of(
                researcher("ada", "g-a", List.of("controlled-precursor")),
                researcher("ben", "g-a", List.of("controlled-precursor")),
                researcher("cyd", "g-a", List.of()),
                researcher("dee", "g-b", List.of("controlled-precursor")));
    }

    public static Researcher researcher(String id, String group, List<String> authorisations) {
        return new Researcher(SchemaIds.RESEARCHER, id, "Researcher " + id, group, authorisations, true);
    }

    public static UsageEvent event(String eventId, String researcher, String compound, UsageKind kind, String at) {
        return new UsageEvent(SchemaIds.USAGE_EVENT, eventId, researcher, compound, kind,
                kind == UsageKind.VIEW ? 0 : 1.0, "g", at);
    }

    public static InventoryEvent stock(String compound, double onHand) {
        return new InventoryEvent(SchemaIds.INVENTORY_EVENT, "inv-" + compound, compound,
                onHand > 0 ? InventoryKind.RECEIVED : InventoryKind.DEPLETED, onHand, "g", "store-1", DAY0);
    }

    /** The event as it travels on the topic: JSON text. */
    public static String json(UsageEvent event) {
        return new String(TOPICS.usageEvents().valueSerde().serializer().serialize("t", event), StandardCharsets.UTF_8);
    }
}
