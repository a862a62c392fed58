package org.congener.demo;

import java.util.List;
import java.util.Set;

/**
 * The invented store rooms of the Kestrelmoor institute and which compound is kept where. The rules
 * follow the common practice of segregating by hazard; they are demo rules, not storage advice.
 */
final class StoreLocations {

    static final String GENERAL = "Harrow Building, store room H0.12 (general)";
    static final String FLAMMABLES = "Harrow Building, flammables store H0.14";
    static final String CORROSIVES = "Harrow Building, corrosives store H0.15";
    static final String POISONS = "Fenwick Wing, poisons cabinet F1.03";
    static final String REACTIVES = "Fenwick Wing, reactives store F1.05";
    static final String COLD_ROOM = "Fenwick Wing, cold room F1.20 (4 C)";
    static final String RADIONUCLIDES = "Fenwick Wing, radionuclide store F1.30";
    static final String GAS_BAY = "Service yard, gas cylinder bay Y1";

    private static final String PROTEIN = "CGNR:0000166";
    private static final String NUCLEOTIDE = "CGNR:0000099";

    private StoreLocations() {
    }

    static List<String> all() {
        return List.of(GENERAL, FLAMMABLES, CORROSIVES, POISONS, REACTIVES, COLD_ROOM, RADIONUCLIDES, GAS_BAY);
    }

    static String of(SourceCompound compound, Set<String> ancestors) {
        List<String> tags = compound.restrictionTags();
        List<String> hazards = compound.hazardCodes();
        if (tags.contains("radioactive")) {
            return RADIONUCLIDES;
        }
        if (compound.form() == PhysicalForm.GAS) {
            return GAS_BAY;
        }
        if (tags.contains("pyrophoric") || hazards.contains("H260") || hazards.contains("H250")) {
            return REACTIVES;
        }
        if (ancestors.contains(PROTEIN) || ancestors.contains(NUCLEOTIDE)) {
            return COLD_ROOM;
        }
        if (tags.contains("toxic") || tags.contains("carcinogen-cmr")) {
            return POISONS;
        }
        if (hazards.contains("H224") || hazards.contains("H225") || hazards.contains("H226")) {
            return FLAMMABLES;
        }
        if (hazards.contains("H314")) {
            return CORROSIVES;
        }
        return GENERAL;
    }
}
