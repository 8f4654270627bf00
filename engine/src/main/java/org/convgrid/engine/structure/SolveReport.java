package org.convgrid.engine.structure;

/**
 * How a Henyey relaxation went: enough to diagnose a failure without rerunning it.
 *
 * @param reason why it stopped
 * @param iterations Newton iterations done
 * @param lastCorrection largest (undamped) correction size of the last iteration; ln units for logarithmic
 *                       unknowns, see {@link DifferenceSystem#correctionSize}
 * @param worstPoint mesh point where that correction was largest (0 = centre)
 * @param worstVariable unknown at that point (for the structure equations: 0 ln r, 1 ln rho, 2 ln T, 3 L)
 * @param detail extra words, e.g. the physics error that stopped a step; empty when none
 */
public record SolveReport(StopReason reason, int iterations, double lastCorrection, int worstPoint,
                          int worstVariable, String detail) {

    public boolean converged() {
        return reason == StopReason.CONVERGED;
    }

    /** Adds the iterations of an earlier stage (e.g. before a remesh) to this report. */
    public SolveReport plusIterations(int earlier) {
        return new SolveReport(reason, iterations + earlier, lastCorrection, worstPoint, worstVariable, detail);
    }

    @Override
    public String toString() {
        return String.format("%s after %d iterations (last correction %.3g at point %d, variable %d)%s",
                reason, iterations, lastCorrection, worstPoint, worstVariable,
                detail.isEmpty() ? "" : ": " + detail);
    }
}
