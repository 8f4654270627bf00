package org.convgrid.cli;

/** An argument that parses but makes no physical sense (negative density, X + Z &gt; 1): exit code 2. */
final class UsageException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    UsageException(String message) {
        super(message);
    }
}
