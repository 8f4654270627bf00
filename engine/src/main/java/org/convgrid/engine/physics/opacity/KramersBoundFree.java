package org.convgrid.engine.physics.opacity;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.state.Composition;

/**
 * Kramers bound-free opacity of the metals with a guillotine factor that depends on temperature and density,
 * {@code kappa_bf = 4.34e25 (g_bf/t(T, R)) Z (1+X) rho T^-3.5} cm^2 g^-1 (coefficient: Carroll &amp; Ostlie 1996,
 * p. 274, who give t "typically 1-100"), with {@code R = rho / T6^3} (T6 = T/1e6 K) as in the opacity tables.
 *
 * <p><b>Guillotine choice (documented fit).</b> A constant t cannot serve a whole star: t = 1 suits the base of
 * the solar convection zone but overestimates the solar centre tenfold, where the K and L shells of the abundant
 * metals are stripped. We let t grow once the metals strip, at a knee temperature that rises as the density
 * falls at fixed R (lower density, fewer recombinations, earlier stripping):
 * <pre>
 *   t = [1 + (T/T_knee(R))^(p s)]^(1/s),   T_knee(R) = T_0 (R/R_0)^(-c),   R_0 = 10^-1.5
 * </pre>
 * which is 1 well below the knee and ~(T/T_knee)^p above it. {@link AnalyticCompositeOpacity#standard()} uses
 * T_0 = 2.04e6 K, p = 1.567, c = 0.420, s = 11.2, fitted together with the composite's degeneracy factor
 * (least squares in log kappa) to the OPAL Rosseland means of Iglesias &amp; Rogers 1996 (ApJ 464, 943; GN93
 * tables for Z = 0.02, X = 0.70 and 0.35) over 6.0 &lt;= log T &lt;= 7.5 and -3.5 &lt;= log R &lt;= -0.5, the
 * points with -2.25 &lt;= log R &lt;= -0.75 (low- and intermediate-mass main-sequence interiors) weighted 2.
 * The fitted points are in {@code reference/opacity/opal-gn93-*.txt}; the residuals are listed by the tests.
 * The guillotine absorbs g_bf and, in effect, the metal bound-bound absorption that OPAL includes.
 * With c = 0 the form reduces to a temperature-only guillotine (c = 0, p = 0 gives the classic constant t).
 */
public final class KramersBoundFree implements LogArgumentsOpacity {

    /** Carroll &amp; Ostlie 1996 coefficient, cgs. */
    static final double COEFFICIENT = 4.34e25;
    /** Fitted knee temperature at R = R_0, K (see class comment). */
    public static final double FITTED_KNEE_TEMPERATURE = 2.04e6;
    /** Fitted high-temperature slope p of ln t versus ln T. */
    public static final double FITTED_SLOPE = 1.567;
    /** Fitted exponent c of the knee's density dependence, T_knee ~ R^-c. */
    public static final double FITTED_DENSITY_EXPONENT = 0.420;
    /** Fitted sharpness s of the knee. */
    public static final double FITTED_SHARPNESS = 11.2;
    /** Reference R = rho/T6^3 of the knee temperature, g cm^-3. */
    static final double REFERENCE_R = Math.pow(10.0, -1.5);
    /** ln(R/R_0) = ln rho - 3 ln T + this: ln R = ln rho - 3 ln T + 18 ln 10 (T6 = T/1e6 K). */
    private static final double LN_R_OFFSET = 18.0 * Math.log(10.0) - Math.log(REFERENCE_R);

    private final double kneeTemperature;
    private final double slope;
    private final double densityExponent;
    private final double sharpness;
    private final double lnKneeTemperature;

