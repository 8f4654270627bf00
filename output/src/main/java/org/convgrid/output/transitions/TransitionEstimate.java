package org.convgrid.output.transitions;

import java.util.List;
import org.convgrid.output.Span;

/**
 * Where one transition lies in a slice, read off the grid.
 *
 * @param massMsun the transition mass (see {@link TransitionFinder} for which end), NaN when the grid does not
 *     bracket it
 * @param bracket the two good masses around it, null when not bracketed
 * @param crossings every change of state between neighbouring good masses, in increasing mass; more than one
 *     means the structure flickers between grid masses
 * @param skippedInBracket models without a usable result (status not ok) strictly inside {@code bracket}: the
 *     bracket was widened past them
 */
public record TransitionEstimate(double massMsun, Span bracket, List<Span> crossings, int skippedInBracket) {

    /** No transition in the grid. */
    public static final TransitionEstimate NONE = new TransitionEstimate(Double.NaN, null, List.of(), 0);

    public TransitionEstimate {
        crossings = List.copyOf(crossings);
    }

    /** Whether the grid brackets this transition. */
    public boolean found() {
        return bracket != null;
    }
}
