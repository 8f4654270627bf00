package org.convgrid.output.transitions;

import java.util.Objects;

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
}
