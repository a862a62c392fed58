package org.congener.streams.state;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

class StateSerdeTest {

    @Test
    void shouldRestoreEveryProfileEntryWhenReadBack() {
        InteractionProfile profile = new InteractionProfile();
        profile.add("c-1", 3f, 1_000L, true);
        profile.add("c-1", 2f, 500L, false);
        profile.add("c-2", 0.5f, 2_000L, false);

        InteractionProfile back = InteractionProfileSerde.read(InteractionProfileSerde.write(profile));

        assertEquals(List.copyOf(profile.entries()), List.copyOf(back.entries()));
        assertEquals(new InteractionProfile.Entry("c-1", 5f, 2, 1_000L, true), back.get("c-1"));
        assertTrue(back.hasUsed("c-1"));
        assertFalse(back.hasUsed("c-2"), "a view is no use");
    }

    @Test
    void shouldStayCompactWhenStoringProfile() {
        InteractionProfile profile = new InteractionProfile();
        for (int i = 0; i < 100; i++) {
            profile.add("c-" + i, 1f, i, true);
        }
        // per entry: 2 (id length) + id bytes + 4 (strength) + 4 (count) + 8 (last seen) + 1 (flags); header 5;
        // no vector: a 2-byte rank of 0
        assertEquals(5 + 100 * 19 + 10 * 3 + 90 * 4 + 2, InteractionProfileSerde.write(profile).length);
        // a rank-64 vector adds its version (2 + 5 bytes) and 64 floats
        profile.keepVector("v0001", new double[64]);
        assertEquals(5 + 100 * 19 + 10 * 3 + 90 * 4 + 2 + 7 + 64 * 4, InteractionProfileSerde.write(profile).length);
    }

    @Test
    void shouldKeepTheFoldedVectorOnlyForItsOwnVersionWhenReadBack() {
        InteractionProfile profile = new InteractionProfile();
        profile.add("c-1", 1f, 1_000L, true);
        profile.keepVector("v0002", new double[] {0.25, -1.5, 3.0});

        InteractionProfile back = InteractionProfileSerde.read(InteractionProfileSerde.write(profile));

        assertArrayEquals(new float[] {0.25f, -1.5f, 3.0f}, back.vectorUnder("v0002"));
        assertNull(back.vectorUnder("v0003"), "a vector is no warm start under other item factors");
        assertEquals(List.copyOf(profile.entries()), List.copyOf(back.entries()));
    }

    @Test
    void shouldReadProfilesWrittenBeforeVectorsWereKept() {
        // format 1: format byte, count, then one entry "c" with strength 2, 1 event, last seen 7, used
        byte[] formatOne = {1, 0, 0, 0, 1, 0, 1, 'c', 0x40, 0, 0, 0, 0, 0, 0, 1, 0, 0, 0, 0, 0, 0, 0, 7, 1};
        InteractionProfile back = InteractionProfileSerde.read(formatOne);
        assertEquals(new InteractionProfile.Entry("c", 2f, 1, 7L, true), back.get("c"));
        assertNull(back.vectorVersion());
    }

    @Test
    void shouldRestoreGroupScoresWhenReadBack() {
        GroupPopularity group = new GroupPopularity();
        group.add("c-1", 2f, 10L, 1000);
        group.add("c-2", 1f, 20L, 1000);
        GroupPopularity back = GroupPopularitySerde.read(GroupPopularitySerde.write(group));
        assertEquals(group.scores(), back.scores());
    }

    @Test
    void shouldHalveWeightAfterOneHalfLife() {
        // definition of a half-life: after h the weight is w/2; after 2h, w/4
        double h = 86_400_000;
        GroupPopularity group = new GroupPopularity();
        group.add("c-1", 4f, 0L, h);
        assertEquals(2.0, group.at("c-1", (long) h, h), 1e-6);
        assertEquals(1.0, group.at("c-1", (long) (2 * h), h), 1e-6);
        group.add("c-1", 1f, (long) h, h);
        assertEquals(3.0, group.at("c-1", (long) h, h), 1e-6);
    }

    @Test
    void shouldGiveSameScoreWhenOlderEventArrivesLate() {
        double h = 1000;
        GroupPopularity inOrder = new GroupPopularity();
        inOrder.add("c", 1f, 0L, h);
        inOrder.add("c", 1f, 500L, h);
        GroupPopularity late = new GroupPopularity();
        late.add("c", 1f, 500L, h);
        late.add("c", 1f, 0L, h);
        assertEquals(inOrder.at("c", 2000L, h), late.at("c", 2000L, h), 1e-6);
    }
}
