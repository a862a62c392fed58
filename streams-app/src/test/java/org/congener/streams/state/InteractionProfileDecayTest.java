package org.congener.streams.state;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.time.Duration;
import java.time.Instant;

import org.congener.core.interactions.InteractionWeights;
import org.congener.schemas.UsageKind;
import org.junit.jupiter.api.Test;

class InteractionProfileDecayTest {

    private static final Duration HALF_LIFE = Duration.ofDays(10);
    private static final InteractionWeights WEIGHTS = InteractionWeights.defaults().withHalfLife(HALF_LIFE);

    /** The batch side: the trainer's weights summed over the events with the reading time as reference. */
    private static double batchStrength(Instant at, Object[][] events) {
        double sum = 0;
        for (Object[] e : events) {
            sum += WEIGHTS.contribution((UsageKind) e[0], (Double) e[1], (Instant) e[2], at);
        }
        return sum;
    }

    @Test
    void shouldEqualTheBatchDecayedSumWhenEventsArriveInAnyOrder() {
        Instant t0 = Instant.parse("2026-03-01T00:00:00Z");
        Object[][] events = {
                {UsageKind.ORDER, 5.0, t0},
                {UsageKind.USAGE_LOG, 2.0, t0.plus(Duration.ofDays(3))},
                {UsageKind.WITHDRAWAL, 1.0, t0.plus(Duration.ofDays(1))}, // arrives late
                {UsageKind.VIEW, 0.0, t0.plus(Duration.ofDays(7))}};
        InteractionProfile profile = new InteractionProfile();
        for (Object[] e : events) {
            Instant when = (Instant) e[2];
            float w = (float) WEIGHTS.contribution((UsageKind) e[0], (Double) e[1], when, when);
            profile.add("c", w, when.toEpochMilli(), e[0] != UsageKind.VIEW, HALF_LIFE.toMillis());
        }
        Instant later = t0.plus(Duration.ofDays(25));
        double streamed = InteractionProfile.strengthAt(profile.get("c"), later.toEpochMilli(), HALF_LIFE.toMillis());
        // float storage: about 7 significant digits
        assertEquals(batchStrength(later, events), streamed, 1e-6 * streamed);
        assertEquals(batchStrength(t0.plus(Duration.ofDays(7)), events),
                InteractionProfile.strengthAt(profile.get("c"), t0.plus(Duration.ofDays(7)).toEpochMilli(),
                        HALF_LIFE.toMillis()), 1e-6 * streamed);
        assertEquals(4, profile.get("c").events());
    }

    @Test
    void shouldSumPlainlyWhenNoHalfLifeIsSet() {
        InteractionProfile profile = new InteractionProfile();
        profile.add("c", 1.5f, 1_000L, true, 0);
        profile.add("c", 0.5f, 9_000_000_000L, false, 0);
        assertEquals(2.0, InteractionProfile.strengthAt(profile.get("c"), 99_000_000_000L, 0));
    }
}
