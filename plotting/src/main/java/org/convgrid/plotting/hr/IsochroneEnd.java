package org.convgrid.plotting.hr;

/**
 * How a line of the HR diagram ends at its high-mass (bright) end, the end cluster researchers read first: the
 * chart marks a turn-off model and says when a line stops short of the turn-off.
 */
public enum IsochroneEnd {

    /**
     * No model of the line's slice past the main sequence lies above the line's highest mass, the grid's highest
     * usable one of that age: the line is not short of a turn-off.
     */
    ALL_ON_MAIN_SEQUENCE,

    /**
     * The line ends at the slice's turn-off model, the heaviest one still on the main sequence, which the transition
     * refinement bracketed with a model past it to within its tolerance (usually one of the refinement's own models).
     */
    AT_TURNOFF_MODEL,

    /**
     * The line stops at the last grid mass on the main sequence: the next grid mass is past it, up to a whole grid
     * step above, and no refinement narrowed the turn-off in between (a run with {@code --no-refine}).
     */
    BELOW_TURNOFF
}
