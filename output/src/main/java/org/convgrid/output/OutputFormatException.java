package org.convgrid.output;

/** A run-directory file whose content cannot be read back; the message names the file part, row and column. */
public final class OutputFormatException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    public OutputFormatException(String message) {
        super(message);
    }

    public OutputFormatException(String message, Throwable cause) {
        super(message, cause);
    }
}
