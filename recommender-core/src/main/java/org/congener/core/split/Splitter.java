package org.congener.core.split;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.congener.core.interactions.Interaction;

/** Divides each researcher's interactions into training and held-out parts. */
public interface Splitter {

    Split split(List<Interaction> interactions);

    /** A short description for reports, e.g. {@code time:0.2}. */
    String describe();

    /** Groups interactions by user, in user order, keeping input order within a user. */
    static Map<Integer, List<Interaction>> byUser(List<Interaction> interactions) {
        Map<Integer, List<Interaction>> groups = new TreeMap<>();
        for (Interaction i : interactions) {
            groups.computeIfAbsent(i.user(), u -> new ArrayList<>()).add(i);
        }
        return groups;
    }
}
