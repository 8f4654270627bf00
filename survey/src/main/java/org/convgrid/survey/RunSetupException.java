package org.convgrid.survey;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;

/**
 * The arguments conflict with what is on disk (a run directory that already holds a catalogue, a resume against a
 * different grid, shards of different grids): {@link ErrorKind#RUN_CONFLICT}, a usage problem, exit code 2. Nothing
 * has been written when it is thrown.
 */
public final class RunSetupException extends ConvgridException {

    private static final long serialVersionUID = 1L;

    public RunSetupException(String message) {
        super(ErrorKind.RUN_CONFLICT, message);
    }
}
