package org.congener.cli.demo;

import org.congener.demo.DemoData;

/** The shipped demo scenario (module demo-events) as a {@link ReplayScenario}. */
public final class StandardScenario {

    private StandardScenario() {
    }

    public static ReplayScenario load() {
        return new ReplayScenario(DemoData.institutName(), DemoData.catalog(), DemoData.researchers(),
                DemoData.usageEvents(), DemoData.inventoryEvents(), DemoData.badUsageEventLines());
    }
}
