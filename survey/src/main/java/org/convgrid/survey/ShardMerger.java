package org.convgrid.survey;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.function.Consumer;
import java.util.function.Function;
import java.util.function.Predicate;
import java.util.Map;
import java.util.Objects;
import java.util.stream.Stream;
import org.convgrid.grids.GridHash;
import org.convgrid.grids.GridSpec;
import org.convgrid.output.AtomicFiles;
import org.convgrid.output.IronAbundance;
import org.convgrid.output.RunLayout;
import org.convgrid.output.catalogue.CatalogueReader;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.catalogue.CatalogueZone;
import org.convgrid.output.catalogue.ZoneTable;
import org.convgrid.output.manifest.RunManifest;
import org.convgrid.output.manifest.RunManifestReader;

/**
 * Joins shard run directories into one run directory whose catalogue is byte for byte the one a single run of the
 * grid writes: the grid text recorded in the manifests gives the grid order, each row's line is copied unchanged.
 * Every shard must record the same models_sha256; a model missing from every shard, present twice, or not in the
 * grid stops the merge before anything is written. Track files (with their zone tables) of the shards are copied into the merged {@code tracks}, their
 * life-events tables joined into one.
 */
public final class ShardMerger {

    private final String toolVersion;
    private final String toolCommit;
    private final Clock clock;
    private final boolean checksStarFiles;
    private final Consumer<String> warnings;

    /**
     * @param checksStarFiles whether each shard's kept stars must have their track, life-events and profile files:
     *                        for shards of solvers that write tracks ({@link ChunkSolverFactory#writesTracks}), as
     *                        a resume checks them
     * @param warnings receives a line when the shards were computed by different builds (the survey layer never
     *                 prints)
     */
    public ShardMerger(String toolVersion, String toolCommit, Clock clock, boolean checksStarFiles,
                       Consumer<String> warnings) {
        this.toolVersion = toolVersion;
        this.toolCommit = toolCommit;
        this.clock = clock;
        this.checksStarFiles = checksStarFiles;
        this.warnings = Objects.requireNonNull(warnings, "warnings");
    }

    /**
     * @param shards run directories, each with manifest.yaml and catalogue.csv
     * @param out a directory without a run in it (created if missing)
     * @param finishers called once the merged directory is complete
     * @throws RunSetupException when the shards do not join into one complete grid; nothing written
     */
    public FinishedRun merge(List<Path> shards, RunDirectory out, List<RunFinisher> finishers) throws IOException {
        return merge(shards, out, finishers, new MergeInterruption());
    }

