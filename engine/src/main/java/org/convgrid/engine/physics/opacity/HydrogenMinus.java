package org.convgrid.engine.physics.opacity;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.state.Composition;

/**
 * Negative-hydrogen-ion opacity of cool envelopes and photospheres as a sum of power laws,
 * {@code kappa_H- = (Z/0.02) [k_1 rho^a_1 (T/5000 K)^b_1 + k_2 rho^a_2 (T/5000 K)^b_2]} cm^2 g^-1. The first
 * term stands for the textbook law (electrons from the easily ionised metals, hence the Z scaling); the
 * second, much steeper in T, stands for the extra electrons that hydrogen ionisation supplies above ~7000 K.
 * Outside its range the sum is used only inside the harmonic bracket of {@link AnalyticCompositeOpacity}, where
 * its steep rise is capped by the interior terms. Z is floored at {@link #METALLICITY_FLOOR} so the term never
 * vanishes (a numerical guard, not physics).
 *
 * <p>Parameter sets:
 * <ul>
 * <li>{@link #hansenKawalerTrimble()}: the textbook law {@code 2.5e-31 (Z/0.02) rho^(1/2) T^9} (Hansen, Kawaler
 * &amp; Trimble 2004, Stellar Interiors, ch. 4; Carroll &amp; Ostlie 2007, ch. 9), i.e. k_1 = 488, a_1 = 1/2,
 * b_1 = 9, no second term, stated for 3000 &lt; T &lt; 6000 K, 1e-10 &lt; rho &lt; 1e-5, X ~ 0.7. Inside the
 * composite it is a factor ~3 above the OPAL tables at the solar photosphere.</li>
 * <li>{@link #HydrogenMinus()}: k_1 = 2130, a_1 = 0.648, b_1 = 7.58 plus k_2 = 8.54e-4, a_2 = 0, b_2 = 17.0,
 * fitted (least squares in log kappa, with the rest of the standard composite in place; a_2 fixed at 0, which a
 * first fit gave to 0.002) to the OPAL Rosseland means of Iglesias &amp; Rogers 1996 (GN93, X = 0.70, Z = 0.02)
 * over 3.75 &lt;= log T &lt;= 3.90 and -2 &lt;= log R &lt;= 1: rms 0.05 dex over 3.75-3.85 (0.13 worst), 0.08
 * dex over 3.75-3.90, -3 &lt;= log R &lt;= 1. b_1 is close to the OPAL slope d log kappa/d log T ~ 7.6 between
 * the two coolest rows at the solar photospheric log R ~ 0.5. A single power law fitted to the
 * same window (k = 41.5, a = 0.437, b = 11.0, rms 0.15 dex, still available through the three-argument
 * constructor) is driven by the hydrogen-ionisation rows and is too steep at the photosphere: it fell 0.1-0.45
 * dex below OPAL at log T 3.75-3.80, and further below in the extrapolation to the grey atmosphere
 * (T &gt;= 0.84 Teff), which made the photospheric pressure of a solar model ~40 % too high and its radius
 * ~5 % too small. Below 5600 K (the coolest OPAL row) both are extrapolations.</li>
 * </ul>
 */
public final class HydrogenMinus implements LogArgumentsOpacity {

    /** Reference metallicity of the power law. */
    static final double REFERENCE_Z = 0.02;
    /** Reference temperature of the coefficient, K. */
    static final double REFERENCE_TEMPERATURE = 5000.0;
    /** Smallest metallicity used in the Z scaling. */
    public static final double METALLICITY_FLOOR = 1.0e-6;
    /** Fitted coefficient k_1 of the metal-electron term at 5000 K, rho = 1, Z = 0.02, cgs (see class comment). */
    public static final double FITTED_COEFFICIENT = 2130.0;
    /** Fitted density exponent a_1 of the metal-electron term. */
    public static final double FITTED_DENSITY_EXPONENT = 0.648;
    /** Fitted temperature exponent b_1 of the metal-electron term. */
    public static final double FITTED_TEMPERATURE_EXPONENT = 7.58;
    /** Fitted coefficient k_2 of the hydrogen-electron term at 5000 K, Z = 0.02, cgs. */
    public static final double FITTED_HOT_COEFFICIENT = 8.54e-4;
    /** Density exponent a_2 of the hydrogen-electron term. */
    public static final double FITTED_HOT_DENSITY_EXPONENT = 0.0;
    /** Fitted temperature exponent b_2 of the hydrogen-electron term. */
    public static final double FITTED_HOT_TEMPERATURE_EXPONENT = 17.0;

