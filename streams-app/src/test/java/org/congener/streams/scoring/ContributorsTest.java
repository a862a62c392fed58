package org.congener.streams.scoring;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

import org.congener.core.fusion.NeighbourLists;
import org.congener.schemas.Contribution;
import org.junit.jupiter.api.Test;

/**
 * The one-pass reasons against looking every (candidate, past compound) pair up in the neighbour
 * lists, on seeded random lists with tied similarities, repeated neighbours and candidates no past
 * compound reaches.
 */
class ContributorsTest {

    @Test
    void shouldNameTheSamePastCompoundsInTheSameOrderAsPairwiseLookUpsWhenSimilaritiesTie() {
        SplittableRandom random = new SplittableRandom(11);
        int items = 300;
        int[] slotOf = new int[items];
        for (int round = 0; round < 200; round++) {
            int[][] ids = new int[items][];
            double[][] sims = new double[items][];
            for (int i = 0; i < items; i++) {
                int k = random.nextInt(12);
                // a neighbour may repeat: the first entry counts, as the look-up reads it
                ids[i] = random.ints(k, 0, items).toArray();
                sims[i] = random.ints(k, 0, 5).mapToDouble(s -> s / 4.0).toArray();
            }
            NeighbourLists lists = new NeighbourLists(ids, sims);
            int[] shuffled = random.ints(0, items).distinct().limit(items).toArray();
            int[] history = java.util.Arrays.copyOf(shuffled, random.nextInt(1, 60));
            int[] top = java.util.Arrays.copyOfRange(shuffled, history.length,
                    history.length + random.nextInt(1, 15));
            List<List<Contribution>> onePass = HybridScorer.contributors(lists, i -> "c" + i, history, top, slotOf);
            assertEquals(pairwise(lists, history, top), onePass, "round " + round);
            assertEquals(0, java.util.Arrays.stream(slotOf).sum(), "slots cleared");
        }
    }

    /** The reasons as defined: for each candidate, every past compound's share looked up, best three kept. */
    private static List<List<Contribution>> pairwise(NeighbourLists lists, int[] history, int[] top) {
        List<List<Contribution>> out = new ArrayList<>();
        for (int candidate : top) {
            List<Contribution> all = new ArrayList<>();
            for (int j : history) {
                double share = lists.similarity(j, candidate) / history.length;
                if (share > 0) {
                    all.add(new Contribution("c" + j, share));
                }
            }
            // stable: ties keep history order
            all.sort((a, b) -> Double.compare(b.weight(), a.weight()));
            out.add(all.subList(0, Math.min(HybridScorer.CONTRIBUTORS, all.size())));
        }
        return out;
    }
}
