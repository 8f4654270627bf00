package org.convgrid.output;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;

/**
 * A run-directory file whose content cannot be read back ({@link ErrorKind#BAD_DATA}); the message names the file
 * part, row and column. A run directory of an earlier format is a {@link ErrorKind#RUN_CONFLICT} instead: the user
 * pointed at it, nothing is broken.
 */
public final class OutputFormatException extends ConvgridException {

    private static final long serialVersionUID = 1L;

    public OutputFormatException(String message) {
        super(ErrorKind.BAD_DATA, message);
    }

    private OutputFormatException(ErrorKind kind, String message) {
        super(kind, message);
    }

    /** A run directory this version does not read because an earlier one wrote it. */
    public static OutputFormatException earlierRunDirectory(String message) {
        return new OutputFormatException(ErrorKind.RUN_CONFLICT, message);
    }

    public OutputFormatException(String message, Throwable cause) {
        super(ErrorKind.BAD_DATA, message, cause);
    }
}
