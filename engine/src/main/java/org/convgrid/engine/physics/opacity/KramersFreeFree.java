package org.convgrid.engine.physics.opacity;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.state.Composition;

/**
 * Kramers free-free opacity of a fully ionized gas,
 * {@code kappa_ff = 3.68e22 g_ff (1+X)(X + Y + B) rho T^-3.5} cm^2 g^-1 with
 * {@code B = sum_metals X_j Z_j^2/A_j}. The coefficient is that of Carroll &amp; Ostlie 1996, p. 274, whose
 * factor (1 - Z) = X + Y is extended by the metal-ion term B as in Kippenhahn, Weigert &amp; Weiss 2012 (opacity
 * chapter), so metal ions also radiate; for Z -&gt; 0 the two forms agree. The frequency-averaged Gaunt factor
 * g_ff is a constructor constant (1 by default: the thermally averaged Gaunt factor is within ~20 % of 1 in
 * stellar interiors, a precision below that of the Kramers law itself). Degeneracy corrections are ignored.
 */
public final class KramersFreeFree implements Opacity {

    /** Carroll &amp; Ostlie 1996 coefficient, cgs. */
    static final double COEFFICIENT = 3.68e22;

    private final double gauntFactor;

    /** @param gauntFactor frequency-averaged free-free Gaunt factor, &gt; 0 */
    public KramersFreeFree(double gauntFactor) {
        this.gauntFactor = ConvgridException.requireInRange("gauntFactor", gauntFactor, Double.MIN_NORMAL, 100.0, "");
    }

    /** Gaunt factor 1. */
    public KramersFreeFree() {
        this(1.0);
    }

    @Override
    public OpacityValue rosselandMean(double density, double temperature, Composition composition) {
        double ions = PlasmaMoments.chargeSquaredPerMass(composition);
        double kappa = COEFFICIENT * gauntFactor * (1.0 + composition.x()) * ions * density
                / (temperature * temperature * temperature * Math.sqrt(temperature));
        return new OpacityValue(kappa, 1.0, -3.5);
    }
}
