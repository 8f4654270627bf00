package org.convgrid.engine.error;

/**
 * The kinds of failure convgrid reports, in the engine and around it; tests assert the kind and its parameters, not
 * the message text. The first kinds are the engine's own; the last ones belong to the modules around it (grid files,
 * run directories, the command line), which extend {@link ConvgridException} so that one root catches everything.
 */
public enum ErrorKind {
    /** A physical input outside its allowed range: parameters are name, value, lower and upper bound. */
    OUT_OF_RANGE,
    /** A composition whose mass fractions are negative or do not sum to one. */
    BAD_COMPOSITION,
    /** A request that falls outside a table: parameters are the table name and the coordinates. */
    OFF_TABLE,
    /** An iteration that did not converge within its budget. */
    NOT_CONVERGED,
    /** A file or resource whose content could not be understood. */
    BAD_DATA,
    /** A grid file with problems, each with its file, line, column and its own kind. */
    BAD_GRID_FILE,
    /** Arguments that parse but make no sense (a negative density, X + Z &gt; 1). */
    BAD_USAGE,
    /** Arguments that conflict with what is on disk (a run directory that already holds a catalogue...). */
    RUN_CONFLICT;

    /** Whether the user's input is at fault (bad arguments or grid file) rather than the software or the disk. */
    public boolean isUsageError() {
        return this == BAD_GRID_FILE || this == BAD_USAGE || this == RUN_CONFLICT;
    }
}
