package org.congener.core.split;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.congener.core.interactions.Interaction;

/**
 * Per-researcher time split: the latest {@code fraction} of each researcher's interactions (by the time
 * of their latest event; ties by item index) is held out, rounded up, but at least one interaction
 * stays in training, so a researcher with a single interaction is not evaluated. Common practice in
 * recommender evaluation (it mimics predicting the next orders from the past).
 */
public record TimeSplit(double fraction) implements Splitter {

    public TimeSplit {
        if (!(fraction > 0 && fraction < 1)) {
            throw new IllegalArgumentException("time split fraction must be in (0, 1): " + fraction);
        }
    }

    @Override
    public Split split(List<Interaction> interactions) {
        List<Interaction> train = new ArrayList<>();
        List<Interaction> test = new ArrayList<>();
        for (List<Interaction> history : Splitter.byUser(interactions).values()) {
            List<Interaction> sorted = new ArrayList<>(history);
            sorted.sort(Comparator.comparingLong(Interaction::lastTimeMillis).thenComparingInt(Interaction::item));
            int held = Math.min(sorted.size() - 1, (int) Math.ceil(fraction * sorted.size()));
            int cut = sorted.size() - held;
            train.addAll(sorted.subList(0, cut));
            test.addAll(sorted.subList(cut, sorted.size()));
        }
        return new Split(train, test);
    }

    @Override
    public String describe() {
        return "time:" + fraction;
    }
}
