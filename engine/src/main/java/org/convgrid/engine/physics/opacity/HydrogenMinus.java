package org.convgrid.engine.physics.opacity;

import org.convgrid.engine.state.Composition;

/**
 * Negative-hydrogen-ion opacity of cool envelopes and photospheres, the power law
 * {@code kappa_H- = 2.5e-31 (Z/0.02) rho^(1/2) T^9} cm^2 g^-1 (Hansen, Kawaler &amp; Trimble 2004, Stellar
 * Interiors, ch. 4; also Carroll &amp; Ostlie 2007, ch. 9), stated for 3000 &lt; T &lt; 6000 K,
 * 1e-10 &lt; rho &lt; 1e-5, X ~ 0.7. The metals supply the electrons that form H^-, hence the Z scaling.
 * Outside that range it is used only inside the harmonic bracket of {@link AnalyticCompositeOpacity}, where its
 * steep rise is capped by the interior terms. Z is floored at {@link #METALLICITY_FLOOR} so the term never
 * vanishes (at Z = 0 hydrogen itself supplies some electrons; the floor is a numerical guard, not physics).
 */
public final class HydrogenMinus implements Opacity {

    /** Coefficient at Z = 0.02, cgs. */
    static final double COEFFICIENT = 2.5e-31;
    /** Reference metallicity of the power law. */
    static final double REFERENCE_Z = 0.02;
    /** Smallest metallicity used in the Z scaling. */
    public static final double METALLICITY_FLOOR = 1.0e-6;

    @Override
    public OpacityValue rosselandMean(double density, double temperature, Composition composition) {
        double t3 = temperature * temperature * temperature;
        double z = Math.max(composition.z(), METALLICITY_FLOOR);
        double kappa = COEFFICIENT * (z / REFERENCE_Z) * Math.sqrt(density) * t3 * t3 * t3;
        return new OpacityValue(kappa, 0.5, 9.0);
    }
}
