package org.congener.demo;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import org.congener.schemas.CatalogEntry;
import org.congener.schemas.InventoryEvent;
import org.congener.schemas.InventoryKind;
import org.congener.schemas.Researcher;
import org.congener.schemas.SchemaIds;
import org.congener.schemas.UsageEvent;
import org.congener.schemas.UsageKind;
import org.junit.jupiter.api.Test;

import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Function;
import java.util.stream.Collectors;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Checks the shipped demo files through the public {@link DemoData} API. */
class DemoDataTest {

    private static Map<String, CatalogEntry> catalogById() {
        return DemoData.catalog().stream().collect(Collectors.toMap(CatalogEntry::compoundId, Function.identity()));
    }

    private static Map<String, Researcher> researchersById() {
        return DemoData.researchers().stream().collect(Collectors.toMap(Researcher::researcherId, Function.identity()));
    }

    @Test
    void shouldHandOutListsThatCannotBeChanged() {
        assertThrows(UnsupportedOperationException.class, () -> DemoData.catalog().get(0).termIds().add("CGNR:0000001"));
        assertThrows(UnsupportedOperationException.class, () -> DemoData.researchers().get(0).authorisations().clear());
        assertThrows(UnsupportedOperationException.class, () -> DemoData.usageEvents().remove(0));
    }

    @Test
    void shouldNameAnInventedInstitute() {
        assertEquals("Kestrelmoor Institute for Molecular Sciences", DemoData.institutName());
    }

    @Test
    void shouldHoldAboutThreeHundredResearchersInEightGroups() {
        List<Researcher> researchers = DemoData.researchers();
        assertTrue(researchers.size() >= 280 && researchers.size() <= 320, "researchers " + researchers.size());
        assertEquals(8, DemoData.groups().size());
        Set<String> groupIds = DemoData.groups().stream().map(DemoGroup::groupId).collect(Collectors.toSet());
        Set<String> names = new HashSet<>();
        for (Researcher r : researchers) {
            assertEquals(SchemaIds.RESEARCHER, r.schema());
            assertTrue(r.researcherId().matches("R\\d{4}"), r.researcherId());
            assertTrue(groupIds.contains(r.groupId()), r.groupId());
            assertTrue(names.add(r.name()), "duplicate name " + r.name());
            assertTrue(CatalogueBuilder.RESTRICTION_TAGS.containsAll(r.authorisations()), r.authorisations().toString());
        }
        long optIn = researchers.stream().filter(Researcher::alertOptIn).count();
        assertTrue(optIn > researchers.size() * 0.7 && optIn < researchers.size() * 0.97, "opt-in " + optIn);
    }

    @Test
    void shouldVaryAuthorisationsWithinAGroup() {
        Map<String, Set<List<String>>> distinctPerGroup = new HashMap<>();
        for (Researcher r : DemoData.researchers()) {
            distinctPerGroup.computeIfAbsent(r.groupId(), k -> new HashSet<>()).add(r.authorisations());
        }
        for (Map.Entry<String, Set<List<String>>> group : distinctPerGroup.entrySet()) {
            assertTrue(group.getValue().size() >= 3, group.getKey() + " has " + group.getValue().size() + " authorisation sets");
        }
    }

    @Test
    void shouldGiveGroupsDistinctInterestsThatAreOntologyTerms() {
        DemoOntology ontology = DemoOntology.parse(DemoData.ontologyObo());
        Set<List<String>> seen = new HashSet<>();
        for (DemoGroup group : DemoData.groups()) {
            assertTrue(group.interests().size() >= 4, group.groupId());
            assertTrue(seen.add(group.interests()), group.groupId());
            for (String term : group.interests()) {
                assertTrue(ontology.isActiveTerm(term), group.groupId() + " " + term);
            }
        }
    }

    @Test
    void shouldMapAboutFourHundredCompoundsToActiveOntologyTerms() {
        DemoOntology ontology = DemoOntology.parse(DemoData.ontologyObo());
        List<CatalogEntry> catalog = DemoData.catalog();
        assertTrue(catalog.size() >= 380 && catalog.size() <= 420, "compounds " + catalog.size());
        Set<String> names = new HashSet<>();
        for (int i = 0; i < catalog.size(); i++) {
            CatalogEntry c = catalog.get(i);
            assertEquals(SchemaIds.CATALOG_ENTRY, c.schema());
            assertEquals(String.format("C%05d", i + 1), c.compoundId());
            assertTrue(names.add(c.name()), "duplicate " + c.name());
            assertTrue(c.termIds().size() >= 1 && c.termIds().size() <= 3, c.compoundId());
            for (String term : c.termIds()) {
                assertTrue(ontology.isActiveTerm(term), c.compoundId() + " maps to missing or obsolete " + term);
            }
            for (String code : c.hazardCodes()) {
                assertTrue(code.matches("H[2-4]\\d\\d[A-Za-z]{0,2}"), c.compoundId() + " " + code);
            }
        }
    }

