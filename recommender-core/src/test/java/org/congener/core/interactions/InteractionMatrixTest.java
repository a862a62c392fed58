package org.congener.core.interactions;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.time.Duration;
import java.time.Instant;
import java.util.List;
import org.congener.schemas.SchemaIds;
import org.congener.schemas.UsageEvent;
import org.congener.schemas.UsageKind;
import org.junit.jupiter.api.Test;

class InteractionMatrixTest {

    @Test
    void shouldSumRepeatedCellsAndKeepBothOrientationsConsistent() {
        InteractionMatrix m = InteractionMatrix.of(3, 4,
                new int[] {0, 2, 0, 1, 0},
                new int[] {3, 1, 1, 1, 3},
                new double[] {1, 2, 3, 4, 5});
        assertEquals(4, m.nonZeroCount());
        assertArrayEquals(new int[] {1, 3}, m.byUser().rowColumns(0));
        assertArrayEquals(new double[] {3, 6}, m.byUser().rowValues(0), 0.0);
        assertArrayEquals(new int[] {0, 1, 2}, m.byItem().rowColumns(1));
        assertArrayEquals(new double[] {3, 4, 2}, m.byItem().rowValues(1), 0.0);
        assertEquals(0, m.byItem().rowLength(0));
        assertArrayEquals(new double[] {6}, m.byItem().rowValues(3), 0.0);
    }

    @Test
    void shouldRejectNegativeStrengthsAndCellsOutsideTheMatrix() {
        InteractionMatrixBuilder builder = new InteractionMatrixBuilder(2, 2);
        assertThrows(IllegalArgumentException.class, () -> builder.add(0, 0, -1));
        assertThrows(IllegalArgumentException.class, () -> builder.add(2, 0, 1));
        assertThrows(IllegalArgumentException.class, () -> builder.add(0, 0, Double.NaN));
    }

    @Test
    void shouldWeighEventsByKindQuantityAndHalfLife() {
        InteractionWeights weights = InteractionWeights.defaults().withHalfLife(Duration.ofDays(10));
        Instant now = Instant.parse("2026-03-01T00:00:00Z");
        List<UsageEvent> events = List.of(
                new UsageEvent(SchemaIds.USAGE_EVENT, "e1", "r1", "c1", UsageKind.ORDER, 0, "g", "2026-03-01T00:00:00Z"),
                new UsageEvent(SchemaIds.USAGE_EVENT, "e2", "r1", "c1", UsageKind.VIEW, 0, "g", "2026-02-19T00:00:00Z"),
                new UsageEvent(SchemaIds.USAGE_EVENT, "e3", "r2", "c2", UsageKind.ORDER, Math.E - 1, "g",
                        "2026-03-01T00:00:00Z"));
        InteractionLog log = InteractionLog.fromEvents(events, weights, now, List.of("c0"));
        assertEquals(3, log.items().size());
        assertEquals(2, log.interactions().size());
        Interaction first = log.interactions().get(0);
        // order today: 1; view ten days ago (one half-life): 0.1 · 0.5
        assertEquals(1.05, first.strength(), 1e-12);
        assertEquals(Instant.parse("2026-03-01T00:00:00Z").toEpochMilli(), first.lastTimeMillis());
        // quantity e − 1: 1 + 0.25 · ln(e) = 1.25
        assertEquals(1.25, log.interactions().get(1).strength(), 1e-12);
        assertEquals(1, log.interactions().get(0).item());
    }
}
