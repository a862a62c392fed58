package org.congener.core.ontology.io;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.congener.core.ontology.GrowableIntArray;
import org.congener.core.ontology.Ontology;
import org.congener.core.ontology.OntologyBuilder;
import org.congener.core.ontology.OntologyFormatException;

/**
 * Reads an OBO 1.4 flat file line by line. From {@code [Term]} stanzas it keeps {@code id}, {@code name},
 * {@code is_a}, {@code relationship} (only the relations named in the constructor count as parents),
 * {@code alt_id} (resolved to the primary term), {@code is_obsolete} (the term is left out) and
 * {@code replaced_by} (edges and look-ups that name an obsolete term go to its replacement). Other tags and
 * other stanzas ({@code [Typedef]}, {@code [Instance]}) are skipped, so the heap holds ids, names and edges
 * only, not the file.
 */
public final class OboReader {
    private static final byte UNDEFINED = 0;
    private static final byte TERM = 1;
    private static final byte OBSOLETE = 2;
    private static final byte ALTERNATIVE = 3;
    private static final int MAX_REPLACEMENT_CHAIN = 64;

    private final Set<String> parentRelations;

    /** A reader that counts is_a alone as a parent link. */
    public OboReader() {
        this(Set.of());
    }

    /** @param parentRelations relationship types (e.g. {@code part_of}) whose targets also count as parents */
    public OboReader(Set<String> parentRelations) {
        this.parentRelations = Set.copyOf(parentRelations);
    }

    public Ontology read(Path file) throws IOException {
        try (BufferedReader reader = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            return read(reader);
        }
    }

    /** Reads from an open reader; the caller closes it. */
    public Ontology read(Reader source) throws IOException {
        Parse parse = new Parse();
        BufferedReader lines = source instanceof BufferedReader b ? b : new BufferedReader(source);
        String line;
        int number = 0;
        while ((line = lines.readLine()) != null) {
            number++;
            int startLine = number;
            while (endsWithContinuation(line)) {
                String next = lines.readLine();
                if (next == null) {
                    break;
                }
                number++;
                line = line.substring(0, line.length() - 1) + next;
            }
            parse.line(line, startLine);
        }
        parse.endStanza();
        return parse.resolve();
    }

    private static boolean endsWithContinuation(String line) {
        int backslashes = 0;
        for (int i = line.length() - 1; i >= 0 && line.charAt(i) == '\\'; i--) {
            backslashes++;
        }
        return backslashes % 2 == 1;
    }

    /** The state of one pass: a symbol table over every id seen, and the edges by symbol. */
    private final class Parse {
        private final Map<String, Integer> symbols = new HashMap<>();
        private final List<String> symbolIds = new ArrayList<>();
        private final List<String> symbolNames = new ArrayList<>();
        private final GrowableIntArray definitionOrder = new GrowableIntArray(1024);
        private final GrowableIntArray edgeChild = new GrowableIntArray(1024);
        private final GrowableIntArray edgeParent = new GrowableIntArray(1024);
        private final GrowableIntArray edgeLine = new GrowableIntArray(1024);
        // per symbol: what it is, the line that defined it, and the symbol it stands for (alt_id, replaced_by)
        private byte[] kinds = new byte[1024];
        private int[] definedAt = new int[1024];
        private int[] target = new int[1024];

        private boolean inTerm;
        private int stanzaLine;
        private String id;
        private String name;
        private boolean obsolete;
        private String replacedBy;
        private final List<String> parents = new ArrayList<>();
        private final GrowableIntArray parentLines = new GrowableIntArray(8);
        private final List<String> altIds = new ArrayList<>();
        private final GrowableIntArray altLines = new GrowableIntArray(8);

