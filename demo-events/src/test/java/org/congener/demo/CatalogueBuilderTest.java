package org.congener.demo;

import org.congener.schemas.CatalogEntry;
import org.congener.schemas.SchemaIds;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class CatalogueBuilderTest {

    private static DemoOntology ontology;

    @BeforeAll
    static void load() {
        ontology = DemoOntology.parse(DemoData.ontologyObo());
    }

    @Test
    void shouldTurnATableLineIntoACatalogueEntryWithExpandedTermIds() {
        List<SourceCompound> compounds = CatalogueBuilder.parse(
                "# comment\nacetone|l|36,202||H225,H319|\nsodium metal|s|5,208|pyrophoric|H260|x\n", ontology);
        List<CatalogEntry> entries = CatalogueBuilder.entries(compounds);
        assertEquals(new CatalogEntry(SchemaIds.CATALOG_ENTRY, "C00001", "acetone", List.of("CGNR:0000036", "CGNR:0000202"),
                List.of(), List.of("H225", "H319"), true), entries.get(0));
        assertEquals(List.of("pyrophoric"), entries.get(1).restrictionTags());
        assertEquals(false, entries.get(1).active());
        assertEquals(PhysicalForm.SOLID, compounds.get(1).form());
    }

    @Test
    void shouldNameTheLineWhenAFieldIsMissing() {
        assertMessage("compounds.txt line 2: expected 6 fields", "# header\nacetone|l|36,202||H225\n");
    }

    @Test
    void shouldNameTheLineWhenATermIsObsoleteOrUnknown() {
        assertMessage("compounds.txt line 1: CGNR:0000190 is not an active ontology term", "benzene|l|190||H225|\n");
        assertMessage("compounds.txt line 1: CGNR:0009999 is not an active ontology term", "benzene|l|9999||H225|\n");
    }

    @Test
    void shouldNameTheLineWhenATagOrHazardCodeIsUnknown() {
        assertMessage("unknown restriction tag 'smelly'", "a|l|36|smelly||\n");
        assertMessage("'P210' is not a GHS hazard statement code", "a|l|36||P210|\n");
        assertMessage("compounds.txt line 1: unknown physical form 'q'", "a|q|36|||\n");
        assertMessage("compounds.txt line 1: term number 'x6' is not 1 to 7 digits", "a|l|x6|||\n");
    }

    @Test
    void shouldShipACatalogueTableThatParses() {
        List<SourceCompound> compounds = CatalogueBuilder.parse(DemoResources.text("source/compounds.txt"), ontology);
        assertEquals(DemoData.catalog().size(), compounds.size());
    }

    private static void assertMessage(String expected, String table) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> CatalogueBuilder.parse(table, ontology));
        assertTrue(e.getMessage().contains(expected), e.getMessage());
    }
}
