package org.convgrid.plotting;

/**
 * Thrown instead of drawing a chart whose data hold nothing to show (no usable model of its physics, no transition
 * found in any of its slices). Its message says why in plain words, for the run's warning line and the report: a
 * chart library left to draw empty data fails with a message about its own internals, which tells a user nothing.
 */
public final class NothingToDraw extends RuntimeException {

    private static final long serialVersionUID = 1L;

    /** @param why what the chart lacks, for people (e.g. "no model of this physics has status ok") */
    public NothingToDraw(String why) {
        super("nothing to draw: " + why);
    }
}