        void line(String raw, int number) {
            String line = raw.strip();
            if (line.isEmpty() || line.charAt(0) == '!') {
                return;
            }
            if (line.charAt(0) == '[') {
                if (line.charAt(line.length() - 1) != ']' || line.length() < 3) {
                    throw new OntologyFormatException(number, null, "broken stanza header '" + line + "'");
                }
                endStanza();
                inTerm = line.equals("[Term]");
                stanzaLine = number;
                return;
            }
            int colon = line.indexOf(':');
            if (colon <= 0) {
                throw new OntologyFormatException(number, id, "broken line, expected 'tag: value': '" + line + "'");
            }
            if (!inTerm) {
                return;
            }
            String tag = knownTag(line, colon);
            if (tag == null) {
                // def, synonym, xref, property_value, ...: nothing the graph needs, and no allocation for them
                return;
            }
            String value = line.substring(colon + 1);
            switch (tag) {
                case "id" -> {
                    if (id != null) {
                        throw new OntologyFormatException(number, id, "a second id in one [Term] stanza");
                    }
                    id = singleToken(value, number, tag);
                }
                case "name" -> name = unescape(stripModifiers(stripComment(value))).strip();
                case "is_a" -> {
                    parents.add(singleToken(value, number, tag));
                    parentLines.add(number);
                }
                case "relationship" -> {
                    String[] parts = stripModifiers(stripComment(value)).strip().split("\\s+");
                    if (parts.length < 2 || parts[0].isEmpty()) {
                        throw new OntologyFormatException(number, id,
                                "broken relationship, expected 'relationship: <type> <term id>'");
                    }
                    if (parentRelations.contains(parts[0])) {
                        parents.add(parts[1]);
                        parentLines.add(number);
                    }
                }
                case "alt_id" -> {
                    altIds.add(singleToken(value, number, tag));
                    altLines.add(number);
                }
                case "is_obsolete" -> obsolete = "true".equals(stripComment(value).strip());
                case "replaced_by" -> {
                    if (replacedBy == null) {
                        replacedBy = singleToken(value, number, tag);
                    }
                }
                default -> throw new IllegalStateException("tag " + tag);
            }
        }

        private String singleToken(String value, int number, String tag) {
            String token = unescape(stripModifiers(stripComment(value))).strip();
            int space = indexOfWhitespace(token);
            if (space >= 0) {
                token = token.substring(0, space);
            }
            if (token.isEmpty()) {
                throw new OntologyFormatException(number, id, "broken line: '" + tag + ":' without a value");
            }
            return token;
        }

        void endStanza() {
            if (!inTerm) {
                return;
            }
            if (id == null) {
                throw new OntologyFormatException(stanzaLine, null, "[Term] stanza without an id");
            }
            int sym = symbol(id);
            int previous = kinds[sym];
            if (previous != UNDEFINED) {
                String where = previous == ALTERNATIVE ? "an alt_id of " + symbolIds.get(target[sym])
                        : "defined at line " + definedAt[sym];
                throw new OntologyFormatException(stanzaLine, id, "duplicate id: already " + where);
            }
            kinds[sym] = obsolete ? OBSOLETE : TERM;
            definedAt[sym] = stanzaLine;
            symbolNames.set(sym, name);
            if (obsolete && replacedBy != null) {
                target[sym] = symbol(replacedBy);
            }
            definitionOrder.add(sym);
            if (!obsolete) {
                for (int i = 0; i < parents.size(); i++) {
                    edgeChild.add(sym);
                    edgeParent.add(symbol(parents.get(i)));
                    edgeLine.add(parentLines.get(i));
                }
            }
            for (int i = 0; i < altIds.size(); i++) {
                int alt = symbol(altIds.get(i));
                if (kinds[alt] != UNDEFINED) {
                    throw new OntologyFormatException(altLines.get(i), id,
                            "duplicate id: alt_id " + altIds.get(i) + " is already used");
                }
                kinds[alt] = ALTERNATIVE;
                definedAt[alt] = altLines.get(i);
                target[alt] = sym;
            }
            inTerm = false;
            id = null;
            name = null;
            obsolete = false;
            replacedBy = null;
            parents.clear();
            parentLines.clear();
            altIds.clear();
            altLines.clear();
        }

        private int symbol(String symbolId) {
            Integer existing = symbols.get(symbolId);
            if (existing != null) {
                return existing;
            }
            int sym = symbolIds.size();
            symbols.put(symbolId, sym);
            symbolIds.add(symbolId);
            symbolNames.add(null);
            if (kinds.length <= sym) {
                int length = kinds.length * 2;
                kinds = Arrays.copyOf(kinds, length);
                definedAt = Arrays.copyOf(definedAt, length);
                target = Arrays.copyOf(target, length);
            }
            kinds[sym] = UNDEFINED;
            target[sym] = -1;
            return sym;
        }

