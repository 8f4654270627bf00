package org.convgrid.engine.physics.nuclear;

import static org.assertj.core.api.Assertions.assertThat;

import org.convgrid.engine.state.Composition;
import org.junit.jupiter.api.Test;

class NegligibleBurningTest {

    private final HydrogenBurningNetwork network = new HydrogenBurningNetwork();
    private final double[] energy = new double[3];

    /**
     * The bound NegligibleBurning states, checked against this network over the stated range: X 0.5-0.8, Z 1e-4 to
     * 0.06, 3He up to 1e-3, deuterium up to 1e-4, 7Li up to 1e-7, density 1e-12 to 1 g cm^-3, every temperature up to
     * the floor. The bound is this code's own choice (common practice, no single source): Coulomb-barrier rates
     * (Clayton 1968, Principles of Stellar Evolution and Nucleosynthesis, ch. 4) rise monotonically with T, so the
     * largest values sit at the floor and the highest density.
     */
    @Test
    void energyGenerationIsBelowTheBoundWhereverBurningIsNegligible() {
        double largest = 0.0;
        for (double x : new double[] {0.5, 0.7, 0.8}) {
            for (double z : new double[] {1.0e-4, 0.02, 0.06}) {
                for (double he3 : new double[] {0.0, 1.0e-3}) {
                    for (double li7 : new double[] {0.0, 1.0e-7}) {
                        for (double h2 : new double[] {0.0, 1.0e-4}) {
                            largest = Math.max(largest, largestOver(composition(x, z, he3, h2, li7)));
                        }
                    }
                }
            }
        }
        assertThat(largest).isPositive().isLessThan(NegligibleBurning.EPS_BOUND);
    }

    /**
     * The composition-rate bound follows from the energy bound (derived: each reaction's largest mass-number
     * coefficient per MeV released, NegligibleBurning.RATE_BOUND): checked where the rates are large enough to test
     * the inequality itself (solar centre, hot CNO burning, birth gas at 1e6 K) and, over the grid of the energy
     * bound, against RATE_BOUND.
     */
    @Test
    void compositionRatesAreBelowTheirBoundWhereverBurningIsNegligible() {
        double perEps = NegligibleBurning.RATE_BOUND / NegligibleBurning.EPS_BOUND;
        Composition birth = composition(0.7, 0.02, 1.0e-4, 2.8e-5, 1.0e-8);
        for (double[] point : new double[][] {{150.0, 1.57e7}, {10.0, 3.0e7}, {1.0, 1.0e6}, {80.0, 1.3e7}}) {
            BurningRate r = network.burn(point[0], point[1], birth);
            assertThat(largestRate(r)).isPositive().isLessThanOrEqualTo(perEps * r.eps());
        }
        double largest = 0.0;
        for (double x : new double[] {0.5, 0.7, 0.8}) {
            for (double z : new double[] {1.0e-4, 0.02, 0.06}) {
                for (double he3 : new double[] {0.0, 1.0e-3}) {
                    for (double h2 : new double[] {0.0, 1.0e-4}) {
                        Composition c = composition(x, z, he3, h2, 1.0e-7);
                        double floor = c.h2() > 0.0 ? NegligibleBurning.DEUTERIUM_FLOOR : NegligibleBurning.FLOOR;
                        for (double lgRho = -12.0; lgRho <= 0.0; lgRho += 1.0) {
                            for (double lgT = 3.3; lgT < Math.log10(floor) + 0.025; lgT += 0.1) {
                                double rho = Math.pow(10.0, lgRho);
                                double t = Math.min(Math.pow(10.0, lgT), Math.nextDown(floor));
                                assertThat(network.rateBound(rho, t, c)).isEqualTo(NegligibleBurning.RATE_BOUND);
                                largest = Math.max(largest, largestRate(network.burn(rho, t, c)));
                            }
                        }
                    }
                }
            }
        }
        assertThat(largest).isPositive().isLessThan(NegligibleBurning.RATE_BOUND);
        // no bound where the network does burn
        assertThat(network.rateBound(1.0, 1.0e6, birth)).isEqualTo(Double.POSITIVE_INFINITY);
        assertThat(network.rateBound(2.0, 1.0e4, birth)).isEqualTo(Double.POSITIVE_INFINITY);
    }

