package org.convgrid.output.manifest;

import java.time.Instant;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.convgrid.engine.request.AgeOrigin;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.request.PhysicsOptions;

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
 * @param medianSecondsPerModel median wall time of one model on one thread, NaN when no model ran
 * @param ageOrigin where the run's ages count from (its catalogue's {@code age_gyr}, its tracks)
 */
public record RunManifest(String toolVersion, String toolCommit, String gridFile, String gridText, String gridFileSha256,
                          String gridModelsSha256, List<PhysicsOptions> physics, Instant started, Instant finished,
                          int threads, String shard, Map<ModelStatus, Long> counts, double medianSecondsPerModel,
                          AgeOrigin ageOrigin) {

    /** A manifest of a run whose ages count from the zero-age main sequence. */
    public RunManifest(String toolVersion, String toolCommit, String gridFile, String gridText, String gridFileSha256,
                       String gridModelsSha256, List<PhysicsOptions> physics, Instant started, Instant finished,
                       int threads, String shard, Map<ModelStatus, Long> counts, double medianSecondsPerModel) {
        this(toolVersion, toolCommit, gridFile, gridText, gridFileSha256, gridModelsSha256, physics, started, finished, threads,
                shard, counts, medianSecondsPerModel, AgeOrigin.ZAMS);
    }

    public RunManifest {
        Objects.requireNonNull(ageOrigin, "ageOrigin");
        Objects.requireNonNull(toolVersion, "toolVersion");
        Objects.requireNonNull(toolCommit, "toolCommit");
        Objects.requireNonNull(gridFile, "gridFile");
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
                started, end, threads, shard, finalCounts, median, ageOrigin);
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
