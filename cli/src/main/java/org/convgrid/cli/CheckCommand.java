package org.convgrid.cli;

import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.convgrid.cli.run.GridSummary;
import org.convgrid.cli.run.RefinementEstimate;
import org.convgrid.cli.run.RunTimeEstimate;
import org.convgrid.grids.GridFile;
import org.convgrid.output.manifest.RunManifest;
import org.convgrid.survey.RunDirectory;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;

/** {@code convgrid check GRID.yaml}: validates a grid file and describes what it would run; computes nothing. */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = {"Validate a grid file without computing anything: every key known (misspelt or renamed keys "
                + "are named), every value of the right type and within its range (masses, Z, Y with Y + Z < 1, "
                + "ages and their origin, physics options), the opacity table and preset files it names readable, "
                + "and the run directory writable. Masses, Z and ages from birth outside the range convgrid is tested "
                + "in get a warning on stderr, not an error.",
            "Then prints the grid's axes, how many models it expands to and rough run times of the sweep and of the "
                + "transition refinement. Problems are printed one per line, all at once, as file:line:column: message "
                + "(exit code 2)."})
final class CheckCommand implements Callable<Integer> {

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
        // the same refusal as 'run' gives, so a grid that passes check does not fail at the start of run
        OutputTargets.requireWritableDirectory("the run directory (output dir)", runDir);
        TestedRange.print(TestedRange.warnings(file.spec()), parent.err());
        TestedRange.print(OvershootAdvice.warnings(file.spec()), parent.err());
        TestedRange.print(LongLivedStarsAdvice.warnings(file.spec()), parent.err());
        Optional<RunManifest> earlier = new RunDirectory(runDir).measuredRun();
        RunTimeEstimate estimate = earlier.isPresent()
                ? RunTimeEstimate.measured(file.spec(), earlier.get().medianSecondsPerModel(), n, runDir.toString())
                : RunTimeEstimate.assumed(file.spec(), n);
        // the refinement's count only carries over from a finished run of these very models
        RefinementEstimate refinement = earlier.isPresent() && earlier.get().finished() != null
                && earlier.get().gridModelsSha256().equals(file.modelsSha256())
                ? RefinementEstimate.measured(file.spec(), earlier.get().total(), n, runDir.toString())
                : RefinementEstimate.assumed(file.spec(), n);
        for (String line : GridSummary.lines(file, estimate, refinement, n, runDir.toString())) {
            parent.out().println(line);
        }
        parent.out().flush();
        return ExitCodes.OK;
    }
}
