package org.convgrid.engine.physics.opacity;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;

/**
 * Envelope absorption missing from the Kramers terms between ~1e4 and ~1e6 K: hydrogenic bound-free absorption
 * of the recombining H and He, and the bound-bound/bound-free "Z bump" of the iron-group and CNO-Ne metals.
 * Documented empirical form (cm^2 g^-1), with R = rho/T6^3 as in the opacity tables:
 * <pre>
 *   kappa_env = (1+X) rho T^-3.5 [ a_H X (1e5 K/T)^p y_H(rho, T)
 *                                 + a_Z (Z/0.02) exp(-(log T - log T_Z)^2 / (2 w^2)) (R/1e-3)^(-q) ]
 *   y_H = s/(1+s),  s = (2 m_u/((1+X) rho)) (2 pi m_e k T/h^2)^(3/2) exp(-chi_H/kT),  chi_H = 13.598 eV
 * </pre>
 * The first bracket is the Kramers form for bound-free absorption by recombined hydrogenic ions, switched on by the
 * Saha ionisation fraction y_H of hydrogen (electron density taken at full ionisation, n_e = (1+X) rho/(2 m_u),
 * which keeps the term a smooth closed form; statistical-weight ratio 2 g_II/g_I = 1); below ~1e4 K hydrogen is
 * neutral, the term vanishes and H^- takes over, so the photosphere is unchanged. The second is a Gaussian in
 * log T proportional to Z for the metal-line bump; its weaker-than-Kramers density scaling (rho^(1-q)) mimics
 * lines that saturate less at low density.
 *
 * <p>{@link #EnvelopeAbsorption()} uses a_H = 10^23.37, p = 1.09, a_Z = 10^24.91, log T_Z = 5.16, w = 0.368,
 * q = 0.22 (cgs), fitted (least squares in log kappa, inside the standard composite of
 * {@link AnalyticCompositeOpacity}) to the OPAL Rosseland means of Iglesias &amp; Rogers 1996 (ApJ 464, 943; GN93,
 * X = 0.70, Z = 0.02; {@code reference/opacity/opal-gn93-x070-z002.txt}) over 4.0 &lt;= log T &lt;= 6.0,
 * -6 &lt;= log R &lt;= -1, while holding the composite's values at 6.3 &lt;= log T &lt;= 7.5 and in the H^-
 * photosphere fixed. Result: 0.15 dex rms, 0.43 dex worst (log T 4.65, log R -1) against 0.54 rms and 1.04 worst
 * before. Above log R ~ -1 the Kramers terms already overshoot OPAL, which no added term can repair.
 */
public final class EnvelopeAbsorption implements LogArgumentsOpacity {

    /** Fitted log10 of the hydrogenic coefficient a_H, cgs. */
    public static final double FITTED_LOG_HYDROGEN_COEFFICIENT = 23.37;
    /** Fitted temperature exponent p of the hydrogenic term, relative to Kramers. */
    public static final double FITTED_HYDROGEN_SLOPE = 1.09;
    /** Fitted log10 of the Z-bump coefficient a_Z, cgs. */
    public static final double FITTED_LOG_BUMP_COEFFICIENT = 24.91;
    /** Fitted log10 of the Z-bump centre temperature, K. */
    public static final double FITTED_LOG_BUMP_TEMPERATURE = 5.16;
    /** Fitted Gaussian width w of the Z bump in log10 T. */
    public static final double FITTED_BUMP_WIDTH = 0.368;
    /** Fitted exponent q: the bump scales as R^-q at fixed T. */
    public static final double FITTED_BUMP_DENSITY_EXPONENT = 0.22;

    /** Hydrogen ionisation energy over k, K. */
    static final double HYDROGEN_IONISATION_TEMPERATURE = 13.598 * Constants.EV / Constants.K_B;
    /** 2 m_u (2 pi m_e k/h^2)^(3/2): the Saha factor per T^(3/2) per (rho/(1+X)), cgs. */
    static final double SAHA_FACTOR = 2.0 * Constants.M_U
            * Math.pow(2.0 * Math.PI * Constants.M_E * Constants.K_B / (Constants.H * Constants.H), 1.5);
    static final double REFERENCE_TEMPERATURE = 1.0e5;
    static final double REFERENCE_Z = 0.02;
    static final double REFERENCE_R = 1.0e-3;
    private static final double LN10 = Math.log(10.0);
    private static final double LN_REFERENCE_TEMPERATURE = Math.log(REFERENCE_TEMPERATURE);
    /** ln(R/R_ref) = ln rho - 3 ln T + this: ln R = ln rho - 3 ln T + 18 ln 10 (T6 = T/1e6 K). */
    private static final double LN_R_OFFSET = 18.0 * LN10 - Math.log(REFERENCE_R);

