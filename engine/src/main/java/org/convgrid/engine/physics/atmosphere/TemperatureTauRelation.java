package org.convgrid.engine.physics.atmosphere;

/**
 * A grey temperature stratification written with a Hopf function q: (T/Teff)^4 = (3/4)(tau + q(tau)),
 * tau the Rosseland optical depth (Chandrasekhar 1935, Proc. Camb. Phil. Soc. 31, 390; Ball 2021, RNAAS 5, 7
 * for the general form). T scales with Teff at fixed tau. Implementations are immutable and thread-safe.
 */
public interface TemperatureTauRelation {

    /** The Hopf function q(tau), dimensionless; tau &gt;= 0. */
    double hopf(double tau);

    /** The slope dq/dtau of the Hopf function; tau &gt;= 0. */
    double hopfSlope(double tau);

    /** Optical depth of the photosphere, where T = Teff, i.e. tau + q(tau) = 4/3. */
    double photosphericDepth();

    /** Temperature, K, at optical depth tau for effective temperature teff (K). */
    default double temperature(double tau, double teff) {
        return teff * Math.sqrt(Math.sqrt(0.75 * (tau + hopf(tau))));
    }

    /** d ln T/d ln tau at optical depth tau (the same for every Teff): tau (1 + q') / (4 (tau + q)). */
    default double dlnTDlnTau(double tau) {
        return tau * (1.0 + hopfSlope(tau)) / (4.0 * (tau + hopf(tau)));
    }
}
