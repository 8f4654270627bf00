package org.convgrid.survey;

import java.io.IOException;
import java.nio.file.Files;
import java.time.Clock;
import java.time.Instant;
import java.util.List;
import java.util.Optional;
import java.util.Map;
import java.util.Set;
import org.convgrid.engine.batch.ChunkSolver;
import org.convgrid.engine.batch.Chunking;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.batch.ProgressListener;
import org.convgrid.engine.batch.Shard;
import org.convgrid.grids.GridFile;
import org.convgrid.grids.GridFileException;
import org.convgrid.output.AtomicFiles;
import org.convgrid.output.OutputFormatException;
import org.convgrid.output.RunLayout;
import org.convgrid.output.catalogue.CatalogueReader;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.grids.words.Counts;
import org.convgrid.output.manifest.RunManifest;
import org.convgrid.output.manifest.RunManifestReader;
import org.convgrid.output.manifest.RunManifestWriter;
import org.convgrid.survey.parallel.ParallelWork;

/**
 * One {@code convgrid run}: {@link #prepare} checks the run directory against the grid (and creates it, or keeps
 * the complete rows of an interrupted run), {@link #execute} sweeps the missing models into catalogue.csv on the
 * command's {@link ParallelWork} and finishes the directory. Chunks are cut by
 * {@link Chunking#DEFAULT_MASSES_PER_CHUNK}.
 */
public final class GridRun {

    /** Masses per chunk; part of what makes a catalogue reproducible, so resumes and shards use the same. */
    public static final int MASSES_PER_CHUNK = Chunking.DEFAULT_MASSES_PER_CHUNK;

    /**
     * What the user asked for.
     *
     * @param grid the grid file as read
     * @param directory the run directory
     * @param threads worker threads, &gt;= 1
     * @param requestedShard {@code --shard} or Slurm's shard, null when neither (the whole grid, or on resume the
     *                       shard the directory records)
     * @param resume continue the directory's catalogue
     * @param force start over, removing every file an earlier run wrote in the directory ({@link RunDirectory#clear})
     */
    public record Settings(GridFile grid, RunDirectory directory, int threads, Shard requestedShard, boolean resume,
                           boolean force) {
    }

    /**
     * A directory ready to receive rows.
     *
     * @param settings as asked
     * @param shard the shard this run computes
     * @param kept the rows already there
     * @param owned how many models the shard owns
     * @param started when the run (first session) started
     * @param previousMedian the median seconds per model an earlier session measured, NaN when none
     * @param removedEarlierFiles how many files of an earlier run {@code --force} removed (0 without it), for the
     *                            user to hear of it: they were deleted, not moved
     * @param recomputedForMissingFiles on resume, why kept rows were dropped to be computed again (their stars lacked
     *                                  track files or life-events rows), for the user; null when none was
     * @param manifestRebuilt whether a resume found no manifest and wrote a new one from the grid, its catalogue's
     *                        rows being this grid's, for the user to hear of it
     */
    public record Plan(Settings settings, Shard shard, KeptCatalogue kept, long owned, Instant started,
                       double previousMedian, int removedEarlierFiles, String recomputedForMissingFiles,
                       boolean manifestRebuilt) {

        /** Models this session computes. */
        public long remaining() {
            return owned - kept.ids().size();
        }
    }

    /**
     * @param counts rows of the whole catalogue by status
     * @param computed rows this session wrote
     * @param run the finished directory
     */
    public record Result(Map<ModelStatus, Long> counts, long computed, FinishedRun run) {
    }

    private final String toolVersion;
    private final String toolCommit;
    private final Clock clock;
    private final boolean checksTracks;

    public GridRun(String toolVersion, String toolCommit, Clock clock) {
        this(toolVersion, toolCommit, clock, false);
    }

