package org.convgrid.engine.physics.atmosphere;

import org.convgrid.engine.physics.opacity.Opacity;
import org.convgrid.engine.physics.opacity.OpacityValue;

/** Test doubles for the Rosseland mean. */
final class TestOpacities {

    private TestOpacities() {
    }

    /** A constant kappa, cm^2 g^-1. */
    static Opacity constant(double kappa) {
        return (rho, t, c) -> new OpacityValue(kappa, 0.0, 0.0);
    }

    /** kappa = k0 rho^a T^b. */
    static Opacity powerLaw(double k0, double a, double b) {
        return (rho, t, c) -> new OpacityValue(k0 * Math.pow(rho, a) * Math.pow(t, b), a, b);
    }

    /**
     * kappa = kappa_mol + 1/(1/kappa_H- + 1/(kappa_es + kappa_Kr)), a common analytic blend: kappa_es = 0.2(1+X),
     * Kramers 4e25 (1+X)(Z+0.001) rho T^-3.5, H^- 2.5e-31 (Z/0.02) rho^1/2 T^9 (Hansen, Kawaler &amp; Trimble
     * 2004 ch. 4; the blend from memory), molecular floor 0.1 Z. Logarithmic derivatives analytic.
     */
    static Opacity blend() {
        return (rho, t, c) -> {
            double x = c.x();
            double z = c.z();
            double es = 0.2 * (1.0 + x);
            double kr = 4.0e25 * (1.0 + x) * (z + 0.001) * rho * Math.pow(t, -3.5);
            double hm = 2.5e-31 * (z / 0.02) * Math.sqrt(rho) * Math.pow(t, 9.0);
            double mol = 0.1 * z;
            double inner = es + kr;
            double comb = 1.0 / (1.0 / hm + 1.0 / inner);
            double kappa = mol + comb;
            // d comb = comb^2 (d hm / hm^2 + d inner / inner^2)
            double wHm = comb / hm;
            double wIn = comb / inner;
            double dRho = comb / kappa * (wHm * 0.5 + wIn * kr / inner);
            double dT = comb / kappa * (wHm * 9.0 - wIn * 3.5 * kr / inner);
            return new OpacityValue(kappa, dRho, dT);
        };
    }
}
