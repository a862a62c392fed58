package org.congener.core.ontology.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStreamReader;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;

import org.congener.core.ontology.Ontology;
import org.congener.core.ontology.OntologyFormatException;
import org.junit.jupiter.api.Test;

class EdgeListReaderTest {

    private Ontology twoRoots() throws IOException {
        return new EdgeListReader().read(new InputStreamReader(
                getClass().getResourceAsStream("/ontology/two-roots.tsv"), StandardCharsets.UTF_8));
    }

    @Test
    void shouldReadTermsAndEdgesAndSkipComments() throws IOException {
        Ontology o = twoRoots();
        assertEquals(9, o.termCount());
        assertEquals(6, o.edgeCount());
        assertArrayEquals(new int[] {o.termIndex("fruit")}, o.parents(o.termIndex("apple")));
        assertEquals("apple", o.name(o.termIndex("apple")));
    }

    @Test
    void shouldPutAVirtualRootAboveSeveralRoots() throws IOException {
        Ontology o = twoRoots();
        assertTrue(o.hasVirtualRoot());
        assertArrayEquals(new int[] {o.termIndex("food"), o.termIndex("rock"), o.termIndex("lonely")}, o.roots());
        assertArrayEquals(new int[] {o.termCount()}, o.parents(o.termIndex("lonely")));
        assertEquals(2, o.depth(o.termIndex("apple")));
    }

    @Test
    void shouldNameTheLineWhenALineHasThreeFields() {
        OntologyFormatException e = assertThrows(OntologyFormatException.class,
                () -> new EdgeListReader().read(new StringReader("a\tb\n# fine\nc\td\te\n")));
        assertEquals(3, e.line());
        assertEquals("c", e.termId());
    }

    @Test
    void shouldNameTheLineWhenAFieldIsEmpty() {
        OntologyFormatException e = assertThrows(OntologyFormatException.class,
                () -> new EdgeListReader().read(new StringReader("a\tb\n\tb\n")));
        assertEquals(2, e.line());
    }

    @Test
    void shouldNameTheMembersAndALineWhenEdgesFormACycle() {
        OntologyFormatException e = assertThrows(OntologyFormatException.class,
                () -> new EdgeListReader().read(new StringReader("top\nb\ttop\nc\td\nd\te\ne\tc\n")));
        assertTrue(e.getMessage().contains("cycle of 3 terms"), e.getMessage());
        assertTrue(e.getMessage().contains("c") && e.getMessage().contains("d") && e.getMessage().contains("e"));
        assertTrue(e.line() >= 3 && e.line() <= 5, "line " + e.line());
    }

    @Test
    void shouldMergeRepeatedEdges() throws IOException {
        Ontology o = new EdgeListReader().read(new StringReader("a\tb\na\tb\n"));
        assertEquals(1, o.edgeCount());
    }
}
