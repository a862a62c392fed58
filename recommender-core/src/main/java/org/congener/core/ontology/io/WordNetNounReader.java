package org.congener.core.ontology.io;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Locale;

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
 * <p>The file is read into memory (15 MB for WordNet 3.0) and tokenised without regular expressions; the glosses,
 * most of the bytes, are jumped over to the end of the line.
 */
public final class WordNetNounReader {
    /** Where Debian's {@code wordnet-base} package installs the noun database. */
    public static final Path DEBIAN_DATA_NOUN = Path.of("/usr/share/wordnet/data.noun");

    public WordNetNouns read(Path dataNoun) throws IOException {
        // Latin-1 strings keep one byte per char, and String.indexOf finds line ends with vector instructions
        String text = new String(Files.readAllBytes(dataNoun), StandardCharsets.ISO_8859_1);
        Cursor cursor = new Cursor(text);
        GrowableIntArray offsets = new GrowableIntArray(1 << 17);
        GrowableIntArray edgeChild = new GrowableIntArray(1 << 17);
        GrowableIntArray edgeParentOffset = new GrowableIntArray(1 << 17);
        GrowableIntArray edgeLine = new GrowableIntArray(1 << 17);
        OntologyBuilder builder = new OntologyBuilder();
        java.util.ArrayList<String> lemmas = new java.util.ArrayList<>(1 << 18);
        GrowableIntArray lemmaTerms = new GrowableIntArray(1 << 18);
        int lineNumber = 0;
        while (cursor.hasMore()) {
            lineNumber++;
            if (cursor.peek() == ' ') {
                cursor.skipLine();
                continue;
            }
            String offsetText = cursor.token();
            int offset = parseDecimal(offsetText, lineNumber);
            cursor.skipToken(); // lex_filenum
            cursor.skipToken(); // ss_type
            int wordCount = cursor.hexNumber();
            String firstLemma = null;
            int term = builder.termCount();
            for (int w = 0; w < wordCount; w++) {
                String lemma = cursor.token();
                cursor.skipToken(); // lex_id
                if (firstLemma == null) {
                    firstLemma = lemma;
                }
                lemmas.add(lowerCase(lemma));
                lemmaTerms.add(term);
            }
            builder.addTerm(offsetText, firstLemma, lineNumber);
            offsets.add(offset);
            int pointerCount = cursor.decimalNumber();
            for (int p = 0; p < pointerCount; p++) {
                boolean isA = cursor.isHypernymSymbol();
                int target = cursor.decimalNumber();
                boolean noun = cursor.isNounPos();
                cursor.skipToken(); // source/target
                if (isA && noun) {
                    edgeChild.add(term);
                    edgeParentOffset.add(target);
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
        return new WordNetNouns(builder.build(), lemmas.toArray(new String[0]), lemmaTerms.toArray());
    }

    private static String lowerCase(String lemma) {
        for (int i = 0; i < lemma.length(); i++) {
            if (Character.isUpperCase(lemma.charAt(i))) {
                return lemma.toLowerCase(Locale.ROOT);
            }
        }
        return lemma;
    }

    private static int parseDecimal(String text, int line) {
        try {
            return Integer.parseInt(text);
        } catch (NumberFormatException e) {
            throw new OntologyFormatException(line, null, "expected a decimal number, found '" + text + "'");
        }
    }

    /** Space-separated tokens of a text, one line at a time. */
    private static final class Cursor {
        private final String text;
        private final int length;
        private int position;

        Cursor(String text) {
            this.text = text;
            this.length = text.length();
        }

        boolean hasMore() {
            return position < length;
        }

        char peek() {
            return text.charAt(position);
        }

        String token() {
            skipSpaces();
            int start = position;
            skipWord();
            return text.substring(start, position);
        }

        void skipToken() {
            skipSpaces();
            skipWord();
        }

        /** Reads {@code @} or {@code @i} (true) or any other pointer symbol (false). */
        boolean isHypernymSymbol() {
            skipSpaces();
            int start = position;
            skipWord();
            int size = position - start;
            return text.charAt(start) == '@' && (size == 1 || (size == 2 && text.charAt(start + 1) == 'i'));
        }

        boolean isNounPos() {
            skipSpaces();
            int start = position;
            skipWord();
            return position - start == 1 && text.charAt(start) == 'n';
        }

        int decimalNumber() {
            return number(10);
        }

        int hexNumber() {
            return number(16);
        }

        private int number(int radix) {
            skipSpaces();
            int value = 0;
            int start = position;
            while (position < length) {
                char c = text.charAt(position);
                if (c == ' ' || c == '\n') {
                    break;
                }
                int digit = Character.digit(c, radix);
                if (digit < 0) {
                    throw new OntologyFormatException(0, null, "expected a number at character " + start);
                }
                value = value * radix + digit;
                position++;
            }
            if (position == start) {
                throw new OntologyFormatException(0, null, "expected a number at character " + start);
            }
            return value;
        }

        private void skipSpaces() {
            while (position < length && text.charAt(position) == ' ') {
                position++;
            }
        }

        private void skipWord() {
            while (position < length) {
                char c = text.charAt(position);
                if (c == ' ' || c == '\n') {
                    return;
                }
                position++;
            }
        }

        void skipLine() {
            int end = text.indexOf('\n', position);
            position = end < 0 ? length : end + 1;
        }
    }
}
