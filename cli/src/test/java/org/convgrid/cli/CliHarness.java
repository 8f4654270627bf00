package org.convgrid.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

/** Runs convgrid commands in this JVM with a fake solver, capturing both streams. */
final class CliHarness {

    /** Lines before the first catalogue row: the ECSV header and the column-name row. */
    static final int CATALOGUE_HEADER_LINES =
            (int) org.convgrid.output.catalogue.CatalogueWriter.ecsvHeader().lines().count() + 1;

    /** The lines of a catalogue without its ECSV header: the column-name row, then the rows. */
    static java.util.List<String> tableLines(java.nio.file.Path catalogue) throws java.io.IOException {
        return java.nio.file.Files.readAllLines(catalogue).stream().filter(l -> !l.startsWith("#")).toList();
    }

    /** 2 metallicities x 39 masses x 2 ages = 156 models, 10 chunks of up to 8 masses. */
    static final String GRID = """
            title: Test survey
            mass:
              from: 0.1
              to: 2.0
              step: 0.05
            metallicity:
              z: [0.004, 0.02]
              helium:
                primordial: 0.2485
                enrichment: 1.5
            age:
              gyr: [0, 2.0]
              origin: zams
            physics:
              mixing_length: 1.8
            output:
              dir: runs/test-survey
            """;
    static final long GRID_MODELS = 156;

    /** What one command did. */
    record Execution(int code, String out, String err) {
    }

    private final CommandContext context;

    CliHarness(CommandContext context) {
        this.context = context;
    }

    /**
     * A harness whose relative paths start at {@code workDir}, with the given solver, refinement lines of the same
     * made-up structure ({@link FakeMassLines}) and no Slurm variables.
     */
    static CliHarness in(Path workDir, FakeChunkSolver solver) {
        // a fake world refines on fake lines too: the production lines would evolve real stars beside fake ones
        return new CliHarness(new CommandContext(grid -> solver, List.of(), Map.of(), workDir, false,
                new FakeMassLines(java.util.Set.of())));
    }

    /**
     * A harness whose relative paths start at {@code workDir}, with the production solvers and refinement lines (real
     * stars), no chart or report finishers and no Slurm variables.
     */
    static CliHarness real(Path workDir) {
        return new CliHarness(new CommandContext(org.convgrid.survey.ProductionSolvers.factory(), List.of(), Map.of(),
                workDir, false));
    }

    CliHarness with(CommandContext newContext) {
        return new CliHarness(newContext);
    }

    CommandContext context() {
        return context;
    }

    Execution execute(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        // built as main builds it, with the named subcommand alone
        int code = ConvgridMain.commandLine(new PrintWriter(out), new PrintWriter(err), context, args).execute(args);
        return new Execution(code, out.toString(), err.toString());
    }

    static Path writeGrid(Path dir, String name, String text) throws IOException {
        Files.createDirectories(dir);
        return Files.writeString(dir.resolve(name), text);
    }
}
