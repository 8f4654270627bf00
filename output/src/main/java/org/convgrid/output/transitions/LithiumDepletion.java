package org.convgrid.output.transitions;

import java.util.Objects;

/**
 * A slice's lithium depletion boundary ({@link LithiumDepletionBoundary}) and the luminosity of the star at it: the
 * boundary mass is what the models give, its luminosity what a cluster's photometry measures (between the brightest
 * star that keeps its lithium and the faintest that has burnt it), so a table of both turns an observed boundary into
 * an age.
 *
 * @param boundary where the boundary lies among the slice's masses
 * @param luminosityLsun the luminosity of the model at the boundary mass (the bracket's lower model, the brightest
 *     that keeps its lithium), solar units; NaN when the boundary is not found, or the table it was read from had no
 *     such column
 */
public record LithiumDepletion(TransitionEstimate boundary, double luminosityLsun) {

    /** No boundary among the slice's masses (or lithium not followed). */
    public static final LithiumDepletion NONE = new LithiumDepletion(TransitionEstimate.NONE, Double.NaN);

    public LithiumDepletion {
        Objects.requireNonNull(boundary, "boundary");
    }

    /** Whether the slice's masses bracket a boundary. */
    public boolean found() {
        return boundary.found();
    }
}
