package org.convgrid.output.transitions;

import java.util.List;
import org.convgrid.output.Span;

/**
 * Where one transition lies in a slice.
 *
 * @param massMsun the transition mass (see {@link TransitionFinder} for which end), NaN when the models do not
 *     bracket it
 * @param bracket the two usable masses around it, null when not bracketed
 * @param crossings every change of this state between neighbouring usable masses, in increasing mass, as the
 *     finder saw them; empty when read back from a file (the file keeps only the bracket)
 * @param skippedInBracket models without a usable result (status not ok) strictly inside {@code bracket}: the
 *     bracket was widened past them (0 when read back from a file)
 */
public record TransitionEstimate(double massMsun, Span bracket, List<Span> crossings, int skippedInBracket) {

    /** No transition among the models. */
    public static final TransitionEstimate NONE = new TransitionEstimate(Double.NaN, null, List.of(), 0);

    public TransitionEstimate {
        crossings = List.copyOf(crossings);
    }

    /** Whether the models bracket this transition. */
    public boolean found() {
        return bracket != null;
    }
}
