package org.convgrid.engine.physics.nuclear;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.state.BirthAbundances;
import org.convgrid.engine.state.Composition;
import org.junit.jupiter.api.Test;

/** Contract every {@link NuclearNetwork} must meet; subclass it per implementation. */
abstract class NuclearNetworkContractTest {

    private static final Composition SOLAR = Composition.scaledSolar(0.70, 0.02);

    /** The implementation under test. */
    abstract NuclearNetwork network();

    @Test
    void compositionRatesConserveMass() {
        // Nucleon-number bookkeeping of the lumped reactions (derived): sum of dX/dt = 0.
        Composition c = new Composition(0.6, 2e-4, 0.3798, 0.003, 0.002, 0.009, 0.006);
        for (double t : new double[] {5e6, 1.5e7, 3e7}) {
            BurningRate r = network().burn(80.0, t, c);
            double[] rates = {r.dh1Dt(), r.dhe3Dt(), r.dhe4Dt(), r.dc12Dt(), r.dn14Dt(), r.do16Dt()};
            double sum = 0.0;
            double scale = 0.0;
            for (double x : rates) {
                sum += x;
                scale = Math.max(scale, Math.abs(x));
            }
            assertThat(Math.abs(sum)).isLessThanOrEqualTo(1e-14 * scale);
            assertThat(r.dhe4Dt()).isPositive();
        }
        // At 15 MK this 3He is ~8x its equilibrium: 3He + 3He returns protons faster than p + p uses them.
        assertThat(network().burn(80.0, 1.5e7, c).dh1Dt()).isPositive();
        Composition fresh = new Composition(0.6, 0.0, 0.38, 0.003, 0.002, 0.009, 0.006);
        assertThat(network().burn(80.0, 1.5e7, fresh).dh1Dt()).isNegative();
    }

    @Test
    void derivativesMatchFiniteDifferences() {
        // Analytic dln eps/dln rho and dln eps/dln T against centred differences at fixed composition.
        Composition withHe3 = SOLAR.withHydrogenAndHelium(0.70 - 1e-4, 1e-4, SOLAR.he4());
        double[][] points = {{152.9, 1.567e7}, {500.0, 4.0e6}, {30.0, 2.8e7}, {80.0, 1.8e7}};
        double h = 1.0e-4;
        for (double[] p : points) {
            double rho = p[0];
            double t = p[1];
            BurningRate r = network().burn(rho, t, withHe3);
            double dT = Math.log(network().burn(rho, t * Math.exp(h), withHe3).eps()
                    / network().burn(rho, t * Math.exp(-h), withHe3).eps()) / (2 * h);
            double dRho = Math.log(network().burn(rho * Math.exp(h), t, withHe3).eps()
                    / network().burn(rho * Math.exp(-h), t, withHe3).eps()) / (2 * h);
            assertThat(r.dlnEpsDlnT()).as("T at " + t).isCloseTo(dT, within(1e-5 * Math.abs(dT)));
            assertThat(r.dlnEpsDlnRho()).as("rho at " + t).isCloseTo(dRho, within(1e-5 * Math.abs(dRho)));
        }
    }

    @Test
    void energyIsTheBurnsEpsAndSlopesBitForBit() {
        // Consistency, no published value: energy() is burn() without its composition rates, so the structure
        // equations get the same digits from either; with and without deuterium and 7Li, burning and cold points.
        Composition withHe3 = SOLAR.withHydrogenAndHelium(0.70 - 1e-4, 1e-4, SOLAR.he4());
        Composition birth = BirthAbundances.of(0.70, 0.02);
        double[][] points = {{152.9, 1.567e7}, {30.0, 2.8e7}, {1.0, 3.0e6}, {1.0e-4, 5.0e5}};
        double[] into = new double[3];
        for (Composition c : new Composition[] {SOLAR, withHe3, birth}) {
            for (double[] p : points) {
                BurningRate r = network().burn(p[0], p[1], c);
                network().energy(p[0], p[1], c, into);
                assertThat(into).containsExactly(r.eps(), r.dlnEpsDlnRho(), r.dlnEpsDlnT());
            }
        }
    }

    @Test
    void equilibriumKeepsTheMassFractionsSummingToOne() {
        // Composition's constructor enforces the sum; also hydrogen only pays for what 3He and CN gained.
        for (double t : new double[] {4e6, 1.2e7, 3e7}) {
            Composition e = network().equilibrium(60.0, t, SOLAR);
            assertThat(e.h1() + e.he3() + e.he4() + e.z()).isCloseTo(1.0, within(1e-12));
            assertThat(e.he4()).isEqualTo(SOLAR.he4());
            assertThat(e.o16()).isEqualTo(SOLAR.o16());
        }
    }

    @Test
    void lightElementCapturesAreTheBurnsRatesPerUnitAbundance() {
        // Consistency, no published value: lambda_i = -(dX_i/dt)/X_i of burn, to rounding, from the Hayashi track's
        // cool envelopes to a main-sequence centre; 0 for a species the composition does not hold.
        Composition birth = BirthAbundances.of(0.70, 0.02);
        double[][] points = {{1.0e-4, 5.0e5}, {0.05, 1.2e6}, {1.0, 3.0e6}, {20.0, 8.0e6}, {150.0, 1.5e7}};
        for (double[] p : points) {
            BurningRate r = network().burn(p[0], p[1], birth);
            LightElementCaptures c = network().lightElementCaptures(p[0], p[1], birth);
            double d = -r.dh2Dt() / birth.h2();
            double li = -r.dli7Dt() / birth.li7();
            assertThat(d).as("deuterium at %s K", p[1]).isPositive();
            assertThat(li).as("7Li at %s K", p[1]).isPositive();
            assertThat(c.deuterium()).as("deuterium at %s K", p[1]).isCloseTo(d, within(1.0e-14 * d));
            assertThat(c.lithium()).as("7Li at %s K", p[1]).isCloseTo(li, within(1.0e-14 * li));
            LightElementCaptures noLithium = network().lightElementCaptures(p[0], p[1],
                    birth.withTraceSpecies(birth.h2(), 0.0));
            assertThat(noLithium.lithium()).isZero();
            assertThat(noLithium.deuterium()).isCloseTo(d, within(1.0e-6 * d));
            LightElementCaptures noDeuterium = network().lightElementCaptures(p[0], p[1],
                    birth.withTraceSpecies(0.0, birth.li7()));
            assertThat(noDeuterium.deuterium()).isZero();
            // the deuterium went to 1H (withTraceSpecies): Y_p, and with it lambda_Li, rises by X_D/X_H ~ 4e-5; the
            // screening moves by a few 1e-6 more
            assertThat(noDeuterium.lithium()).isCloseTo(li * (1.0 + birth.h2() / birth.h1()),
                    within(1.0e-5 * li));
            assertThat(network().lightElementCaptures(p[0], p[1], SOLAR)).isEqualTo(LightElementCaptures.NONE);
        }
    }

    @Test
    void burningIsDeterministicAcrossThreads() throws Exception {
        // No hidden state: the same call from another thread gives bit-identical results.
        BurningRate here = network().burn(120.0, 1.4e7, SOLAR);
        BurningRate[] there = new BurningRate[1];
        Thread thread = new Thread(() -> there[0] = network().burn(120.0, 1.4e7, SOLAR));
        thread.start();
        thread.join();
        assertThat(there[0]).isEqualTo(here);
    }
}
