package org.convgrid.cli;

import java.io.IOException;
import java.io.UncheckedIOException;
import org.convgrid.engine.error.ConvgridException;
import org.convgrid.grids.GridFileException;
import org.convgrid.grids.GridProblem;
import org.convgrid.output.OutputFormatException;
import org.convgrid.survey.IoMessages;
import org.convgrid.survey.RunSetupException;
import picocli.CommandLine.IExecutionExceptionHandler;
import picocli.CommandLine.ParseResult;
import picocli.CommandLine;

/**
 * Failures during a command: a clean message, a stack trace only with --verbose. Grid-file problems are printed one
 * per line as {@code file:line:column: message} (exit 2); usage and run-directory conflicts exit 2; I/O failures,
 * unreadable run files and engine errors exit 1.
 */
final class FailureHandler implements IExecutionExceptionHandler {

    @Override
    public int handleExecutionException(Exception ex, CommandLine cmd, ParseResult parseResult) {
        boolean verbose = parseResult.hasMatchedOption("--verbose")
                || (parseResult.subcommand() != null && parseResult.subcommand().hasMatchedOption("--verbose"));
        int code;
        if (ex instanceof GridFileException grid) {
            for (GridProblem problem : grid.problems()) {
                cmd.getErr().println(problem);
            }
            code = ExitCodes.USAGE;
        } else if (ex instanceof UsageException || ex instanceof RunSetupException) {
            cmd.getErr().println("convgrid: " + ex.getMessage());
            code = ExitCodes.USAGE;
        } else if (ex instanceof ConvgridException || ex instanceof OutputFormatException) {
            cmd.getErr().println("convgrid: " + ex.getMessage());
            code = ExitCodes.FAILURE;
        } else if (ex instanceof IOException io) {
            cmd.getErr().println("convgrid: " + IoMessages.reason(io));
            code = ExitCodes.FAILURE;
        } else if (ex instanceof UncheckedIOException io) {
            cmd.getErr().println("convgrid: " + IoMessages.reason(io.getCause()));
            code = ExitCodes.FAILURE;
        } else {
            cmd.getErr().println("convgrid: internal error: " + ex);
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
