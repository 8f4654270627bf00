package org.convgrid.cli;

import java.io.PrintWriter;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** Entry point of the {@code convgrid} command. */
@Command(name = "convgrid", mixinStandardHelpOptions = true, versionProvider = ToolVersion.class,
        description = "Where convection operates inside main-sequence stars, across a grid of mass, "
                + "metallicity and age.",
        subcommands = {ProbeCommand.class})
public final class ConvgridMain implements Runnable {

    @Option(names = "--verbose", scope = CommandLine.ScopeType.INHERIT,
            description = "Print stack traces with error messages.")
    boolean verbose;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** Builds the command line with convgrid's error handling; used by {@link #main} and by tests. */
    public static CommandLine commandLine(PrintWriter out, PrintWriter err) {
        CommandLine cli = new CommandLine(new ConvgridMain());
        cli.setOut(out);
        cli.setErr(err);
        cli.setCaseInsensitiveEnumValuesAllowed(true);
        cli.setParameterExceptionHandler(new UsageErrorHandler());
        cli.setExecutionExceptionHandler(new FailureHandler());
        return cli;
    }

    public static void main(String[] args) {
        PrintWriter out = new PrintWriter(System.out, true);
        PrintWriter err = new PrintWriter(System.err, true);
        System.exit(commandLine(out, err).execute(args));
    }
}
