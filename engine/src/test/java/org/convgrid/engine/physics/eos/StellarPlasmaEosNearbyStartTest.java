package org.convgrid.engine.physics.eos;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.state.Composition;
import org.junit.jupiter.api.Test;

/**
 * {@link StellarPlasmaEos#atDensity(double, double, Composition, EosState)} is only a faster start of the same
 * neutrality solve, and {@link StellarPlasmaEos#atPressure(double, double, Composition, EosState)} of the same density
 * inversion: from any nearby state (the same point, a finite-difference neighbour, a Newton step away, or a
 * state far across the star) it gives the state of the plain {@code atDensity} to the solve's own tolerance.
 * A numerical property of our solver, not physics: no published values are involved.
 */
class StellarPlasmaEosNearbyStartTest {

    /** Relative agreement asked for (the neutrality solve stops at |d eta| below 1e-11). */
    private static final double TOLERANCE = 1.0e-9;

    private static final StellarPlasmaEos EOS = new StellarPlasmaEos();

    /**
     * rho (g cm^-3), T (K), X: solar centre, radiative interior, base of the convection zone, He and H ionisation
     * zones, photospheres, H2 region, M-dwarf centre, hot massive-star centre.
     */
    private static final double[][] POINTS = {
        {152.9, 1.567e7, 0.346}, {1.5, 5.0e6, 0.7}, {0.19, 2.2e6, 0.7}, {3.0e-5, 1.0e5, 0.7},
        {1.0e-5, 5.0e4, 0.7}, {3.0e-7, 1.5e4, 0.7}, {2.0e-7, 5800.0, 0.7}, {1.0e-6, 3000.0, 0.7},
        {300.0, 6.0e6, 0.7}, {1000.0, 1.0e7, 0.7}, {3.0, 3.8e7, 0.7},
    };

    @Test
    void startsFromTheSamePointANeighbourANewtonStepOrAFarPointAgreeWithTheColdSolve() {
        EosState far = EOS.atDensity(152.9, 1.567e7, Composition.scaledSolar(0.346, 0.0188));
        for (double[] p : POINTS) {
            Composition c = Composition.scaledSolar(p[2], 0.0188);
            EosState cold = EOS.atDensity(p[0], p[1], c);
            EosState[] starts = {
                cold,
                EOS.atDensity(p[0] * Math.exp(1.0e-6), p[1], c),
                EOS.atDensity(p[0] * 0.8, p[1] * 1.2, c),
                far,
            };
            for (EosState start : starts) {
                EosState warm = EOS.atDensity(p[0], p[1], c, start);
                assertSameState(warm, cold, p);
            }
        }
    }

    /**
     * The inversion for the density started from a nearby state (the previous point of an atmosphere integration, a
     * state a little off in P and T, a state far across the star, which the carry refuses) finds the density of the
     * plain inversion, and with it the same state, to the inversion's tolerance (|d ln rho| below 1e-11).
     */
    @Test
    void pressureInversionsStartedNearbyOrFarAgreeWithTheColdInversion() {
        EosState far = EOS.atDensity(152.9, 1.567e7, Composition.scaledSolar(0.346, 0.0188));
        for (double[] p : POINTS) {
            Composition c = Composition.scaledSolar(p[2], 0.0188);
            double pressure = EOS.atDensity(p[0], p[1], c).pressure();
            EosState cold = EOS.atPressure(pressure, p[1], c);
            EosState[] starts = {
                cold,
                EOS.atPressure(pressure * 1.01, p[1] * 0.995, c),
                EOS.atPressure(pressure * 1.5, p[1] * 1.1, c),
                far,
            };
            for (EosState start : starts) {
                EosState warm = EOS.atPressure(pressure, p[1], c, start);
                assertThat(warm.density()).as("rho at rho = %s, T = %s", p[0], p[1])
                        .isCloseTo(cold.density(), within(TOLERANCE * cold.density()));
                assertSameState(warm, cold, p);
            }
        }
    }