    /**
     * @param checksTracks whether a resume recomputes kept stars whose track files or life-events row are missing
     *                     ({@link MissingStarFiles}): for solvers that write tracks ({@link ChunkSolverFactory#writesTracks})
     */
    public GridRun(String toolVersion, String toolCommit, Clock clock, boolean checksTracks) {
        this.toolVersion = toolVersion;
        this.toolCommit = toolCommit;
        this.clock = clock;
        this.checksTracks = checksTracks;
    }

    /**
     * Checks (and creates or trims) the run directory.
     *
     * @throws RunSetupException when the directory conflicts with the request; nothing was changed
     * @throws IOException when the directory cannot be created or read; nothing was left behind
     */
    public Plan prepare(Settings s) throws IOException {
        RunDirectory dir = s.directory();
        new RunLayout(dir.root()).refuseEarlierFormat();
        if (s.resume() && dir.holdsRun()) {
            return resume(s);
        }
        if (dir.holdsRun() && !s.force()) {
            // a directory of another shard, or of this shard of another grid, refuses both (the message said to add
            // --resume or --force there): say what it holds instead
            refuseAnotherShard(s);
            // a finished run that was refined refuses --resume (KeptCatalogue), so it is not offered there; a
            // finished one that was not may still be refined by a resume
            Optional<RunManifest> held = dir.readableManifest();
            if (held.isPresent() && !held.get().isUnfinished()) {
                boolean refined = dir.holdsRefinedModels();
                throw new RunSetupException(dir.root() + " already holds a finished" + (refined ? ", refined" : "")
                        + " run (" + Counts.of(held.get().total(), "model") + "); "
                        + (refined ? "" : held.get().shard() != null ? "merge it with the other shards, "
                        : "--resume refines its transitions if the grid asks for it, ")
                        + "--force starts it over, or give a new --out ('convgrid plot' and 'convgrid transitions' "
                        + "read it as it is)");
            }
            throw new RunSetupException(dir.root() + " already holds a run; add --resume to continue it or "
                    + "--force to start it over");
        }
        if (!dir.holdsRun() && !s.force()) {
            refuseFilesOfARun(dir);
        }
        int removed = 0;
        if (s.force()) {
            refuseAnotherShard(s);
            // also when the catalogue and manifest are gone: tracks or charts of an earlier run must not outlive it
            removed = dir.clear();
        }
        Shard shard = s.requestedShard() == null ? Shard.ALL : s.requestedShard();
        Instant started = clock.instant();
        long owned = new ShardPlan(s.grid().spec(), shard, MASSES_PER_CHUNK).count();
        // unfinished until the end: it says how many models the directory is to hold, should the run be cut short
        RunManifest start = manifest(s, shard, started, null, Map.of(), Double.NaN).unfinished(Map.of(), Double.NaN,
                owned);
        dir.create(RunManifestWriter.toYaml(start), start.ironAbundance());
        return new Plan(s, shard, new KeptCatalogue(Set.of(), true, 0), owned, started, Double.NaN, removed, null,
                false);
    }

    /**
     * Refuses a directory without catalogue and manifest that holds files a run writes: they are a user's (a
     * zones.csv of their own) or what is left of an earlier run whose catalogue went (its life_events.csv would read
     * as this run's), and a new run would overwrite some and leave others beside its own.
     */
    private static void refuseFilesOfARun(RunDirectory dir) throws IOException {
        List<java.nio.file.Path> found = dir.earlierRunFiles();
        if (!found.isEmpty()) {
            throw new RunSetupException(dir.root() + " holds files a run writes (" + dir.describe(found) + ") but no "
                    + RunLayout.CATALOGUE + " or " + RunLayout.MANIFEST + ", so they are yours or left by an "
                    + "earlier run; choose another --out, or add --force to remove them and start the run there "
                    + "(files convgrid does not write are kept)");
        }
    }

