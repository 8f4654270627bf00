package org.convgrid.engine.evolution;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.physics.nuclear.BurningAndFactors;
import org.convgrid.engine.physics.nuclear.BurningRate;
import org.convgrid.engine.physics.nuclear.HydrogenBurningNetwork;
import org.convgrid.engine.physics.nuclear.NegligibleBurning;
import org.convgrid.engine.physics.nuclear.NuclearNetwork;
import org.convgrid.engine.state.Composition;
import org.junit.jupiter.api.Test;

/**
 * Points whose rates the network bounds below what the step could make matter ({@link NuclearNetwork#rateBound}
 * times dt below {@link CompositionStep#NEGLIGIBLE_CHANGE}) are not evaluated, and what that leaves out is within the
 * bound. Consistency checks of this code, no published values.
 */
class CompositionStepNegligiblePointsTest {

    private static final HydrogenBurningNetwork NETWORK = new HydrogenBurningNetwork();
    /** Main-sequence envelope gas with its 3He (below NegligibleBurning's floor at the cool points used). */
    private static final Composition ENVELOPE;

    static {
        Composition base = Composition.scaledSolar(0.70, 0.02);
        ENVELOPE = new Composition(base.h1() - 1.0e-4, 1.0e-4, base.he4(), base.c12(), base.n14(), base.o16(),
                base.otherMetals(), 0.0, 0.0);
    }

    /** 3e15 s (~100 Myr), a main-sequence step: bound x dt ~1e-14, below NEGLIGIBLE_CHANGE. */
    private static final double DT = 3.0e15;

    @Test
    void aCoolPointIsNotEvaluatedAndKeepsItsComposition() {
        Counting counting = new Counting(true);
        Composition after = new CompositionStep(counting).advance(1.0e-2, 3.0e5, ENVELOPE, DT);
        assertThat(counting.calls).isZero();
        // the rates it left out, as the network gives them (its bound hidden): below the bound, their change below
        // the bound times dt
        Composition evaluated = new CompositionStep(new Counting(false)).advance(1.0e-2, 3.0e5, ENVELOPE, DT);
        assertClose(after, evaluated, NegligibleBurning.RATE_BOUND * DT);
        assertClose(after, ENVELOPE, 1.0e-15);
    }

    @Test
    void aCoolPointIsEvaluatedOverAStepLongEnoughForItsBoundToMatter() {
        Counting counting = new Counting(true);
        new CompositionStep(counting).advance(1.0e-2, 3.0e5, ENVELOPE, 2.0 * CompositionStep.NEGLIGIBLE_CHANGE
                / NegligibleBurning.RATE_BOUND);
        assertThat(counting.calls).isPositive();
    }

    @Test
    void aMixedZoneEvaluatesOnlyItsHotPoints() {
        // the base of a convective envelope (2e6 K) and its cool points above, down to 5e4 K
        double[] rho = {0.2, 0.1, 0.03, 0.01, 1.0e-3, 1.0e-5};
        double[] t = {2.0e6, 1.0e6, 4.9e5, 3.0e5, 1.0e5, 5.0e4};
        double[] w = {1.0, 1.0, 2.0, 2.0, 1.0, 0.5};
        Counting counting = new Counting(true);
        Composition after = new CompositionStep(counting).advanceMixed(rho, t, w, ENVELOPE, DT);
        assertThat(counting.coolCalls).isZero();
        assertThat(counting.calls).isPositive();
        Composition evaluated = new CompositionStep(new Counting(false)).advanceMixed(rho, t, w, ENVELOPE, DT);
        assertThat(after.he3()).as("the hot base's 3He changes").isNotEqualTo(ENVELOPE.he3());
        // the zone's mean rates move by less than the bound: their change over the step by less than bound x dt
        // (and the Newton iteration's tolerance, to which each of the two is converged)
        assertClose(after, evaluated, NegligibleBurning.RATE_BOUND * DT + CompositionStep.NEWTON_TOLERANCE);
    }

    /** The network, counting its evaluations; with or without its rate bound. */
    private static final class Counting implements NuclearNetwork {
        private final boolean bounded;
        int calls;
        int coolCalls;

        Counting(boolean bounded) {
            this.bounded = bounded;
        }

        private void count(double temperature) {
            calls++;
            coolCalls += temperature < NegligibleBurning.FLOOR ? 1 : 0;
        }

        @Override
        public BurningRate burn(double density, double temperature, Composition composition) {
            count(temperature);
            return NETWORK.burn(density, temperature, composition);
        }

        @Override
        public BurningAndFactors burnAndFactors(double density, double temperature, Composition composition) {
            count(temperature);
            return NETWORK.burnAndFactors(density, temperature, composition);
        }

        @Override
        public double rateBound(double density, double temperature, Composition composition) {
            return bounded ? NETWORK.rateBound(density, temperature, composition) : Double.POSITIVE_INFINITY;
        }

        @Override
        public Composition equilibrium(double density, double temperature, Composition composition) {
            return NETWORK.equilibrium(density, temperature, composition);
        }
    }

    private static void assertClose(Composition a, Composition b, double tolerance) {
        double[] x = MassFractions.of(a);
        double[] y = MassFractions.of(b);
        for (int i = 0; i < x.length; i++) {
            assertThat(x[i]).as("species %d", i).isCloseTo(y[i], within(tolerance));
        }
    }
}
