package org.convgrid.engine.refine;

import java.util.List;
import org.convgrid.engine.request.ModelOutcome;

/**
 * What a {@link MassBisection} made of one bracket.
 *
 * @param lowMass lower end of the final bracket, g: a usable model on the low side of the transition (the grid end
 *     when nothing was narrowed)
 * @param highMass upper end of the final bracket, g: a usable model on the high side
 * @param newModels every model computed strictly between the original ends, in the order computed (failed ones
 *     included); the recomputed ends are not in it
 * @param stop why the bisection stopped
 * @param stoppedAt mass of the model that stopped it (an end or a midpoint), g; NaN when none did
 * @param detail the status detail of that model, empty when none
 */
public record Refinement(double lowMass, double highMass, List<ModelOutcome> newModels,
                         BisectionStop stop, double stoppedAt, String detail) {

    public Refinement {
        newModels = List.copyOf(newModels);
        detail = detail == null ? "" : detail;
    }

    /** Whether the final bracket is narrower than the tolerance asked. */
    public boolean narrowEnough() {
        return stop == BisectionStop.NARROW_ENOUGH;
    }

    /** Width of the final bracket, g. */
    public double width() {
        return highMass - lowMass;
    }
}