    /**
     * Refuses {@code --force} on a directory holding a shard other than the one asked for, or a shard of another
     * grid (by its models' hash): starting over there would delete another task's results, not redo this one's.
     * An unreadable manifest names no shard, and {@code --force} replaces it as before.
     */
    private static void refuseAnotherShard(Settings s) throws IOException {
        RunDirectory dir = s.directory();
        if (!Files.isRegularFile(dir.manifest())) {
            return;
        }
        RunManifest old;
        try {
            old = RunManifestReader.read(Files.readString(dir.manifest()));
        } catch (org.convgrid.output.OutputFormatException | IOException e) {
            return;
        }
        if (old.shard() == null) {
            return;
        }
        Shard asked = s.requestedShard() == null ? Shard.ALL : s.requestedShard();
        String held;
        if (!ShardChoice.parse(old.shard()).equals(asked)) {
            held = "shard " + old.shard() + ", and this run computes "
                    + (asked.count() == 1 ? "the whole grid" : "shard " + shard(asked));
        } else if (!old.gridModelsSha256().equals(s.grid().modelsSha256())) {
            held = "shard " + old.shard() + " of another grid (models_sha256 " + old.gridModelsSha256() + " vs "
                    + s.grid().modelsSha256() + ")";
        } else {
            return;
        }
        throw new RunSetupException(dir.root() + " holds " + held + (s.force()
                ? ": --force would delete that shard's results, so nothing was removed"
                : ": --resume cannot continue it and --force would delete that shard's results, so nothing was "
                        + "changed") + "; choose another --out (shard K of N writes to <DIR>-shard-K-of-N), or "
                + "remove the directory yourself if that shard is not needed");
    }

    private Plan resume(Settings s) throws IOException {
        RunDirectory dir = s.directory();
        if (!Files.exists(dir.manifest())) {
            return resumeWithoutManifest(s);
        }
        RunManifest old;
        try {
            old = RunManifestReader.read(Files.readString(dir.manifest()));
        } catch (OutputFormatException e) {
            // a cut manifest gave the Java null-pointer text, exit 1, and no way on
            throw new RunSetupException(dir.manifest() + ": " + e.getMessage() + "; nothing was changed. Move it "
                    + "aside (e.g. to " + RunLayout.MANIFEST + ".damaged) and resume again: without a manifest the "
                    + "resume writes a new one when the catalogue's rows are this grid's");
        }
        String models = s.grid().modelsSha256();
        if (!old.gridModelsSha256().equals(models)) {
            throw new RunSetupException("the grid's models differ from those of the run in " + dir.root()
                    + " (models_sha256 " + models + " vs " + old.gridModelsSha256()
                    + "); resume with the original grid, or choose a new --out");
        }
        refuseProfilesChange(dir, old, s.grid().spec().profiles());
        Shard recorded = old.shard() == null ? Shard.ALL : ShardChoice.parse(old.shard());
        Shard shard = s.requestedShard() == null ? recorded : s.requestedShard();
        if (!shard.equals(recorded)) {
            throw new RunSetupException(dir.root() + " holds shard " + shard(recorded) + " but this run asks for shard "
                    + shard(shard));
        }
        ShardPlan plan = new ShardPlan(s.grid().spec(), shard, MASSES_PER_CHUNK);
        // its refusals (a refined run, rows not this grid's) come before anything is written
        KeptCatalogue kept = KeptCatalogue.inspectAndTrim(dir.catalogue(), plan);
        if (!old.isUnfinished()) {
            // the resume may cut rows back (a star lacking its files) and computes them again: until its end the
            // manifest must not say the run is finished, or a process killed outright (kill -9, out of memory)
            // leaves a finished manifest beside a shorter catalogue; counts as at a run's start
            AtomicFiles.writeString(dir.manifest(), RunManifestWriter.toYaml(
                    old.unfinished(Map.of(), old.medianSecondsPerModel(), plan.count())));
        }
        MissingStarFiles.Recomputed recomputed = !checksTracks ? null : MissingStarFiles.cutBackToFirstLacking(dir,
                s.grid().spec(), GridIronAbundance.of(s.grid().spec()));
        if (recomputed != null) {
            // read again: the rows kept are fewer now, and the zones of the dropped ones go too
            KeptCatalogue fewer = KeptCatalogue.inspectAndTrim(dir.catalogue(), plan);
            kept = new KeptCatalogue(fewer.ids(), fewer.hasHeader(), kept.droppedBytes());
        }
        return new Plan(s, shard, kept, plan.count(), old.started(), old.medianSecondsPerModel(), 0,
                recomputed == null ? null : recomputed.describe(dir.catalogue()), false);
    }

