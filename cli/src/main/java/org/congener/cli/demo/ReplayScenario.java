package org.congener.cli.demo;

import java.time.Instant;
import java.util.List;

import org.congener.schemas.CatalogEntry;
import org.congener.schemas.InventoryEvent;
import org.congener.schemas.Researcher;
import org.congener.schemas.UsageEvent;

/**
 * What the demo loads and replays: reference data for the compacted topics, and the usage and
 * inventory events (each list in time order) plus deliberately broken usage-event lines.
 */
public record ReplayScenario(String institute, List<CatalogEntry> catalog, List<Researcher> researchers,
                             List<UsageEvent> usageEvents, List<InventoryEvent> inventoryEvents,
                             List<String> badUsageLines) {

    /**
     * The first {@code usageLimit} usage events, the inventory events up to the last of them, and all
     * broken lines; for quick runs and tests.
     */
    public ReplayScenario limitedTo(int usageLimit) {
        if (usageLimit < 0) {
            throw new IllegalArgumentException("limit must be ≥ 0, got " + usageLimit);
        }
        if (usageLimit >= usageEvents.size()) {
            return this;
        }
        List<UsageEvent> usage = usageEvents.subList(0, usageLimit);
        Instant last = usage.isEmpty() ? Instant.MIN : Instant.parse(usage.get(usage.size() - 1).occurredAt());
        List<InventoryEvent> inventory = inventoryEvents.stream()
                .filter(e -> !Instant.parse(e.occurredAt()).isAfter(last))
                .toList();
        return new ReplayScenario(institute, catalog, researchers, List.copyOf(usage), inventory, badUsageLines);
    }

    /** Where the demo splits the usage events into the history trained on before the replay and the rest. */
    public int historySize() {
        return usageEvents.size() * 2 / 5;
    }

    /** The first {@code n} usage events and the inventory events up to the last of them; no broken lines. */
    public ReplayScenario history(int n) {
        ReplayScenario first = limitedTo(n);
        return new ReplayScenario(institute, catalog, researchers, first.usageEvents(), first.inventoryEvents(),
                List.of());
    }

    /** What {@link #history} leaves: the usage events from {@code n}, the later inventory events, every broken line. */
    public ReplayScenario after(int n) {
        ReplayScenario first = history(n);
        List<UsageEvent> usage = List.copyOf(usageEvents.subList(Math.min(n, usageEvents.size()), usageEvents.size()));
        List<InventoryEvent> inventory = List.copyOf(inventoryEvents.subList(first.inventoryEvents().size(),
                inventoryEvents.size()));
        return new ReplayScenario(institute, catalog, researchers, usage, inventory, badUsageLines);
    }
}