    /**
     * As {@link #merge(List, RunDirectory, List)}, each write of the merged directory through {@code interruption},
     * which a signal's handler stops.
     */
    public FinishedRun merge(List<Path> shards, RunDirectory out, List<RunFinisher> finishers,
                             MergeInterruption interruption) throws IOException {
        List<RunManifest> manifests = new ArrayList<>();
        for (Path shard : shards) {
            RunDirectory dir = new RunDirectory(shard);
            if (dir.root().equals(out.root())) {
                throw new RunSetupException("--out " + out.root() + " is one of the directories to merge");
            }
            new RunLayout(dir.root()).refuseEarlierFormat();
            if (!Files.isRegularFile(dir.manifest()) || !Files.isRegularFile(dir.catalogue())) {
                throw new RunSetupException(dir.root() + " is not a run directory (needs " + RunLayout.MANIFEST
                        + " and " + RunLayout.CATALOGUE + ")");
            }
            manifests.add(RunManifestReader.read(Files.readString(dir.manifest())));
        }
        GridSpec grid = commonGrid(shards, manifests);
        IronAbundance iron = GridIronAbundance.of(grid);
        ShardRows rows = new ShardRows(grid.physics().overshootScheme(), iron);
        List<List<CatalogueRow>> shardRows = new ArrayList<>();
        for (Path shard : shards) {
            shardRows.add(rows.add(new RunDirectory(shard).catalogue(), shard));
        }
        // an unfinished shard is what explains missing models
        List<String> ordered = rows.inGridOrder(grid, unfinished(shards, manifests));
        for (int i = 0; i < shards.size(); i++) {
            refuseLackingFiles(new RunDirectory(shards.get(i)), shardRows.get(i), grid);
        }
        if (Files.exists(out.catalogue()) && !Files.exists(out.manifest())) {
            // a merge stopped by a signal leaves its catalogue before the manifest it writes last
            throw new RunSetupException(out.root() + " holds a " + RunLayout.CATALOGUE + " but no "
                    + RunLayout.MANIFEST + ": a merge cut short (or a manifest deleted), not a finished run; remove "
                    + "the directory and merge again (the shards are untouched)");
        }
        if (out.holdsRun()) {
            throw new RunSetupException(out.root() + " already holds a run; merge into a new directory");
        }
        // as run refuses them: an earlier run's tracks, life events or charts there would pass for the merge's own
        // (zero-age shards merged beside an evolved run's files got its life events and charts)
        List<Path> earlier = out.earlierRunFiles();
        if (!earlier.isEmpty()) {
            throw new RunSetupException(out.root() + " holds files a run writes (" + out.describe(earlier) + ") but no "
                    + RunLayout.CATALOGUE + " or " + RunLayout.MANIFEST + ", so they are yours or left by an earlier "
                    + "run; merge into a new directory");
        }
        Path top = RunDirectory.topMissing(out.root());
        MergeInterruption.Write removal = () -> {
            if (top != null) {
                RunDirectory.deleteTree(top);
            } else {
                out.clear();
            }
        };
        interruption.writing(removal);
        FinishedRun run;
        try {
            interruption.write(() -> AtomicFiles.write(out.catalogue(), w -> {
                w.append(RunDirectory.catalogueHeader(iron));
                for (String line : ordered) {
                    w.append(line).append('\n');
                }
            }));
            copyTracks(shards, out, interruption);
            copyProfiles(shards, out, interruption);
            interruption.write(() -> LifeEventLog.merge(shards.stream()
                    .map(d -> new RunDirectory(d).layout().lifeEvents()).toList(), out.layout().lifeEvents(),
                    grid.physics().overshootScheme(), iron));
            List<CatalogueRow> mergedRows = new ArrayList<>();
            // read under the lock too: a stop removes the catalogue
            interruption.write(() -> mergedRows.addAll(CatalogueReader.read(out.catalogue())));
            interruption.write(() -> writeZones(shards, out, mergedRows));
            FinishedRun[] written = new FinishedRun[1];
            interruption.write(() -> {
                written[0] = RunFinishing.writeTables(out, grid, merged(manifests, mergedRows, iron), mergedRows);
                interruption.complete();
            });
            run = written[0];
        } catch (IOException e) {
            interruption.undo();
            throw new IOException("cannot write the merged run in " + out.root() + ": " + IoMessages.reason(e), e);
        }
        mixedBuilds(shards, manifests);
        RunFinishing.callFinishers(run, finishers);
        return run;
    }

    /**
     * Refuses a shard whose kept stars lack their files (a track, a life-events row, a profile) or whose zones.csv is
     * gone: merge copies what is there, and shards with a deleted track, life-events row and zones table were
     * merged into a run that looked whole (66 of 68 tracks, 18 zone rows lost). A resume of the shard computes the
     * stars lacking files again; a zones table is written only beside the rows, so that shard is run again.
     */
    private void refuseLackingFiles(RunDirectory shard, List<CatalogueRow> shardRows, GridSpec grid)
            throws IOException {
        MissingStarFiles.Lacking lacking = checksStarFiles ? MissingStarFiles.find(shard, grid, shardRows) : null;
        if (lacking != null) {
            throw new RunSetupException(shard.root() + ": " + lacking.describe() + "; resume that shard (convgrid run "
                    + "GRID.yaml --out " + shard.root() + " --resume) to compute them again, then merge");
        }
        if (!shardRows.isEmpty() && !Files.isRegularFile(shard.zones())) {
            throw new RunSetupException(shard.root() + ": " + RunLayout.ZONES + " is missing beside its "
                    + shardRows.size() + " catalogue rows; run that shard again (with --force), then merge");
        }
    }

