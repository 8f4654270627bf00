package org.convgrid.cli;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.ZoneOffset;
import java.util.concurrent.Callable;
import org.convgrid.grids.words.Counts;
import org.convgrid.grids.words.MessageNumbers;
import org.convgrid.plotting.label.SliceLabels;
import org.convgrid.cli.run.Durations;
import org.convgrid.cli.run.ProgressReporter;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.output.RunLayout;
import org.convgrid.survey.RunDirectory;
import org.convgrid.survey.RunLock;
import org.convgrid.survey.RunFinishing;
import org.convgrid.survey.refine.RefinementProgress;
import org.convgrid.survey.refine.TransitionRefiner;
import org.convgrid.survey.refine.TransitionTables;
import org.convgrid.output.transitions.TransitionFinder;
import org.convgrid.output.transitions.TransitionMethod;
import org.convgrid.output.transitions.TransitionRow;
import org.convgrid.survey.parallel.ParallelWork;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;

/** {@code convgrid transitions RUN_DIR [--refine]}: the transition masses of a run, refined on request. */
@Command(name = "transitions", mixinStandardHelpOptions = true,
        description = {"Rewrite RUN_DIR/transitions.csv from its catalogue and print it: per (Z, age, physics) slice "
                + "the highest fully convective mass (fully_convective_limit_msun), the lowest mass above which every "
                + "star of the slice has a convective core at its age (conv_core_onset_msun), each with the two "
                + "models that bracket it (*_bracket_lo_msun, *_bracket_hi_msun, solar masses), and the window of "
                + "small central cores just above the fully convective limit (transient_core_lo_msun, "
                + "transient_core_hi_msun; empty when none).",
            "A convective core is a central convective zone whose top lies above the run's core threshold, a mass "
                + "fraction m/M (" + TransitionFinder.DEFAULT_CORE_MASS_FRACTION_THRESHOLD + ", the one its "
                + "structure classes use; in manifest.yaml); "
                + "the convective criterion is the one the run used. When the structure changes back and forth with "
                + "mass, notes says how often. Coreless stars at the top of a slice with central hydrogen below "
                + TransitionFinder.RECEDED_CORE_CENTRAL_H + " are left out of the core search (their cores receded "
                + "as hydrogen ran out; notes names them).",
            "With --refine, each reported bracket wider than --tolerance is narrowed by bisection with new models at "
                + "every age: each new mass is the slice's own grid request (its composition, physics and age, "
                + "evolved as a grid model would be; zero-age models seeded by homology from their converged "
                + "neighbours), until the bracket is narrower than the tolerance (method refined, tolerance_msun); "
                + "the fully convective limit, the mass above which every star has a core, both edges of the "
                + "transient window and the main-sequence turn-off (turnoff_mass_msun, its side read off the "
                + "status past_main_sequence) are refined, other crossings only with --all-crossings; when new models reveal "
                + "crossings between earlier masses, further rounds refine them (at most "
                + TransitionTables.MAX_ROUNDS + "). The new models are appended to catalogue.ecsv with ids "
                + "p<i>-z<i>-r<n>-a<i> (r: refined, n counts per slice). A refined run cannot be resumed with 'run --resume'. Needs a finished, merged run.",
            "Exit codes: 0 done, 3 some new models failed (in the catalogue with their status; notes says where "
                + "a bisection stopped), 2 bad usage or not a run directory, 1 I/O or software failure."})
final class TransitionsCommand implements Callable<Integer> {

    /** Default width below which a refined bracket stops, solar masses. */
    static final double DEFAULT_TOLERANCE_MSUN = 0.002;

    @ParentCommand
    ConvgridMain parent;

    @Parameters(index = "0", paramLabel = "RUN_DIR", description = "A run directory (holds catalogue.ecsv).")
    Path runDirectory;

    @Option(names = "--refine", description = "Narrow the brackets by bisection with new models at each slice's age.")
    boolean refine;

    @Option(names = "--tolerance", paramLabel = "MSUN", description = "With --refine: stop when a bracket is "
            + "narrower than this (solar masses; default: the grid file's transitions tolerance_msun, "
            + DEFAULT_TOLERANCE_MSUN + " unless it says otherwise, so that finishing an interrupted or merged run "
            + "gives what a single run gives).")
    Double tolerance;

    @Option(names = "--all-crossings", description = "With --refine: when a slice's structure changes back and forth "
            + "with mass, refine every crossing, not only the one the table reports (more models).")
    boolean allCrossings;

