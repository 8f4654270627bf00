package org.convgrid.grids;

import java.util.Objects;

/**
 * One problem found in a grid file.
 *
 * @param file the file name as given to the reader
 * @param line 1-based line
 * @param column 1-based column
 * @param kind what is wrong, for programs
 * @param message what is wrong, with the offending value and the allowed range
 */
public record GridProblem(String file, int line, int column, GridProblemKind kind, String message) {

    public GridProblem {
        Objects.requireNonNull(file, "file");
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(message, "message");
        if (line < 1 || column < 1) {
            throw new IllegalArgumentException("line and column are 1-based, got " + line + ":" + column);
        }
    }

    /** The compiler-style form {@code file:line:column: message}. */
    @Override
    public String toString() {
        return file + ":" + line + ":" + column + ": " + message;
    }
}
