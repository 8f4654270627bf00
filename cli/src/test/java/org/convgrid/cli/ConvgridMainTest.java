package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/** The command line built for one subcommand behaves as the one built with all of them. */
class ConvgridMainTest {

    @TempDir
    Path dir;

    private record Result(int code, String out, String err) {
    }

    private CommandContext context() {
        return new CommandContext(grid -> FakeChunkSolver.fast(), List.of(), Map.of(), dir, false,
                new FakeMassLines(Set.of()));
    }

    private Result run(boolean forArguments, String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cli = forArguments
                ? ConvgridMain.commandLine(new PrintWriter(out), new PrintWriter(err), context(), args)
                : ConvgridMain.commandLine(new PrintWriter(out), new PrintWriter(err), context());
        int code = cli.execute(args);
        // stack frames (printed with --verbose) name the line of this test that called run: not compared
        String messages = err.toString().lines().filter(l -> !l.strip().startsWith("at "))
                .collect(java.util.stream.Collectors.joining("\n"));
        return new Result(code, out.toString(), messages);
    }

    @Test
    void aNamedSubcommandIsTheOnlyOneBuilt() {
        CommandLine cli = ConvgridMain.commandLine(new PrintWriter(new StringWriter()),
                new PrintWriter(new StringWriter()), context(), "star", "--mass", "1");
        assertThat(cli.getSubcommands().keySet()).containsExactly("star");
        CommandLine all = ConvgridMain.commandLine(new PrintWriter(new StringWriter()),
                new PrintWriter(new StringWriter()), context(), "--verbose", "star");
        assertThat(all.getSubcommands().keySet()).containsExactly("calibrate-sun", "check", "run", "merge", "plot",
                "probe", "star", "transitions", "help");
    }

    @Test
    void helpNamesASubcommandAsItsOwnHelpOptionDoes() {
        // `convgrid help star` complained that --mass was missing
        Result help = run(true, "help", "star");
        assertThat(help.code()).as(help.err()).isZero();
        assertThat(help.out()).isEqualTo(run(true, "star", "--help").out());
        assertThat(run(true, "help").out()).contains("calibrate-sun", "transitions");
    }

    @Test
    void everySubcommandsHelpIsTheSameBuiltAloneOrAmongAll() {
        for (Class<?> command : ConvgridMain.SUBCOMMANDS) {
            String name = command.getAnnotation(CommandLine.Command.class).name();
            Result alone = run(true, name, "--help");
            assertThat(alone.code()).as(name).isZero();
            assertThat(alone).as(name).isEqualTo(run(false, name, "--help"));
            // the option inherited from the top command reaches a subcommand registered alone
            assertThat(alone.out()).as(name).contains("--verbose");
        }
    }

    @Test
    void usageMistypedNamesAndBadOptionsAnswerAsBefore() throws Exception {
        List<String[]> cases = List.of(
                new String[] {"--help"},
                new String[] {},
                new String[] {"stra", "--mass", "1"},
                new String[] {"star", "--mass", "-1", "--z", "0.02"},
                new String[] {"star", "--mass", "1", "--z", "0.02", "--bogus"},
                new String[] {"--verbose", "check", "missing.yaml"},
                new String[] {"check", "missing.yaml", "--verbose"},
                new String[] {"probe", "--temp-k", "1e7", "--density-cgs", "100", "--x", "0.7", "--z", "0.02"});
        for (String[] args : cases) {
            Result alone = run(true, args);
            assertThat(alone).as(String.join(" ", args)).isEqualTo(run(false, args));
        }
        assertThat(run(true, "--help").out()).contains("calibrate-sun", "check", "run", "merge", "plot", "probe",
                "star", "transitions");
        assertThat(run(true, "stra").code()).isEqualTo(ExitCodes.USAGE);
        Result verbose = run(true, "--verbose", "check", "missing.yaml");
        assertThat(verbose.code()).isEqualTo(ExitCodes.USAGE);
        assertThat(verbose.err()).contains("not found", "UsageException");
        assertThat(run(true, "check", "missing.yaml", "--verbose").err()).contains("UsageException");
    }
}
