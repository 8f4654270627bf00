package org.convgrid.cli;

import java.io.PrintWriter;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutionException;
import java.nio.file.Path;
import java.time.Clock;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.stream.Collectors;
import org.convgrid.cli.run.Durations;
import org.convgrid.cli.run.RefinementEstimate;
import org.convgrid.cli.run.RunTimeEstimate;
import org.convgrid.cli.run.ProgressReporter;
import org.convgrid.engine.batch.ChunkSolver;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.batch.ProgressListener;
import org.convgrid.engine.batch.Shard;
import org.convgrid.grids.GridFile;
import org.convgrid.grids.GridSpec;
import org.convgrid.grids.TransitionSettings;
import org.convgrid.output.RunLayout;
import org.convgrid.output.transitions.TransitionFinder;
import org.convgrid.survey.GridIronAbundance;
import org.convgrid.survey.GridRun;
import org.convgrid.survey.RunDirectory;
import org.convgrid.survey.RunFinishing;
import org.convgrid.survey.RunLock;
import org.convgrid.survey.StaleTemporaryFiles;
import org.convgrid.survey.ShardChoice;
import org.convgrid.survey.SweepInterruption;
import org.convgrid.survey.TrackFiles;
import org.convgrid.survey.parallel.ParallelWork;
import org.convgrid.survey.refine.RefinementProgress;
import org.convgrid.survey.ProfileFiles;
import org.convgrid.engine.batch.ModelSink;
import org.convgrid.engine.batch.StarTrackSink;
import org.convgrid.survey.refine.TransitionRefiner;
import org.convgrid.survey.refine.TransitionTables;
import org.convgrid.grids.words.MessageNumbers;
import org.convgrid.grids.words.Counts;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;

/** {@code convgrid run GRID.yaml}: sweeps a grid into a run directory, resumable and shardable. */
@Command(name = "run", mixinStandardHelpOptions = true,
        description = {"Compute every model of a grid and write a run directory: " + RunLayout.CATALOGUE + " (one "
                + "row per model, grown row by row in grid order), " + RunLayout.ZONES + " (one row per convective "
                + "zone), " + RunLayout.TRANSITIONS + " (transition masses per Z, age and physics), "
                + RunLayout.LIFE_EVENTS + " (ages from birth: when each star's life changes), " + RunLayout.TRACKS
                + "/ (one CSV per star evolved beyond age 0), " + RunLayout.PROFILES + "/ (one CSV per model, "
                + "with output: profiles: true), " + RunLayout.MAPS + "/ (PNG charts), " + RunLayout.REPORT
                + " (one page with the charts and tables) and " + RunLayout.MANIFEST + " (provenance).",
            "Exit codes: 0 all models ok, 3 some models failed or did not converge (they are in the catalogue with "
                + "their status), 2 bad grid file or usage, 1 I/O or software failure, 130 interrupted (Ctrl-C or "
                + "SIGTERM: the catalogue keeps its complete rows; continue with --resume)."})
final class RunCommand implements Callable<Integer> {

    /** Grids larger than this many models need --yes: a typo in a step can ask for days of computing. */
    static final long LARGE_GRID_MODELS = 100_000L;

    @ParentCommand
    ConvgridMain parent;

    @Parameters(index = "0", paramLabel = "GRID.yaml", description = "Grid file (YAML).")
    Path grid;

    @Option(names = "--out", paramLabel = "DIR", description = {"Run directory (path; default: the grid's output.dir, "
            + "relative to the current directory). Shard K of N writes to <DIR>-shard-K-of-N, DIR being --out or "
            + "output.dir, so every task of a job array can run the same command line."})
    Path out;

    @Option(names = "--threads", paramLabel = "N",
            description = "Worker threads (count; default: available processors).")
    Integer threads;

    @Option(names = "--shard", paramLabel = "K/N", description = {"Compute only share K of N of the grid (1-based; "
            + "default: from SLURM_ARRAY_TASK_ID/_COUNT/_MIN when set, else the whole grid). Join shards with merge."})
    String shard;

    @Option(names = "--resume", description = "Continue the run in the directory: keep its complete rows, compute "
            + "the missing ones (the grid's models must match its manifest).")
    boolean resume;

