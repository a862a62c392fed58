package org.congener.core.ontology;

/**
 * A file or graph that cannot be an ontology: a broken line, a duplicate or dangling id, a cycle. The message
 * names the line (when there is one) and the term, so that a user can fix the file.
 */
public final class OntologyFormatException extends RuntimeException {
    private final int line;
    private final String termId;

    /**
     * @param line   1-based line number in the source file, or 0 when the problem has no single line
     * @param termId the term concerned, or null when none is known yet
     */
    public OntologyFormatException(int line, String termId, String problem) {
        super(describe(line, termId, problem));
        this.line = line;
        this.termId = termId;
    }

    private static String describe(int line, String termId, String problem) {
        StringBuilder text = new StringBuilder();
        if (line > 0) {
            text.append("line ").append(line).append(": ");
        }
        if (termId != null) {
            text.append("term ").append(termId).append(": ");
        }
        return text.append(problem).toString();
    }

    /** 1-based line number, 0 when the problem spans no single line. */
    public int line() {
        return line;
    }

    /** The term concerned, or null. */
    public String termId() {
        return termId;
    }
}
