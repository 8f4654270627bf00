package org.convgrid.engine.physics.atmosphere;

import org.apache.commons.math3.analysis.solvers.BrentSolver;

/**
 * The empirical solar T(tau) relation of Krishna Swamy (1966, ApJ 145, 174), as a Hopf function
 * q(tau) = 1.39 - 0.815 exp(-2.54 tau) - 0.025 exp(-30 tau) (coefficients from memory).
 * T = Teff near tau = 0.312, which the constructor finds by root finding.
 */
public record KrishnaSwamy() implements TemperatureTauRelation {

    static final double Q_INFINITY = 1.39;
    static final double A1 = 0.815;
    static final double K1 = 2.54;
    static final double A2 = 0.025;
    static final double K2 = 30.0;

    /** tau + q(tau) = 4/3 solved once (the left side increases with tau). */
    private static final double PHOTOSPHERE = new BrentSolver(1e-15, 1e-15)
            .solve(100, t -> t + Q_INFINITY - A1 * Math.exp(-K1 * t) - A2 * Math.exp(-K2 * t) - 4.0 / 3.0,
                    0.0, 4.0 / 3.0);

    @Override
    public double hopf(double tau) {
        return Q_INFINITY - A1 * Math.exp(-K1 * tau) - A2 * Math.exp(-K2 * tau);
    }

    @Override
    public double hopfSlope(double tau) {
        return A1 * K1 * Math.exp(-K1 * tau) + A2 * K2 * Math.exp(-K2 * tau);
    }

    @Override
    public double photosphericDepth() {
        return PHOTOSPHERE;
    }
}
