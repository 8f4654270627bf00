package org.convgrid.grids;

import org.convgrid.grids.words.MessageNumbers;

/**
 * The grid's {@code transitions:} section: whether {@code run} refines the transition masses by bisection once the
 * grid is computed, and to what bracket width.
 *
 * @param refine refine after the sweep (default true; {@code run --no-refine} skips it)
 * @param toleranceMsun the bisection stops when a bracket is narrower than this, solar masses (&gt; 0)
 */
public record TransitionSettings(boolean refine, double toleranceMsun) {

    /** Refine to 0.002 Msun: about the spread of the transition masses between mesh resolutions (from memory). */
    public static final TransitionSettings DEFAULT = new TransitionSettings(true, 0.002);

    public TransitionSettings {
        if (!(toleranceMsun > 0.0 && Double.isFinite(toleranceMsun))) {
            throw new IllegalArgumentException("tolerance must be a positive mass, got "
                    + MessageNumbers.format(toleranceMsun));
        }
    }
}
