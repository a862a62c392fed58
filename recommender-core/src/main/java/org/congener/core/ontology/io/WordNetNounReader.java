package org.congener.core.ontology.io;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;

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
        Cursor cursor = new Cursor(Files.readAllBytes(dataNoun));
        GrowableIntArray offsets = new GrowableIntArray(1 << 17);
        GrowableIntArray edgeChild = new GrowableIntArray(1 << 17);
        GrowableIntArray edgeParentOffset = new GrowableIntArray(1 << 17);
        GrowableIntArray edgeLine = new GrowableIntArray(1 << 17);
        OntologyBuilder builder = new OntologyBuilder(1 << 17);
        // lemma strings are made on the first look-up, from these positions in the file's bytes
        GrowableIntArray lemmaStart = new GrowableIntArray(1 << 18);
        GrowableIntArray lemmaEnd = new GrowableIntArray(1 << 18);
        GrowableIntArray lemmaTerms = new GrowableIntArray(1 << 18);
        int lineNumber = 0;
        while (cursor.hasMore()) {
            lineNumber++;
            if (cursor.peek() == ' ') {
                cursor.skipLine();
                continue;
            }
            int offsetStart = cursor.position();
            int offset = cursor.decimalNumber();
            String offsetText = cursor.textFrom(offsetStart);
            cursor.skipToken(); // lex_filenum
            cursor.skipToken(); // ss_type
            int wordCount = cursor.hexNumber();
            String firstLemma = null;
            int term = builder.termCount();
            for (int w = 0; w < wordCount; w++) {
                cursor.skipSpacesBeforeToken();
                int start = cursor.position();
                cursor.skipToken();
                if (firstLemma == null) {
                    firstLemma = cursor.textFrom(start);
                }
                lemmaStart.add(start);
                lemmaEnd.add(cursor.position());
                lemmaTerms.add(term);
                cursor.skipToken(); // lex_id
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
        return new WordNetNouns(builder.build(), cursor.bytes(), lemmaStart.toArray(), lemmaEnd.toArray(),
                lemmaTerms.toArray());
    }

    /** Space-separated tokens of the file's bytes, one line at a time. */
    private static final class Cursor {
        private final byte[] bytes;
        // the same bytes as a Latin-1 string, whose indexOf finds line ends with vector instructions
        private final String text;
        private final int length;
        private int position;

        Cursor(byte[] bytes) {
            this.bytes = bytes;
            this.text = new String(bytes, StandardCharsets.ISO_8859_1);
            this.length = bytes.length;
        }

        boolean hasMore() {
            return position < length;
        }

        byte peek() {
            return bytes[position];
        }

        int position() {
            return position;
        }

        byte[] bytes() {
            return bytes;
        }

        void skipSpacesBeforeToken() {
            skipSpaces();
        }

        String textFrom(int start) {
            return new String(bytes, start, position - start, StandardCharsets.ISO_8859_1);
        }

        String token() {
            skipSpaces();
            int start = position;
            skipWord();
            return textFrom(start);
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
            return bytes[start] == '@' && (size == 1 || (size == 2 && bytes[start + 1] == 'i'));
        }

        boolean isNounPos() {
            skipSpaces();
            int start = position;
            skipWord();
            return position - start == 1 && bytes[start] == 'n';
        }

        int decimalNumber() {
            skipSpaces();
            int start = position;
            int value = 0;
            while (position < length && bytes[position] >= '0' && bytes[position] <= '9') {
                value = value * 10 + (bytes[position++] - '0');
            }
            return checkedEnd(start, value);
        }

        int hexNumber() {
            skipSpaces();
            int start = position;
            int value = 0;
            while (position < length) {
                int digit = Character.digit(bytes[position], 16);
                if (digit < 0) {
                    break;
                }
                value = value * 16 + digit;
                position++;
            }
            return checkedEnd(start, value);
        }

        private int checkedEnd(int start, int value) {
            if (position == start || (position < length && bytes[position] != ' ' && bytes[position] != '\n')) {
                throw new OntologyFormatException(0, null, "expected a number at byte " + start + " of data.noun");
            }
            return value;
        }

        private void skipSpaces() {
            while (position < length && bytes[position] == ' ') {
                position++;
            }
        }

        private void skipWord() {
            while (position < length && bytes[position] != ' ' && bytes[position] != '\n') {
                position++;
            }
        }

        void skipLine() {
            int end = text.indexOf('\n', position);
            position = end < 0 ? length : end + 1;
        }
    }
}
