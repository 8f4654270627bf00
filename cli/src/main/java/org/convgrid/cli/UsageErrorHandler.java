package org.convgrid.cli;

import org.convgrid.cli.run.TerminalText;
import picocli.CommandLine;
import picocli.CommandLine.IParameterExceptionHandler;
import picocli.CommandLine.ParameterException;

/** Bad usage: one line naming the problem and where to read more, exit code 2. */
final class UsageErrorHandler implements IParameterExceptionHandler {

    @Override
    public int handleParseException(ParameterException ex, String[] args) {
        CommandLine cmd = ex.getCommandLine();
        cmd.getErr().println("convgrid: " + TerminalText.clean(ex.getMessage()) + " (see '" + cmd.getCommandSpec().qualifiedName()
                + " --help')");
        return ExitCodes.USAGE;
    }
}
