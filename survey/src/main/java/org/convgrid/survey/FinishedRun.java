package org.convgrid.survey;

import java.nio.file.Path;
import java.util.List;
import org.convgrid.grids.GridSpec;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.manifest.RunManifest;
import org.convgrid.output.transitions.TransitionRow;

/**
 * A run directory whose catalogue, transitions and manifest are complete, as handed to {@link RunFinisher}s.
 *
 * @param directory the run directory
 * @param grid the grid the run was made from
 * @param manifest the final manifest, as written
 * @param catalogue every catalogue row of the directory, in grid order
 * @param transitions the transition rows, as written
 */
public record FinishedRun(Path directory, GridSpec grid, RunManifest manifest, List<CatalogueRow> catalogue,
                          List<TransitionRow> transitions) {

    public FinishedRun {
        catalogue = List.copyOf(catalogue);
        transitions = List.copyOf(transitions);
    }
}
