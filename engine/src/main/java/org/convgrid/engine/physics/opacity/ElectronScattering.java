package org.convgrid.engine.physics.opacity;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;

/**
 * Electron-scattering opacity with the degeneracy and Compton corrections of Buchler &amp; Yueh 1976
 * (ApJ 210, 440), in the fit as commonly quoted:
 * {@code kappa = kappa_T (1+X) / {[1 + 2.7e11 rho/T^2] [1 + (T/4.5e8)^0.86]}}, where
 * {@code kappa_T (1+X) = sigma_T (1+X)/(2 m_u)} = 0.2003 (1+X) cm^2 g^-1 is the Thomson value
 * (Carroll &amp; Ostlie 1996, p. 274, who round it to 0.2 (1+X)). The first factor is the reduction by electron
 * degeneracy (Pauli blocking), the second the Klein-Nishina/Compton reduction at high temperature.
 * Units: rho in g cm^-3, T in K, kappa in cm^2 g^-1.
 */
public final class ElectronScattering implements LogArgumentsOpacity {

    /** sigma_T/(2 m_u), cm^2 g^-1: Thomson opacity per (1+X). */
    public static final double THOMSON_PER_ONE_PLUS_X = Constants.SIGMA_THOMSON / (2.0 * Constants.M_U);
    /** Degeneracy factor coefficient, K^2 cm^3 g^-1 (Buchler &amp; Yueh 1976 fit). */
    static final double DEGENERACY_COEFFICIENT = 2.7e11;
    /** Compton factor temperature scale, K (Buchler &amp; Yueh 1976 fit). */
    static final double COMPTON_TEMPERATURE = 4.5e8;
    /** Compton factor exponent (Buchler &amp; Yueh 1976 fit). */
    static final double COMPTON_EXPONENT = 0.86;

    private static final double LN_COMPTON_TEMPERATURE = Math.log(COMPTON_TEMPERATURE);

    @Override
    public OpacityValue rosselandMean(double density, double temperature, Composition composition) {
        return rosselandMean(density, temperature, Math.log(density), Math.log(temperature), composition);
    }

    @Override
    public OpacityValue rosselandMean(double density, double temperature, double lnDensity, double lnTemperature,
                                      Composition composition) {
        double a = DEGENERACY_COEFFICIENT * density / (temperature * temperature);
        // (T/T_C)^0.86 as one exponential of the caller's ln T (a pow costs about two of them)
        double b = Math.exp(COMPTON_EXPONENT * (lnTemperature - LN_COMPTON_TEMPERATURE));
        double kappa = THOMSON_PER_ONE_PLUS_X * (1.0 + composition.x()) / ((1.0 + a) * (1.0 + b));
        double dRho = -a / (1.0 + a);
        double dT = 2.0 * a / (1.0 + a) - COMPTON_EXPONENT * b / (1.0 + b);
        return new OpacityValue(kappa, dRho, dT);
    }
}
