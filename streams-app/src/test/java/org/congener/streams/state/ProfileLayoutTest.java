package org.congener.streams.state;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.ByteArrayOutputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.util.List;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

/**
 * The profile bytes against the layout as {@link DataOutputStream} writes it (the form stores and
 * changelogs already hold), over seeded random profiles whose ids are ASCII, accented, Greek, or hold
 * a NUL (which modified UTF-8 writes in two bytes).
 */
class ProfileLayoutTest {

    @Test
    void shouldWriteTheDataStreamLayoutByteForByteAndReadItBackWhenIdsAreAsciiOrNot() throws IOException {
        SplittableRandom random = new SplittableRandom(3);
        String[] alphabets = {"abcxyz-019", "äöüßé", "αβγδ", "a\u0000b", "\u4e2d\u6587"};
        for (int round = 0; round < 300; round++) {
            InteractionProfile profile = new InteractionProfile();
            int entries = random.nextInt(40);
            for (int e = 0; e < entries; e++) {
                String alphabet = alphabets[random.nextInt(round % 3 == 0 ? alphabets.length : 1)];
                StringBuilder id = new StringBuilder("c-");
                for (int t = random.nextInt(1, 12); t > 0; t--) {
                    id.append(alphabet.charAt(random.nextInt(alphabet.length())));
                }
                profile.add(id.toString(), (float) random.nextDouble(0, 5), random.nextLong(0, 2_000_000_000_000L),
                        random.nextBoolean());
            }
            if (random.nextBoolean()) {
                profile.keepVector(round % 5 == 0 ? "v-ü" : "v0003", random.doubles(random.nextInt(1, 70)).toArray());
            }
            byte[] written = InteractionProfileSerde.write(profile);
            assertArrayEquals(dataStreamLayout(profile), written, "round " + round);
            InteractionProfile back = InteractionProfileSerde.read(written);
            // written back as read: stored ids are copied, not re-encoded, and must give the same bytes
            assertArrayEquals(written, InteractionProfileSerde.write(back), "round " + round);
            assertEquals(List.copyOf(profile.entries()), List.copyOf(back.entries()), "round " + round);
            assertEquals(profile.vectorVersion(), back.vectorVersion());
            assertArrayEquals(profile.vectorUnder(profile.vectorVersion()), back.vectorUnder(back.vectorVersion()));
        }
    }

    @Test
    void shouldNameTheProblemWhenStoredBytesAreCutShort() {
        InteractionProfile profile = new InteractionProfile();
        profile.add("c-1", 1f, 1L, true);
        byte[] whole = InteractionProfileSerde.write(profile);
        byte[] cut = java.util.Arrays.copyOf(whole, whole.length - 9);
        IllegalStateException e = assertThrows(IllegalStateException.class, () -> InteractionProfileSerde.read(cut));
        assertEquals("interaction profile of " + cut.length + " bytes is cut short", e.getMessage());
    }

    /** Format 2 as documented on {@link InteractionProfileSerde}, written by the data stream classes. */
    private static byte[] dataStreamLayout(InteractionProfile profile) throws IOException {
        ByteArrayOutputStream buffer = new ByteArrayOutputStream();
        try (DataOutputStream out = new DataOutputStream(buffer)) {
            out.writeByte(2);
            out.writeInt(profile.size());
            for (InteractionProfile.Entry e : profile.entries()) {
                out.writeUTF(e.compoundId());
                out.writeFloat(e.strength());
                out.writeInt(e.events());
                out.writeLong(e.lastSeenEpochMs());
                out.writeByte(e.used() ? 1 : 0);
            }
            float[] vector = profile.vectorUnder(profile.vectorVersion());
            if (vector == null) {
                out.writeShort(0);
            } else {
                out.writeShort(vector.length);
                out.writeUTF(profile.vectorVersion());
                for (float v : vector) {
                    out.writeFloat(v);
                }
            }
        }
        return buffer.toByteArray();
    }
}