    @Option(names = "--force", description = "Start over in a directory that already holds a run. First removes "
            + "every file convgrid wrote there: catalogue.ecsv, zones.csv, transitions.csv, life_events.csv, "
            + "manifest.yaml, report.html, the track files in tracks/, the profiles in profiles/ (files named by a "
            + "track or model id, such as p0-z00-m000.csv), the charts in maps/ and the temporary files of writes "
            + "cut short (emptied folders go too), and says how many on stderr. Keeps the lock file "
            + RunLock.FILE_NAME + " and every file convgrid does not write. Without --force such a directory is "
            + "refused, and so is one holding files a run writes but no catalogue or manifest. Refuses a directory "
            + "holding another shard, or another grid's shard.")
    boolean force;

    @Option(names = "--no-refine", description = "Skip the refinement of the transition masses by bisection that "
            + "follows the sweep (the grid's transitions: refine: true, the default); the table then holds the values "
            + "read off the grid.")
    boolean noRefine;

    @Option(names = "--yes", description = "Allow grids of more than " + LARGE_GRID_MODELS + " models.")
    boolean yes;

    @Option(names = "--quiet", description = "No progress or start messages on stderr (errors still are).")
    boolean quiet;

    @Override
    public Integer call() throws Exception {
        CommandContext context = parent.context();
        // the solver's tables are read while the grid file is read and the run directory prepared
        context.solvers().readSharedDataAhead();
        int n = threads(threads);
        if (resume && force) {
            throw new UsageException("--resume and --force exclude each other");
        }
        GridFile file = GridFiles.read(grid, context);
        TestedRange.print(TestedRange.warnings(file.spec()), parent.err());
        TestedRange.print(OvershootAdvice.warnings(file.spec()), parent.err());
        TestedRange.print(LongLivedStarsAdvice.warnings(file.spec()), parent.err());
        long count = file.spec().count();
        if (count > LARGE_GRID_MODELS && !yes) {
            throw new UsageException("the grid asks for " + count + " models, more than " + LARGE_GRID_MODELS
                    + "; check it with 'convgrid check' and add --yes to run it");
        }
        Shard chosen = ShardChoice.choose(shard, context.environment()).orElse(null);
        Path given = context.resolve(out != null ? out : Path.of(file.spec().outputDir()));
        if (out != null && chosen != null && chosen.count() > 1 && given.getFileName() != null
                && context.workingDirectory().normalize().startsWith(given)) {
            // 'cd runs/grid && run --shard 1/2 --out .' would write beside it, to runs/grid-shard-1-of-2 (or above
            // the home directory, from there)
            throw new UsageException("--out " + out + " names the current directory or one above it, but a shard "
                    + "writes to <DIR>-shard-K-of-N beside DIR; name the directory, e.g. --out runs/"
                    + given.getFileName());
        }
        // a shard's directory is named for it whichever way the directory was given, so that one command line
        // serves every task of a job array
        RunDirectory dir = new RunDirectory(RunDirectory.forShard(given, chosen));
        OutputTargets.requireWritableDirectory("--out", dir.root());
        boolean evolves = file.spec().ages().evolves();
        // every catalogue row and life-events row goes through it, so that a signal stops the sweep between rows
        SweepInterruption interruption = new SweepInterruption();
        TrackFiles tracks = new TrackFiles(dir.layout(), GridIronAbundance.of(file.spec()), interruption);
        ProfileFiles profiles = file.spec().profiles()
                ? new ProfileFiles(dir.layout(), ToolVersion.current(), ToolVersion.commit()) : null;
        ChunkSolver solver = context.solvers().solverFor(file.spec(), evolves ? tracks : StarTrackSink.NONE,
                profiles != null ? profiles : ModelSink.NONE);
        Clock clock = Clock.tickSeconds(java.time.ZoneOffset.UTC);
        GridRun runner = new GridRun(ToolVersion.current(), ToolVersion.commit(), clock,
                context.solvers().writesTracks());
        // the plan the interrupt hook stops, once the directory is prepared (or why it could not be)
        CompletableFuture<GridRun.Plan> prepared = new CompletableFuture<>();
        try (RunLock lock = RunLock.acquire(dir.root());
             // installed before the directory is prepared: a signal while prepare wrote the start manifest ended the
             // JVM without a word (exit 130 and no line; by hand a SIGTERM 0.84 s after the start left
             // a manifest without a catalogue, exit 143, nothing said), and its hook waits for prepare to end
             RunInterruptHook hook = RunInterruptHook.install(() -> interrupted(runner, prepared, interruption, lock,
                     context.terminal() && !quiet), parent.err())) {
            Locks.reportStale(lock, parent.err());
            long start = System.nanoTime();
            boolean nothingToResume = resume && !dir.holdsRun();
            GridRun.Plan plan;
            int staleTemporaries;
            try {
                plan = runner.prepare(new GridRun.Settings(file, dir, n, chosen, resume, force));
                // before the interrupt hook may go on: its manifest rewrite goes through a temporary file that this
                // cleaning would otherwise take for a stale one
                staleTemporaries = StaleTemporaryFiles.remove(dir.layout(), StaleTemporaryFiles.Scope.RUN);
                prepared.complete(plan);
            } catch (Exception | Error e) {
                prepared.completeExceptionally(e);
                throw e;
            }
            PrintWriter err = parent.err();
            if (nothingToResume) {
                // said even with --quiet: a mistyped directory would otherwise cost the whole grid again unnoticed
                // (a job script that always adds --resume reads it once, on its first submission)
                err.println("convgrid: note: --resume found no run in " + dir.root() + "; starting a new one there");
                err.flush();
            }
            if (staleTemporaries > 0) {
                // said even with --quiet: files were deleted (only convgrid's own, half-written ones)
                err.println("convgrid: removed " + Counts.of(staleTemporaries, "temporary file") + " that interrupted "
                        + "writes had left in " + dir.root());
                err.flush();
            }
            if (plan.manifestRebuilt()) {
                // said even with --quiet: the manifest's first start time and measured cost are gone
                // the kept count is after the cut-back of stars lacking files (said next): before it, the rows were
                // more, and a catalogue of 68 rows read "0 rows"
                err.println("convgrid: note: " + dir.root() + " had no " + RunLayout.MANIFEST + "; its catalogue's "
                        + (plan.recomputedForMissingFiles() == null ? Counts.of(plan.kept().ids().size(), "row") + " are"
                        : "rows are") + " this grid's first models, so the resume wrote a new manifest (started now) "
                        + "and continues the run");
                err.flush();
            }
            if (plan.recomputedForMissingFiles() != null) {
                // said even with --quiet: rows the user had were dropped (to be computed again), and why
                err.println("convgrid: note: " + plan.recomputedForMissingFiles());
                err.flush();
            }
            if (plan.removedEarlierFiles() > 0) {
                // said even with --quiet: files were deleted, and the user should not learn it from a missing file
                err.println("convgrid: --force removed " + Counts.of(plan.removedEarlierFiles(), "file")
                        + " of the earlier run in " + dir.root());
                err.flush();
            }
            if (plan.shard().count() > 1 && plan.owned() == 0) {
                // said even with --quiet: a job array's task that computes nothing is a waste the user must see
                err.println("convgrid: warning: shard " + plan.shard().index() + "/" + plan.shard().count()
                        + " holds none of the grid's " + Counts.of(count, "model") + ": shards take blocks of up to "
                        + GridRun.MASSES_PER_CHUNK + " consecutive masses per metallicity and physics choice, so a "
                        + "grid this small needs fewer shards");
                err.flush();
            }
            ProgressReporter reporter = quiet ? null : new ProgressReporter(err, context.terminal(), System::nanoTime, n);
            if (!quiet) {
                err.println("convgrid: " + startLine(plan, count, n) + longRunNote(file.spec(), plan.remaining(), count, n));
                err.flush();
            }
            TransitionSettings transitions = file.spec().transitions();
            boolean refineNow = refinesNow(plan);
            GridRun.Result result;
            TransitionTables.Update refined = null;
            double sweepSeconds;
            try (ParallelWork work = new ParallelWork(n)) {
                result = runner.execute(plan, work, solver, reporter == null ? ProgressListener.NONE : reporter,
                        refineNow ? List.of() : context.finishers(), interruption,
                        evolves ? tracks : org.convgrid.survey.StarFiles.NONE);
                if (reporter != null) {
                    reporter.finish();
                }
                // the sweep's own time: the refinement's models are counted and timed on their own line below
                sweepSeconds = (System.nanoTime() - start) * 1e-9;
                if (refineNow) {
                    ProgressReporter refinementReporter = null;
                    if (!quiet) {
                        // the refinement can take longer than the sweep (the demo: 25 s after 14 s): say what is
                        // happening and roughly for how long, then count its new models as the sweep counts its own;
                        // a grid of one mass has no bracket, and its summary says "nothing to refine" alone
                        if (!oneMass(file.spec()) && !file.spec().ages().fractions()) {
                            err.println("convgrid: " + refiningLine(file.spec(), n));
                            err.flush();
                        }
                        refinementReporter = new ProgressReporter(err, context.terminal(), System::nanoTime, n,
                                "new model");
                    }
                    TransitionFinder finder = TransitionFinder.withDefaults();
                    try {
                        refined = TransitionTables.refine(dir, finder, new TransitionRefiner(context.lines(), finder,
                                transitions.toleranceMsun(), work, false, new RefinementProgress(
                                        refinementReporter == null ? ProgressListener.NONE : refinementReporter)),
                                context.finishers(), clock);
                    } finally {
                        // an error message then starts a line of its own
                        if (refinementReporter != null) {
                            refinementReporter.finish();
                        }
                    }
                }
                // the run's files are complete: a signal from here on ends the process as the JVM does by default
                hook.close();
            }
            if (tracks.failure() != null) {
                throw tracks.failure();
            }
            if (profiles != null && profiles.failure() != null) {
                throw profiles.failure();
            }
            double seconds = (System.nanoTime() - start) * 1e-9;
            parent.out().println(dir.root() + ": " + Counts.of(result.run().catalogue().size(), "model") + " in "
                    + RunLayout.CATALOGUE + " (" + describe(result.counts()) + "); " + result.computed()
                    + " computed now in " + Durations.describe(refined == null ? seconds : sweepSeconds));
            if (refined != null) {
                parent.out().println(dir.transitions() + ": " + refinedLine(refined, file.spec(), seconds - sweepSeconds));
            }
            parent.out().flush();
            // the refinement's new models are catalogue rows too: one that failed makes the run's exit code 3, as
            // `transitions --refine` does for the same models (the sweep's counts alone left it 0)
            if (RunFinishing.someModelsFailed(result.counts()) || (refined != null && failedOrUnconverged(refined) > 0)) {
                err.println("convgrid: some models failed or did not converge; their status_detail in "
                        + RunLayout.CATALOGUE + " says why");
                err.flush();
                return ExitCodes.SOME_MODELS_FAILED;
            }
            return ExitCodes.OK;
        }
    }

