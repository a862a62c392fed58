package org.congener.trainer.evaluation;

import java.nio.file.Path;

/** A problem in an input file, naming the file and the line (1-based; 0 when not tied to a line). */
public final class InputFileException extends RuntimeException {
    public InputFileException(Path file, long line, String problem) {
        super(file + (line > 0 ? ":" + line : "") + ": " + problem);
    }
}
