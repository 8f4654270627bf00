package org.convgrid.engine.refine;

/**
 * Which side of a transition a model of a {@link MassBisection} falls on, or that it cannot say. Most transitions
 * are read off a converged model's structure, so only solved models have a side; the main-sequence turn-off is read
 * off the status itself (a model past the main sequence is on its high side), which is why the side is decided from
 * the whole outcome.
 */
public enum BracketSide {
    /** On the side of the bracket's lower end. */
    LOW,
    /** On the side of the bracket's upper end. */
    HIGH,
    /** No side: the model failed or did not converge, and the bisection stops before it. */
    UNUSABLE
}
