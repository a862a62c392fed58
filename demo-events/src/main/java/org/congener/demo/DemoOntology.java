package org.congener.demo;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Deque;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The part of the demo ontology the generator needs to pick compounds: terms, their {@code is_a}
 * parents and {@code has_role} targets, obsolescence. A deliberately small reader of the OBO 1.4
 * flat-file subset used by {@code ontology.obo}; the full reader lives in recommender-core.
 * Ancestry follows {@code is_a} only.
 */
final class DemoOntology {

    /** One {@code [Term]} stanza. */
    record Term(String id, String name, List<String> parents, List<String> roles, List<String> altIds,
                boolean obsolete, String replacedBy) {
    }

    private final Map<String, Term> terms;
    private final Map<String, List<String>> children = new LinkedHashMap<>();
    private final Map<String, Set<String>> ancestorCache = new LinkedHashMap<>();
    private final Map<String, Set<String>> descendantCache = new LinkedHashMap<>();
    private final Map<String, Integer> depthCache = new LinkedHashMap<>();

    private DemoOntology(Map<String, Term> terms) {
        this.terms = Collections.unmodifiableMap(terms);
        for (Term term : terms.values()) {
            for (String parent : term.parents()) {
                children.computeIfAbsent(parent, k -> new ArrayList<>()).add(term.id());
            }
        }
    }

    /**
     * Parses the stanzas of an OBO 1.4 text. Throws {@link IllegalArgumentException} naming the line
     * for a tag line outside a stanza's shape, a duplicate id, or an {@code is_a}/relationship target
     * that no stanza defines.
     */
    static DemoOntology parse(String obo) {
        Map<String, Term> terms = new LinkedHashMap<>();
        String[] lines = obo.split("\n", -1);
        String stanza = null;
        TermBuilder current = null;
        for (int i = 0; i < lines.length; i++) {
            String line = lines[i];
            int lineNumber = i + 1;
            if (line.isBlank() || line.startsWith("!")) {
                continue;
            }
            if (line.startsWith("[")) {
                if (current != null) {
                    current.addTo(terms, lineNumber);
                }
                stanza = line.trim();
                current = "[Term]".equals(stanza) ? new TermBuilder() : null;
                continue;
            }
            int colon = line.indexOf(": ");
            if (colon <= 0) {
                throw new IllegalArgumentException("ontology line " + lineNumber + ": expected 'tag: value', got '" + line + "'");
            }
            if (current == null) {
                continue;
            }
            String tag = line.substring(0, colon);
            String value = stripComment(line.substring(colon + 2));
            switch (tag) {
                case "id" -> current.id = value;
                case "name" -> current.name = value;
                case "is_a" -> current.parents.add(value);
                case "alt_id" -> current.altIds.add(value);
                case "is_obsolete" -> current.obsolete = "true".equals(value);
                case "replaced_by" -> current.replacedBy = value;
                case "relationship" -> {
                    String[] parts = value.split(" ");
                    if (parts.length != 2) {
                        throw new IllegalArgumentException("ontology line " + lineNumber + ": relationship needs a type and a target");
                    }
                    if ("has_role".equals(parts[0])) {
                        current.roles.add(parts[1]);
                    }
                }
                default -> {
                    // def, namespace, consider, comment and the like carry nothing the generator needs.
                }
            }
        }
        if (current != null) {
            current.addTo(terms, lines.length);
        }
        for (Term term : terms.values()) {
            for (String target : concat(term.parents(), term.roles())) {
                if (!terms.containsKey(target)) {
                    throw new IllegalArgumentException("ontology term " + term.id() + " refers to undefined " + target);
                }
            }
        }
        return new DemoOntology(terms);
    }

    private static String stripComment(String value) {
        int bang = value.indexOf(" ! ");
        return (bang >= 0 ? value.substring(0, bang) : value).trim();
    }

    private static List<String> concat(List<String> a, List<String> b) {
        List<String> all = new ArrayList<>(a);
        all.addAll(b);
        return all;
    }

    Map<String, Term> terms() {
        return terms;
    }

    Term term(String id) {
        Term term = terms.get(id);
        if (term == null) {
            throw new IllegalArgumentException("unknown ontology term " + id);
        }
        return term;
    }

    boolean isActiveTerm(String id) {
        Term term = terms.get(id);
        return term != null && !term.obsolete();
    }

    /** The term and every term reachable from it by {@code is_a}, in breadth-first order. */
    Set<String> ancestorsOrSelf(String id) {
        return ancestorCache.computeIfAbsent(id, this::walkUp);
    }

    private Set<String> walkUp(String id) {
        Set<String> seen = new LinkedHashSet<>();
        Deque<String> queue = new ArrayDeque<>(List.of(id));
        while (!queue.isEmpty()) {
            String next = queue.removeFirst();
            if (seen.add(next)) {
                queue.addAll(term(next).parents());
            }
        }
        return Collections.unmodifiableSet(seen);
    }

    /** The term and every term below it by {@code is_a}. */
    Set<String> descendantsOrSelf(String id) {
        return descendantCache.computeIfAbsent(id, this::walkDown);
    }

    private Set<String> walkDown(String id) {
        Set<String> seen = new LinkedHashSet<>();
        Deque<String> queue = new ArrayDeque<>(List.of(id));
        while (!queue.isEmpty()) {
            String next = queue.removeFirst();
            if (seen.add(next)) {
                queue.addAll(children.getOrDefault(next, List.of()));
            }
        }
        return Collections.unmodifiableSet(seen);
    }

    /** Length of the longest {@code is_a} path from the term up to a root; a root has depth 0. */
    int depth(String id) {
        Integer cached = depthCache.get(id);
        if (cached != null) {
            return cached;
        }
        int depth = 0;
        for (String parent : term(id).parents()) {
            depth = Math.max(depth, depth(parent) + 1);
        }
        depthCache.put(id, depth);
        return depth;
    }

    List<String> parents(String id) {
        return term(id).parents();
    }

    private static final class TermBuilder {
        String id;
        String name;
        final List<String> parents = new ArrayList<>();
        final List<String> roles = new ArrayList<>();
        final List<String> altIds = new ArrayList<>();
        boolean obsolete;
        String replacedBy;

        void addTo(Map<String, Term> terms, int lineNumber) {
            if (id == null || name == null) {
                throw new IllegalArgumentException("ontology stanza ending before line " + lineNumber + " lacks id or name");
            }
            if (terms.containsKey(id)) {
                throw new IllegalArgumentException("ontology line " + lineNumber + ": duplicate term id " + id);
            }
            terms.put(id, new Term(id, name, List.copyOf(parents), List.copyOf(roles), List.copyOf(altIds), obsolete, replacedBy));
        }
    }
}
