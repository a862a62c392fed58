package org.congener.streams.state;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

/**
 * The column layout with its position table against a plain insertion-ordered map of entries, the
 * profile's former layout: same entries in the same order, same look-ups, whether the profile is
 * small (scanned), crosses the size where the table is built, or grows after it was built.
 */
class InteractionProfileLookupTest {

    @Test
    void shouldAgreeWithAnOrderedMapWhenEventsRepeatAndTheProfileGrows() {
        SplittableRandom random = new SplittableRandom(17);
        for (int round = 0; round < 40; round++) {
            InteractionProfile profile = new InteractionProfile();
            Map<String, InteractionProfile.Entry> expected = new LinkedHashMap<>();
            int distinct = 1 + random.nextInt(round < 10 ? 12 : 400);
            for (int e = 0; e < 3 * distinct; e++) {
                // a fresh String each time, as an event's id is
                String id = new String("cmp-" + random.nextInt(distinct));
                float weight = (float) random.nextDouble(0.1, 4);
                long at = random.nextLong(0, 1_000_000);
                boolean used = random.nextInt(3) > 0;
                profile.add(id, weight, at, used);
                if (random.nextInt(40) == 0) {
                    // through the store, as at every event: ids read back stay stored bytes until asked for
                    profile = InteractionProfileSerde.read(InteractionProfileSerde.write(profile));
                }
                expected.merge(id, new InteractionProfile.Entry(id, weight, 1, at, used),
                        (old, now) -> new InteractionProfile.Entry(id, old.strength() + weight, old.events() + 1,
                                Math.max(old.lastSeenEpochMs(), at), old.used() || used));
                if (random.nextInt(5) == 0) {
                    // a look-up in between builds the table early, so later additions must update it
                    String probe = "cmp-" + random.nextInt(distinct + 3);
                    assertEquals(expected.get(probe), profile.get(probe), "round " + round + ", " + probe);
                }
            }
            assertEquals(new ArrayList<>(expected.values()), List.copyOf(profile.entries()), "round " + round);
            for (String id : expected.keySet()) {
                assertEquals(expected.get(id).used(), profile.hasUsed(new String(id)), id);
            }
            assertNull(profile.get("cmp-absent"));
            assertEquals(false, profile.hasUsed("cmp-absent"));
        }
    }

    @Test
    void shouldReadTheColumnsOfEachPositionInFirstSeenOrder() {
        InteractionProfile profile = new InteractionProfile();
        profile.add("b", 1f, 10L, false);
        profile.add("a", 2f, 20L, true);
        profile.add("b", 3f, 5L, true);

        assertEquals(2, profile.size());
        assertEquals("b", profile.compoundId(0));
        assertEquals(4f, profile.strength(0));
        assertEquals(2, profile.events(0));
        assertEquals(10L, profile.lastSeenEpochMs(0), "an older event does not move last-seen back");
        assertEquals(true, profile.used(0));
        assertEquals("a", profile.compoundId(1));
        assertEquals(2.0, profile.strengthAt(1, 1_000L, 0));
    }
}