    private final double coefficient;
    private final double densityExponent;
    private final double temperatureExponent;
    private final double hotCoefficient;
    private final double hotDensityExponent;
    private final double hotTemperatureExponent;

    /**
     * A single power law (no second term).
     *
     * @param coefficient kappa at T = 5000 K, rho = 1 g cm^-3, Z = 0.02, cm^2 g^-1
     * @param densityExponent a
     * @param temperatureExponent b
     */
    public HydrogenMinus(double coefficient, double densityExponent, double temperatureExponent) {
        this(coefficient, densityExponent, temperatureExponent, 0.0, 0.0, 0.0);
    }

    /**
     * Two power laws.
     *
     * @param coefficient k_1: first term at T = 5000 K, rho = 1 g cm^-3, Z = 0.02, cm^2 g^-1, &gt; 0
     * @param densityExponent a_1
     * @param temperatureExponent b_1
     * @param hotCoefficient k_2: second term, same units, &gt;= 0 (0: no second term)
     * @param hotDensityExponent a_2
     * @param hotTemperatureExponent b_2
     */
    public HydrogenMinus(double coefficient, double densityExponent, double temperatureExponent,
                         double hotCoefficient, double hotDensityExponent, double hotTemperatureExponent) {
        this.hotCoefficient = ConvgridException.requireInRange("hotCoefficient", hotCoefficient, 0.0, 1e30, "cgs");
        this.hotDensityExponent = ConvgridException.requireInRange("hotDensityExponent", hotDensityExponent, 0.0,
                2.0, "");
        this.hotTemperatureExponent = ConvgridException.requireInRange("hotTemperatureExponent",
                hotTemperatureExponent, 0.0, 30.0, "");
        this.coefficient = ConvgridException.requireInRange("coefficient", coefficient, Double.MIN_NORMAL, 1e30, "cgs");
        this.densityExponent = ConvgridException.requireInRange("densityExponent", densityExponent, 0.0, 2.0, "");
        this.temperatureExponent = ConvgridException.requireInRange("temperatureExponent", temperatureExponent, 0.0,
                30.0, "");
    }

    /** The two power laws fitted to OPAL (see class comment). */
    public HydrogenMinus() {
        this(FITTED_COEFFICIENT, FITTED_DENSITY_EXPONENT, FITTED_TEMPERATURE_EXPONENT, FITTED_HOT_COEFFICIENT,
                FITTED_HOT_DENSITY_EXPONENT, FITTED_HOT_TEMPERATURE_EXPONENT);
    }

    /** The textbook law 2.5e-31 (Z/0.02) rho^(1/2) T^9 (Hansen, Kawaler &amp; Trimble 2004). */
    public static HydrogenMinus hansenKawalerTrimble() {
        return new HydrogenMinus(2.5e-31 * Math.pow(REFERENCE_TEMPERATURE, 9.0), 0.5, 9.0);
    }

    private static final double LN_REFERENCE_TEMPERATURE = Math.log(REFERENCE_TEMPERATURE);

    @Override
    public OpacityValue rosselandMean(double density, double temperature, Composition composition) {
        return rosselandMean(density, temperature, Math.log(density), Math.log(temperature), composition);
    }

    @Override
    public OpacityValue rosselandMean(double density, double temperature, double lnDensity, double lnTemperature,
                                      Composition composition) {
        double z = Math.max(composition.z(), METALLICITY_FLOOR);
        double lnRho = lnDensity;
        double lnTheta = lnTemperature - LN_REFERENCE_TEMPERATURE;
        double scale = z / REFERENCE_Z;
        double cool = coefficient * scale * Math.exp(densityExponent * lnRho + temperatureExponent * lnTheta);
        double hot = hotCoefficient == 0.0 ? 0.0
                : hotCoefficient * scale * Math.exp(hotDensityExponent * lnRho + hotTemperatureExponent * lnTheta);
        double kappa = cool + hot;
        // logarithmic derivatives of a sum: weights k_i/kappa
        return new OpacityValue(kappa, (cool * densityExponent + hot * hotDensityExponent) / kappa,
                (cool * temperatureExponent + hot * hotTemperatureExponent) / kappa);
    }
}
