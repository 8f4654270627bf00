package org.convgrid.output;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;

/**
 * A run-directory file whose content cannot be read back ({@link ErrorKind#BAD_DATA}); the message names the file
 * part, row and column.
 */
public final class OutputFormatException extends ConvgridException {

    private static final long serialVersionUID = 1L;

    public OutputFormatException(String message) {
        super(ErrorKind.BAD_DATA, message);
    }

    public OutputFormatException(String message, Throwable cause) {
        super(ErrorKind.BAD_DATA, message, cause);
    }
}
