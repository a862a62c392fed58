package org.congener.core.ontology.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.util.Arrays;
import java.util.Set;

import org.congener.core.ontology.Ontology;
import org.congener.core.ontology.SmallDag;
import org.junit.jupiter.api.Test;

class OboReaderTest {

    private final SmallDag dag = SmallDag.load();

    private int[] sorted(int... terms) {
        int[] copy = terms.clone();
        Arrays.sort(copy);
        return copy;
    }

    @Test
    void shouldKeepTermsEdgesAndNamesWhenReadingTheFixture() {
        Ontology o = dag.ontology;
        assertEquals(8, o.termCount());
        assertEquals(8, o.size(), "one root: no virtual root");
        assertEquals(8, o.edgeCount());
        assertEquals("CGT:0000005", o.termId(dag.term("D")));
        assertArrayEquals(sorted(dag.term("A"), dag.term("B")), o.parents(dag.term("D")));
        assertArrayEquals(sorted(dag.term("E"), dag.term("F")), o.children(dag.term("C")));
        assertArrayEquals(new int[] {dag.term("R")}, o.roots());
        assertEquals(dag.term("R"), o.top());
        assertArrayEquals(sorted(dag.term("G"), dag.term("D"), dag.term("A"), dag.term("B"), dag.term("R")),
                o.ancestors(dag.term("G")));
        assertEquals(3, o.depth(dag.term("G")));
        assertEquals(3, o.maxDepth());
    }

    @Test
    void shouldResolveAltIdsToTheirPrimaryTerm() {
        assertEquals(dag.term("E"), dag.ontology.termIndex("CGT:0000106"));
    }

    @Test
    void shouldLeaveObsoleteTermsOutAndFollowReplacedBy() {
        Ontology o = dag.ontology;
        assertEquals(1, o.obsoleteTermsLeftOut());
        assertEquals(dag.term("F"), o.termIndex("CGT:0000009"));
        assertEquals(-1, o.termIndex("part_of"), "typedef stanzas are not terms");
    }

    @Test
    void shouldCountOnlyIsAWhenNoRelationIsConfigured() {
        assertArrayEquals(new int[] {dag.term("C")}, dag.ontology.parents(dag.term("E")));
    }

    @Test
    void shouldCountConfiguredRelationsAsParents() throws IOException {
        Ontology o = new OboReader(Set.of("part_of")).read(
                new java.io.InputStreamReader(getClass().getResourceAsStream(SmallDag.RESOURCE)));
        int e = o.termIndex("CGT:0000006");
        assertArrayEquals(sorted(o.termIndex("CGT:0000003"), o.termIndex("CGT:0000004")), o.parents(e));
        assertEquals(9, o.edgeCount());
    }

    @Test
    void shouldRedirectAParentThatIsObsoleteToItsReplacement() throws IOException {
        String obo = """
                [Term]
                id: X:1

                [Term]
                id: X:2
                is_obsolete: true
                replaced_by: X:1

                [Term]
                id: X:3
                is_a: X:2
                """;
        Ontology o = new OboReader().read(new StringReader(obo));
        assertArrayEquals(new int[] {o.termIndex("X:1")}, o.parents(o.termIndex("X:3")));
    }

    @Test
    void shouldAcceptForwardReferencesAndIdsWithoutNames() throws IOException {
        String obo = """
                [Term]
                id: X:2
                is_a: X:1

                [Term]
                id: X:1
                """;
        Ontology o = new OboReader().read(new StringReader(obo));
        assertEquals(0, o.termIndex("X:2"), "terms keep the order of their stanzas");
        assertEquals("X:1", o.name(o.termIndex("X:1")));
        assertTrue(o.isAncestorOrSelf(o.termIndex("X:1"), o.termIndex("X:2")));
        assertFalse(o.isAncestorOrSelf(o.termIndex("X:2"), o.termIndex("X:1")));
    }

    @Test
    void shouldJoinSeveralRootsUnderAVirtualRoot() throws IOException {
        String obo = """
                [Term]
                id: X:1
                [Term]
                id: X:2
                [Term]
                id: X:3
                is_a: X:1
                is_a: X:2
                """;
        Ontology o = new OboReader().read(new StringReader(obo));
        assertTrue(o.hasVirtualRoot());
        assertEquals(4, o.size());
        assertEquals(3, o.termCount());
        assertEquals(2, o.edgeCount(), "virtual edges are not counted");
        assertEquals(Ontology.VIRTUAL_ROOT_ID, o.termId(o.top()));
        assertArrayEquals(new int[] {0, 1, 2, 3}, o.ancestors(o.termIndex("X:3")));
        assertEquals(-1, o.depth(o.top()));
        assertEquals(0, o.depth(o.termIndex("X:1")));
    }
}
