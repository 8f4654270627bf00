package org.convgrid.engine.physics.eos;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.state.MetalMixture;
import org.junit.jupiter.api.Test;

/**
 * Internals behind the speed of {@link StellarPlasmaEos}: analytic partials, Fermi-Dirac slopes, the cost of the
 * neutrality solve, and results that do not depend on the composition cache. Numerical checks, no published values.
 */
class PlasmaPointTest {

    private static final PlasmaElements ELEMENTS = new PlasmaElements(MetalMixture.GS98);
    private static final double[][] POINTS = {
        {152.9, 1.567e7}, {0.19, 2.2e6}, {300, 6e6}, {30, 1e5}, {1e-5, 5e4}, {1e-7, 1.2e4}, {3e-7, 5000},
        {1e-9, 5000}, {1e-6, 3000}, {1e-4, 2000}, {1e-3, 6000}, {1e-7, 600}, {0.08, 15000}};
    /** Where molecular hydrogen matters: points of {@link #POINTS} from index 8 on. */
    private static final int FIRST_MOLECULAR = 8;

    @Test
    void analyticPartialsMatchCentredDifferencesAtFixedEta() {
        // Centred differences with h = 1e-4 carry a truncation error ~ h^2 (chi/kT)^3/6 < 1e-5 relative here.
        Composition sun = Composition.scaledSolar(0.7, 0.0188);
        for (int i = 0; i < POINTS.length; i++) {
            double[] pt = POINTS[i];
            PlasmaPoint p = point(sun);
            // Cool points at their own root (rounded): eta = -5 there would mean ye ~ 4, with a Coulomb coupling
            // that no star reaches, where the blended OCP fit is only smooth to first order.
            double eta = -5.0;
            // Below ~3000 K the metals' chi/kT reaches 20, so a smaller step keeps the truncation error down.
            double h = i >= FIRST_MOLECULAR ? 1e-5 : 1e-4;
            if (i >= FIRST_MOLECULAR) {
                StellarPlasmaEos.solve(p, pt[0], pt[1], StellarPlasmaEos.fullyIonisedEta(p, pt[0], pt[1]));
                eta = Math.rint(p.lastEta);
            }
            p.prepare(pt[0], pt[1], -5.0);
            p.solveStep(eta);
            p.evaluate();
            double[] analytic = {p.pressureEta, p.pressureRho, p.pressureT, p.energyEta, p.energyT, p.residualRho,
                p.residualT, p.residualSlope};
            double[] plus = shifted(sun, pt, eta, h);
            double[] minus = shifted(sun, pt, eta, -h);
            for (int k = 0; k < analytic.length; k++) {
                double numeric = (plus[k] - minus[k]) / (2 * h);
                double scale = k < 3 ? p.pressure : k < 5 ? Math.abs(p.energy) : 1.0;
                assertThat(analytic[k]).as("partial %d at rho = %s, T = %s", k, pt[0], pt[1])
                        .isCloseTo(numeric, within(1e-6 * scale));
            }
        }
    }

    @Test
    void fermiDiracSlopesAreTheDerivativesOfTheValues() {
        double[] out = new double[7];
        double[] values = new double[3];
        double[] up = new double[7];
        double[] down = new double[7];
        double h = 1e-5;
        for (double eta : new double[] {-40, -12.3, -10.0004, -3.217, 0.5, 12.34, 69.99, 85.0}) {
            FermiDirac.withSlopes(eta, out);
            FermiDirac.all(eta, values);
            FermiDirac.withSlopes(eta + h, up);
            FermiDirac.withSlopes(eta - h, down);
            for (int k = 0; k < 3; k++) {
                assertThat(out[k]).as("F_%d at %s", k, eta).isCloseTo(values[k], within(1e-14 * values[k]));
                double numeric = (up[k] - down[k]) / (2 * h);
                assertThat(out[3 + k]).as("dF_%d at %s", k, eta).isCloseTo(numeric, within(1e-7 * out[3 + k]));
            }
            assertThat(out[3]).isCloseTo(FermiDirac.minusHalfSlope(eta), within(1e-13 * Math.abs(out[3])));
            double second = (up[3] - down[3]) / (2 * h);
            assertThat(out[6]).as("d2F_-1/2 at %s", eta).isCloseTo(second, within(1e-5 * Math.abs(second) + 1e-12));
        }
    }

    @Test
    void neutralitySolveTakesFewNewtonSteps() {
        // Guards the solve's cost: the ionisation-aware start and the convergence test before the bracket keep
        // it to a handful of steps (a sub-ulp step once sent it to the bisection point, ~50 steps).
        Composition sun = Composition.scaledSolar(0.7, 0.0188);
        for (double[] pt : POINTS) {
            PlasmaPoint p = point(sun);
            StellarPlasmaEos.solve(p, pt[0], pt[1], StellarPlasmaEos.fullyIonisedEta(p, pt[0], pt[1]));
            assertThat(p.iterations).as("rho = %s, T = %s", pt[0], pt[1]).isBetween(1, 6);
        }
    }

