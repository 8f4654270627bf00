package org.convgrid.cli;

import org.convgrid.cli.run.TerminalText;
import java.io.IOException;
import java.io.UncheckedIOException;
import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.grids.GridFileException;
import org.convgrid.grids.GridProblem;
import org.convgrid.output.OutputFormatException;
import org.convgrid.survey.IoMessages;
import org.convgrid.survey.RunSetupException;
import picocli.CommandLine;
import picocli.CommandLine.IExecutionExceptionHandler;
import picocli.CommandLine.ParseResult;
import picocli.CommandLine;

/**
 * Failures during a command: a clean message, a stack trace only with --verbose. Every failure of ours is a
 * {@link ConvgridException} whose kind decides: grid-file problems are printed one per line as
 * {@code file:line:column: message}, and they, bad usage and run-directory conflicts exit 2; engine errors and
 * unreadable run files exit 1. I/O failures exit 1 with the reason.
 */
final class FailureHandler implements IExecutionExceptionHandler {

    @Override
    public int handleExecutionException(Exception ex, CommandLine cmd, ParseResult parseResult) {
        boolean verbose = parseResult.hasMatchedOption("--verbose")
                || (parseResult.subcommand() != null && parseResult.subcommand().hasMatchedOption("--verbose"));
        int code;
        if (ex instanceof ConvgridException failure) {
            // a grid file's message is already one "file:line:column: message" line per problem
            cmd.getErr().println(TerminalText.clean(failure.kind() == ErrorKind.BAD_GRID_FILE ? failure.getMessage()
                    : "convgrid: " + failure.getMessage()));
            code = failure.kind().isUsageError() ? ExitCodes.USAGE : ExitCodes.FAILURE;
        } else if (ex instanceof IOException || ex instanceof UncheckedIOException) {
            cmd.getErr().println("convgrid: " + TerminalText.clean(IoMessages.reason(ex instanceof IOException io ? io
                    : ((UncheckedIOException) ex).getCause())));
            code = ExitCodes.FAILURE;
        } else {
            // a software fault: no class name or raw message for the user, the trace with --verbose
            cmd.getErr().println("convgrid: internal error (a fault in convgrid, not in your input); please "
                    + "report it with the command line");
            if (!verbose) {
                cmd.getErr().println("(run again with --verbose for the stack trace)");
            }
            code = ExitCodes.FAILURE;
        }
        if (verbose) {
            ex.printStackTrace(cmd.getErr());
        }
        return code;
    }
}
