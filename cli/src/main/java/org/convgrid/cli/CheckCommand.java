package org.convgrid.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.convgrid.cli.run.GridSummary;
import org.convgrid.grids.GridFile;
import org.convgrid.output.OutputFormatException;
import org.convgrid.output.manifest.RunManifest;
import org.convgrid.output.manifest.RunManifestReader;
import org.convgrid.survey.RunDirectory;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;

/** {@code convgrid check GRID.yaml}: validates a grid file and describes what it would run; computes nothing. */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = {"Validate a grid file and print its axes, how many models it expands to and a rough run time.",
            "Runs nothing. Problems are printed as file:line:column: message (exit code 2)."})
final class CheckCommand implements Callable<Integer> {

    /** Seconds per model assumed when no earlier run says better: a rough guess, stated as such in the output. */
    static final double ASSUMED_SECONDS_PER_MODEL = 1.0;

    @ParentCommand
    ConvgridMain parent;

    @Parameters(index = "0", paramLabel = "GRID.yaml", description = "Grid file (YAML).")
    Path grid;

    @Option(names = "--threads", paramLabel = "N",
            description = "Worker threads the time estimate assumes (count; default: available processors).")
    Integer threads;

    @Override
    public Integer call() {
        CommandContext context = parent.context();
        int n = RunCommand.threads(threads);
        GridFile file = GridFiles.read(grid, context);
        Path runDir = context.resolve(Path.of(file.spec().outputDir()));
        double cost = ASSUMED_SECONDS_PER_MODEL;
        String source = "a rough default; a finished run records its own median";
        RunManifest earlier = earlierRun(runDir);
        if (earlier != null) {
            cost = earlier.medianSecondsPerModel();
            source = "median of the run in " + runDir;
        }
        for (String line : GridSummary.lines(file, cost, source, n, runDir.toString())) {
            parent.out().println(line);
        }
        parent.out().flush();
        return ExitCodes.OK;
    }

    /** The manifest of an earlier run of this grid with a measured median, or null. */
    private static RunManifest earlierRun(Path runDir) {
        Path manifest = new RunDirectory(runDir).manifest();
        try {
            if (Files.isRegularFile(manifest)) {
                RunManifest m = RunManifestReader.read(Files.readString(manifest));
                return Double.isFinite(m.medianSecondsPerModel()) && m.medianSecondsPerModel() > 0 ? m : null;
            }
        } catch (IOException | OutputFormatException e) {
            // an unreadable earlier manifest only means no measured cost: fall back to the default
        }
        return null;
    }
}
