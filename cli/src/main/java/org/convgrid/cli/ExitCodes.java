package org.convgrid.cli;

/** Process exit codes, fixed in the conventions. */
final class ExitCodes {
    /** All good. */
    static final int OK = 0;
    /** Software or I/O failure. */
    static final int FAILURE = 1;
    /** Bad usage or bad grid file. */
    static final int USAGE = 2;
    /** The run finished but some models failed. */
    static final int SOME_MODELS_FAILED = 3;
    /** Stopped by SIGINT or SIGTERM: 128 + SIGINT's number, what shells report for a Ctrl-C. */
    static final int INTERRUPTED = 130;

    private ExitCodes() {
    }
}
