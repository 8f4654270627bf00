package org.convgrid.cli;

import org.convgrid.cli.run.TerminalText;
import picocli.CommandLine;
import picocli.CommandLine.IParameterExceptionHandler;
import picocli.CommandLine.ParameterException;

/** Bad usage: one line naming the problem and where to read more, exit code 2. */
final class UsageErrorHandler implements IParameterExceptionHandler {

    private static final String PICOCLI_PREFIX = "Error: ";

    @Override
    public int handleParseException(ParameterException ex, String[] args) {
        CommandLine cmd = ex.getCommandLine();
        // picocli starts the messages of option groups with "Error: ", which our "convgrid: " prefix already says
        String message = ex.getMessage().startsWith(PICOCLI_PREFIX)
                ? ex.getMessage().substring(PICOCLI_PREFIX.length()) : ex.getMessage();
        cmd.getErr().println("convgrid: " + TerminalText.clean(message) + " (see '"
                + cmd.getCommandSpec().qualifiedName() + " --help')");
        return ExitCodes.USAGE;
    }
}
