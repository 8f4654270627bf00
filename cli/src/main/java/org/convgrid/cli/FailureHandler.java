package org.convgrid.cli;

import org.convgrid.engine.error.ConvgridException;
import picocli.CommandLine;
import picocli.CommandLine.IExecutionExceptionHandler;
import picocli.CommandLine.ParseResult;

/** Failures during a command: a clean message, a stack trace only with --verbose. */
final class FailureHandler implements IExecutionExceptionHandler {

    @Override
    public int handleExecutionException(Exception ex, CommandLine cmd, ParseResult parseResult) {
        boolean verbose = parseResult.hasMatchedOption("--verbose")
                || (parseResult.subcommand() != null && parseResult.subcommand().hasMatchedOption("--verbose"));
        if (ex instanceof UsageException || ex instanceof ConvgridException) {
            cmd.getErr().println("convgrid: " + ex.getMessage());
            if (verbose) {
                ex.printStackTrace(cmd.getErr());
            }
            return ex instanceof UsageException ? ExitCodes.USAGE : ExitCodes.FAILURE;
        }
        cmd.getErr().println("convgrid: internal error: " + ex);
        if (verbose) {
            ex.printStackTrace(cmd.getErr());
        } else {
            cmd.getErr().println("(run again with --verbose for the stack trace)");
        }
        return ExitCodes.FAILURE;
    }
}
