package org.convgrid.engine.structure;

/** Why a Henyey relaxation stopped. */
public enum StopReason {
    /** The largest correction fell below the tolerance. */
    CONVERGED,
    /** The iteration budget ran out first. */
    ITERATION_BUDGET,
    /** The linearised system was singular to working precision. */
    SINGULAR_JACOBIAN,
    /** A correction or residual was NaN or infinite, or the physics rejected every damped step. */
    BAD_STATE
}