    @Test
    void shouldRestrictARealisticShareAndMarkAFewCompoundsInactive() {
        List<CatalogEntry> catalog = DemoData.catalog();
        double restricted = catalog.stream().filter(c -> !c.restrictionTags().isEmpty()).count() / (double) catalog.size();
        double withHazards = catalog.stream().filter(c -> !c.hazardCodes().isEmpty()).count() / (double) catalog.size();
        long inactive = catalog.stream().filter(c -> !c.active()).count();
        long radioactive = catalog.stream().filter(c -> c.restrictionTags().contains("radioactive")).count();
        assertTrue(restricted >= 0.15 && restricted <= 0.25, "restricted share " + restricted);
        assertTrue(withHazards >= 0.5, "hazard share " + withHazards);
        assertTrue(inactive >= 3 && inactive <= 10, "inactive " + inactive);
        assertTrue(radioactive >= 1 && radioactive <= 6, "radioactive " + radioactive);
    }

    @Test
    void shouldHoldAboutTwentyThousandUsageEventsInTimeOrderWithUniqueIds() {
        List<UsageEvent> events = DemoData.usageEvents();
        assertTrue(events.size() >= 19_000 && events.size() <= 21_000, "events " + events.size());
        Set<String> ids = new HashSet<>();
        Instant previous = Instant.MIN;
        for (UsageEvent e : events) {
            assertEquals(SchemaIds.USAGE_EVENT, e.schema());
            assertTrue(e.eventId().matches("U\\d{6}"), e.eventId());
            assertTrue(ids.add(e.eventId()), "duplicate " + e.eventId());
            Instant at = Instant.parse(e.occurredAt());
            assertFalse(at.isBefore(previous), e.eventId() + " goes back in time");
            assertTrue(e.occurredAt().startsWith("2026-") && e.occurredAt().endsWith("Z"), e.occurredAt());
            previous = at;
        }
    }

    @Test
    void shouldUseKnownActiveCompoundsWithQuantitiesFittingTheKind() {
        Map<String, CatalogEntry> catalog = catalogById();
        Map<String, Researcher> researchers = researchersById();
        Map<String, String> unitOf = new HashMap<>();
        Map<UsageKind, Integer> kinds = new HashMap<>();
        for (UsageEvent e : DemoData.usageEvents()) {
            CatalogEntry c = catalog.get(e.compoundId());
            assertNotNull(c, e.eventId());
            assertTrue(c.active(), e.eventId() + " uses inactive " + c.compoundId());
            assertNotNull(researchers.get(e.researcherId()), e.eventId());
            if (e.kind() == UsageKind.VIEW) {
                assertEquals(0.0, e.quantity(), e.eventId());
            } else {
                assertTrue(e.quantity() > 0, e.eventId());
            }
            assertEquals(unitOf.computeIfAbsent(e.compoundId(), k -> e.unit()), e.unit(), e.eventId());
            kinds.merge(e.kind(), 1, Integer::sum);
        }
        for (UsageKind kind : UsageKind.values()) {
            assertTrue(kinds.getOrDefault(kind, 0) > 1000, kind + " " + kinds.get(kind));
        }
    }

    @Test
    void shouldNeverLetAResearcherUseACompoundWhoseRestrictionTagsTheyLack() {
        Map<String, CatalogEntry> catalog = catalogById();
        Map<String, Researcher> researchers = researchersById();
        int restrictedUses = 0;
        for (UsageEvent e : DemoData.usageEvents()) {
            List<String> tags = catalog.get(e.compoundId()).restrictionTags();
            assertTrue(researchers.get(e.researcherId()).authorisations().containsAll(tags),
                    e.eventId() + ": " + e.researcherId() + " lacks one of " + tags);
            restrictedUses += tags.isEmpty() ? 0 : 1;
        }
        assertTrue(restrictedUses > 500, "restricted compounds are used by authorised people too: " + restrictedUses);
    }

