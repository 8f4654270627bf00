package org.convgrid.cli;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;

/**
 * An argument that parses but makes no physical sense (negative density, X + Z &gt; 1): {@link ErrorKind#BAD_USAGE},
 * exit code 2.
 */
final class UsageException extends ConvgridException {

    private static final long serialVersionUID = 1L;

    UsageException(String message) {
        super(ErrorKind.BAD_USAGE, message);
    }
}
