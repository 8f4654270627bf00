package org.convgrid.engine.physics.opacity;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.state.Composition;

/**
 * Kramers bound-free opacity of the metals with a temperature-dependent guillotine factor,
 * {@code kappa_bf = 4.34e25 (g_bf/t(T)) Z (1+X) rho T^-3.5} cm^2 g^-1 (coefficient: Carroll &amp; Ostlie 1996,
 * p. 274, who give t "typically 1-100").
 *
 * <p><b>Guillotine choice (documented fit).</b> A constant t cannot serve a whole star: with t = 1 the law gives
 * ~18 cm^2 g^-1 at the base of the solar convection zone (T = 2.2e6 K, rho = 0.19), close to the opacity
 * tables (~20), but ~12 at the solar centre where the tables give ~1.2-1.3, because there the K and L shells of
 * the abundant metals are stripped and few bound electrons remain to absorb. We therefore let the guillotine
 * grow once the metals strip:
 * <pre>  t(T) = [1 + (T/T_knee)^(p s)]^(1/s)</pre>
 * which is 1 below ~T_knee and ~(T/T_knee)^p above it (s sets the sharpness of the knee). The default
 * T_knee = 2.8e6 K, p = 1.9, s = 4 were fitted (least squares in ln kappa, solar-centre and convection-zone-base
 * points weighted 3, two mid radiative-zone points weighted 1) to the Rosseland means listed in
 * {@code reference/opacity/solar-interior-opal.txt} (OPAL/OP values, partly from memory; see that file).
 * The fit is one-dimensional in T because the solar interior lies on nearly constant log R = -1.4 to -1.75;
 * at other densities the true t also varies with rho (Saha), which this form ignores. g_bf is folded into t.
 */
public final class KramersBoundFree implements Opacity {

    /** Carroll &amp; Ostlie 1996 coefficient, cgs. */
    static final double COEFFICIENT = 4.34e25;
    /** Fitted knee temperature, K (see class comment). */
    public static final double DEFAULT_KNEE_TEMPERATURE = 2.8e6;
    /** Fitted high-temperature slope of ln t versus ln T. */
    public static final double DEFAULT_SLOPE = 1.9;
    /** Sharpness of the knee. */
    public static final double DEFAULT_SHARPNESS = 4.0;

    private final double kneeTemperature;
    private final double slope;
    private final double sharpness;

    /**
     * @param kneeTemperature K, where the guillotine starts to grow
     * @param slope dln t/dln T well above the knee (0 gives the classic constant t = 1)
     * @param sharpness s of the knee, &gt;= 1
     */
    public KramersBoundFree(double kneeTemperature, double slope, double sharpness) {
        this.kneeTemperature = ConvgridException.requireInRange("kneeTemperature", kneeTemperature, 1.0, 1.0e10, "K");
        this.slope = ConvgridException.requireInRange("slope", slope, 0.0, 10.0, "");
        this.sharpness = ConvgridException.requireInRange("sharpness", sharpness, 1.0, 50.0, "");
    }

    /** The fitted default guillotine. */
    public KramersBoundFree() {
        this(DEFAULT_KNEE_TEMPERATURE, DEFAULT_SLOPE, DEFAULT_SHARPNESS);
    }

    /** The guillotine factor t(T) (dimensionless, &gt;= 1). */
    public double guillotine(double temperature) {
        double u = Math.pow(temperature / kneeTemperature, slope * sharpness);
        return Math.pow(1.0 + u, 1.0 / sharpness);
    }

    @Override
    public OpacityValue rosselandMean(double density, double temperature, Composition composition) {
        double u = Math.pow(temperature / kneeTemperature, slope * sharpness);
        double lnT = Math.log1p(u) / sharpness;
        double kappa = COEFFICIENT * composition.z() * (1.0 + composition.x()) * density
                / (temperature * temperature * temperature * Math.sqrt(temperature)) * Math.exp(-lnT);
        return new OpacityValue(kappa, 1.0, -3.5 - slope * u / (1.0 + u));
    }
}
