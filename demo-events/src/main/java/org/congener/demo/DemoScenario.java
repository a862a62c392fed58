package org.congener.demo;

import org.congener.schemas.CatalogEntry;
import org.congener.schemas.InventoryEvent;
import org.congener.schemas.Researcher;
import org.congener.schemas.UsageEvent;

import java.util.List;

/**
 * The whole demo scenario for one seed, in memory: the hand-written ontology and catalogue (the same
 * for every seed) and the seeded researchers and events.
 */
record DemoScenario(long seed, String ontologyObo, DemoOntology ontology, List<SourceCompound> compounds,
                    List<CatalogEntry> catalog, List<DemoGroup> groups, List<ResearcherProfile> profiles,
                    List<UsageEvent> usageEvents, List<InventoryEvent> inventoryEvents, List<String> badUsageEventLines) {

    static DemoScenario build(long seed, int targetUsageEvents) {
        String obo = DemoResources.text(DemoGenerator.ONTOLOGY_FILE);
        DemoOntology ontology = DemoOntology.parse(obo);
        List<SourceCompound> compounds = CatalogueBuilder.parse(DemoResources.text("source/compounds.txt"), ontology);
        List<CatalogEntry> catalog = CatalogueBuilder.entries(compounds);
        List<GroupProfile> groupProfiles = GroupProfile.kestrelmoorGroups();
        ResearcherFactory factory = new ResearcherFactory(DemoResources.words("source/given-names.txt"),
                DemoResources.words("source/family-names.txt"));
        List<ResearcherProfile> profiles = factory.create(groupProfiles, targetUsageEvents,
                DemoRandom.fork(seed, "researchers"));
        CompoundIndex index = new CompoundIndex(compounds, ontology);
        List<UsageEvent> usage = new UsageSimulator(ontology, index, groupProfiles, DemoRandom.fork(seed, "popularity"))
                .simulate(profiles, DemoRandom.fork(seed, "usage"));
        List<InventoryEvent> inventory = new InventorySimulator(index).simulate(usage, DemoRandom.fork(seed, "inventory"));
        List<DemoGroup> groups = groupProfiles.stream().map(GroupProfile::toGroup).toList();
        return new DemoScenario(seed, obo, ontology, compounds, catalog, groups, profiles, usage, inventory,
                BadUsageEventLines.from(usage.get(0)));
    }

    List<Researcher> researchers() {
        return profiles.stream().map(ResearcherProfile::researcher).toList();
    }
}