    /**
     * The slopes of eta a state carries (which move a nearby start along its tangent) are those of the solved eta:
     * central differences of the cold solve over +-1e-4 in ln rho and ln T (error ~1e-8 from the step, ~1e-7 from
     * the solve's tolerance).
     */
    @Test
    void theCarriedSlopesOfEtaAreThoseOfTheSolvedEta() {
        double h = 1.0e-4;
        for (double[] p : POINTS) {
            Composition c = Composition.scaledSolar(p[2], 0.0188);
            EosState s = EOS.atDensity(p[0], p[1], c);
            double rhoSlope = (EOS.atDensity(p[0] * Math.exp(h), p[1], c).eta()
                    - EOS.atDensity(p[0] * Math.exp(-h), p[1], c).eta()) / (2.0 * h);
            double tSlope = (EOS.atDensity(p[0], p[1] * Math.exp(h), c).eta()
                    - EOS.atDensity(p[0], p[1] * Math.exp(-h), c).eta()) / (2.0 * h);
            assertThat(s.dEtaDlnRho()).as("d eta/d ln rho at rho = %s, T = %s", p[0], p[1])
                    .isCloseTo(rhoSlope, within(1.0e-5 * Math.max(1.0, Math.abs(rhoSlope))));
            assertThat(s.dEtaDlnT()).as("d eta/d ln T at rho = %s, T = %s", p[0], p[1])
                    .isCloseTo(tSlope, within(1.0e-5 * Math.max(1.0, Math.abs(tSlope))));
        }
    }

    /** A state without the slopes of eta (another equation of state's) starts at its bare eta. */
    @Test
    void aStartWithoutSlopesStartsAtItsEta() {
        Composition c = Composition.scaledSolar(0.7, 0.0188);
        EosState cold = EOS.atDensity(0.19, 2.2e6, c);
        EosState bare = new EosState(0.2, 2.3e6, 1.0, 1.0, 1.0, 1.0, 1.0, 1.0, 1.0, 0.4, 1.0, 0.6, 0.8,
                cold.eta(), 1.0);
        assertThat(StellarPlasmaEos.nearbyGuess(0.19, 2.2e6, bare)).isEqualTo(cold.eta());
        assertSameState(EOS.atDensity(0.19, 2.2e6, c, bare), cold, new double[] {0.19, 2.2e6, 0.7});
    }

    @Test
    void aStartWithoutDegeneracyFallsBackToTheColdSolve() {
        Composition c = Composition.scaledSolar(0.7, 0.0188);
        EosState cold = EOS.atDensity(0.19, 2.2e6, c);
        EosState broken = new EosState(0.19, 2.2e6, 1.0, 1.0, 1.0, 1.0, 1.0, 1.0, 1.0, 0.4, 1.0, 0.6, 0.8,
                Double.NaN, 1.0);
        assertSameState(EOS.atDensity(0.19, 2.2e6, c, broken), cold, new double[] {0.19, 2.2e6, 0.7});
    }

    private static void assertSameState(EosState warm, EosState cold, double[] p) {
        double[] a = values(warm);
        double[] b = values(cold);
        for (int k = 0; k < a.length; k++) {
            double scale = k == a.length - 1 ? Math.max(1.0, Math.abs(b[k])) : Math.abs(b[k]);
            assertThat(a[k]).as("field %d at rho = %s, T = %s", k, p[0], p[1])
                    .isCloseTo(b[k], within(TOLERANCE * scale));
        }
    }

    /** Every state field, eta last. */
    private static double[] values(EosState s) {
        return new double[] {s.pressure(), s.internalEnergy(), s.chiRho(), s.chiT(), s.cp(), s.cv(), s.gamma1(),
            s.nablaAd(), s.delta(), s.mu(), s.electronsPerBaryon(), s.gasPressureFraction(), s.eta()};
    }
}
