package org.congener.demo;

import org.congener.schemas.SchemaIds;
import org.congener.schemas.UsageEvent;
import org.congener.schemas.UsageKind;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

/**
 * Simulates a year of usage events. For each researcher, in time order, the next compound comes from
 * one of four moves:
 * <ul>
 *   <li>repeat: a compound already used, in proportion to how often (re-orders, more withdrawals);</li>
 *   <li>neighbour: a sibling or cousin in the ontology of a compound already used (go up one or two
 *       {@code is_a} steps from one of its terms and draw below), so that similar compounds travel
 *       together and semantic similarity carries real signal;</li>
 *   <li>branch: a compound from one of the researcher's favourite branches, chosen by personal weight;</li>
 *   <li>staple: a common solvent or drying agent, as everybody uses.</li>
 * </ul>
 * Within a move, compounds are drawn by popularity: a global log-normal factor times one per group,
 * which gives members of a group shared favourites (co-use structure for collaborative filtering).
 * Only active compounds whose every restriction tag the researcher is authorised for are drawn.
 */
final class UsageSimulator {

    static final double REPEAT = 0.30;
    static final double NEIGHBOUR = 0.25;
    static final double BRANCH = 0.35;
    /** The rest (0.10) goes to staples. */
    static final double POPULARITY_SIGMA = 0.8;
    static final double GROUP_POPULARITY_SIGMA = 0.7;
    /** An ancestor with more compounds under it than this is too general to count as a neighbourhood. */
    static final int MAX_NEIGHBOURHOOD = 80;

    private static final String SOLVENT = "CGNR:0000201";
    private static final String DRYING_AGENT = "CGNR:0000234";

    private final DemoOntology ontology;
    private final CompoundIndex index;
    private final double[] popularity;
    private final Map<String, double[]> groupPopularity = new LinkedHashMap<>();
    private final List<Integer> staples;

    UsageSimulator(DemoOntology ontology, CompoundIndex index, List<GroupProfile> groups, DemoRandom random) {
        this.ontology = ontology;
        this.index = index;
        this.popularity = new double[index.size()];
        for (int i = 0; i < popularity.length; i++) {
            popularity[i] = random.logNormal(POPULARITY_SIGMA);
        }
        for (GroupProfile group : groups) {
            double[] factors = new double[index.size()];
            for (int i = 0; i < factors.length; i++) {
                factors[i] = random.logNormal(GROUP_POPULARITY_SIGMA);
            }
            groupPopularity.put(group.groupId(), factors);
        }
        List<Integer> common = new ArrayList<>(index.under(SOLVENT));
        for (Integer i : index.under(DRYING_AGENT)) {
            if (!common.contains(i)) {
                common.add(i);
            }
        }
        this.staples = List.copyOf(common);
    }

    List<UsageEvent> simulate(List<ResearcherProfile> researchers, DemoRandom random) {
        List<Draft> drafts = new ArrayList<>();
        for (int r = 0; r < researchers.size(); r++) {
            simulateOne(r, researchers.get(r), random, drafts);
        }
        drafts.sort(Comparator.comparingLong(Draft::epochSecond).thenComparingInt(Draft::researcher)
                .thenComparingInt(Draft::sequence));
        List<UsageEvent> events = new ArrayList<>(drafts.size());
        for (int i = 0; i < drafts.size(); i++) {
            Draft d = drafts.get(i);
            ResearcherProfile who = researchers.get(d.researcher());
            SourceCompound what = index.compound(d.compound());
            events.add(new UsageEvent(SchemaIds.USAGE_EVENT, String.format(Locale.ROOT, "U%06d", i + 1),
                    who.researcher().researcherId(), CatalogueBuilder.compoundId(d.compound()), d.kind(),
                    d.milliQuantity() / 1000.0, what.form().unit(), DemoYear.iso(d.epochSecond())));
        }
        return List.copyOf(events);
    }

    private void simulateOne(int r, ResearcherProfile profile, DemoRandom random, List<Draft> out) {
        long[] moments = new long[profile.eventCount()];
        for (int i = 0; i < moments.length; i++) {
            moments[i] = DemoYear.sampleMoment(random, profile.firstDay(), profile.untilDay());
        }
        Arrays.sort(moments);
        Set<String> authorisations = profile.authorisations();
        double[] groupFactor = groupPopularity.get(profile.group().groupId());
        Map<Integer, Integer> used = new LinkedHashMap<>();
        for (int i = 0; i < moments.length; i++) {
            int compound = nextCompound(profile, authorisations, groupFactor, used, random);
            boolean first = !used.containsKey(compound);
            used.merge(compound, 1, Integer::sum);
            UsageKind kind = kind(first, random);
            PhysicalForm form = index.compound(compound).form();
            if (form == PhysicalForm.GAS && kind == UsageKind.WITHDRAWAL) {
                kind = UsageKind.USAGE_LOG;
            }
            out.add(new Draft(moments[i], r, i, compound, kind, QuantityModel.amount(kind, form, random)));
        }
    }

