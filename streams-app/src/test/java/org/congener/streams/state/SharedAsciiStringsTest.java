package org.congener.streams.state;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertSame;

import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.Map;

import org.junit.jupiter.api.Test;

class SharedAsciiStringsTest {

    private static String read(String text) {
        byte[] framed = ("##" + text + "##").getBytes(StandardCharsets.US_ASCII);
        return SharedAsciiStrings.of(framed, 2, text.length());
    }

    @Test
    void shouldReturnTheSameInstanceWhenTheSameIdIsReadAgain() {
        String first = read("CMP-shared-0001");
        String again = read("CMP-shared-0001");

        assertEquals("CMP-shared-0001", first);
        assertSame(first, again, "the second read finds the kept String");
    }

    @Test
    void shouldReadEveryTextCorrectlyWhenManyIdsShareTheTable() {
        // four times as many ids as slots: slots are taken over again and again, and every read must
        // still give its own text
        Map<String, String> kept = new HashMap<>();
        for (int round = 0; round < 2; round++) {
            for (int i = 0; i < 4 * 65_536; i += 7) {
                String id = "CMP-" + i;
                String read = read(id);
                assertEquals(id, read);
                assertEquals(id.hashCode(), read.hashCode());
                kept.putIfAbsent(id, read);
            }
        }
        assertEquals(4 * 65_536 / 7 + 1, kept.size());
    }

    @Test
    void shouldMakeANewStringWhenTheTextIsLongerThanTheKeptLimit() {
        String longText = "L".repeat(SharedAsciiStrings.LONGEST_KEPT + 1);

        String first = read(longText);
        String again = read(longText);

        assertEquals(longText, again);
        assertNotSame(first, again, "long texts are not kept");
    }

    @Test
    void shouldHandOutTheSharedInstanceWhenItWasSharedBeforeTheRead() {
        String own = new String("CMP-model-0042");
        assertSame(own, SharedAsciiStrings.shared(own), "the first to share an id keeps its instance");
        assertSame(own, SharedAsciiStrings.shared(new String("CMP-model-0042")));
        assertSame(own, read("CMP-model-0042"), "a store read returns the shared instance");
        String accented = "CMP-\u00e9";
        assertSame(accented, SharedAsciiStrings.shared(accented), "text that is not ASCII is returned as given");
    }

    @Test
    void shouldKeepProfileIdsSharedAcrossReadsOfTheStore() {
        InteractionProfile profile = new InteractionProfile();
        profile.add("CMP-profile-7", 1f, 1_000L, true);
        byte[] bytes = InteractionProfileSerde.write(profile);

        InteractionProfile one = InteractionProfileSerde.read(bytes);
        InteractionProfile two = InteractionProfileSerde.read(bytes);

        assertSame(one.entries().iterator().next().compoundId(), two.entries().iterator().next().compoundId());
    }
}
