package org.convgrid.engine.physics.opacity;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.state.Composition;

/**
 * Negative-hydrogen-ion opacity of cool envelopes and photospheres as a power law,
 * {@code kappa_H- = k_5000 (Z/0.02) rho^a (T/5000 K)^b} cm^2 g^-1. The metals supply the electrons that form
 * H^-, hence the Z scaling. Outside its range it is used only inside the harmonic bracket of
 * {@link AnalyticCompositeOpacity}, where its steep rise is capped by the interior terms. Z is floored at
 * {@link #METALLICITY_FLOOR} so the term never vanishes (a numerical guard, not physics).
 *
 * <p>Two parameter sets:
 * <ul>
 * <li>{@link #hansenKawalerTrimble()}: the textbook law {@code 2.5e-31 (Z/0.02) rho^(1/2) T^9} (Hansen, Kawaler
 * &amp; Trimble 2004, Stellar Interiors, ch. 4; Carroll &amp; Ostlie 2007, ch. 9), i.e. k_5000 = 488, a = 1/2,
 * b = 9, stated for 3000 &lt; T &lt; 6000 K, 1e-10 &lt; rho &lt; 1e-5, X ~ 0.7. Inside the composite it is a
 * factor ~3 above the OPAL tables at the solar photosphere.</li>
 * <li>{@link #HydrogenMinus()}: k_5000 = 41.5, a = 0.437, b = 11.0, fitted (least squares in log kappa, with
 * the rest of the standard composite in place) to the OPAL Rosseland means of Iglesias &amp; Rogers 1996
 * (GN93, X = 0.70, Z = 0.02) over 3.75 &lt;= log T &lt;= 3.90 and -3 &lt;= log R &lt;= 1, where H^- dominates;
 * rms 0.15 dex there. Below 5600 K (the coolest OPAL row) it is an extrapolation.</li>
 * </ul>
 */
public final class HydrogenMinus implements Opacity {

    /** Reference metallicity of the power law. */
    static final double REFERENCE_Z = 0.02;
    /** Reference temperature of the coefficient, K. */
    static final double REFERENCE_TEMPERATURE = 5000.0;
    /** Smallest metallicity used in the Z scaling. */
    public static final double METALLICITY_FLOOR = 1.0e-6;
    /** Fitted coefficient at 5000 K, rho = 1, Z = 0.02, cgs (see class comment). */
    public static final double FITTED_COEFFICIENT = 41.5;
    /** Fitted density exponent. */
    public static final double FITTED_DENSITY_EXPONENT = 0.437;
    /** Fitted temperature exponent. */
    public static final double FITTED_TEMPERATURE_EXPONENT = 11.0;

    private final double coefficient;
    private final double densityExponent;
    private final double temperatureExponent;

    /**
     * @param coefficient kappa at T = 5000 K, rho = 1 g cm^-3, Z = 0.02, cm^2 g^-1
     * @param densityExponent a
     * @param temperatureExponent b
     */
    public HydrogenMinus(double coefficient, double densityExponent, double temperatureExponent) {
        this.coefficient = ConvgridException.requireInRange("coefficient", coefficient, Double.MIN_NORMAL, 1e30, "cgs");
        this.densityExponent = ConvgridException.requireInRange("densityExponent", densityExponent, 0.0, 2.0, "");
        this.temperatureExponent = ConvgridException.requireInRange("temperatureExponent", temperatureExponent, 0.0,
                30.0, "");
    }

    /** The power law fitted to OPAL (see class comment). */
    public HydrogenMinus() {
        this(FITTED_COEFFICIENT, FITTED_DENSITY_EXPONENT, FITTED_TEMPERATURE_EXPONENT);
    }

    /** The textbook law 2.5e-31 (Z/0.02) rho^(1/2) T^9 (Hansen, Kawaler &amp; Trimble 2004). */
    public static HydrogenMinus hansenKawalerTrimble() {
        return new HydrogenMinus(2.5e-31 * Math.pow(REFERENCE_TEMPERATURE, 9.0), 0.5, 9.0);
    }

    @Override
    public OpacityValue rosselandMean(double density, double temperature, Composition composition) {
        double z = Math.max(composition.z(), METALLICITY_FLOOR);
        double kappa = coefficient * (z / REFERENCE_Z) * Math.exp(densityExponent * Math.log(density)
                + temperatureExponent * Math.log(temperature / REFERENCE_TEMPERATURE));
        return new OpacityValue(kappa, densityExponent, temperatureExponent);
    }
}
