package org.convgrid.survey.refine;

import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.convgrid.grids.GridSpec;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.survey.RunSetupException;

/** Reads grid indices back from catalogue grid model ids ({@code p<i>-z<i>-m<i>-a<i>}). */
final class ModelIds {

    private static final Pattern GRID_ID = Pattern.compile("p(\\d+)-z(\\d+)-m(\\d+)-a(\\d+)");

    private ModelIds() {
    }

    /**
     * The grid's own request behind a grid model id: its composition, age (with its origin) and physics are those of
     * the id's slice.
     *
     * @throws RunSetupException when the id is not a grid id of this grid
     */
    static ModelRequest gridRequest(GridSpec grid, String modelId) {
        Matcher m = GRID_ID.matcher(modelId);
        if (!m.matches()) {
            throw new RunSetupException("model id '" + modelId + "' is not one convgrid writes; the catalogue was "
                    + "edited");
        }
        long p = Long.parseLong(m.group(1));
        long z = Long.parseLong(m.group(2));
        long mass = Long.parseLong(m.group(3));
        long a = Long.parseLong(m.group(4));
        long nZ = grid.metallicities().size();
        long nM = grid.massesMsun().size();
        long nA = grid.ages().values().size();
        if (p >= grid.physics().size() || z >= nZ || mass >= nM || a >= nA) {
            throw new RunSetupException("model " + modelId + " is not in the run's grid");
        }
        ModelRequest request = grid.requestAt(((p * nZ + z) * nM + mass) * nA + a);
        if (!request.modelId().equals(modelId)) {
            throw new RunSetupException("model " + modelId + " is not in the run's grid (its place there holds "
                    + request.modelId() + ")");
        }
        return request;
    }
}
