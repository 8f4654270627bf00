package org.convgrid.cli;

import java.io.PrintWriter;
import java.util.List;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * Entry point of the {@code convgrid} command. The subcommands are registered when the command line is built rather
 * than named in the annotation, so that a process running one of them builds picocli's model of that one only.
 */
@Command(name = "convgrid", mixinStandardHelpOptions = true, versionProvider = ToolVersion.class,
        description = {"Where convection operates inside pre-main-sequence and main-sequence stars, across a grid "
                + "of mass, metallicity and age.",
            "Ages count from birth by default, so young ages cover the pre-main sequence (the contraction to the "
                + "zero-age main sequence) as well as the main sequence; 'origin: zams' in a grid file or "
                + "'star --age-origin zams' counts them from the zero-age main sequence instead."})
public final class ConvgridMain implements Runnable {

    /** The subcommands, in the order the usage lists them. */
    static final List<Class<?>> SUBCOMMANDS = List.of(
            CalibrateSunCommand.class,
            CheckCommand.class,
            RunCommand.class,
            MergeCommand.class,
            PlotCommand.class,
            ProbeCommand.class,
            StarCommand.class,
            TransitionsCommand.class);

    @Option(names = "--verbose", scope = CommandLine.ScopeType.INHERIT,
            description = "Print stack traces with error messages.")
    boolean verbose;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    private final CommandContext context;

    ConvgridMain(CommandContext context) {
        this.context = context;
    }

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** What the subcommands take from the world (solver seam, finishers, environment). */
    CommandContext context() {
        return context;
    }

    /** Standard output of the command line (the results). */
    PrintWriter out() {
        return spec.commandLine().getOut();
    }

    /** Error output of the command line (messages, progress). */
    PrintWriter err() {
        return spec.commandLine().getErr();
    }

    /** Builds the command line with convgrid's error handling and the production context; used by {@link #main}. */
    public static CommandLine commandLine(PrintWriter out, PrintWriter err) {
        return commandLine(out, err, CommandContext.production());
    }

    /**
     * Builds the command line with convgrid's error handling and the given context (tests inject fakes here), with
     * every subcommand.
     */
    public static CommandLine commandLine(PrintWriter out, PrintWriter err, CommandContext context) {
        CommandLine cli = withSubcommands(SUBCOMMANDS, context);
        // `convgrid help star` as well as `convgrid star --help`; listed last in the usage
        cli.addSubcommand(CommandLine.HelpCommand.class);
        return configured(cli, out, err);
    }

    /**
     * The command line that will run {@code args}: when the first argument names a subcommand, only that one is
     * registered (picocli reads every option of every registered command by reflection, about a fifth of a second
     * in a fresh JVM for all eight); otherwise, for the usage, a mistyped name or options before the subcommand,
     * every one. A registered subcommand behaves as it does among all of them.
     */
    public static CommandLine commandLine(PrintWriter out, PrintWriter err, CommandContext context, String... args) {
        if (args.length > 0) {
            for (Class<?> command : SUBCOMMANDS) {
                if (command.getAnnotation(Command.class).name().equals(args[0])) {
                    return configured(withSubcommands(List.of(command), context), out, err);
                }
            }
        }
        return commandLine(out, err, context);
    }

    private static CommandLine withSubcommands(List<Class<?>> subcommands, CommandContext context) {
        CommandLine cli = new CommandLine(new ConvgridMain(context));
        for (Class<?> command : subcommands) {
            cli.addSubcommand(command);
        }
        return cli;
    }

    /** Settings for the whole hierarchy, so they come after the subcommands (picocli applies them to those present). */
    private static CommandLine configured(CommandLine cli, PrintWriter out, PrintWriter err) {
        cli.setOut(out);
        cli.setErr(err);
        cli.setCaseInsensitiveEnumValuesAllowed(true);
        cli.registerConverter(java.nio.file.Path.class, ConvgridMain::path);
        cli.setParameterExceptionHandler(new UsageErrorHandler());
        cli.setExecutionExceptionHandler(new FailureHandler());
        return cli;
    }

    /** A path typed on the command line; an unusable one is refused with words rather than the JDK's. */
    private static java.nio.file.Path path(String text) {
        if (text.isEmpty()) {
            throw new CommandLine.TypeConversionException("an empty path");
        }
        try {
            return java.nio.file.Path.of(text);
        } catch (java.nio.file.InvalidPathException e) {
            throw new CommandLine.TypeConversionException(UnusablePath.reason(text,
                    System.getProperty("sun.jnu.encoding"), System.getenv()));
        }
    }

    public static void main(String[] args) {
        PrintWriter out = new PrintWriter(System.out, true);
        PrintWriter err = new PrintWriter(System.err, true);
        System.exit(commandLine(out, err, CommandContext.production(), args).execute(args));
    }
}