    /**
     * Resumes a directory whose manifest is gone (deleted, or moved aside when damaged) but whose catalogue is there:
     * when the catalogue's rows are the first models of this grid and shard, in order, it is this run's, and a new
     * start manifest is written (the first session's start time and measured cost are lost). The
     * only way out offered had been --force, which deletes the rows.
     */
    private Plan resumeWithoutManifest(Settings s) throws IOException {
        RunDirectory dir = s.directory();
        Shard shard = s.requestedShard() == null ? Shard.ALL : s.requestedShard();
        refuseUnnamedShard(dir, s.requestedShard());
        refuseProfilesUnlike(dir, s.grid().spec().profiles());
        ShardPlan plan = new ShardPlan(s.grid().spec(), shard, MASSES_PER_CHUNK);
        KeptCatalogue kept;
        try {
            kept = KeptCatalogue.inspectAndTrim(dir.catalogue(), plan);
        } catch (RunSetupException e) {
            throw new RunSetupException(dir.root() + " has a catalogue but no " + RunLayout.MANIFEST + ", and the "
                    + "catalogue is not this grid's" + (shard.count() > 1 ? " shard " + shard(shard) : "") + ": "
                    + e.getMessage() + ". Resume with the grid file (and --shard) that wrote it, which rebuilds the "
                    + "manifest, or choose a new --out");
        }
        Instant started = clock.instant();
        RunManifest start = manifest(s, shard, started, null, Map.of(), Double.NaN).unfinished(Map.of(), Double.NaN,
                plan.count());
        AtomicFiles.writeString(dir.manifest(), RunManifestWriter.toYaml(start));
        MissingStarFiles.Recomputed recomputed = !checksTracks ? null : MissingStarFiles.cutBackToFirstLacking(dir,
                s.grid().spec(), GridIronAbundance.of(s.grid().spec()));
        if (recomputed != null) {
            // as on a resume with its manifest: the stars that lack their files are computed again
            KeptCatalogue fewer = KeptCatalogue.inspectAndTrim(dir.catalogue(), plan);
            kept = new KeptCatalogue(fewer.ids(), fewer.hasHeader(), kept.droppedBytes());
        }
        return new Plan(s, shard, kept, plan.count(), started, Double.NaN, 0,
                recomputed == null ? null : recomputed.describe(dir.catalogue()), true);
    }

    /**
     * Without a manifest the shard is not on record, and shard 1's first rows are the whole grid's first rows too: a
     * directory named for a shard ({@code -shard-K-of-N}, the name {@link RunDirectory#forShard} gives) must be resumed
     * with {@code --shard} (a resume without it turned a shard's directory into the whole grid's).
     */
    private static void refuseUnnamedShard(RunDirectory dir, Shard requested) {
        java.nio.file.Path name = dir.root().getFileName();
        if (requested == null && name != null && name.toString().matches(".*-shard-[0-9]+-of-[0-9]+")) {
            throw new RunSetupException(dir.root() + " has a catalogue but no " + RunLayout.MANIFEST + " and is named "
                    + "for a shard: resume it with the --shard it was run with, which rebuilds the manifest");
        }
    }

