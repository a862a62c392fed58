package org.congener.core.ontology;

import java.util.SplittableRandom;

/**
 * Seeded random DAGs with multiple inheritance for property tests: term i picks its first parent among the
 * terms before it, biased towards recent ones so that the graph grows deep, and a second parent with the given
 * probability.
 */
public final class RandomDag {
    private RandomDag() {
    }

    public static Ontology generate(int terms, double secondParentProbability, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        OntologyBuilder builder = new OntologyBuilder();
        for (int t = 0; t < terms; t++) {
            builder.addTerm("T" + t, null, 0);
            if (t == 0 || (t < 3 && random.nextBoolean())) {
                continue;
            }
            int first = parentBefore(t, random);
            builder.addEdge(t, first, 0);
            if (t > 2 && random.nextDouble() < secondParentProbability) {
                int second = parentBefore(t, random);
                if (second != first) {
                    builder.addEdge(t, second, 0);
                }
            }
        }
        return builder.build();
    }

    private static int parentBefore(int t, SplittableRandom random) {
        // half the time a term close before t (deep chains), otherwise any earlier term (bushy levels)
        return random.nextBoolean() ? Math.max(0, t - 1 - random.nextInt(Math.min(t, 20))) : random.nextInt(t);
    }
}