    private final double hydrogenCoefficient;
    private final double hydrogenSlope;
    private final double bumpCoefficient;
    private final double logBumpTemperature;
    private final double bumpWidth;
    private final double bumpDensityExponent;

    /**
     * @param hydrogenCoefficient a_H, cgs, &gt;= 0
     * @param hydrogenSlope p
     * @param bumpCoefficient a_Z, cgs, &gt;= 0
     * @param logBumpTemperature log10 T_Z, T in K
     * @param bumpWidth w in log10 T, &gt; 0
     * @param bumpDensityExponent q
     */
    public EnvelopeAbsorption(double hydrogenCoefficient, double hydrogenSlope, double bumpCoefficient,
                              double logBumpTemperature, double bumpWidth, double bumpDensityExponent) {
        this.hydrogenCoefficient = ConvgridException.requireInRange("hydrogenCoefficient", hydrogenCoefficient,
                0.0, 1.0e30, "cgs");
        this.hydrogenSlope = ConvgridException.requireInRange("hydrogenSlope", hydrogenSlope, -5.0, 5.0, "");
        this.bumpCoefficient = ConvgridException.requireInRange("bumpCoefficient", bumpCoefficient, 0.0, 1.0e30,
                "cgs");
        this.logBumpTemperature = ConvgridException.requireInRange("logBumpTemperature", logBumpTemperature, 3.0,
                8.0, "log K");
        this.bumpWidth = ConvgridException.requireInRange("bumpWidth", bumpWidth, 0.01, 2.0, "dex");
        this.bumpDensityExponent = ConvgridException.requireInRange("bumpDensityExponent", bumpDensityExponent,
                -1.0, 1.0, "");
    }

    /** The OPAL-fitted set (see class comment). */
    public EnvelopeAbsorption() {
        this(Math.pow(10.0, FITTED_LOG_HYDROGEN_COEFFICIENT), FITTED_HYDROGEN_SLOPE,
                Math.pow(10.0, FITTED_LOG_BUMP_COEFFICIENT), FITTED_LOG_BUMP_TEMPERATURE, FITTED_BUMP_WIDTH,
                FITTED_BUMP_DENSITY_EXPONENT);
    }

    /** The hydrogen ionised fraction y_H of the class comment at rho (g cm^-3), T (K) and hydrogen fraction X. */
    public static double hydrogenIonisedFraction(double density, double temperature, double x) {
        return ionisedFraction(lnSaha(density, temperature, x));
    }

    @Override
    public OpacityValue rosselandMean(double density, double temperature, Composition composition) {
        return rosselandMean(density, temperature, Math.log(density), Math.log(temperature), composition);
    }

    @Override
    public OpacityValue rosselandMean(double density, double temperature, double lnDensity, double lnTemperature,
                                      Composition composition) {
        double x = composition.x();
        double kramers = (1.0 + x) * density / (temperature * temperature * temperature * Math.sqrt(temperature));
        // hydrogenic term: dln y/dln rho = -(1-y), dln y/dln T = (1-y)(3/2 + chi/kT)
        double y = ionisedFraction(lnSaha(density, temperature, x));
        double hK = hydrogenCoefficient * x * kramers * Math.exp(hydrogenSlope
                * (LN_REFERENCE_TEMPERATURE - lnTemperature)) * y;
        double hRho = y; // 1 - (1 - y)
        double hT = -3.5 - hydrogenSlope + (1.0 - y) * (1.5 + HYDROGEN_IONISATION_TEMPERATURE / temperature);
        // Z bump: Gaussian in log T times R^-q, R = rho/T6^3
        double u = (lnTemperature / LN10 - logBumpTemperature) / bumpWidth;
        double zK = bumpCoefficient * (composition.z() / REFERENCE_Z) * kramers * Math.exp(-0.5 * u * u
                - bumpDensityExponent * (lnDensity - 3.0 * lnTemperature + LN_R_OFFSET));
        double zRho = 1.0 - bumpDensityExponent;
        double zT = -3.5 - u / (bumpWidth * LN10) + 3.0 * bumpDensityExponent;
        double kappa = hK + zK;
        if (kappa <= 0.0) {
            return new OpacityValue(0.0, 0.0, 0.0);
        }
        return new OpacityValue(kappa, (hK * hRho + zK * zRho) / kappa, (hK * hT + zK * zT) / kappa);
    }

    private static double lnSaha(double density, double temperature, double x) {
        return Math.log(SAHA_FACTOR * temperature * Math.sqrt(temperature) / ((1.0 + x) * density))
                - HYDROGEN_IONISATION_TEMPERATURE / temperature;
    }

    /** y = s/(1+s) from ln s, without overflow. */
    private static double ionisedFraction(double lnS) {
        double e = Math.exp(lnS > 0.0 ? -lnS : lnS);
        return lnS > 0.0 ? 1.0 / (1.0 + e) : e / (1.0 + e);
    }
}
