package org.convgrid.engine.evolution;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.physics.nuclear.BurningAndFactors;
import org.convgrid.engine.physics.nuclear.BurningRate;
import org.convgrid.engine.physics.nuclear.HydrogenBurningNetwork;
import org.convgrid.engine.physics.nuclear.InterfaceDefaultsNetwork;
import org.convgrid.engine.physics.nuclear.NuclearNetwork;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

/**
 * The step with the network's analytic Jacobian converges to the same backward-Euler solution as the step with
 * the finite-difference Jacobian (the network hidden behind a wrapper without rate factors): both iterate to
 * {@link CompositionStep#NEWTON_TOLERANCE} (absolute, on each mass fraction), so they agree to it, and to
 * round-off compounded over the sub-steps.
 */
class CompositionStepAnalyticJacobianTest {

    private static final HydrogenBurningNetwork NETWORK = new HydrogenBurningNetwork();
    /** The same rates with no rate factors, so the step differences them (the path before the analytic one). */
    private static final NuclearNetwork DIFFERENCED = new InterfaceDefaultsNetwork(NETWORK);
    /** Protosolar start with its 3He, deuterium and 7Li (initial abundances of order the solar ones). */
    private static final Composition BIRTH = new Composition(0.70, 3.0e-5, 0.28, 0.0030, 0.0009, 0.0080,
            0.02 - 0.0030 - 0.0009 - 0.0080 - 3.0e-5 - 4.0e-5 - 1.0e-8, 4.0e-5, 1.0e-8);
    private static final Composition FRESH = Composition.scaledSolar(0.70, 0.02);

    @Test
    void advanceAgreesWithTheDifferencedJacobian() {
        double year = Constants.YEAR;
        // CN-cycle approach: 12C burning towards its equilibrium with 14N over ~1e7 yr at 1.3e7 K
        assertSame(80.0, 1.3e7, FRESH, 1.0e7 * year, false);
        // 3He building up at a cool point over 1e9 yr, and from the birth composition (deuterium and 7Li)
        assertSame(20.0, 8.0e6, FRESH, 1.0e9 * year, false);
        assertSame(20.0, 8.0e6, BIRTH, 1.0e8 * year, false);
        // solar-centre burning over 1e8 yr, and the same with the trace limit used before the zero-age sequence
        assertSame(150.0, 1.57e7, NETWORK.equilibrium(150.0, 1.57e7, Composition.scaledSolar(0.35, 0.02)),
                1.0e8 * year, false);
        assertSame(80.0, 1.3e7, BIRTH, 1.0e6 * year, true);
        // hot CNO burning, a few per cent of the hydrogen
        assertSame(10.0, 3.0e7, NETWORK.equilibrium(10.0, 3.0e7, FRESH), 1.0e6 * year, false);
    }

    @Test
    void mixedZoneAgreesWithTheDifferencedJacobian() {
        double[] rho = {150.0, 100.0, 60.0};
        double[] t = {1.57e7, 1.45e7, 1.3e7};
        double[] w = {1.0, 2.0, 3.0};
        Composition start = Composition.scaledSolar(0.5, 0.02);
        Composition analytic = new CompositionStep(NETWORK).advanceMixed(rho, t, w, start, 1.0e8 * Constants.YEAR);
        Composition differenced = new CompositionStep(DIFFERENCED).advanceMixed(rho, t, w, start,
                1.0e8 * Constants.YEAR);
        assertClose(analytic, differenced);
    }

    @Test
    void stepStartEvaluatesTheNetworkOnceForRatesAndJacobian() {
        // the rates and the rate factors at the start composition come from one call; the light elements burn
        // first from the rates at the birth composition, so the sub-steps start from the burnt one
        for (Composition start : new Composition[] {FRESH, BIRTH}) {
            CountingNetwork counting = new CountingNetwork(start);
            new CompositionStep(counting).advance(80.0, 1.3e7, start, 1.0e7 * Constants.YEAR);
            assertThat(counting.atStart).as("network calls at the start composition").isEqualTo(1);
            assertThat(counting.combined).as("rates with factors").isEqualTo(1);
        }
    }

    /** Counts the calls the step makes, and those at one composition. */
    private static final class CountingNetwork implements NuclearNetwork {
        private final Composition start;
        int atStart;
        int combined;

        CountingNetwork(Composition start) {
            this.start = start;
        }

        @Override
        public BurningRate burn(double density, double temperature, Composition composition) {
            atStart += composition.equals(start) ? 1 : 0;
            return NETWORK.burn(density, temperature, composition);
        }

        @Override
        public BurningAndFactors burnAndFactors(double density, double temperature, Composition composition) {
            atStart += composition.equals(start) ? 1 : 0;
            combined++;
            return NETWORK.burnAndFactors(density, temperature, composition);
        }

        @Override
        public Composition equilibrium(double density, double temperature, Composition composition) {
            return NETWORK.equilibrium(density, temperature, composition);
        }
    }

    private static void assertSame(double rho, double t, Composition start, double dt, boolean traceLimit) {
        CompositionStep analytic = new CompositionStep(NETWORK);
        CompositionStep differenced = new CompositionStep(DIFFERENCED);
        if (traceLimit) {
            analytic = analytic.withTraceLimit(0.05);
            differenced = differenced.withTraceLimit(0.05);
        }
        Composition d = differenced.advance(rho, t, start, dt);
        Composition a = analytic.advance(rho, t, start, dt);
        // the step must have changed something, or the comparison proves nothing
        assertThat(Math.abs(a.c12() - start.c12()) + Math.abs(a.he3() - start.he3())).isGreaterThan(1e-9);
        assertClose(a, d);
    }

    private static void assertClose(Composition a, Composition d) {
        double[] x = MassFractions.of(a);
        double[] y = MassFractions.of(d);
        for (int i = 0; i < x.length; i++) {
            // 1e-10 relative, and the convergence test's absolute tolerance for the trace species
            assertThat(x[i]).as("species %d", i)
                    .isCloseTo(y[i], within(1e-10 * Math.abs(y[i]) + CompositionStep.NEWTON_TOLERANCE));
        }
    }
}
