package org.convgrid.engine.structure;

/**
 * A two-point boundary-value problem discretised on a mesh of {@link #points()} points with
 * {@link #variables()} unknowns per point, as the Henyey method expects it (Henyey et al. 1964, ApJ 139, 306):
 * {@link #centralConditions()} rows that involve only point 0, then {@code variables()} rows per interval
 * (k, k + 1) that involve only those two points, then the remaining surface rows that involve only the last
 * point. The unknown vector is ordered point by point: index {@code variables() * k + j}.
 *
 * <p>With this ordering the Jacobian is banded with {@link #lowerBandwidth()} sub- and {@link #upperBandwidth()}
 * super-diagonals. Implementations hold scratch space and are used by one thread at a time.
 */
public interface DifferenceSystem {

    int points();

    int variables();

    int centralConditions();

    /** The name of unknown {@code j} (0 &lt;= j &lt; {@link #variables()}) for messages, e.g. "ln T". */
    default String unknownName(int j) {
        return "unknown " + j;
    }

    /**
     * Evaluates the residuals and, when {@code jacobian} is not null, adds the Jacobian dF/dy to it (the caller
     * clears it first).
     *
     * @throws org.convgrid.engine.error.ConvgridException when the state lies outside what the physics accepts
     */
    void evaluate(double[] y, double[] residual, BandMatrix jacobian);

    /**
     * The size of a proposed Newton correction of unknown {@code index}, as used for damping and for the
     * convergence test: |delta| for logarithmic unknowns, a suitably normalised change for linear ones.
     */
    default double correctionSize(double[] y, int index, double delta) {
        return Math.abs(delta);
    }

    default int lowerBandwidth() {
        return centralConditions() + variables() - 1;
    }

    default int upperBandwidth() {
        return 2 * variables() - 1 - centralConditions();
    }

    /** Row of equation {@code e} (0 .. variables() - 1) of interval (k, k + 1). */
    default int intervalRow(int k, int e) {
        return centralConditions() + variables() * k + e;
    }

    /** Row of surface condition {@code e} (0 .. variables() - centralConditions() - 1). */
    default int surfaceRow(int e) {
        return centralConditions() + variables() * (points() - 1) + e;
    }

    /** Column of unknown {@code j} at point {@code k}. */
    default int column(int k, int j) {
        return variables() * k + j;
    }
}