    @Option(names = "--threads", paramLabel = "N",
            description = "With --refine: bisections run at once (count; default: available processors).")
    Integer threads;

    @Override
    public Integer call() throws Exception {
        CommandContext context = parent.context();
        if (tolerance != null && !(tolerance > 0.0 && Double.isFinite(tolerance))) {
            throw new UsageException("--tolerance must be a positive mass in Msun (got "
                    + MessageNumbers.format(tolerance) + ")");
        }
        // options that only steer the bisection mean nothing without it: said, not ignored (--tolerance
        // 0.01 without --refine had exited 0 and changed nothing)
        if (!refine && (tolerance != null || allCrossings || threads != null)) {
            throw new UsageException((tolerance != null ? "--tolerance" : allCrossings ? "--all-crossings"
                    : "--threads") + " steers the refinement: add --refine (without it the table is recomputed "
                    + "from the catalogue, no model computed)");
        }
        int n = RunCommand.threads(threads);
        RunDirectory dir = new RunDirectory(context.resolve(runDirectory));
        double gridTolerance = refine && tolerance == null ? TransitionTables.gridTolerance(dir) : Double.NaN;
        double width = tolerance != null ? tolerance
                : Double.isNaN(gridTolerance) ? DEFAULT_TOLERANCE_MSUN : gridTolerance;
        // the run's one core threshold, the one its structure classes were computed with
        TransitionFinder finder = TransitionFinder.withDefaults();
        long start = System.nanoTime();
        TransitionTables.Update update;
        if (refine) {
            // a missing directory is reported by the tables' reader; an existing one is owned for the refinement
            try (RunLock lock = java.nio.file.Files.isDirectory(dir.root()) ? RunLock.acquire(dir.root()) : null;
                 ParallelWork work = new ParallelWork(n)) {
                if (lock != null) {
                    Locks.reportStale(lock, parent.err());
                }
                // once the directory is ours: a run still going is refused by the lock, not told to resume
                UnfinishedRunWarning.printIfUnfinished(dir.layout(), parent.err());
                // the bisections can take minutes: count their new models on stderr as `run` does
                ProgressReporter reporter = new ProgressReporter(parent.err(), context.terminal(), System::nanoTime,
                        n, "new model");
                try {
                    update = TransitionTables.refine(dir, finder, new TransitionRefiner(context.lines(), finder,
                            width, work, allCrossings, new RefinementProgress(reporter)), context.finishers(),
                            Clock.tickSeconds(ZoneOffset.UTC));
                } finally {
                    // an error message then starts a line of its own
                    reporter.finish();
                }
            }
        } else {
            // recomputing rewrites transitions.csv: owned like a refinement
            try (RunLock lock = java.nio.file.Files.isDirectory(dir.root()) ? RunLock.acquire(dir.root()) : null) {
                if (lock != null) {
                    Locks.reportStale(lock, parent.err());
                }
                UnfinishedRunWarning.printIfUnfinished(dir.layout(), parent.err());
                update = TransitionTables.recompute(dir, finder, context.finishers());
            }
        }
        long refined = update.transitions().stream().filter(t -> t.method() == TransitionMethod.REFINED).count();
        // a new model past the main sequence is the turn-off's answer, not a failure
        long failed = update.added().stream().filter(o -> o.status() == ModelStatus.FAILED
                || o.status() == ModelStatus.NOT_CONVERGED).count();
        StringBuilder line = new StringBuilder(dir.transitions() + ": " + Counts.of(update.transitions().size(), "slice"));
        if (refine) {
            line.append(", ").append(refined).append(" refined; ").append(Counts.of(update.searches(), "bisection")).append(", ")
                    .append(Counts.of(update.added().size(), "new model")).append(" in ").append(RunLayout.CATALOGUE)
                    .append(failed > 0 ? " (" + failed + " failed or not converged)" : "").append(" in ")
                    .append(Durations.describe((System.nanoTime() - start) * 1e-9));
        }
        parent.out().println(line);
        parent.out().print(Files.readString(dir.transitions(), StandardCharsets.UTF_8));
        parent.out().flush();
        for (TransitionRow t : update.transitions()) {
            if (!t.notes().isEmpty() && refine) {
                parent.err().println("convgrid: Z = " + MessageNumbers.format(t.slice().zInit()) + ", "
                        + SliceLabels.age(t.slice().ageGyr()) + ": " + t.notes());
            }
        }
        parent.err().flush();
        return failed > 0 ? ExitCodes.SOME_MODELS_FAILED : ExitCodes.OK;
    }
}
