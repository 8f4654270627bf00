package org.convgrid.engine.physics.opacity;

import org.convgrid.engine.state.Composition;

/**
 * Molecular opacity of cool envelopes, the "molecules" row of the Bell &amp; Lin 1994 (ApJ 427, 987) piecewise
 * fit, {@code kappa = 1e-8 rho^(2/3) T^3} cm^2 g^-1 for solar composition (as tabulated by Keith &amp; Wardle
 * 2014, MNRAS 440, 89, Table 1), scaled by Z/0.02 (a common assumption, not part of Bell &amp; Lin) and
 * switched off smoothly above the dissociation of molecules by the factor
 * {@code 1/[1 + (T/T_diss)^n]}, T_diss = 4000 K, n = 8 (our choice: the Bell &amp; Lin rows hand over to H^-
 * between ~3700 and 5200 K for rho = 1e-9..1e-6, and an un-cut T^3 law would wrongly add ~10 cm^2 g^-1 at
 * 1e5 K). Below ~3000 K the cut-off changes the row by less than 10 %.
 */
public final class MolecularOpacity implements Opacity {

    /** Bell &amp; Lin 1994 molecular row coefficient, cgs. */
    static final double COEFFICIENT = 1.0e-8;
    /** Reference metallicity of the Bell &amp; Lin fit (solar). */
    static final double REFERENCE_Z = 0.02;
    /** Temperature where the cut-off halves the row, K. */
    public static final double DISSOCIATION_TEMPERATURE = 4000.0;
    /** Steepness of the cut-off. */
    static final int CUTOFF_POWER = 8;

    @Override
    public OpacityValue rosselandMean(double density, double temperature, Composition composition) {
        double cbrtRho = Math.cbrt(density);
        double w = temperature / DISSOCIATION_TEMPERATURE;
        double w2 = w * w;
        double w4 = w2 * w2;
        double cut = w4 * w4;
        double kappa = COEFFICIENT * (composition.z() / REFERENCE_Z) * cbrtRho * cbrtRho
                * temperature * temperature * temperature / (1.0 + cut);
        return new OpacityValue(kappa, 2.0 / 3.0, 3.0 - CUTOFF_POWER * cut / (1.0 + cut));
    }
}
