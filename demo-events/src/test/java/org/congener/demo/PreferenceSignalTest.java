package org.congener.demo;

import org.congener.schemas.CatalogEntry;
import org.congener.schemas.Researcher;
import org.congener.schemas.UsageEvent;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;

import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The events must carry the structure they were generated from: group interests and ontology
 * neighbourhoods. Checked on the shipped files.
 */
class PreferenceSignalTest {

    private static DemoOntology ontology;
    private static Map<String, Set<String>> compoundAncestors;
    private static List<String> activeCompounds;

    @BeforeAll
    static void load() {
        ontology = DemoOntology.parse(DemoData.ontologyObo());
        compoundAncestors = new HashMap<>();
        activeCompounds = new ArrayList<>();
        for (CatalogEntry c : DemoData.catalog()) {
            Set<String> all = new LinkedHashSet<>();
            c.termIds().forEach(t -> all.addAll(ontology.ancestorsOrSelf(t)));
            compoundAncestors.put(c.compoundId(), all);
            if (c.active()) {
                activeCompounds.add(c.compoundId());
            }
        }
    }

    @Test
    void shouldDrawFarMoreOfEachGroupsEventsFromItsFavouriteBranchesThanChanceWould() {
        Map<String, String> groupOf = new HashMap<>();
        DemoData.researchers().forEach(r -> groupOf.put(r.researcherId(), r.groupId()));
        Map<String, int[]> inBranchAndTotal = new TreeMap<>();
        for (UsageEvent e : DemoData.usageEvents()) {
            DemoGroup group = group(groupOf.get(e.researcherId()));
            int[] counts = inBranchAndTotal.computeIfAbsent(group.groupId(), k -> new int[2]);
            counts[0] += inBranches(e.compoundId(), group) ? 1 : 0;
            counts[1]++;
        }
        for (DemoGroup group : DemoData.groups()) {
            long inCatalogue = activeCompounds.stream().filter(c -> inBranches(c, group)).count();
            double chance = inCatalogue / (double) activeCompounds.size();
            int[] counts = inBranchAndTotal.get(group.groupId());
            double share = counts[0] / (double) counts[1];
            assertTrue(share > 2 * chance && share > 0.5,
                    group.groupId() + ": share in favourite branches " + share + ", chance " + chance);
        }
    }

    @Test
    void shouldGiveTwoCompoundsOfOneResearcherADeeperCommonAncestorThanTwoRandomCompounds() {
        Map<String, Set<String>> usedBy = new TreeMap<>();
        for (UsageEvent e : DemoData.usageEvents()) {
            usedBy.computeIfAbsent(e.researcherId(), k -> new TreeSet<>()).add(e.compoundId());
        }
        List<String> researchers = usedBy.entrySet().stream().filter(x -> x.getValue().size() >= 2)
                .map(Map.Entry::getKey).toList();
        Random random = new Random(7);
        int samples = 4000;
        double sameResearcher = 0;
        double anyTwo = 0;
        for (int i = 0; i < samples; i++) {
            List<String> used = new ArrayList<>(usedBy.get(researchers.get(random.nextInt(researchers.size()))));
            String a = used.get(random.nextInt(used.size()));
            String b = used.get(random.nextInt(used.size()));
            while (b.equals(a)) {
                b = used.get(random.nextInt(used.size()));
            }
            sameResearcher += deepestCommonAncestorDepth(a, b);
            String c = activeCompounds.get(random.nextInt(activeCompounds.size()));
            String d = activeCompounds.get(random.nextInt(activeCompounds.size()));
            anyTwo += deepestCommonAncestorDepth(c, d);
        }
        sameResearcher /= samples;
        anyTwo /= samples;
        assertTrue(sameResearcher > anyTwo + 0.2, "same researcher " + sameResearcher + ", random pairs " + anyTwo);
    }

    @Test
    void shouldLetMembersOfOneGroupShareMoreCompoundsThanMembersOfDifferentGroups() {
        Map<String, Set<String>> usedBy = new TreeMap<>();
        for (UsageEvent e : DemoData.usageEvents()) {
            usedBy.computeIfAbsent(e.researcherId(), k -> new TreeSet<>()).add(e.compoundId());
        }
        List<Researcher> people = DemoData.researchers();
        Random random = new Random(11);
        double within = 0;
        double across = 0;
        int withinPairs = 0;
        int acrossPairs = 0;
        for (int i = 0; i < 6000; i++) {
            Researcher a = people.get(random.nextInt(people.size()));
            Researcher b = people.get(random.nextInt(people.size()));
            if (a.equals(b)) {
                continue;
            }
            double jaccard = jaccard(usedBy.getOrDefault(a.researcherId(), Set.of()), usedBy.getOrDefault(b.researcherId(), Set.of()));
            if (a.groupId().equals(b.groupId())) {
                within += jaccard;
                withinPairs++;
            } else {
                across += jaccard;
                acrossPairs++;
            }
        }
        within /= withinPairs;
        across /= acrossPairs;
        assertTrue(within > 2 * across, "Jaccard within groups " + within + ", across " + across);
    }

    private static double jaccard(Set<String> a, Set<String> b) {
        Set<String> union = new TreeSet<>(a);
        union.addAll(b);
        if (union.isEmpty()) {
            return 0;
        }
        long common = a.stream().filter(b::contains).count();
        return common / (double) union.size();
    }

    /** Depth of the deepest term both compounds fall under; -1 when they share none. */
    private static int deepestCommonAncestorDepth(String a, String b) {
        int deepest = -1;
        for (String term : compoundAncestors.get(a)) {
            if (compoundAncestors.get(b).contains(term)) {
                deepest = Math.max(deepest, ontology.depth(term));
            }
        }
        return deepest;
    }

    private static boolean inBranches(String compoundId, DemoGroup group) {
        Set<String> ancestors = compoundAncestors.get(compoundId);
        return group.interests().stream().anyMatch(ancestors::contains);
    }

    private static DemoGroup group(String groupId) {
        return DemoData.groups().stream().filter(g -> g.groupId().equals(groupId)).findFirst().orElseThrow();
    }
}