    /**
     * The shards whose manifest says they are unfinished (interrupted, failed part-way or still running), for the
     * message of a merge that lacks models: it had said only which models were missing, not which shard; empty
     * when every shard finished.
     */
    private static String unfinished(List<Path> shards, List<RunManifest> manifests) {
        List<String> named = new ArrayList<>();
        for (int i = 0; i < shards.size(); i++) {
            RunManifest m = manifests.get(i);
            if (m.isUnfinished()) {
                named.add(shards.get(i) + " (" + m.total() + (m.expectedModels() == RunManifest.EXPECTED_UNKNOWN ? ""
                        : " of " + m.expectedModels()) + " models)");
            }
        }
        return named.isEmpty() ? "" : "; unfinished (interrupted, or still running): " + String.join(", ", named)
                + "; resume or wait for it, then merge";
    }

    /** Warns when the shards were computed by more than one build, naming each build's shards. */
    private void mixedBuilds(List<Path> shards, List<RunManifest> manifests) {
        Map<String, List<Path>> builds = buildsOf(shards, manifests);
        if (builds.size() > 1) {
            StringBuilder which = new StringBuilder();
            builds.forEach((build, from) -> which.append(which.length() == 0 ? "" : "; ").append(build).append(": ")
                    .append(from.stream().map(Path::toString).collect(java.util.stream.Collectors.joining(", "))));
            warnings.accept("the shards were computed by different builds (" + which + "); the merged manifest "
                    + "records the merging build, " + toolVersion + " " + toolCommit + ": compare the rows of the "
                    + "shards if the physics changed between them");
        }
    }

    /**
     * The builds that computed the shards ({@code tool_version tool_commit}), each with its shards in the order
     * given: more than one when the jar was rebuilt while an array of shards ran, which the README allows.
     */
    private static Map<String, List<Path>> buildsOf(List<Path> shards, List<RunManifest> manifests) {
        Map<String, List<Path>> builds = new java.util.LinkedHashMap<>();
        for (int i = 0; i < shards.size(); i++) {
            RunManifest m = manifests.get(i);
            builds.computeIfAbsent(m.toolVersion() + " " + m.toolCommit(), k -> new ArrayList<>()).add(shards.get(i));
        }
        return builds;
    }

    /** Joins the shards' zones files, in the merged catalogue's order. */
    private static void writeZones(List<Path> shards, RunDirectory out, List<CatalogueRow> mergedRows)
            throws IOException {
        Map<String, List<CatalogueZone>> zones = new HashMap<>();
        for (Path shard : shards) {
            Path file = new RunDirectory(shard).zones();
            if (Files.isRegularFile(file)) {
                zones.putAll(ZoneTable.read(file));
            }
        }
        AtomicFiles.write(out.zones(), w -> {
            w.append(ZoneTable.headerLine());
            for (CatalogueRow row : mergedRows) {
                w.append(ZoneTable.lines(row.withZones(zones.getOrDefault(row.modelId(), List.of()))));
            }
        });
    }

    /** Copies every shard's track files (each star is computed by one shard only) into the merged directory. */
    private static void copyTracks(List<Path> shards, RunDirectory out, MergeInterruption interruption)
            throws IOException {
        copyOwnFiles(shards, d -> d.layout().tracks(), RunLayout::isTrackFile, out.layout().tracks(), interruption);
    }

    /** Copies every shard's profile files (each model is computed by one shard only) into the merged directory. */
    private static void copyProfiles(List<Path> shards, RunDirectory out, MergeInterruption interruption)
            throws IOException {
        copyOwnFiles(shards, d -> d.layout().profiles(), RunLayout::isProfileFile, out.layout().profiles(),
                interruption);
    }

    private static void copyOwnFiles(List<Path> shards, Function<RunDirectory, Path> folder,
                                     Predicate<Path> own, Path target, MergeInterruption interruption)
            throws IOException {
        for (Path shard : shards) {
            Path from = folder.apply(new RunDirectory(shard));
            if (!Files.isDirectory(from)) {
                continue;
            }
            List<Path> files;
            try (Stream<Path> listed = Files.list(from)) {
                // convgrid's own only: a user's file beside them is not part of the run
                files = listed.filter(own).sorted().toList();
            }
            for (Path file : files) {
                interruption.write(() -> AtomicFiles.writeBinary(target.resolve(file.getFileName().toString()),
                        o -> Files.copy(file, o)));
            }
        }
    }