    @Test
    void neutralitySolveStopsAtTheResidualFloor() {
        // A step stuck just above the eta tolerance by rounding counts as converged once the residual (relative
        // electron-density mismatch) is below 1e-13; a larger residual still needs the step test.
        assertThat(StellarPlasmaEos.converged(1.0e-11 * 1.0001, 3.0e-14)).isTrue();
        assertThat(StellarPlasmaEos.converged(1.0e-11 * 1.0001, 3.0e-12)).isFalse();
        assertThat(StellarPlasmaEos.converged(0.9e-11, 3.0e-12)).isTrue();
        // The region where the stuck step was reported (envelopes of 0.08-0.10 Msun models): forward and inverse
        // solves converge throughout. Cold starts from the fully ionised eta take ~7 Newton steps here (at most 19,
        // one more than without H2), far inside the budget.
        StellarPlasmaEos eos = new StellarPlasmaEos();
        Composition sun = Composition.scaledSolar(0.7, 0.0188);
        for (double rho = 0.05; rho <= 0.12; rho *= 1.07) {
            for (double t = 1.2e4; t <= 1.9e4; t *= 1.013) {
                PlasmaPoint p = point(sun);
                StellarPlasmaEos.solve(p, rho, t, StellarPlasmaEos.fullyIonisedEta(p, rho, t));
                assertThat(p.iterations).as("rho = %s, T = %s", rho, t).isBetween(1, 25);
                EosState back = eos.atPressure(p.pressure, t, sun);
                assertThat(back.density()).isCloseTo(rho, within(1e-10 * rho));
            }
        }
    }

    @Test
    void resultsDoNotDependOnTheCompositionCache() {
        StellarPlasmaEos shared = new StellarPlasmaEos();
        Composition a = Composition.scaledSolar(0.7, 0.0188);
        Composition b = Composition.scaledSolar(0.3, 0.004);
        for (double[] pt : POINTS) {
            EosState first = new StellarPlasmaEos().atDensity(pt[0], pt[1], a);
            shared.atDensity(pt[0], pt[1], b);
            assertThat(shared.atDensity(pt[0], pt[1], a)).isEqualTo(first);
            assertThat(shared.atDensity(pt[0], pt[1], a)).isEqualTo(first);
        }
    }

    @Test
    void threadsSharingOneInstanceGetTheSameResults() throws Exception {
        StellarPlasmaEos shared = new StellarPlasmaEos();
        Composition[] mixes = {Composition.scaledSolar(0.7, 0.0188), Composition.scaledSolar(0.1, 0.03),
            Composition.scaledSolar(0.5, 0.001), Composition.scaledSolar(0.74, 0.01)};
        EosState[][] expected = new EosState[mixes.length][POINTS.length];
        for (int c = 0; c < mixes.length; c++) {
            for (int i = 0; i < POINTS.length; i++) {
                expected[c][i] = new StellarPlasmaEos().atDensity(POINTS[i][0], POINTS[i][1], mixes[c]);
            }
        }
        var pool = java.util.concurrent.Executors.newFixedThreadPool(4);
        try {
            var futures = new java.util.ArrayList<java.util.concurrent.Future<Boolean>>();
            for (int task = 0; task < 16; task++) {
                int c = task % mixes.length;
                futures.add(pool.submit(() -> {
                    boolean same = true;
                    for (int rep = 0; rep < 50; rep++) {
                        for (int i = 0; i < POINTS.length; i++) {
                            same &= shared.atDensity(POINTS[i][0], POINTS[i][1], mixes[c]).equals(expected[c][i]);
                        }
                    }
                    return same;
                }));
            }
            for (var f : futures) {
                assertThat(f.get()).isTrue();
            }
        } finally {
            pool.shutdownNow();
        }
    }

    private static PlasmaPoint point(Composition c) {
        return new PlasmaPoint(ELEMENTS, true, true, new PlasmaComposition(ELEMENTS, c));
    }

    /** Residual, P and u with eta, ln rho and ln T moved by step one at a time (fixed reference). */
    private static double[] shifted(Composition c, double[] pt, double eta, double step) {
        PlasmaPoint p = point(c);
        p.prepare(pt[0], pt[1], -5.0);
        p.solveStep(eta + step);
        p.evaluate();
        double pEta = p.pressure;
        double uEta = p.energy;
        double rEta = p.residual;
        p.prepare(pt[0] * Math.exp(step), pt[1], -5.0);
        p.solveStep(eta);
        p.evaluate();
        double pRho = p.pressure;
        double rRho = p.residual;
        p.prepare(pt[0], pt[1] * Math.exp(step), -5.0);
        p.solveStep(eta);
        p.evaluate();
        return new double[] {pEta, pRho, p.pressure, uEta, p.energy, rRho, p.residual, rEta};
    }
}
