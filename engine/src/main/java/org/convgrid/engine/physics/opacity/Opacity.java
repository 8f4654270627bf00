package org.convgrid.engine.physics.opacity;

import org.convgrid.engine.state.Composition;

/** Rosseland-mean opacity. Implementations are immutable and thread-safe. */
public interface Opacity {

    /**
     * @param density g cm^-3
     * @param temperature K
     * @param composition mass fractions
     * @return kappa in cm^2 g^-1 and its logarithmic derivatives
     */
    OpacityValue rosselandMean(double density, double temperature, Composition composition);

    /**
     * This opacity at one composition, for many (rho, T) with it: the same values as {@link #rosselandMean}. An
     * implementation whose calls spend time on the composition alone (table weights, charge moments) prepares that
     * here once; by default each call is simply passed on.
     */
    default OpacityAtComposition atComposition(Composition composition) {
        return (density, temperature) -> rosselandMean(density, temperature, composition);
    }

    /**
     * The opacity a rough first guess is relaxed with before this one takes over (a continuation, used by the
     * pre-main-sequence start models): this opacity itself unless an implementation has a variant that behaves
     * better far from any solution, e.g. beyond the density edge of its tables.
     */
    default Opacity relaxationAid() {
        return this;
    }
}