    private static double largestRate(BurningRate r) {
        double[] rates = {r.dh1Dt(), r.dhe3Dt(), r.dhe4Dt(), r.dc12Dt(), r.dn14Dt(), r.do16Dt(), r.dh2Dt(), r.dli7Dt()};
        double largest = 0.0;
        for (double rate : rates) {
            largest = Math.max(largest, Math.abs(rate));
        }
        return largest;
    }

    @Test
    void hotDenseOrDeuteriumBearingGasIsNotSkipped() {
        Composition noDeuterium = composition(0.7, 0.02, 0.0, 0.0, 1.0e-8);
        Composition deuterium = composition(0.7, 0.02, 0.0, 2.8e-5, 1.0e-8);
        assertThat(NegligibleBurning.at(1.0e-2, 4.0e5, noDeuterium)).isTrue();
        assertThat(NegligibleBurning.at(1.0e-2, 4.0e5, deuterium)).isFalse();
        assertThat(NegligibleBurning.at(1.0e-2, 9.0e4, deuterium)).isTrue();
        assertThat(NegligibleBurning.at(1.0e-2, NegligibleBurning.FLOOR, noDeuterium)).isFalse();
        assertThat(NegligibleBurning.at(2.0, 1.0e4, noDeuterium)).isFalse();
        // where the network does matter: 1e6 K with the birth deuterium, ~1e3 erg g^-1 s^-1 at 1 g cm^-3
        network.energy(1.0, 1.0e6, deuterium, energy);
        assertThat(energy[0]).isGreaterThan(1.0e6 * NegligibleBurning.EPS_BOUND);
    }

    @Test
    void energyIsZeroWhereBurningIsNegligibleAndTheBurnsEpsElsewhere() {
        // Consistency, no published value: the network's energy() skips its reactions exactly where
        // NegligibleBurning holds (where burn() gives a positive eps below the bound) and nowhere else
        Composition noDeuterium = composition(0.7, 0.02, 1.0e-4, 0.0, 1.0e-8);
        java.util.Arrays.fill(energy, Double.NaN);
        network.energy(1.0e-2, 4.0e5, noDeuterium, energy);
        assertThat(energy).containsExactly(0.0, 0.0, 0.0);
        assertThat(network.burn(1.0e-2, 4.0e5, noDeuterium).eps()).isPositive().isLessThan(NegligibleBurning.EPS_BOUND);
        network.energy(2.0, 4.0e5, noDeuterium, energy);
        assertThat(energy[0]).isEqualTo(network.burn(2.0, 4.0e5, noDeuterium).eps()).isPositive();
    }

    /** The largest eps over the grid of densities and temperatures where NegligibleBurning holds. */
    private double largestOver(Composition c) {
        double largest = 0.0;
        double floor = c.h2() > 0.0 ? NegligibleBurning.DEUTERIUM_FLOOR : NegligibleBurning.FLOOR;
        for (double lgRho = -12.0; lgRho <= 0.0; lgRho += 0.5) {
            double rho = Math.pow(10.0, lgRho);
            for (double lgT = 3.3; lgT < Math.log10(floor) + 0.025; lgT += 0.05) {
                // the last temperature just below the floor itself
                double t = Math.min(Math.pow(10.0, lgT), Math.nextDown(floor));
                assertThat(NegligibleBurning.at(rho, t, c)).isTrue();
                // the reactions themselves (burn): energy() gives zero here
                largest = Math.max(largest, network.burn(rho, t, c).eps());
            }
        }
        return largest;
    }

    private static Composition composition(double x, double z, double he3, double h2, double li7) {
        Composition base = Composition.scaledSolar(x, z);
        return new Composition(base.h1() - he3 - h2 - li7, he3, base.he4(), base.c12(), base.n14(), base.o16(),
                base.otherMetals(), h2, li7);
    }
}