        Ontology resolve() {
            OntologyBuilder builder = new OntologyBuilder();
            int[] node = new int[symbolIds.size()];
            Arrays.fill(node, -1);
            int obsoleteCount = 0;
            for (int i = 0; i < definitionOrder.size(); i++) {
                int sym = definitionOrder.get(i);
                if (kinds[sym] == TERM) {
                    node[sym] = builder.addTerm(symbolIds.get(sym), symbolNames.get(sym), definedAt[sym]);
                } else {
                    obsoleteCount++;
                }
            }
            builder.setObsoleteTermsLeftOut(obsoleteCount);
            for (int e = 0; e < edgeChild.size(); e++) {
                int child = node[edgeChild.get(e)];
                String childId = symbolIds.get(edgeChild.get(e));
                int parent = resolveParent(edgeParent.get(e), node, edgeLine.get(e), childId);
                builder.addEdge(child, parent, edgeLine.get(e));
            }
            for (int sym = 0; sym < symbolIds.size(); sym++) {
                if (kinds[sym] == ALTERNATIVE || kinds[sym] == OBSOLETE) {
                    int resolved = resolveAlias(sym, node);
                    if (resolved >= 0) {
                        builder.addAlias(symbolIds.get(sym), resolved, definedAt[sym]);
                    }
                }
            }
            // the symbol table has done its job: let it go before the ancestor sets take their room
            symbols.clear();
            symbolIds.clear();
            symbolNames.clear();
            kinds = null;
            definedAt = null;
            target = null;
            return builder.build();
        }

        private int resolveParent(int sym, int[] node, int line, String childId) {
            int current = sym;
            for (int step = 0; step < MAX_REPLACEMENT_CHAIN; step++) {
                switch (kinds[current]) {
                    case TERM:
                        return node[current];
                    case ALTERNATIVE:
                        current = target[current];
                        break;
                    case OBSOLETE:
                        int replacement = target[current];
                        if (replacement < 0) {
                            throw new OntologyFormatException(line, childId, "parent " + symbolIds.get(current)
                                    + " is obsolete and names no replaced_by");
                        }
                        current = replacement;
                        break;
                    default:
                        String via = current == sym ? "" : " (reached from " + symbolIds.get(sym) + ")";
                        throw new OntologyFormatException(line, childId,
                                "dangling parent: " + symbolIds.get(current) + via + " is not defined in the file");
                }
            }
            throw new OntologyFormatException(line, childId,
                    "replaced_by links starting at " + symbolIds.get(sym) + " loop");
        }

        /** An alternative or obsolete id maps to a term when its chain of replacements ends at one; else -1. */
        private int resolveAlias(int sym, int[] node) {
            int current = sym;
            for (int step = 0; step < MAX_REPLACEMENT_CHAIN; step++) {
                if (kinds[current] == TERM) {
                    return node[current];
                }
                int next = kinds[current] == UNDEFINED ? -1 : target[current];
                if (next < 0) {
                    return -1;
                }
                current = next;
            }
            return -1;
        }
    }

    private static final String[] KNOWN_TAGS =
            {"id", "name", "is_a", "relationship", "alt_id", "is_obsolete", "replaced_by"};

    /** The tag before the colon when the reader uses it, else null. */
    private static String knownTag(String line, int colon) {
        int end = colon;
        while (end > 0 && Character.isWhitespace(line.charAt(end - 1))) {
            end--;
        }
        for (String tag : KNOWN_TAGS) {
            if (tag.length() == end && line.startsWith(tag)) {
                return tag;
            }
        }
        return null;
    }

    private static int indexOfWhitespace(String text) {
        for (int i = 0; i < text.length(); i++) {
            if (Character.isWhitespace(text.charAt(i))) {
                return i;
            }
        }
        return -1;
    }

    /** OBO 1.4: an unescaped '!' starts a comment that runs to the end of the line. */
    static String stripComment(String value) {
        for (int i = 0; i < value.length(); i++) {
            char c = value.charAt(i);
            if (c == '\\') {
                i++;
            } else if (c == '!') {
                return value.substring(0, i);
            }
        }
        return value;
    }

    /** OBO 1.4: trailing modifiers are written as {@code {key=value, ...}} after the value. */
    static String stripModifiers(String value) {
        String trimmed = value.strip();
        if (!trimmed.endsWith("}")) {
            return trimmed;
        }
        int open = trimmed.lastIndexOf('{');
        return open > 0 ? trimmed.substring(0, open) : trimmed;
    }

    static String unescape(String value) {
        if (value.indexOf('\\') < 0) {
            return value;
        }
        StringBuilder out = new StringBuilder(value.length());
        for (int i = 0; i < value.length(); i++) {
            char c = value.charAt(i);
            if (c == '\\' && i + 1 < value.length()) {
                char next = value.charAt(++i);
                out.append(switch (next) {
                    case 'n' -> '\n';
                    case 't' -> '\t';
                    case 'W' -> ' ';
                    default -> next;
                });
            } else {
                out.append(c);
            }
        }
        return out.toString();
    }
}
