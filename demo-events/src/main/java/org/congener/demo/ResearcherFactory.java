package org.congener.demo;

import org.congener.schemas.Researcher;
import org.congener.schemas.SchemaIds;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

/** Invents the institute's researchers: names, groups, authorisations, personal tastes and activity. */
final class ResearcherFactory {

    /** Spread of activity: log-normal σ; a few heavy users and a long tail of occasional ones. */
    static final double ACTIVITY_SIGMA = 1.1;
    /** Spread of the personal re-weighting of the group's branches. */
    static final double TASTE_SIGMA = 0.7;
    static final double SIDE_INTEREST_CHANCE = 0.35;
    static final double SIDE_INTEREST_SHARE = 0.15;
    static final double ALERT_OPT_IN_CHANCE = 0.85;
    static final int MIN_EVENTS = 4;

    private final List<String> givenNames;
    private final List<String> familyNames;

    ResearcherFactory(List<String> givenNames, List<String> familyNames) {
        this.givenNames = givenNames;
        this.familyNames = familyNames;
    }

    List<ResearcherProfile> create(List<GroupProfile> groups, int totalEvents, DemoRandom random) {
        List<GroupProfile> memberGroups = new ArrayList<>();
        for (GroupProfile group : groups) {
            for (int i = 0; i < group.headcount(); i++) {
                memberGroups.add(group);
            }
        }
        double[] activity = new double[memberGroups.size()];
        double activitySum = 0;
        for (int i = 0; i < activity.length; i++) {
            activity[i] = random.logNormal(ACTIVITY_SIGMA);
            activitySum += activity[i];
        }
        Set<String> usedNames = new HashSet<>();
        List<ResearcherProfile> profiles = new ArrayList<>();
        for (int i = 0; i < memberGroups.size(); i++) {
            GroupProfile group = memberGroups.get(i);
            String id = String.format(Locale.ROOT, "R%04d", i + 1);
            String name = uniqueName(random, usedNames);
            List<String> authorisations = authorisations(group, random);
            boolean alerts = random.chance(ALERT_OPT_IN_CHANCE);
            Researcher researcher = new Researcher(SchemaIds.RESEARCHER, id, name, group.groupId(), authorisations, alerts);
            int firstDay = 0;
            int untilDay = DemoYear.DAYS;
            double window = random.uniform();
            if (window < 0.10) {
                firstDay = random.between(30, 300);
            } else if (window < 0.15) {
                untilDay = random.between(120, 330);
            }
            int events = Math.max(MIN_EVENTS, (int) Math.round(totalEvents * activity[i] / activitySum));
            profiles.add(new ResearcherProfile(researcher, group, tastes(group, groups, random), events, firstDay, untilDay));
        }
        return List.copyOf(profiles);
    }

    private String uniqueName(DemoRandom random, Set<String> used) {
        while (true) {
            String name = random.pick(givenNames) + " " + random.pick(familyNames);
            if (used.add(name)) {
                return name;
            }
        }
    }

    /** The group's usual clearances, each granted with its chance, plus rare individual extras. */
    private static List<String> authorisations(GroupProfile group, DemoRandom random) {
        List<String> granted = new ArrayList<>();
        for (String tag : CatalogueBuilder.RESTRICTION_TAGS.stream().sorted().toList()) {
            double chance = group.authorisationChances().getOrDefault(tag,
                    "radioactive".equals(tag) ? 0.0 : GroupProfile.STRAY_AUTHORISATION_CHANCE);
            if (random.chance(chance)) {
                granted.add(tag);
            }
        }
        return List.copyOf(granted);
    }

    private static Map<String, Double> tastes(GroupProfile group, List<GroupProfile> groups, DemoRandom random) {
        Map<String, Double> weights = new LinkedHashMap<>();
        double total = 0;
        for (Map.Entry<String, Double> branch : group.branchWeights().entrySet()) {
            double w = branch.getValue() * random.logNormal(TASTE_SIGMA);
            weights.put(branch.getKey(), w);
            total += w;
        }
        if (random.chance(SIDE_INTEREST_CHANCE)) {
            GroupProfile other = random.pick(groups);
            List<String> otherBranches = new ArrayList<>(other.branchWeights().keySet());
            String side = random.pick(otherBranches);
            weights.merge(side, total * SIDE_INTEREST_SHARE, Double::sum);
        }
        return weights;
    }
}
