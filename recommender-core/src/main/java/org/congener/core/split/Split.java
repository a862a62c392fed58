package org.congener.core.split;

import java.util.List;
import org.congener.core.interactions.Interaction;

/** Interactions for training and the held-out ones to evaluate against. */
public record Split(List<Interaction> train, List<Interaction> test) {
    public Split {
        train = List.copyOf(train);
        test = List.copyOf(test);
    }
}
