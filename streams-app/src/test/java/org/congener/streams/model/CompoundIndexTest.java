package org.congener.streams.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.Set;

import org.junit.jupiter.api.Test;

class CompoundIndexTest {

    @Test
    void shouldAgreeWithAHashMapWhenIdsShareHashCodes() {
        // "Aa" and "BB" have the same String hash, so these ids collide in pairs and longer chains
        Set<String> distinct = new LinkedHashSet<>();
        SplittableRandom random = new SplittableRandom(5);
        while (distinct.size() < 3_000) {
            StringBuilder id = new StringBuilder("c-");
            for (int t = random.nextInt(1, 5); t > 0; t--) {
                id.append(random.nextBoolean() ? "Aa" : "BB");
            }
            id.append(random.nextInt(400));
            distinct.add(id.toString());
        }
        String[] ids = distinct.toArray(String[]::new);
        CompoundIndex index = new CompoundIndex(ids);
        Map<String, Integer> expected = new HashMap<>();
        for (int i = 0; i < ids.length; i++) {
            expected.put(ids[i], i);
        }
        for (String id : ids) {
            // a copy, not the instance: the look-up must compare the text
            assertEquals(expected.get(id), index.indexOf(new String(id)), id);
            assertEquals(expected.get(id), index.indexOf(id), id);
        }
        for (String id : ids) {
            byte[] framed = ("##" + id).getBytes(java.nio.charset.StandardCharsets.US_ASCII);
            assertEquals(expected.get(id), index.indexOf(framed, 2, id.length(), id.hashCode()), id);
        }
        byte[] absent = "c-AaBB-absent".getBytes(java.nio.charset.StandardCharsets.US_ASCII);
        assertEquals(-1, index.indexOf(absent, 0, absent.length, "c-AaBB-absent".hashCode()));
        assertEquals(-1, index.indexOf("c-AaBB-absent"));
        assertEquals(-1, index.indexOf(""));
    }

    @Test
    void shouldFindAnIdThatIsNotAsciiByItsStringButNotByBytes() {
        String accented = "c-\u00e9ther";
        CompoundIndex index = new CompoundIndex(new String[] {"c-1", accented, "c-2"});
        assertEquals(1, index.indexOf(accented));
        byte[] latin1 = accented.getBytes(java.nio.charset.StandardCharsets.ISO_8859_1);
        // the same Latin-1 hash, but a stored profile's bytes are ASCII only: no such text can match
        assertEquals(-1, index.indexOf(latin1, 0, latin1.length, accented.hashCode()));
        byte[] two = "c-2".getBytes(java.nio.charset.StandardCharsets.US_ASCII);
        assertEquals(2, index.indexOf(two, 0, two.length, "c-2".hashCode()), "the ids after it are packed right");
    }

    @Test
    void shouldAnswerForAnEmptyVersionAndRefuseAnIdListedTwice() {
        assertEquals(-1, new CompoundIndex(new String[0]).indexOf("c-1"));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new CompoundIndex(new String[] {"c-1", "c-2", new String("c-1")}));
        assertEquals("compound id c-1 is listed twice", e.getMessage());
    }
}