    @Test
    void shouldSkewActivityToAFewHeavyUsersAndALongTail() {
        Map<String, Integer> perResearcher = new HashMap<>();
        for (UsageEvent e : DemoData.usageEvents()) {
            perResearcher.merge(e.researcherId(), 1, Integer::sum);
        }
        List<Integer> counts = new ArrayList<>(perResearcher.values());
        counts.sort(null);
        int total = counts.stream().mapToInt(Integer::intValue).sum();
        int topTenth = counts.subList(counts.size() - counts.size() / 10, counts.size()).stream().mapToInt(Integer::intValue).sum();
        int median = counts.get(counts.size() / 2);
        assertTrue(topTenth > total * 0.3, "top 10 % share " + topTenth / (double) total);
        assertTrue(counts.get(counts.size() - 1) > 5 * median, "max " + counts.get(counts.size() - 1) + " median " + median);
    }

    @Test
    void shouldKeepInventoryEventsInTimeOrderWithUniqueIdsAndNonNegativeStock() {
        Map<String, CatalogEntry> catalog = catalogById();
        Set<String> ids = new HashSet<>();
        Instant previous = Instant.MIN;
        for (InventoryEvent e : DemoData.inventoryEvents()) {
            assertEquals(SchemaIds.INVENTORY_EVENT, e.schema());
            assertTrue(ids.add(e.eventId()), e.eventId());
            assertNotNull(catalog.get(e.compoundId()), e.eventId());
            assertTrue(e.quantityOnHand() >= 0, e.eventId());
            assertTrue(StoreLocations.all().contains(e.location()), e.location());
            if (e.kind() == InventoryKind.DEPLETED) {
                assertEquals(0.0, e.quantityOnHand(), e.eventId());
            }
            Instant at = Instant.parse(e.occurredAt());
            assertFalse(at.isBefore(previous), e.eventId());
            assertTrue(at.isBefore(Instant.parse("2027-01-01T00:00:00Z")), e.eventId());
            previous = at;
        }
    }

    @Test
    void shouldLetSomeCompoundsRunOutAndComeBackInStock() {
        Map<String, Boolean> outOfStock = new HashMap<>();
        Set<String> cameBack = new HashSet<>();
        Map<InventoryKind, Integer> kinds = new HashMap<>();
        for (InventoryEvent e : DemoData.inventoryEvents()) {
            kinds.merge(e.kind(), 1, Integer::sum);
            if (e.kind() == InventoryKind.DEPLETED) {
                outOfStock.put(e.compoundId(), true);
            } else if (e.kind() == InventoryKind.RECEIVED && outOfStock.getOrDefault(e.compoundId(), false)) {
                cameBack.add(e.compoundId());
                outOfStock.put(e.compoundId(), false);
            }
        }
        assertTrue(cameBack.size() >= 10, "compounds back in stock " + cameBack.size());
        for (InventoryKind kind : InventoryKind.values()) {
            assertTrue(kinds.getOrDefault(kind, 0) >= 10, kind + " " + kinds.get(kind));
        }
    }

    @Test
    void shouldShipOneBadUsageEventLinePerDefect() throws Exception {
        List<String> lines = DemoData.badUsageEventLines();
        assertEquals(6, lines.size());
        assertThrows(JsonProcessingException.class, () -> DemoJson.mapper().readTree(lines.get(0)));
        JsonNode unknownKind = DemoJson.mapper().readTree(lines.get(1));
        JsonNode negative = DemoJson.mapper().readTree(lines.get(2));
        JsonNode missing = DemoJson.mapper().readTree(lines.get(3));
        JsonNode unknownCompound = DemoJson.mapper().readTree(lines.get(4));
        JsonNode wrongSchema = DemoJson.mapper().readTree(lines.get(5));
        assertThrows(IllegalArgumentException.class, () -> UsageKind.valueOf(unknownKind.get("kind").asText()));
        assertTrue(negative.get("quantity").asDouble() < 0);
        assertFalse(missing.has("researcherId"));
        assertFalse(catalogById().containsKey(unknownCompound.get("compoundId").asText()));
        assertFalse(SchemaIds.USAGE_EVENT.equals(wrongSchema.get("schema").asText()));
        for (JsonNode fine : List.of(unknownKind, negative, missing, unknownCompound)) {
            assertEquals(SchemaIds.USAGE_EVENT, fine.get("schema").asText());
        }
        Set<String> knownIds = DemoData.usageEvents().stream().map(UsageEvent::eventId).collect(Collectors.toSet());
        for (JsonNode line : List.of(unknownKind, negative, missing, unknownCompound, wrongSchema)) {
            assertFalse(knownIds.contains(line.get("eventId").asText()), "bad line reuses a real event id");
        }
    }
}
