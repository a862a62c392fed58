package org.congener.demo;

import com.fasterxml.jackson.core.type.TypeReference;
import org.congener.schemas.CatalogEntry;
import org.congener.schemas.InventoryEvent;
import org.congener.schemas.Researcher;
import org.congener.schemas.UsageEvent;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;

/**
 * The shipped demo scenario of the invented Kestrelmoor institute: its ontology, catalogue,
 * researchers, groups and a year of usage and inventory events (seed {@link DemoGenerator#DEFAULT_SEED}).
 * All of it is invented demo data; hazard codes are illustrative, not a safety data source.
 * Lists, and the lists inside their records, are immutable; the files are read once per JVM.
 */
public final class DemoData {

    /** The invented institute the demo is set in. */
    public static final String INSTITUTE_NAME = "Kestrelmoor Institute for Molecular Sciences";

    private DemoData() {
    }

    public static String institutName() {
        return INSTITUTE_NAME;
    }

    /** The ontology as OBO 1.4 text. */
    public static String ontologyObo() {
        return DemoResources.text(DemoGenerator.ONTOLOGY_FILE);
    }

    /** The ontology file as a stream; the caller closes it. */
    public static InputStream openOntology() {
        return DemoResources.open(DemoGenerator.ONTOLOGY_FILE);
    }

    public static List<CatalogEntry> catalog() {
        return Loaded.CATALOG;
    }

    public static List<Researcher> researchers() {
        return Loaded.RESEARCHERS;
    }

    public static List<DemoGroup> groups() {
        return Loaded.GROUPS;
    }

    /** Usage events in time order. */
    public static List<UsageEvent> usageEvents() {
        return Loaded.USAGE;
    }

    /** Inventory events in time order. */
    public static List<InventoryEvent> inventoryEvents() {
        return Loaded.INVENTORY;
    }

    /** Deliberately broken usage-event lines for the dead-letter path, one defect each. */
    public static List<String> badUsageEventLines() {
        return Loaded.BAD_LINES;
    }

    static <T> List<T> readJsonLines(String name, Class<T> type) {
        List<String> lines = DemoResources.lines(name);
        List<T> values = new ArrayList<>(lines.size());
        for (int i = 0; i < lines.size(); i++) {
            values.add(DemoJson.readLine(lines.get(i), type, name, i + 1));
        }
        return List.copyOf(values);
    }

    /** Loaded on first use, once (holder idiom). */
    private static final class Loaded {
        static final List<CatalogEntry> CATALOG = readJsonLines(DemoGenerator.CATALOG_FILE, CatalogEntry.class).stream()
                .map(c -> new CatalogEntry(c.schema(), c.compoundId(), c.name(), List.copyOf(c.termIds()),
                        List.copyOf(c.restrictionTags()), List.copyOf(c.hazardCodes()), c.active()))
                .toList();
        static final List<Researcher> RESEARCHERS = readJsonLines(DemoGenerator.RESEARCHERS_FILE, Researcher.class).stream()
                .map(r -> new Researcher(r.schema(), r.researcherId(), r.name(), r.groupId(),
                        List.copyOf(r.authorisations()), r.alertOptIn()))
                .toList();
        static final List<UsageEvent> USAGE = readJsonLines(DemoGenerator.USAGE_EVENTS_FILE, UsageEvent.class);
        static final List<InventoryEvent> INVENTORY = readJsonLines(DemoGenerator.INVENTORY_EVENTS_FILE, InventoryEvent.class);
        static final List<String> BAD_LINES = List.copyOf(DemoResources.lines(DemoGenerator.BAD_USAGE_EVENTS_FILE));
        static final List<DemoGroup> GROUPS = readGroups();

        private static List<DemoGroup> readGroups() {
            try {
                List<DemoGroup> groups = DemoJson.mapper().readValue(DemoResources.bytes(DemoGenerator.GROUPS_FILE),
                        new TypeReference<List<DemoGroup>>() { });
                return groups.stream().map(g -> new DemoGroup(g.groupId(), g.name(), List.copyOf(g.interests()))).toList();
            } catch (IOException e) {
                throw new UncheckedIOException("cannot read " + DemoGenerator.GROUPS_FILE, e);
            }
        }
    }
}
