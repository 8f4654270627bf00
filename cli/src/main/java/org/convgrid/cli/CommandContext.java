package org.convgrid.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.convgrid.engine.refine.MassLineFactory;
import org.convgrid.plotting.style.ChartFiles;
import org.convgrid.survey.ChunkSolverFactory;
import org.convgrid.survey.MapsAndReport;
import org.convgrid.survey.ProductionSolvers;
import org.convgrid.survey.RunFinisher;
import org.convgrid.survey.refine.SolverMassLines;

/**
 * What the commands take from the world, gathered so tests can replace it: the solver seams (grid runs, refinement), the finishers run at
 * the end of {@code run} and {@code merge}, the environment (Slurm variables), the directory relative paths are
 * resolved against, and whether the error stream is a terminal (progress redrawn in place).
 *
 * @param solvers makes the chunk solver of a grid
 * @param finishers last steps after a run directory is complete, in order
 * @param environment process environment variables
 * @param workingDirectory absolute directory that relative paths are resolved against
 * @param terminal whether progress may redraw one line in place
 * @param lines opens the mass lines {@code transitions --refine} computes its new models on
 */
public record CommandContext(ChunkSolverFactory solvers, List<RunFinisher> finishers, Map<String, String> environment,
                             Path workingDirectory, boolean terminal, MassLineFactory lines) {

    public CommandContext {
        finishers = List.copyOf(finishers);
        environment = Map.copyOf(environment);
        workingDirectory = workingDirectory.toAbsolutePath();
        Objects.requireNonNull(lines, "lines");
    }

    /** A context whose refinement uses the production solver. */
    public CommandContext(ChunkSolverFactory solvers, List<RunFinisher> finishers, Map<String, String> environment,
                          Path workingDirectory, boolean terminal) {
        this(solvers, finishers, environment, workingDirectory, terminal, SolverMassLines.production());
    }

    /** The real process: production solver, maps and report at the end, the process environment and directory. */
    public static CommandContext production() {
        return new CommandContext(ProductionSolvers.factory(),
                List.of(new MapsAndReport(EnumSet.noneOf(ChartFiles.VectorFormat.class),
                        warning -> System.err.println("convgrid: warning: " + warning))), System.getenv(),
                Path.of("").toAbsolutePath(), System.console() != null);
    }

    public CommandContext withSolvers(ChunkSolverFactory newSolvers) {
        return new CommandContext(newSolvers, finishers, environment, workingDirectory, terminal, lines);
    }

    public CommandContext withLines(MassLineFactory newLines) {
        return new CommandContext(solvers, finishers, environment, workingDirectory, terminal, newLines);
    }

    /** The same context with one more finisher at the end of the list. */
    public CommandContext withFinisher(RunFinisher finisher) {
        List<RunFinisher> all = new ArrayList<>(finishers);
        all.add(finisher);
        return new CommandContext(solvers, all, environment, workingDirectory, terminal, lines);
    }

    public CommandContext withEnvironment(Map<String, String> newEnvironment) {
        return new CommandContext(solvers, finishers, newEnvironment, workingDirectory, terminal, lines);
    }

    public CommandContext withWorkingDirectory(Path directory) {
        return new CommandContext(solvers, finishers, environment, directory, terminal, lines);
    }

    /** A path from the command line, relative ones taken from {@link #workingDirectory}. */
    Path resolve(Path path) {
        return workingDirectory.resolve(path).normalize();
    }
}