    /**
     * Why a shard's manifest does not give its models back: the grid text is read with the files it names (a preset,
     * an opacity table) as they are now, so a file changed since the run (calibrate-sun rewrites its preset) fails
     * as an edited manifest does; the message had said "the manifest was edited" for an edited preset.
     */
    private static final String NOT_ITS_MODELS = "the grid text in its manifest, read with the files it names (preset, "
            + "opacity table) as they are now, does not give its models_sha256: one of those files changed since the "
            + "run (put back the one the run used), or the manifest was edited";

    private static GridSpec commonGrid(List<Path> shards, List<RunManifest> manifests) {
        String models = manifests.get(0).gridModelsSha256();
        for (int i = 1; i < manifests.size(); i++) {
            if (!manifests.get(i).gridModelsSha256().equals(models)) {
                throw new RunSetupException(shards.get(i) + " was run from another grid than " + shards.get(0)
                        + " (models_sha256 " + manifests.get(i).gridModelsSha256() + " vs " + models + ")");
            }
        }
        RunManifest first = manifests.get(0);
        GridSpec grid = RecordedGrid.of(first);
        if (!GridHash.ofModels(grid).equals(models)) {
            throw new RunSetupException(shards.get(0) + ": " + NOT_ITS_MODELS);
        }
        // the same models from grid files that differ elsewhere (the title, transitions refine or tolerance_msun,
        // profiles): the merged run would take the first-named shard's choices, so the order of the arguments
        // changed the result; differences in comments alone are accepted
        for (int i = 1; i < manifests.size(); i++) {
            GridSpec other = RecordedGrid.of(manifests.get(i));
            if (!GridHash.ofModels(other).equals(models)) {
                throw new RunSetupException(shards.get(i) + ": " + NOT_ITS_MODELS);
            }
            if (!other.title().equals(grid.title()) || !other.transitions().equals(grid.transitions())
                    || other.profiles() != grid.profiles()) {
                throw new RunSetupException(shards.get(i) + " was run from a grid file that differs from "
                        + shards.get(0) + "'s outside its models (title, transitions or output profiles); run "
                        + "every shard from one grid file (the differing ones again with --force)");
            }
        }
        return grid;
    }

    /**
     * The merged provenance: the first shard's grid and tool, the earliest start, the latest end (now when a shard
     * never finished), the shards' threads summed, the median of the shards' medians, counts of the merged rows, the
     * grid's [Fe/H] reference {@code iron} (shards written before manifests recorded it do not say it).
     */
    private RunManifest merged(List<RunManifest> shards, List<CatalogueRow> rows, IronAbundance iron) {
        RunManifest first = shards.get(0);
        Instant started = shards.stream().map(RunManifest::started).min(Comparator.naturalOrder()).orElseThrow();
        Instant finished = shards.stream().anyMatch(m -> m.finished() == null) ? clock.instant()
                : shards.stream().map(RunManifest::finished).filter(Objects::nonNull).max(Comparator.naturalOrder())
                .orElseThrow();
        int threads = shards.stream().mapToInt(RunManifest::threads).sum();
        double median = RunManifest.median(shards.stream().mapToDouble(RunManifest::medianSecondsPerModel)
                .filter(Double::isFinite).toArray());
        // the build that computed the rows when every shard names the same one; shards of several builds keep the
        // merging one, and merge warns (mixedBuilds)
        boolean oneBuild = shards.stream().allMatch(m -> m.toolVersion().equals(first.toolVersion())
                && m.toolCommit().equals(first.toolCommit()));
        return new RunManifest(oneBuild ? first.toolVersion() : toolVersion, oneBuild ? first.toolCommit() : toolCommit,
                first.gridFile(), first.gridText(), first.gridFileSha256(),
                first.gridModelsSha256(), first.physics(), started, finished, threads, null,
                RunFinishing.countByStatus(rows), median, first.ageOrigin(), RunManifest.EXPECTED_UNKNOWN, iron,
                first.gridLocation());
    }
}
