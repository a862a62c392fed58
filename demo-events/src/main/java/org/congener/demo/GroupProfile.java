package org.congener.demo;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * A research group and the preferences its members draw from.
 *
 * @param branchWeights         favourite ontology branches (term id to relative weight)
 * @param authorisationChances  restriction tag to the chance that a member is cleared for it
 * @param headcount             number of members
 */
record GroupProfile(String groupId, String name, Map<String, Double> branchWeights,
                    Map<String, Double> authorisationChances, int headcount) {

    /** Chance that a member holds a tag the group does not usually need (individual variation). */
    static final double STRAY_AUTHORISATION_CHANCE = 0.04;

    DemoGroup toGroup() {
        return new DemoGroup(groupId, name, List.copyOf(branchWeights.keySet()));
    }

    /** The eight groups of the Kestrelmoor institute; 300 researchers in all. */
    static List<GroupProfile> kestrelmoorGroups() {
        return List.of(
                group("G01", "Organometallic Catalysis Group", 45,
                        branches(122, 3.0, 225, 3.0, 220, 3.0, 212, 2.0, 129, 2.0, 233, 1.0),
                        tags("pyrophoric", 0.85, "flammable-bulk", 0.7, "toxic", 0.5, "carcinogen-cmr", 0.3,
                                "explosive-precursor", 0.2, "controlled-precursor", 0.2)),
                group("G02", "Peptide Chemistry Group", 35,
                        branches(47, 3.0, 45, 3.0, 215, 3.0, 219, 2.0, 58, 1.5, 161, 1.0, 230, 1.0),
                        tags("toxic", 0.6, "explosive-precursor", 0.4, "controlled-precursor", 0.4,
                                "carcinogen-cmr", 0.3, "flammable-bulk", 0.3)),
                group("G03", "Polymer Materials Group", 38,
                        branches(223, 4.0, 160, 3.0, 221, 2.0, 55, 1.0, 28, 1.0),
                        tags("carcinogen-cmr", 0.6, "explosive-precursor", 0.5, "flammable-bulk", 0.5, "toxic", 0.3)),
                group("G04", "Analytical and Environmental Chemistry Group", 40,
                        branches(241, 4.0, 206, 2.0, 239, 2.0, 158, 2.0, 18, 2.0, 140, 1.5, 240, 1.0),
                        tags("toxic", 0.6, "carcinogen-cmr", 0.6, "explosive-precursor", 0.4,
                                "controlled-precursor", 0.4, "flammable-bulk", 0.3)),
                group("G05", "Electrochemistry and Battery Materials Group", 36,
                        branches(243, 4.0, 245, 4.0, 150, 2.0, 154, 2.0, 116, 1.5, 130, 1.0, 165, 1.0),
                        tags("pyrophoric", 0.5, "explosive-precursor", 0.5, "carcinogen-cmr", 0.5, "toxic", 0.4)),
                group("G06", "Medicinal Chemistry Group", 42,
                        branches(80, 3.0, 246, 3.0, 208, 1.5, 218, 1.5, 216, 1.5, 217, 1.0, 209, 1.0),
                        tags("toxic", 0.6, "carcinogen-cmr", 0.4, "explosive-precursor", 0.4,
                                "controlled-precursor", 0.3, "pyrophoric", 0.3, "flammable-bulk", 0.3)),
                group("G07", "Photochemistry and Dyes Group", 30,
                        branches(236, 4.0, 214, 3.0, 238, 2.0, 38, 1.0, 18, 1.0, 74, 1.0),
                        tags("carcinogen-cmr", 0.5, "toxic", 0.4, "flammable-bulk", 0.3, "explosive-precursor", 0.2)),
                group("G08", "Chemical Biology Group", 34,
                        branches(249, 4.0, 232, 3.0, 98, 2.0, 166, 2.0, 60, 2.0, 237, 2.0, 172, 0.5),
                        tags("toxic", 0.5, "carcinogen-cmr", 0.4, "radioactive", 0.35, "flammable-bulk", 0.1)));
    }

    private static GroupProfile group(String id, String name, int headcount, Map<String, Double> branches,
                                      Map<String, Double> tags) {
        return new GroupProfile(id, name, branches, tags, headcount);
    }

    private static Map<String, Double> branches(Object... numberWeightPairs) {
        Map<String, Double> map = new LinkedHashMap<>();
        for (int i = 0; i < numberWeightPairs.length; i += 2) {
            map.put(String.format(Locale.ROOT, "CGNR:%07d", (Integer) numberWeightPairs[i]),
                    (Double) numberWeightPairs[i + 1]);
        }
        return map;
    }

    private static Map<String, Double> tags(Object... tagChancePairs) {
        Map<String, Double> map = new LinkedHashMap<>();
        for (int i = 0; i < tagChancePairs.length; i += 2) {
            map.put((String) tagChancePairs[i], (Double) tagChancePairs[i + 1]);
        }
        return map;
    }
}