    /**
     * @param kneeTemperature K, where the guillotine starts to grow (at R = R_0)
     * @param slope dln t/dln T well above the knee (0 gives a constant t)
     * @param densityExponent c in T_knee ~ R^-c (0: the knee is density-blind)
     * @param sharpness s of the knee, &gt;= 1
     */
    public KramersBoundFree(double kneeTemperature, double slope, double densityExponent, double sharpness) {
        this.kneeTemperature = ConvgridException.requireInRange("kneeTemperature", kneeTemperature, 1.0, 1.0e10, "K");
        this.slope = ConvgridException.requireInRange("slope", slope, 0.0, 10.0, "");
        this.densityExponent = ConvgridException.requireInRange("densityExponent", densityExponent, -2.0, 2.0, "");
        this.sharpness = ConvgridException.requireInRange("sharpness", sharpness, 1.0, 50.0, "");
        this.lnKneeTemperature = Math.log(kneeTemperature);
    }

    /** A temperature-only guillotine (the knee does not move with density). */
    public KramersBoundFree(double kneeTemperature, double slope, double sharpness) {
        this(kneeTemperature, slope, 0.0, sharpness);
    }

    /** The fitted default guillotine. */
    public KramersBoundFree() {
        this(FITTED_KNEE_TEMPERATURE, FITTED_SLOPE, FITTED_DENSITY_EXPONENT, FITTED_SHARPNESS);
    }

    /** The guillotine factor t (dimensionless, &gt;= 1) at density rho (g cm^-3) and temperature T (K). */
    public double guillotine(double density, double temperature) {
        double lnU = lnU(Math.log(density), Math.log(temperature));
        return Math.exp(lnGuillotine(lnU, expOfMinusAbs(lnU)));
    }

    @Override
    public OpacityValue rosselandMean(double density, double temperature, Composition composition) {
        return rosselandMean(density, temperature, Math.log(density), Math.log(temperature), composition);
    }

    @Override
    public OpacityValue rosselandMean(double density, double temperature, double lnDensity, double lnTemperature,
                                      Composition composition) {
        double lnU = lnU(lnDensity, lnTemperature);
        // one exponential serves w and the guillotine (the same value three calls gave; this is a hot path)
        double e = expOfMinusAbs(lnU);
        // w = u/(1+u) without overflow
        double w = lnU > 0.0 ? 1.0 / (1.0 + e) : e / (1.0 + e);
        double kappa = COEFFICIENT * composition.z() * (1.0 + composition.x()) * density
                / (temperature * temperature * temperature * Math.sqrt(temperature))
                * Math.exp(-lnGuillotine(lnU, e));
        // ln u = p s [ln(T/T0) + c ln(R/R0)], R ~ rho T^-3: dln u/dln rho = p s c, dln u/dln T = p s (1 - 3c)
        return new OpacityValue(kappa, 1.0 - slope * densityExponent * w,
                -3.5 - slope * (1.0 - 3.0 * densityExponent) * w);
    }

    /** ln u from ln rho and ln T (no logarithm of its own: the caller's serve). */
    private double lnU(double lnDensity, double lnTemperature) {
        return slope * sharpness * (lnTemperature - lnKneeTemperature
                + densityExponent * (lnDensity - 3.0 * lnTemperature + LN_R_OFFSET));
    }

    /** exp(-|ln u|): 1/u for ln u &gt; 0, u otherwise, so that it never overflows. */
    private static double expOfMinusAbs(double lnU) {
        return Math.exp(lnU > 0.0 ? -lnU : lnU);
    }

    /**
     * ln(1 + e) for 0 &lt;= e &lt;= 1: e itself below 2^-54, where {@link StrictMath#log1p} (fdlibm, which
     * {@link Math#log1p} delegates to) returns its argument unchanged, so the result is the same to the last bit;
     * the call is skipped because it is a native call, and far from the knee (cool envelopes, hot interiors) the
     * argument is that small.
     */
    private static double log1pOfTiny(double e) {
        return e < 0x1.0p-54 ? e : Math.log1p(e);
    }

    /** ln t = ln(1 + u)/s, evaluated without overflow for large ln u; e = {@link #expOfMinusAbs}(ln u). */
    private double lnGuillotine(double lnU, double e) {
        double ln1pU = lnU > 0.0 ? lnU + log1pOfTiny(e) : log1pOfTiny(e);
        return ln1pU / sharpness;
    }
}