    /**
     * What the refinement did, after the file name: the tolerance and the new models, or, when it made none, why
     * ("refined with 0 new models" would read as if it had refined something).
     */
    static String refinedLine(TransitionTables.Update refined, GridSpec grid, double seconds) {
        String tolerance = MessageNumbers.format(grid.transitions().toleranceMsun()) + " Msun";
        if (refined.added().isEmpty()) {
            return "nothing to refine (" + (oneMass(grid) ? "the grid has one mass, so no two models bracket a transition"
                    : grid.ages().fractions() ? org.convgrid.survey.refine.TransitionRefiner.FRACTION_AGES_NOT_REFINED
                    : "no bracket wider than " + tolerance) + ")";
        }
        long failedNew = failedOrUnconverged(refined);
        return "transitions refined to " + tolerance + " with " + Counts.of(refined.added().size(), "new model")
                + (failedNew > 0 ? " (" + failedNew + " failed or not converged)" : "") + " in "
                + Durations.describe(seconds);
    }

    /** The refinement's new models that failed or did not converge (one past the main sequence is an answer). */
    private static long failedOrUnconverged(TransitionTables.Update refined) {
        return refined.added().stream().filter(o -> o.status() == ModelStatus.FAILED
                || o.status() == ModelStatus.NOT_CONVERGED).count();
    }

