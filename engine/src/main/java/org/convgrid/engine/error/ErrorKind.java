package org.convgrid.engine.error;

/** The kinds of failure the engine reports; tests assert the kind and its parameters, not the message text. */
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
    BAD_DATA
}
