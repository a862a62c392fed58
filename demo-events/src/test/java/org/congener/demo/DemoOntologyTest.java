package org.congener.demo;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Checks the hand-written ontology against the OBO 1.4 flat-file shape and the demo's needs. */
class DemoOntologyTest {

    /** Tags allowed in a [Term] stanza of OBO 1.4 that this file uses. */
    private static final Set<String> TERM_TAGS = Set.of("id", "name", "namespace", "alt_id", "def", "comment",
            "is_a", "relationship", "is_obsolete", "replaced_by", "consider", "synonym", "xref");
    private static final Set<String> TYPEDEF_TAGS = Set.of("id", "name", "def", "domain", "range", "is_transitive");
    private static final Set<String> HEADER_TAGS = Set.of("format-version", "data-version", "date", "saved-by",
            "default-namespace", "ontology", "remark");

    private static String obo;
    private static DemoOntology ontology;

    @BeforeAll
    static void load() {
        obo = DemoData.ontologyObo();
        ontology = DemoOntology.parse(obo);
    }

    @Test
    void shouldStartWithFormatVersion14AndDeclareTheHasRoleTypedef() {
        assertTrue(obo.startsWith("format-version: 1.4\n"));
        assertTrue(obo.contains("[Typedef]\nid: has_role\nname: has role\n"));
    }

    @Test
    void shouldUseOnlyOboTagsInTheirStanzasWithTagColonValueLines() {
        String stanza = "header";
        String[] lines = obo.split("\n");
        for (int i = 0; i < lines.length; i++) {
            String line = lines[i];
            if (line.isEmpty()) {
                continue;
            }
            if (line.startsWith("[")) {
                stanza = line;
                assertTrue(Set.of("[Term]", "[Typedef]").contains(stanza), "line " + (i + 1) + ": " + line);
                continue;
            }
            int colon = line.indexOf(": ");
            assertTrue(colon > 0, "line " + (i + 1) + " is not 'tag: value': " + line);
            String tag = line.substring(0, colon);
            Set<String> allowed = switch (stanza) {
                case "header" -> HEADER_TAGS;
                case "[Term]" -> TERM_TAGS;
                default -> TYPEDEF_TAGS;
            };
            assertTrue(allowed.contains(tag), "line " + (i + 1) + ": tag '" + tag + "' in " + stanza);
            if (tag.equals("def")) {
                assertTrue(line.matches("def: \"[^\"]+\" \\[[^\\]]*\\]"), "line " + (i + 1) + ": def needs a quoted text and a dbxref list");
            }
        }
    }

    @Test
    void shouldHoldAboutOneHundredFiftyTermsWithOurOwnSevenDigitIds() {
        Map<String, DemoOntology.Term> terms = ontology.terms();
        assertTrue(terms.size() >= 140 && terms.size() <= 190, "term count " + terms.size());
        for (String id : terms.keySet()) {
            assertTrue(id.matches("CGNR:\\d{7}"), id);
        }
    }

    @Test
    void shouldDefineEveryIsAAndRelationshipTarget() {
        for (DemoOntology.Term term : ontology.terms().values()) {
            for (String target : term.parents()) {
                assertNotNull(ontology.terms().get(target), term.id() + " is_a " + target);
            }
            for (String target : term.roles()) {
                assertNotNull(ontology.terms().get(target), term.id() + " has_role " + target);
            }
        }
    }

    @Test
    void shouldHaveNoIsACycles() {
        Map<String, Integer> state = new HashMap<>();
        for (String id : ontology.terms().keySet()) {
            assertFalse(reachesCycle(id, state), "cycle through " + id);
        }
    }

    /** Depth-first search with white (absent) / grey (1) / black (2) marks. */
    private static boolean reachesCycle(String id, Map<String, Integer> state) {
        Integer mark = state.get(id);
        if (mark != null) {
            return mark == 1;
        }
        state.put(id, 1);
        for (String parent : ontology.parents(id)) {
            if (reachesCycle(parent, state)) {
                return true;
            }
        }
        state.put(id, 2);
        return false;
    }

    @Test
    void shouldHaveMultipleInheritanceRolesAndTwoRoots() {
        long multiParent = ontology.terms().values().stream().filter(t -> t.parents().size() > 1).count();
        long withRoles = ontology.terms().values().stream().filter(t -> !t.roles().isEmpty()).count();
        List<String> roots = ontology.terms().values().stream()
                .filter(t -> !t.obsolete() && t.parents().isEmpty()).map(DemoOntology.Term::name).toList();
        assertTrue(multiParent >= 20, "terms with several parents: " + multiParent);
        assertTrue(withRoles >= 10, "terms with has_role: " + withRoles);
        assertEquals(List.of("chemical entity", "chemical role"), roots);
    }

    @Test
    void shouldReplaceEveryObsoleteTermAndGiveItNoIsA() {
        List<DemoOntology.Term> obsolete = ontology.terms().values().stream().filter(DemoOntology.Term::obsolete).toList();
        assertTrue(obsolete.size() >= 2);
        for (DemoOntology.Term term : obsolete) {
            assertTrue(term.parents().isEmpty(), term.id());
            assertTrue(ontology.isActiveTerm(term.replacedBy()), term.id() + " replaced_by " + term.replacedBy());
        }
    }

    @Test
    void shouldKeepAltIdsApartFromPrimaryIds() {
        Set<String> altIds = new HashSet<>();
        for (DemoOntology.Term term : ontology.terms().values()) {
            for (String alt : term.altIds()) {
                assertFalse(ontology.terms().containsKey(alt), alt + " is also a primary id");
                assertTrue(altIds.add(alt), alt + " used twice");
            }
        }
        assertTrue(altIds.size() >= 2);
    }

    @Test
    void shouldRejectAnUndefinedIsATargetNamingTheTerm() {
        String broken = "format-version: 1.4\n\n[Term]\nid: CGNR:0000001\nname: a\nis_a: CGNR:0000999 ! nothing\n";
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> DemoOntology.parse(broken));
        assertTrue(e.getMessage().contains("CGNR:0000001") && e.getMessage().contains("CGNR:0000999"), e.getMessage());
    }

    @Test
    void shouldRejectALineThatIsNotTagColonValueNamingItsNumber() {
        String broken = "format-version: 1.4\n\n[Term]\nid: CGNR:0000001\nname a\n";
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> DemoOntology.parse(broken));
        assertTrue(e.getMessage().contains("line 5"), e.getMessage());
    }

    @Test
    void shouldFollowIsAUpToTheRootWhenListingAncestors() {
        Set<String> ancestors = ontology.ancestorsOrSelf("CGNR:0000046");
        assertTrue(ancestors.containsAll(List.of("CGNR:0000046", "CGNR:0000045", "CGNR:0000044", "CGNR:0000039",
                "CGNR:0000065", "CGNR:0000002", "CGNR:0000001")), ancestors.toString());
        assertEquals(0, ontology.depth("CGNR:0000001"));
        assertTrue(ontology.descendantsOrSelf("CGNR:0000044").contains("CGNR:0000047"));
    }
}
