package org.convgrid.engine.refine;

/** Why a {@link MassBisection} stopped. */
public enum BisectionStop {
    /** The bracket is narrower than the tolerance: the wanted answer. */
    NARROW_ENOUGH,
    /** A bracket end could not be recomputed (the model failed or has no convective structure). */
    END_NOT_USABLE,
    /** A recomputed bracket end lies on the other side of the transition than the caller said. */
    END_DISAGREES,
    /** A model between the ends failed; the bracket is left as it was before it. */
    MODEL_NOT_USABLE,
    /** No representable mass lies strictly between the ends any more. */
    RESOLUTION,
    /** The step budget ran out first. */
    BUDGET
}