    /**
     * Without a manifest the profile setting is not on record: profile files beside a grid that writes none, or a grid
     * that writes them and none beside kept rows, mean another setting wrote the rows (a resume wrote a
     * manifest claiming profiles that did not exist).
     */
    private static void refuseProfilesUnlike(RunDirectory dir, boolean wanted) throws IOException {
        java.nio.file.Path profiles = dir.layout().profiles();
        boolean present = false;
        if (Files.isDirectory(profiles)) {
            try (var entries = Files.list(profiles)) {
                present = entries.findAny().isPresent();
            }
        }
        boolean rowsKept = Files.exists(dir.catalogue()) && Files.size(dir.catalogue()) > 0;
        if (rowsKept && present != wanted) {
            throw new RunSetupException(dir.root() + " has a catalogue but no " + RunLayout.MANIFEST + ", and "
                    + (present ? "profile files that this grid file ('profiles: false') would not write"
                    : "no profile files, though this grid file asks for them ('profiles: true')")
                    + ": it was run with the other setting; resume with the grid file that wrote it, or choose a "
                    + "new --out");
        }
    }

    /**
     * Refuses a resume whose grid file turns {@code output: profiles} on or off: the models already in the catalogue
     * were computed with the other setting, so the directory would hold profiles of some models only while its
     * manifest (which quotes the new grid file) claimed them all, or none. Profiles turned
     * on for a resume were accepted silently (10 of 52 profile files, manifest saying {@code profiles: true}); merge
     * refuses shards that differ so already. A recorded grid text this version cannot read names no setting, and
     * is not held against the resume (its models hash already matched).
     */
    private static void refuseProfilesChange(RunDirectory dir, RunManifest old, boolean wanted) {
        boolean recorded;
        try {
            recorded = RecordedGrid.of(old).profiles();
        } catch (GridFileException e) {
            return;
        }
        if (recorded != wanted) {
            throw new RunSetupException(dir.root() + " was run with 'output: profiles: " + recorded + "' and this grid "
                    + "file says 'profiles: " + wanted + "': a resume cannot " + (wanted
                    ? "write the profiles of the models already in the catalogue" : "take back the profiles already "
                    + "written") + ", so nothing was changed; resume with 'profiles: " + recorded + "' as the run "
                    + "was started, or run the grid with 'profiles: " + wanted + "' into a new --out");
        }
    }

    /**
     * Computes the missing rows on {@code work}, then writes transitions.csv, the final manifest and calls the
     * finishers.
     */
    public Result execute(Plan plan, ParallelWork work, ChunkSolver solver, ProgressListener progress,
                          List<RunFinisher> finishers) throws IOException {
        return execute(plan, work, solver, progress, finishers, new SweepInterruption());
    }

    /**
     * As {@link #execute(Plan, ParallelWork, ChunkSolver, ProgressListener, List)}, every catalogue row and the final
     * tables written through {@code interruption}, so that {@link #interrupt} can stop the sweep between two of them.
     */
    public Result execute(Plan plan, ParallelWork work, ChunkSolver solver, ProgressListener progress,
                          List<RunFinisher> finishers, SweepInterruption interruption) throws IOException {
        return execute(plan, work, solver, progress, finishers, interruption, StarFiles.NONE);
    }

