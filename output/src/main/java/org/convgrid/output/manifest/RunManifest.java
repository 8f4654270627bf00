package org.convgrid.output.manifest;

import java.time.Instant;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.convgrid.engine.request.AgeOrigin;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.output.IronAbundance;

/**
 * Provenance of one run directory.
 *
 * @param toolVersion convgrid's version
 * @param toolCommit the git commit convgrid was built from ({@code -dirty} appended when its working tree had
 *                   uncommitted changes), or {@code unknown}
 * @param gridFile the grid file's name as given on the command line
 * @param gridText the grid file's text as read
 * @param gridFileSha256 SHA-256 of the grid file's bytes
 * @param gridModelsSha256 SHA-256 of the grid's model-deciding content (for resume checks)
 * @param physics every physics combination of the grid, in grid order
 * @param started when the run started
 * @param finished when it finished, null while running or when interrupted
 * @param threads worker threads
 * @param shard {@code K/N} when this run is one shard of a grid, null otherwise
 * @param counts models by status (every status present, zero when none)
 * @param medianSecondsPerModel median wall time of one model on one thread, NaN when no model ran (then not written)
 * @param ageOrigin where the run's ages count from (its catalogue's {@code age_gyr}, its tracks)
 * @param expectedModels how many models the run directory is to hold when complete (the grid's count, or its shard's),
 *                       {@link #EXPECTED_UNKNOWN} when not recorded; written only while the run is unfinished, so a
 *                       reader sees how far it got
 * @param ironAbundance the Sun the tables' {@code fe_h_dex} is measured against and whether the grid gave [Fe/H]
 *                      ({@link IronAbundance#DEFAULT} for manifests written before it was recorded)
 * @param gridLocation the grid file's absolute path when the run read it, whose folder the files the grid names (a
 *                     preset, an opacity table) are read from again; empty when not recorded (manifests written
 *                     before it was)
 */
