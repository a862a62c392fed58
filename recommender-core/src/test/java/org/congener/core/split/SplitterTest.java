package org.congener.core.split;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.congener.core.interactions.Interaction;
import org.junit.jupiter.api.Test;

class SplitterTest {

    private static List<Interaction> history() {
        List<Interaction> all = new ArrayList<>();
        for (int u = 0; u < 5; u++) {
            for (int i = 0; i <= u * 2; i++) {
                all.add(new Interaction(u, i, 1.0, 1000L * (10 - i)));
            }
        }
        return all;
    }

    @Test
    void shouldHoldOutTheLatestFractionOfEachResearcherWhenSplittingByTime() {
        Split split = new TimeSplit(0.25).split(history());
        // user 4 has 9 interactions, item i at time 10 − i: ceil(0.25·9) = 3 latest are items 0, 1, 2
        Set<Integer> heldOut = new HashSet<>();
        for (Interaction i : split.test()) {
            if (i.user() == 4) {
                heldOut.add(i.item());
            }
        }
        assertEquals(Set.of(0, 1, 2), heldOut);
        // user 0 has a single interaction: it stays in training
        assertTrue(split.test().stream().noneMatch(i -> i.user() == 0));
        assertEquals(history().size(), split.train().size() + split.test().size());
        for (Interaction t : split.test()) {
            for (Interaction r : split.train()) {
                if (r.user() == t.user()) {
                    assertTrue(r.lastTimeMillis() <= t.lastTimeMillis());
                }
            }
        }
    }

    @Test
    void shouldHoldOutKPerResearcherReproduciblyWhenLeavingKOut() {
        List<Interaction> all = history();
        Split a = new LeaveKOut(2, 5L).split(all);
        List<Interaction> shuffled = new ArrayList<>(all);
        Collections.shuffle(shuffled, new java.util.Random(1));
        Split b = new LeaveKOut(2, 5L).split(shuffled);
        assertEquals(Set.copyOf(a.test()), Set.copyOf(b.test()));
        // users with more than 2 interactions: 1 (3), 2 (5), 3 (7), 4 (9)
        assertEquals(8, a.test().size());
        Split c = new LeaveKOut(2, 6L).split(all);
        assertNotEquals(Set.copyOf(a.test()), Set.copyOf(c.test()));
    }
}
