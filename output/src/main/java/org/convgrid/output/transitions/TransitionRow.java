package org.convgrid.output.transitions;

import java.util.List;
import java.util.Objects;
import org.convgrid.output.Span;

/**
 * One row of {@code transitions.csv}.
 *
 * @param slice the metallicity, age and physics
 * @param fullyConvective the highest mass that is still fully convective
 * @param convCore the lowest mass with a convective core
 * @param method grid or refined
 * @param notes short remarks (no transition in the grid, widened brackets, flickering), empty when none
 */
public record TransitionRow(Slice slice, TransitionEstimate fullyConvective, TransitionEstimate convCore,
                            TransitionMethod method, String notes) {

    public TransitionRow {
        Objects.requireNonNull(slice, "slice");
        Objects.requireNonNull(fullyConvective, "fullyConvective");
        Objects.requireNonNull(convCore, "convCore");
        Objects.requireNonNull(method, "method");
        notes = notes == null ? "" : notes;
    }

    /**
     * The onset of the lasting convective core: the upper end of the last crossing into a core. The lowest
     * masses of a slice have no core (fully convective stars do not count as having one), so the crossings
     * alternate starting with "into a core": an odd count means the highest masses have a core. Derived from the
     * crossings, so it needs no column of its own to be read back.
     */
    public TransitionEstimate lastingCoreOnset() {
        List<Span> crossings = convCore.crossings();
        if (crossings.size() % 2 == 0) {
            return TransitionEstimate.NONE;
        }
        Span last = crossings.get(crossings.size() - 1);
        return new TransitionEstimate(last.hi(), last, List.of(last), 0);
    }
}
