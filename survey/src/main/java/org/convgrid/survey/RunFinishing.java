package org.convgrid.survey;

import java.io.IOException;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.grids.GridSpec;
import org.convgrid.output.AtomicFiles;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.manifest.RunManifest;
import org.convgrid.output.manifest.RunManifestWriter;
import org.convgrid.output.transitions.TransitionFinder;
import org.convgrid.output.transitions.TransitionRow;
import org.convgrid.output.transitions.TransitionWriter;

/**
 * The common end of {@code run} and {@code merge}: transitions.csv from the catalogue as it stands on disk, then the
 * final manifest (so a finished manifest implies the tables are complete), then the finishers. Files are replaced
 * atomically.
 */
public final class RunFinishing {

    private RunFinishing() {
    }

    /** Writes transitions.csv and manifest.yaml, then calls each finisher in order. */
    public static FinishedRun complete(RunDirectory dir, GridSpec grid, RunManifest manifest,
                                       List<CatalogueRow> catalogue, List<RunFinisher> finishers) throws IOException {
        FinishedRun run = writeTables(dir, grid, manifest, catalogue);
        callFinishers(run, finishers);
        return run;
    }

    /** Writes transitions.csv from the catalogue rows, then manifest.yaml. */
    public static FinishedRun writeTables(RunDirectory dir, GridSpec grid, RunManifest manifest,
                                          List<CatalogueRow> catalogue) throws IOException {
        // the rule every writer of the table applies; a finished manifest (a run's end, a merge) leaves it unmarked
        List<TransitionRow> transitions = UnfinishedSlices.marked(TransitionFinder.withDefaults().find(catalogue),
                catalogue, manifest);
        AtomicFiles.write(dir.transitions(),
                out -> TransitionWriter.write(transitions, GridIronAbundance.of(grid), out));
        AtomicFiles.writeString(dir.manifest(), RunManifestWriter.toYaml(manifest));
        return new FinishedRun(dir.root(), grid, manifest, catalogue, transitions);
    }

    /** Calls each finisher in order. */
    public static void callFinishers(FinishedRun run, List<RunFinisher> finishers) throws IOException {
        for (RunFinisher finisher : finishers) {
            finisher.finish(run);
        }
    }

    /** Rows by status, every status present. */
    public static Map<ModelStatus, Long> countByStatus(List<CatalogueRow> rows) {
        Map<ModelStatus, Long> counts = new EnumMap<>(ModelStatus.class);
        for (ModelStatus status : ModelStatus.values()) {
            counts.put(status, 0L);
        }
        rows.forEach(r -> counts.merge(r.status(), 1L, Long::sum));
        return counts;
    }

    /** Whether some models failed or did not converge (exit code 3); past the main sequence is an answer. */
    public static boolean someModelsFailed(Map<ModelStatus, Long> counts) {
        return counts.getOrDefault(ModelStatus.FAILED, 0L) + counts.getOrDefault(ModelStatus.NOT_CONVERGED, 0L) > 0;
    }
}
