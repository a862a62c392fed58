package org.congener.demo;

import org.obolibrary.oboformat.model.Clause;
import org.obolibrary.oboformat.model.Frame;
import org.obolibrary.oboformat.model.OBODoc;
import org.obolibrary.oboformat.parser.OBOFormatConstants.OboFormatTag;
import org.obolibrary.oboformat.parser.OBOFormatParser;
import org.obolibrary.oboformat.parser.OBOFormatParserException;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import java.io.BufferedReader;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Holds the hand-written ontology against an independent OBO 1.4 parser: the OBO format parser of
 * the OWL API ({@code net.sourceforge.owlapi:owlapi-oboformat}, the reference implementation of the
 * OBO 1.4 syntax), and cross-checks the generator's small reader against it.
 */
class ReferenceOboParserTest {

    private static OBODoc reference;
    private static DemoOntology ours;

    @BeforeAll
    static void parseBoth() throws Exception {
        String obo = DemoData.ontologyObo();
        reference = new OBOFormatParser().parse(new BufferedReader(new StringReader(obo)));
        ours = DemoOntology.parse(obo);
    }

    @Test
    void shouldParseWithTheReferenceOboParserAndPassItsChecks() {
        reference.check();
        assertEquals(List.of(), new OBOFormatParser().checkDanglingReferences(reference));
        assertEquals("1.4", reference.getHeaderFrame().getTagValue(OboFormatTag.TAG_FORMAT_VERSION));
        assertNotNull(reference.getTypedefFrame("has_role"));
    }

    @Test
    void shouldAgreeWithTheReferenceParserOnTermsParentsAndRoles() {
        assertEquals(ours.terms().size(), reference.getTermFrames().size());
        for (Frame frame : reference.getTermFrames()) {
            DemoOntology.Term term = ours.term(frame.getId());
            assertEquals(term.parents(), values(frame, OboFormatTag.TAG_IS_A), frame.getId());
            List<String> roles = new ArrayList<>();
            for (Clause clause : frame.getClauses(OboFormatTag.TAG_RELATIONSHIP)) {
                if ("has_role".equals(clause.getValue())) {
                    roles.add(clause.getValue2(String.class));
                }
            }
            assertEquals(term.roles(), roles, frame.getId());
            assertEquals(term.name(), frame.getTagValue(OboFormatTag.TAG_NAME, String.class), frame.getId());
            assertEquals(term.obsolete(), Boolean.TRUE.equals(frame.getTagValue("is_obsolete")), frame.getId());
        }
    }

    @Test
    void shouldBeRejectedByTheReferenceParserWhenALineIsMalformed() {
        String broken = "format-version: 1.4\n\n[Term]\nid: CGNR:0000001\nname a\n";
        OBOFormatParserException e = assertThrows(OBOFormatParserException.class,
                () -> new OBOFormatParser().parse(new BufferedReader(new StringReader(broken))));
        assertEquals(5, e.getLineNo());
    }

    @Test
    void shouldReportADanglingIsAWhenTheReferenceParserChecksAnOntologyThatHasOne() throws Exception {
        String dangling = "format-version: 1.4\n\n[Term]\nid: CGNR:0000001\nname: a\nis_a: CGNR:0000002 ! b\n";
        OBODoc doc = new OBOFormatParser().parse(new BufferedReader(new StringReader(dangling)));
        assertEquals(1, new OBOFormatParser().checkDanglingReferences(doc).size());
    }

    private static List<String> values(Frame frame, OboFormatTag tag) {
        List<String> values = new ArrayList<>();
        for (Clause clause : frame.getClauses(tag)) {
            values.add(clause.getValue(String.class));
        }
        assertTrue(values.stream().allMatch(v -> v != null && !v.isEmpty()));
        return values;
    }
}
