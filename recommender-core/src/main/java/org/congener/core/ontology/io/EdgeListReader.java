package org.congener.core.ontology.io;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.congener.core.ontology.Ontology;
import org.congener.core.ontology.OntologyBuilder;
import org.congener.core.ontology.OntologyFormatException;

/**
 * Reads a taxonomy written as one {@code child<TAB>parent} pair per line. A line with a single id declares a
 * term without parents; blank lines and lines starting with {@code #} are skipped. Every id that appears is a
 * term, and its name is its id.
 */
public final class EdgeListReader {

    public Ontology read(Path file) throws IOException {
        try (BufferedReader reader = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            return read(reader);
        }
    }

    /** Reads from an open reader; the caller closes it. */
    public Ontology read(Reader source) throws IOException {
        OntologyBuilder builder = new OntologyBuilder();
        BufferedReader lines = source instanceof BufferedReader b ? b : new BufferedReader(source);
        String line;
        int number = 0;
        while ((line = lines.readLine()) != null) {
            number++;
            // strip the end only: a leading tab means an empty child field
            String content = line.stripTrailing();
            if (content.isBlank() || content.stripLeading().charAt(0) == '#') {
                continue;
            }
            int tab = content.indexOf('\t');
            if (tab < 0) {
                checkId(content, number, line);
                termOf(builder, content, number);
                continue;
            }
            String child = content.substring(0, tab).strip();
            String parent = content.substring(tab + 1).strip();
            if (parent.indexOf('\t') >= 0) {
                throw new OntologyFormatException(number, child,
                        "broken line, expected 'child<TAB>parent' but found more than two fields");
            }
            checkId(child, number, line);
            checkId(parent, number, line);
            int childIndex = termOf(builder, child, number);
            int parentIndex = termOf(builder, parent, number);
            builder.addEdge(childIndex, parentIndex, number);
        }
        return builder.build();
    }

    private static void checkId(String id, int number, String line) {
        if (id.isEmpty() || id.chars().anyMatch(Character::isWhitespace)) {
            throw new OntologyFormatException(number, null,
                    "broken line, expected 'child<TAB>parent': '" + line + "'");
        }
    }

    private static int termOf(OntologyBuilder builder, String id, int number) {
        int index = builder.indexOf(id);
        return index >= 0 ? index : builder.addTerm(id, id, number);
    }
}