    /** Whether the grid has a single mass (its masses are strictly increasing): no two models bracket anything. */
    static boolean oneMass(GridSpec grid) {
        return grid.massesMsun().size() < 2;
    }

    /** The line said before the transitions are refined: the tolerance, the expected work, how to skip it. */
    static String refiningLine(GridSpec grid, int threads) {
        RefinementEstimate expected = RefinementEstimate.assumed(grid, threads);
        return "refining the transition masses to " + MessageNumbers.format(grid.transitions().toleranceMsun())
                + " Msun by bisection" + (expected.models() > 0 ? " (about " + Counts.of(expected.models(), "new model")
                + ", about " + Durations.describeEstimate(expected.seconds()) + ")" : "") + "; --no-refine skips this";
    }

    /**
     * On SIGINT or SIGTERM (from {@link RunInterruptHook}'s thread): stops the sweep between two rows, rewrites the
     * manifest as unfinished, releases the directory and returns the line to print.
     *
     * @param progressShown whether a progress line may be on the terminal (the message then starts a line of its own)
     */
    private String interrupted(GridRun runner, CompletableFuture<GridRun.Plan> prepared,
                               SweepInterruption interruption, RunLock lock, boolean progressShown)
            throws java.io.IOException, InterruptedException {
        GridRun.Plan plan;
        try {
            // prepare takes well under a second: its directory is then whole, and the resume line true
            plan = prepared.get();
        } catch (ExecutionException e) {
            // released as below: otherwise the next command reports a stale lock after this path
            Locks.closeQuietly(lock);
            return "convgrid: interrupted while the run directory was prepared; nothing was computed";
        }
        boolean refines = refinesNow(plan);
        GridRun.Interrupted left = runner.interrupt(plan, interruption);
        // released as a normal end would, so that the resume does not report a holder that died
        Locks.closeQuietly(lock);
        // a shard's directory is not the --out given: name the one that holds its rows (its manifest names the shard)
        return (progressShown ? "\n" : "") + RunInterruptHook.line(left, grid.toString(),
                out != null && plan.shard().count() == 1 ? out.toString()
                        : plan.settings().directory().root().toString(), refines);
    }

