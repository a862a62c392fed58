package org.congener.core.split;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.SplittableRandom;
import org.congener.core.interactions.Interaction;

/**
 * Leave-k-out: for each researcher with more than k interactions, k chosen uniformly at random
 * (partial Fisher–Yates shuffle from a per-researcher stream of {@code seed}) are held out.
 */
public record LeaveKOut(int k, long seed) implements Splitter {

    public LeaveKOut {
        if (k < 1) {
            throw new IllegalArgumentException("leave-k-out needs k >= 1: " + k);
        }
    }

    @Override
    public Split split(List<Interaction> interactions) {
        List<Interaction> train = new ArrayList<>();
        List<Interaction> test = new ArrayList<>();
        for (List<Interaction> history : Splitter.byUser(interactions).values()) {
            List<Interaction> items = new ArrayList<>(history);
            // a fixed order first, so the result does not depend on the input order
            items.sort(Comparator.comparingInt(Interaction::item));
            if (items.size() <= k) {
                train.addAll(items);
                continue;
            }
            SplittableRandom random = new SplittableRandom(seed * 0x9E3779B97F4A7C15L + items.get(0).user());
            for (int t = 0; t < k; t++) {
                int pick = t + random.nextInt(items.size() - t);
                Interaction swap = items.get(t);
                items.set(t, items.get(pick));
                items.set(pick, swap);
            }
            test.addAll(items.subList(0, k));
            train.addAll(items.subList(k, items.size()));
        }
        return new Split(train, test);
    }

    @Override
    public String describe() {
        return "leave-" + k + "-out:seed=" + seed;
    }
}
