package org.congener.core.ontology.io;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.HashMap;
import java.util.Locale;
import java.util.Map;

import org.congener.core.ontology.GrowableIntArray;
import org.congener.core.ontology.Ontology;
import org.congener.core.ontology.OntologyBuilder;
import org.congener.core.ontology.OntologyFormatException;

/**
 * Reads WordNet's {@code data.noun} (format: {@code man 5 wndb}). Each data line is
 * {@code offset lex_filenum ss_type w_cnt (word lex_id)* p_cnt (pointer_symbol offset pos source/target)* | gloss};
 * hypernym ({@code @}) and instance hypernym ({@code @i}) pointers to nouns become is-a edges. Lines starting
 * with two spaces are the licence header.
 *
 * <p>The file is read into memory as bytes (15 MB for WordNet 3.0) and tokenised without regular expressions.
 */
public final class WordNetNounReader {
    /** Where Debian's {@code wordnet-base} package installs the noun database. */
    public static final Path DEBIAN_DATA_NOUN = Path.of("/usr/share/wordnet/data.noun");

    public WordNetNouns read(Path dataNoun) throws IOException {
        byte[] bytes = Files.readAllBytes(dataNoun);
        Cursor cursor = new Cursor(bytes);
        GrowableIntArray offsets = new GrowableIntArray(1 << 17);
        GrowableIntArray edgeChild = new GrowableIntArray(1 << 17);
        GrowableIntArray edgeParentOffset = new GrowableIntArray(1 << 17);
        GrowableIntArray edgeLine = new GrowableIntArray(1 << 17);
        OntologyBuilder builder = new OntologyBuilder();
        Map<String, GrowableIntArray> senses = new HashMap<>(1 << 18);
        int lineNumber = 0;
        while (cursor.hasMore()) {
            lineNumber++;
            if (cursor.peek() == ' ') {
                cursor.skipLine();
                continue;
            }
            String offsetText = cursor.token();
            int offset = parseDecimal(offsetText, lineNumber);
            cursor.token(); // lex_filenum
            cursor.token(); // ss_type
            int wordCount = Integer.parseInt(cursor.token(), 16);
            String firstLemma = null;
            int term = builder.termCount();
            for (int w = 0; w < wordCount; w++) {
                String lemma = cursor.token();
                cursor.token(); // lex_id
                if (firstLemma == null) {
                    firstLemma = lemma;
                }
                senses.computeIfAbsent(lemma.toLowerCase(Locale.ROOT), k -> new GrowableIntArray(2)).add(term);
            }
            builder.addTerm(offsetText, firstLemma, lineNumber);
            offsets.add(offset);
            int pointerCount = parseDecimal(cursor.token(), lineNumber);
            for (int p = 0; p < pointerCount; p++) {
                String symbol = cursor.token();
                String target = cursor.token();
                String pos = cursor.token();
                cursor.token(); // source/target
                if ((symbol.equals("@") || symbol.equals("@i")) && pos.equals("n")) {
                    edgeChild.add(term);
                    edgeParentOffset.add(parseDecimal(target, lineNumber));
                    edgeLine.add(lineNumber);
                }
            }
            cursor.skipLine();
        }
        int[] sortedOffsets = offsets.toArray();
        for (int i = 1; i < sortedOffsets.length; i++) {
            if (sortedOffsets[i] <= sortedOffsets[i - 1]) {
                throw new OntologyFormatException(0, null, "data.noun offsets are not ascending");
            }
        }
        for (int e = 0; e < edgeChild.size(); e++) {
            int parent = Arrays.binarySearch(sortedOffsets, edgeParentOffset.get(e));
            if (parent < 0) {
                throw new OntologyFormatException(edgeLine.get(e), null,
                        "dangling hypernym pointer to offset " + edgeParentOffset.get(e));
            }
            builder.addEdge(edgeChild.get(e), parent, edgeLine.get(e));
        }
        Map<String, int[]> sensesByLemma = new HashMap<>(senses.size() * 2);
        senses.forEach((lemma, list) -> sensesByLemma.put(lemma, list.toArray()));
        return new WordNetNouns(builder.build(), Map.copyOf(sensesByLemma));
    }

    private static int parseDecimal(String text, int line) {
        try {
            return Integer.parseInt(text);
        } catch (NumberFormatException e) {
            throw new OntologyFormatException(line, null, "expected a decimal number, found '" + text + "'");
        }
    }

    /** Space-separated tokens of a byte array, one line at a time. */
    private static final class Cursor {
        private final byte[] bytes;
        private int position;

        Cursor(byte[] bytes) {
            this.bytes = bytes;
        }

        boolean hasMore() {
            return position < bytes.length;
        }

        byte peek() {
            return bytes[position];
        }

        String token() {
            while (position < bytes.length && bytes[position] == ' ') {
                position++;
            }
            int start = position;
            while (position < bytes.length && bytes[position] != ' ' && bytes[position] != '\n') {
                position++;
            }
            return new String(bytes, start, position - start, StandardCharsets.ISO_8859_1);
        }

        void skipLine() {
            while (position < bytes.length && bytes[position] != '\n') {
                position++;
            }
            position++;
        }
    }
}