    /**
     * Whether this run refines its transitions after the sweep: a shard holds part of each mass line, so its brackets
     * are refined once the shards are merged.
     */
    private boolean refinesNow(GridRun.Plan plan) {
        return !noRefine && plan.settings().grid().spec().transitions().refine() && plan.shard().count() == 1;
    }

    /** The thread count asked for, or the available processors. */
    static int threads(Integer asked) {
        if (asked == null) {
            return Runtime.getRuntime().availableProcessors();
        }
        if (asked < 1) {
            throw new UsageException("--threads must be at least 1, got " + asked);
        }
        return asked;
    }

    /** A run expected to take at least this long says so when it starts. */
    static final double LONG_RUN_SECONDS = 3600.0;

    /**
     * What the start line adds for a long run: {@code check}'s rough estimate of the models still to compute (a share of
     * the whole grid's), so that a grid started without a {@code check} (a 99 000-model grid estimated at
     * 22 h started without a word) shows its size in hours before the night is spent; empty below
     * {@link #LONG_RUN_SECONDS}.
     */
    static String longRunNote(GridSpec spec, long remaining, long gridCount, int threads) {
        if (gridCount == 0 || remaining == 0) {
            return "";
        }
        double seconds = RunTimeEstimate.assumed(spec, threads).seconds() * remaining / (double) gridCount;
        if (seconds < LONG_RUN_SECONDS) {
            return "";
        }
        return "; expected to take about " + Durations.describeEstimate(seconds) + " (check's rough estimate; Ctrl-C stops "
                + "it and --resume continues it)";
    }

    private static String startLine(GridRun.Plan plan, long gridCount, int threads) {
        StringBuilder line = new StringBuilder("computing ").append(Counts.of(plan.remaining(), "model"));
        if (plan.shard().count() > 1) {
            line.append(" (shard ").append(plan.shard().index()).append('/').append(plan.shard().count())
                    .append(": ").append(plan.owned()).append(" of the grid's ").append(gridCount).append(')');
        }
        line.append(" on ").append(Counts.of(threads, "thread")).append(" into ")
                .append(plan.settings().directory().root());
        if (!plan.kept().ids().isEmpty()) {
            line.append("; ").append(plan.kept().ids().size()).append(" already in the catalogue");
        }
        if (plan.kept().droppedBytes() > 0) {
            line.append("; a half-written last row (").append(Counts.of(plan.kept().droppedBytes(), "byte"))
                    .append(") dropped");
        }
        return line.toString();
    }

    static String describe(Map<ModelStatus, Long> counts) {
        return counts.entrySet().stream().map(e -> e.getValue() + " " + e.getKey().label())
                .collect(Collectors.joining(", "));
    }
}
