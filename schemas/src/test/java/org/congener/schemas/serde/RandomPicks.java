package org.congener.schemas.serde;

import java.util.Random;

/** Small draws the seeded test corpora share. */
final class RandomPicks {

    private RandomPicks() {
    }

    /** {@code count} decimal digits. */
    static String digits(Random random, int count) {
        StringBuilder out = new StringBuilder(count);
        for (int i = 0; i < count; i++) {
            out.append((char) ('0' + random.nextInt(10)));
        }
        return out.toString();
    }

    /** One of {@code values}, uniformly. */
    static <V> V pick(Random random, java.util.List<V> values) {
        return values.get(random.nextInt(values.size()));
    }

    /** One of {@code values}, uniformly. */
    @SafeVarargs
    static <V> V pick(Random random, V... values) {
        return values[random.nextInt(values.length)];
    }
}