public record RunManifest(String toolVersion, String toolCommit, String gridFile, String gridText, String gridFileSha256,
                          String gridModelsSha256, List<PhysicsOptions> physics, Instant started, Instant finished,
                          int threads, String shard, Map<ModelStatus, Long> counts, double medianSecondsPerModel,
                          AgeOrigin ageOrigin, long expectedModels, IronAbundance ironAbundance,
                          String gridLocation) {

    /** A manifest that does not record where the grid file was. */
    public RunManifest(String toolVersion, String toolCommit, String gridFile, String gridText, String gridFileSha256,
                       String gridModelsSha256, List<PhysicsOptions> physics, Instant started, Instant finished,
                       int threads, String shard, Map<ModelStatus, Long> counts, double medianSecondsPerModel,
                       AgeOrigin ageOrigin, long expectedModels, IronAbundance ironAbundance) {
        this(toolVersion, toolCommit, gridFile, gridText, gridFileSha256, gridModelsSha256, physics, started, finished,
                threads, shard, counts, medianSecondsPerModel, ageOrigin, expectedModels, ironAbundance, "");
    }

    /** {@link #expectedModels} of a manifest that does not record it (finished runs, earlier versions). */
    public static final long EXPECTED_UNKNOWN = -1;

    /** A manifest of a run whose [Fe/H] is measured against the default Sun, its grid given in Z. */
    public RunManifest(String toolVersion, String toolCommit, String gridFile, String gridText, String gridFileSha256,
                       String gridModelsSha256, List<PhysicsOptions> physics, Instant started, Instant finished,
                       int threads, String shard, Map<ModelStatus, Long> counts, double medianSecondsPerModel,
                       AgeOrigin ageOrigin, long expectedModels) {
        this(toolVersion, toolCommit, gridFile, gridText, gridFileSha256, gridModelsSha256, physics, started, finished,
                threads, shard, counts, medianSecondsPerModel, ageOrigin, expectedModels, IronAbundance.DEFAULT);
    }

    /** A manifest that does not record how many models the run expects. */
    public RunManifest(String toolVersion, String toolCommit, String gridFile, String gridText, String gridFileSha256,
                       String gridModelsSha256, List<PhysicsOptions> physics, Instant started, Instant finished,
                       int threads, String shard, Map<ModelStatus, Long> counts, double medianSecondsPerModel,
                       AgeOrigin ageOrigin) {
        this(toolVersion, toolCommit, gridFile, gridText, gridFileSha256, gridModelsSha256, physics, started, finished,
                threads, shard, counts, medianSecondsPerModel, ageOrigin, EXPECTED_UNKNOWN);
    }

    /** A manifest of a run whose ages count from the zero-age main sequence. */
    public RunManifest(String toolVersion, String toolCommit, String gridFile, String gridText, String gridFileSha256,
                       String gridModelsSha256, List<PhysicsOptions> physics, Instant started, Instant finished,
                       int threads, String shard, Map<ModelStatus, Long> counts, double medianSecondsPerModel) {
        this(toolVersion, toolCommit, gridFile, gridText, gridFileSha256, gridModelsSha256, physics, started, finished, threads,
                shard, counts, medianSecondsPerModel, AgeOrigin.ZAMS);
    }

    public RunManifest {
        if (expectedModels < EXPECTED_UNKNOWN) {
            throw new IllegalArgumentException("expectedModels must be a count or EXPECTED_UNKNOWN, got "
                    + expectedModels);
        }
        Objects.requireNonNull(ageOrigin, "ageOrigin");
        Objects.requireNonNull(ironAbundance, "ironAbundance");
        Objects.requireNonNull(toolVersion, "toolVersion");
        Objects.requireNonNull(toolCommit, "toolCommit");
        Objects.requireNonNull(gridFile, "gridFile");
        Objects.requireNonNull(gridLocation, "gridLocation");
        Objects.requireNonNull(gridText, "gridText");
        Objects.requireNonNull(gridFileSha256, "gridFileSha256");
        Objects.requireNonNull(gridModelsSha256, "gridModelsSha256");
        Objects.requireNonNull(started, "started");
        physics = List.copyOf(physics);
        Map<ModelStatus, Long> all = new EnumMap<>(ModelStatus.class);
        for (ModelStatus status : ModelStatus.values()) {
            all.put(status, counts.getOrDefault(status, 0L));
        }
        counts = Map.copyOf(all);
    }

    /** Total models counted. */
    public long total() {
        return counts.values().stream().mapToLong(Long::longValue).sum();
    }

    /** The same manifest, finished at {@code end} with the final counts and median. */
    public RunManifest finishedAt(Instant end, Map<ModelStatus, Long> finalCounts, double median) {
        return new RunManifest(toolVersion, toolCommit, gridFile, gridText, gridFileSha256, gridModelsSha256, physics,
                started, end, threads, shard, finalCounts, median, ageOrigin, expectedModels, ironAbundance,
                gridLocation);
    }

    /** The same manifest, not finished, with the counts and median so far and the models the run is to hold. */
    public RunManifest unfinished(Map<ModelStatus, Long> countsSoFar, double median, long expected) {
        return new RunManifest(toolVersion, toolCommit, gridFile, gridText, gridFileSha256, gridModelsSha256, physics,
                started, null, threads, shard, countsSoFar, median, ageOrigin, expected, ironAbundance, gridLocation);
    }

    /** Whether the run is known to be unfinished: no finish time. */
    public boolean isUnfinished() {
        return finished == null;
    }

    /** Median of per-model seconds (mean of the two middle values for an even count), NaN when empty. */
    public static double median(double[] seconds) {
        if (seconds.length == 0) {
            return Double.NaN;
        }
        double[] sorted = seconds.clone();
        java.util.Arrays.sort(sorted);
        int mid = sorted.length / 2;
        return sorted.length % 2 == 1 ? sorted[mid] : 0.5 * (sorted[mid - 1] + sorted[mid]);
    }
}