    private int nextCompound(ResearcherProfile profile, Set<String> authorisations, double[] groupFactor,
                             Map<Integer, Integer> used, DemoRandom random) {
        double move = random.uniform();
        Integer chosen = null;
        if (!used.isEmpty() && move < REPEAT) {
            chosen = repeat(used, random);
        } else if (!used.isEmpty() && move < REPEAT + NEIGHBOUR) {
            chosen = neighbour(used, authorisations, groupFactor, random);
        } else if (move < REPEAT + NEIGHBOUR + BRANCH || used.isEmpty()) {
            chosen = fromBranch(profile, authorisations, groupFactor, random);
        }
        if (chosen == null) {
            chosen = drawByPopularity(staples, authorisations, groupFactor, -1, random);
        }
        if (chosen == null) {
            throw new IllegalStateException("no compound at all that " + profile.researcher().researcherId() + " may use");
        }
        return chosen;
    }

    private static Integer repeat(Map<Integer, Integer> used, DemoRandom random) {
        List<Integer> keys = new ArrayList<>(used.keySet());
        double[] weights = new double[keys.size()];
        for (int i = 0; i < weights.length; i++) {
            weights[i] = used.get(keys.get(i));
        }
        return keys.get(random.weightedIndex(weights));
    }

    private Integer neighbour(Map<Integer, Integer> used, Set<String> authorisations, double[] groupFactor,
                              DemoRandom random) {
        int seed = random.pick(new ArrayList<>(used.keySet()));
        String term = random.pick(index.compound(seed).termIds());
        String ancestor = term;
        List<String> parents = ontology.parents(term);
        if (!parents.isEmpty()) {
            String parent = random.pick(parents);
            if (!ontology.parents(parent).isEmpty() && index.under(parent).size() <= MAX_NEIGHBOURHOOD) {
                ancestor = parent;
                List<String> grandparents = ontology.parents(parent);
                String grandparent = random.pick(grandparents);
                if (random.chance(0.4) && !ontology.parents(grandparent).isEmpty()
                        && index.under(grandparent).size() <= MAX_NEIGHBOURHOOD) {
                    ancestor = grandparent;
                }
            }
        }
        return drawByPopularity(index.under(ancestor), authorisations, groupFactor, seed, random);
    }

    private Integer fromBranch(ResearcherProfile profile, Set<String> authorisations, double[] groupFactor,
                               DemoRandom random) {
        List<String> branches = new ArrayList<>(profile.branchWeights().keySet());
        double[] weights = new double[branches.size()];
        for (int i = 0; i < weights.length; i++) {
            weights[i] = profile.branchWeights().get(branches.get(i));
        }
        String branch = branches.get(random.weightedIndex(weights));
        return drawByPopularity(index.under(branch), authorisations, groupFactor, -1, random);
    }

    /** A candidate drawn in proportion to popularity, skipping {@code exclude} and what the researcher may not use. */
    private Integer drawByPopularity(List<Integer> candidates, Set<String> authorisations, double[] groupFactor,
                                     int exclude, DemoRandom random) {
        List<Integer> allowed = new ArrayList<>(candidates.size());
        for (Integer c : candidates) {
            if (c != exclude && index.compound(c).active()
                    && authorisations.containsAll(index.compound(c).restrictionTags())) {
                allowed.add(c);
            }
        }
        if (allowed.isEmpty()) {
            return null;
        }
        double[] weights = new double[allowed.size()];
        for (int i = 0; i < weights.length; i++) {
            weights[i] = popularity[allowed.get(i)] * groupFactor[allowed.get(i)];
        }
        return allowed.get(random.weightedIndex(weights));
    }

    private static UsageKind kind(boolean firstUse, DemoRandom random) {
        double[] weights = firstUse ? new double[]{0.05, 0.35, 0.15, 0.45} : new double[]{0.32, 0.18, 0.38, 0.12};
        return switch (random.weightedIndex(weights)) {
            case 0 -> UsageKind.USAGE_LOG;
            case 1 -> UsageKind.ORDER;
            case 2 -> UsageKind.WITHDRAWAL;
            default -> UsageKind.VIEW;
        };
    }

    private record Draft(long epochSecond, int researcher, int sequence, int compound, UsageKind kind,
                         long milliQuantity) {
    }
}
