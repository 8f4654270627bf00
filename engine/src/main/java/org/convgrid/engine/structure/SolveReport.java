package org.convgrid.engine.structure;

import java.util.Locale;

/**
 * How a Henyey relaxation went: enough to diagnose a failure without rerunning it.
 *
 * @param reason why it stopped
 * @param iterations Newton iterations done
 * @param lastCorrection largest (undamped) correction size of the last iteration; ln units for logarithmic
 *                       unknowns, see {@link DifferenceSystem#correctionSize}
 * @param worstPoint mesh point where that correction was largest (0 = centre)
 * @param worstUnknown name of the unknown at that point (e.g. "ln T", {@link DifferenceSystem#unknownName}); empty
 *                     when no correction was computed
 * @param detail extra words, e.g. the physics error that stopped a step; empty when none
 */
public record SolveReport(StopReason reason, int iterations, double lastCorrection, int worstPoint,
                          String worstUnknown, String detail) {

    public boolean converged() {
        return reason == StopReason.CONVERGED;
    }

    /** Adds the iterations of an earlier stage (e.g. before a remesh) to this report. */
    public SolveReport plusIterations(int earlier) {
        return new SolveReport(reason, iterations + earlier, lastCorrection, worstPoint, worstUnknown, detail);
    }

    /** In the root locale: this text goes into the catalogue's status_detail, which must not change with the session. */
    @Override
    public String toString() {
        String where = worstPoint < 0 ? ""
                : String.format(Locale.ROOT, " (last correction %.3g in %s at mesh point %d, 0 = centre)", lastCorrection,
                        worstUnknown, worstPoint);
        return reason + " after " + iterations + " iterations" + where + (detail.isEmpty() ? "" : ": " + detail);
    }
}