    /**
     * As {@link #execute(Plan, ParallelWork, ChunkSolver, ProgressListener, List, SweepInterruption)}, each row
     * appended only once {@code starFiles} says its star's files were written: a failed track write stops the sweep
     * (an IOException naming the file and the reason) before the first row of that star, whose block a resume then
     * recomputes.
     */
    public Result execute(Plan plan, ParallelWork work, ChunkSolver solver, ProgressListener progress,
                          List<RunFinisher> finishers, SweepInterruption interruption, StarFiles starFiles)
            throws IOException {
        Settings s = plan.settings();
        RunDirectory dir = s.directory();
        TimedSolver timed = new TimedSolver(solver);
        interruption.timedBy(timed::medianSecondsPerModel);
        Set<String> done = plan.kept().ids();
        Map<ModelStatus, Long> emitted;
        try (CatalogueAppender sink = CatalogueAppender.open(dir.catalogue(), !plan.kept().hasHeader(),
                GridIronAbundance.of(s.grid().spec()))) {
            emitted = ChunkSweep.run(work, s.grid().spec().requests().iterator(), MASSES_PER_CHUNK, plan.shard(),
                    r -> done.contains(r.modelId()), timed, o -> {
                        starFiles.requireWritten(o.request());
                        interruption.write(() -> sink.accept(o));
                    }, progress,
                    plan.remaining());
        }
        FinishedRun[] run = new FinishedRun[1];
        Map<ModelStatus, Long> counts = new java.util.EnumMap<>(ModelStatus.class);
        interruption.finalWrite(() -> {
            LifeEventLog.tidy(dir.layout().lifeEvents(), s.grid().spec().physics().overshootScheme(),
                    GridIronAbundance.of(s.grid().spec()));
            List<CatalogueRow> rows = CatalogueReader.read(dir.catalogue());
            counts.putAll(RunFinishing.countByStatus(rows));
            double median = timed.medianSecondsPerModel();
            RunManifest end = manifest(s, plan.shard(), plan.started(), clock.instant(), counts,
                    Double.isNaN(median) ? plan.previousMedian() : median);
            run[0] = RunFinishing.writeTables(dir, s.grid().spec(), end, rows);
        });
        RunFinishing.callFinishers(run[0], finishers);
        return new Result(counts, emitted.values().stream().mapToLong(Long::longValue).sum(), run[0]);
    }

    /**
     * What an interrupted run left.
     *
     * @param rows complete rows in the catalogue
     * @param expected models the directory is to hold when complete (the shard's, or the grid's)
     * @param swept whether the sweep had finished (its final manifest written; refinement or charts were cut short)
     */
    public record Interrupted(long rows, long expected, boolean swept) {
    }

    /**
     * Stops the sweep of {@code plan} between two writes ({@link SweepInterruption#stop}) and, unless it had
     * already finished, rewrites the manifest honestly: not finished, the rows the catalogue holds by status, the
     * models it is to hold ({@code models.expected}) and the median time per model measured so far. For a signal
     * handler: it touches nothing else, and the caller ends the process right after.
     */
    public Interrupted interrupt(Plan plan, SweepInterruption interruption) throws IOException {
        SweepInterruption.Stopped stopped = interruption.stop();
        RunDirectory dir = plan.settings().directory();
        // a row cut short is no row: only complete lines count (a resume drops the rest)
        List<CatalogueRow> rows = Files.exists(dir.catalogue())
                ? CatalogueReader.readCompleteLines(Files.readString(dir.catalogue())) : List.of();
        if (!stopped.swept()) {
            double median = Double.isNaN(stopped.medianSecondsPerModel()) ? plan.previousMedian()
                    : stopped.medianSecondsPerModel();
            RunManifest unfinished = manifest(plan.settings(), plan.shard(), plan.started(), null, Map.of(),
                    Double.NaN).unfinished(RunFinishing.countByStatus(rows), median, plan.owned());
            AtomicFiles.writeString(dir.manifest(), RunManifestWriter.toYaml(unfinished));
        }
        return new Interrupted(rows.size(), plan.owned(), stopped.swept());
    }

    private RunManifest manifest(Settings s, Shard shard, Instant started, Instant finished,
                                 Map<ModelStatus, Long> counts, double median) {
        GridFile g = s.grid();
        return new RunManifest(toolVersion, toolCommit, g.name(), g.text(), g.fileSha256(), g.modelsSha256(),
                g.spec().physics().combinations(), started, finished, s.threads(), ShardChoice.label(shard), counts,
                median, g.spec().ages().origin(), RunManifest.EXPECTED_UNKNOWN, GridIronAbundance.of(g.spec()),
                g.location());
    }

    private static String shard(Shard shard) {
        return shard.index() + "/" + shard.count();
    }
}
