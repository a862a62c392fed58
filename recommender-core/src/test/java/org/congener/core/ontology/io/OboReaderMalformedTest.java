package org.congener.core.ontology.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;

import org.congener.core.ontology.OntologyFormatException;
import org.junit.jupiter.api.Test;

/** One test per kind of bad input of the OBO reader: each must name the line and the term. */
class OboReaderMalformedTest {

    private OntologyFormatException readFails(String obo) {
        return assertThrows(OntologyFormatException.class, () -> new OboReader().read(new StringReader(obo)));
    }

    private void assertMentions(OntologyFormatException e, String... fragments) {
        for (String fragment : fragments) {
            assertTrue(e.getMessage().contains(fragment), () -> "'" + e.getMessage() + "' lacks '" + fragment + "'");
        }
    }

    @Test
    void shouldNameLineAndTermWhenAParentIsDangling() {
        OntologyFormatException e = readFails("""
                [Term]
                id: X:1

                [Term]
                id: X:2
                is_a: X:1
                is_a: X:404
                """);
        assertEquals(7, e.line());
        assertEquals("X:2", e.termId());
        assertMentions(e, "line 7", "X:2", "X:404", "not defined");
    }

    @Test
    void shouldNameEveryMemberWhenTheGraphHasACycle() {
        OntologyFormatException e = readFails("""
                [Term]
                id: X:0

                [Term]
                id: X:1
                is_a: X:0
                is_a: X:3

                [Term]
                id: X:2
                is_a: X:1

                [Term]
                id: X:3
                is_a: X:2
                """);
        assertMentions(e, "cycle of 3 terms", "X:1", "X:2", "X:3");
        assertTrue(e.line() == 7 || e.line() == 11 || e.line() == 15, "line of a cycle edge: " + e.line());
        assertTrue(e.getMessage().startsWith("line " + e.line() + ": term " + e.termId()), e.getMessage());
    }

    @Test
    void shouldReportASelfLoopAsACycle() {
        OntologyFormatException e = readFails("""
                [Term]
                id: X:1
                is_a: X:1
                """);
        assertEquals(3, e.line());
        assertMentions(e, "X:1", "cycle");
    }

    @Test
    void shouldNameBothLinesWhenAnIdIsDefinedTwice() {
        OntologyFormatException e = readFails("""
                [Term]
                id: X:1
                name: first

                [Term]
                id: X:1
                name: second
                """);
        assertEquals(5, e.line());
        assertEquals("X:1", e.termId());
        assertMentions(e, "duplicate id", "line 1");
    }

    @Test
    void shouldRejectAnAltIdThatIsAlreadyATerm() {
        OntologyFormatException e = readFails("""
                [Term]
                id: X:1

                [Term]
                id: X:2
                alt_id: X:1
                """);
        assertEquals(6, e.line());
        assertMentions(e, "duplicate id", "X:1");
    }

    @Test
    void shouldRejectATermWhoseIdIsAlreadyAnAltId() {
        OntologyFormatException e = readFails("""
                [Term]
                id: X:2
                alt_id: X:1

                [Term]
                id: X:1
                """);
        assertEquals(5, e.line());
        assertMentions(e, "duplicate id", "alt_id of X:2");
    }

    @Test
    void shouldNameLineAndTermWhenALineHasNoTag() {
        OntologyFormatException e = readFails("""
                [Term]
                id: X:1
                name: fine
                this line has no tag
                """);
        assertEquals(4, e.line());
        assertEquals("X:1", e.termId());
        assertMentions(e, "broken line", "this line has no tag");
    }

    @Test
    void shouldRejectABrokenStanzaHeader() {
        OntologyFormatException e = readFails("""
                [Term]
                id: X:1

                [Term
                id: X:2
                """);
        assertEquals(4, e.line());
        assertMentions(e, "broken stanza header");
    }

    @Test
    void shouldRejectAnIsAWithoutValue() {
        OntologyFormatException e = readFails("""
                [Term]
                id: X:1
                is_a:   ! nothing here
                """);
        assertEquals(3, e.line());
        assertMentions(e, "X:1", "without a value");
    }

    @Test
    void shouldRejectARelationshipWithoutTarget() {
        OntologyFormatException e = readFails("""
                [Term]
                id: X:1
                relationship: part_of
                """);
        assertEquals(3, e.line());
        assertMentions(e, "X:1", "relationship");
    }

    @Test
    void shouldRejectATermStanzaWithoutId() {
        OntologyFormatException e = readFails("""
                [Term]
                id: X:1

                [Term]
                name: nameless
                """);
        assertEquals(4, e.line());
        assertMentions(e, "without an id");
    }

    @Test
    void shouldRejectAParentThatIsObsoleteWithoutReplacement() {
        OntologyFormatException e = readFails("""
                [Term]
                id: X:1
                is_obsolete: true

                [Term]
                id: X:2
                is_a: X:1
                """);
        assertEquals(7, e.line());
        assertEquals("X:2", e.termId());
        assertMentions(e, "obsolete", "replaced_by");
    }
}
