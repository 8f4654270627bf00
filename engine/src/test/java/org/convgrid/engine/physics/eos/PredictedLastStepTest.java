package org.convgrid.engine.physics.eos;

import static org.assertj.core.api.Assertions.assertThat;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.state.MetalMixture;
import org.junit.jupiter.api.Test;

/**
 * The neutrality solve's predicted last step ({@link StellarPlasmaEos#lastStepPredicted}) leaves every state
 * bitwise as the full Newton iteration, which takes that step and stops at the next residual, gives it. Numerical
 * checks of the solver against itself, no published values.
 */
class PredictedLastStepTest {

    private static final PlasmaElements ELEMENTS = new PlasmaElements(MetalMixture.GS98);
    /** Copies of StellarPlasmaEos's private solve constants, for the reference iteration below. */
    private static final double NON_DEGENERATE = -2.0;
    private static final double REREFERENCE = 100.0;
    private static final double MAX_NEWTON_STEP = 30.0;

    @Test
    void predictionNeedsAQuadraticShrinkAndATinyNextStep() {
        // the K-dwarf photosphere's last two steps (7.5e-3 then 2.4e-6: the next is 2.6e-13) and a solar centre's
        assertThat(StellarPlasmaEos.lastStepPredicted(-7.47e-3, -2.45e-6)).isTrue();
        assertThat(StellarPlasmaEos.lastStepPredicted(-2.71e-3, 2.25e-7)).isTrue();
        // too early: the next step would be ~1e-9
        assertThat(StellarPlasmaEos.lastStepPredicted(-3.38e-2, 1.31e-4)).isFalse();
        // steps held near the tolerance by rounding do not shrink: no prediction
        assertThat(StellarPlasmaEos.lastStepPredicted(1.2e-11, -1.1e-11)).isFalse();
        // no step before (the first step) or a bisection before: no rate, no prediction
        assertThat(StellarPlasmaEos.lastStepPredicted(Double.NaN, 1.0e-9)).isFalse();
    }

    @Test
    void coldSolvesAreBitwiseThoseOfTheFullIteration() {
        Composition[] mixes = {Composition.scaledSolar(0.7, 0.0188), Composition.scaledSolar(0.346, 0.0188),
            Composition.scaledSolar(0.0, 0.02), Composition.scaledSolar(0.75, 1.0e-4)};
        int predicted = 0;
        int points = 0;
        for (Composition mix : mixes) {
            for (double logT = 2.75; logT <= 8.5; logT += 0.0625) {
                for (double logRho = -12.0; logRho <= 6.0; logRho += 0.125) {
                    double rho = Math.pow(10.0, logRho);
                    double t = Math.pow(10.0, logT);
                    PlasmaPoint fast = point(mix);
                    PlasmaPoint full = point(mix);
                    double guess = StellarPlasmaEos.fullyIonisedEta(fast, rho, t);
                    boolean solved;
                    try {
                        StellarPlasmaEos.solve(fast, rho, t, guess);
                        solved = true;
                    } catch (ConvgridException e) {
                        solved = false;
                    }
                    boolean reference;
                    try {
                        fullSolve(full, rho, t, guess);
                        reference = true;
                    } catch (ConvgridException e) {
                        reference = false;
                    }
                    assertThat(solved).as("solved at rho = %s, T = %s", rho, t).isEqualTo(reference);
                    if (!solved) {
                        continue;
                    }
                    points++;
                    if (fast.iterations != fullIterations) {
                        throw new AssertionError("iterations differ at rho = " + rho + ", T = " + t + " mix " + mix + ": " + fast.iterations + " vs " + fullIterations + " eta " + fast.lastEta + " vs " + full.lastEta);
                    }
                    assertThat(state(fast)).as("rho = %s, T = %s", rho, t).containsExactly(state(full));
                    predicted += lastPredicted;
                }
            }
        }
        // the prediction serves ~40 % of these cold solves (a test where it never served would prove nothing)
        assertThat(predicted).isGreaterThan(points / 4);
    }

    private static double[] state(PlasmaPoint p) {
        return new double[] {p.lastEta, p.pressure, p.energy, p.residualRho, p.residualT, p.residualSlope,
            p.pressureEta, p.pressureRho, p.pressureT, p.energyEta, p.energyT, p.electrons, p.heavyParticles,
            p.hydrogenIonised, p.hydrogenMolecular, p.heliumSingle, p.heliumDouble, p.radiationPressure};
    }

    private int fullIterations;
    private int lastPredicted;

    /**
     * StellarPlasmaEos.solve as it was before the prediction: every Newton step ends with a residual, and the state
     * is completed at the first eta that passes the convergence test. Counts whether the prediction would have
     * served this solve (the step before the last one passes {@link StellarPlasmaEos#lastStepPredicted}).
     */
    private void fullSolve(PlasmaPoint p, double density, double temperature, double etaGuess) {
        double eta = etaGuess;
        p.prepare(density, temperature, eta);
        if (eta < NON_DEGENERATE) {
            double better = p.ionisationGuess(eta);
            if (Double.isFinite(better)) {
                eta = Math.max(-PlasmaPoint.ETA_LIMIT + 1.0, Math.min(eta, better));
                if (Math.abs(eta - p.reference) > REREFERENCE) {
                    p.prepare(density, temperature, eta);
                }
            }
        }
        double lo = -PlasmaPoint.ETA_LIMIT;
        double hi = PlasmaPoint.ETA_LIMIT;
        double[] steps = new double[StellarPlasmaEos.SOLVE_BUDGET];
        for (int i = 0; i < StellarPlasmaEos.SOLVE_BUDGET; i++) {
            p.solveStep(eta);
            if (p.residual > 0.0) {
                hi = eta;
            } else {
                lo = eta;
            }
            double step = -p.residual / p.residualSlope;
            step = Math.max(-MAX_NEWTON_STEP, Math.min(MAX_NEWTON_STEP, step));
            if (StellarPlasmaEos.converged(step, p.residual)) {
                p.evaluate();
                p.lastEta = eta;
                fullIterations = i + 1;
                lastPredicted = i >= 2 && StellarPlasmaEos.lastStepPredicted(steps[i - 2], steps[i - 1]) ? 1 : 0;
                return;
            }
            double next = eta + step;
            if (!(next > lo && next < hi)) {
                next = 0.5 * (lo + hi);
                step = Double.NaN;
            }
            steps[i] = step;
            if (Math.abs(next - p.reference) > REREFERENCE) {
                p.prepare(density, temperature, next);
            }
            eta = next;
        }
        throw new ConvgridException(org.convgrid.engine.error.ErrorKind.NOT_CONVERGED, "not solved");
    }

    private static PlasmaPoint point(Composition c) {
        return new PlasmaPoint(ELEMENTS, true, true, new PlasmaComposition(ELEMENTS, c));
    }
}
