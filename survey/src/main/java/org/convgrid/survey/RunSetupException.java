package org.convgrid.survey;

/**
 * The arguments conflict with what is on disk (a run directory that already holds a catalogue, a resume against a
 * different grid, shards of different grids): a usage problem, exit code 2. Nothing has been written when it is
 * thrown.
 */
public final class RunSetupException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    public RunSetupException(String message) {
        super(message);
    }
}
