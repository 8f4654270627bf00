package org.convgrid.engine.physics.nuclear;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.state.MetalMixture;
import org.junit.jupiter.api.Test;

/**
 * The analytic Jacobian of the composition rates ({@link RateFactors#addJacobian}) against central differences of
 * {@link HydrogenBurningNetwork#burn} (common practice for checking a Jacobian), at solar-centre, CN-approach,
 * 3He-building and hot CNO points.
 */
class RateFactorsTest {

    private static final HydrogenBurningNetwork BARE =
            new HydrogenBurningNetwork(NoScreening.INSTANCE, MetalMixture.GS98, 1.0e16);
    private static final HydrogenBurningNetwork SCREENED = new HydrogenBurningNetwork();
    /** Protosolar-like start, 3He and CN at their initial values (not burnt to equilibrium). */
    private static final Composition FRESH = new Composition(0.70, 3.0e-5, 0.28, 0.0030, 0.0009, 0.0080,
            0.02 - 0.0030 - 0.0009 - 0.0080 - 3.0e-5);
    /** Solar-centre-like: half the hydrogen burnt, CN and 3He towards equilibrium (values from memory). */
    private static final Composition CENTRE = new Composition(0.35, 1.0e-5, 0.63, 2.0e-5, 0.0047, 0.0079,
            0.02 - 2.0e-5 - 0.0047 - 0.0079 - 1.0e-5);

    /** (rho g cm^-3, T K): solar centre, CN approach (12C burning), 3He building up, hot CNO burning. */
    private static final double[][] POINTS = {{150.0, 1.57e7}, {80.0, 1.3e7}, {20.0, 8.0e6}, {10.0, 3.0e7}};

    @Test
    void unscreenedJacobianEqualsCentralDifferences() {
        for (double[] p : POINTS) {
            for (Composition c : new Composition[] {FRESH, CENTRE}) {
                // without screening the factors do not depend on composition: the Jacobian is exact
                assertAgrees(BARE, p[0], p[1], c, 1.0e-7);
            }
        }
    }

    @Test
    void screenedJacobianMissesOnlyTheScreeningsCompositionDependence() {
        for (double[] p : POINTS) {
            for (Composition c : new Composition[] {FRESH, CENTRE}) {
                // weak screening H ~ 0.1 at these points (Salpeter 1954 form) scales with the mean charge
                // zeta, which changes by ~ dX/zeta^2 per unit mass fraction: the part held fixed is a few per cent
                // of a row's largest entry at most
                assertAgrees(SCREENED, p[0], p[1], c, 0.05);
            }
        }
    }

    @Test
    void factorsTimesAbundancesGiveTheNetworksRates() {
        // the 12C rate of burn() is 12 (r14 - r12) with r = k Y1 Y_z (rate form of HydrogenBurningNetwork)
        Composition c = FRESH;
        RateFactors k = SCREENED.burnAndFactors(80.0, 1.3e7, c).factors().orElseThrow();
        double expected = 12.0 * (k.n14() * c.h1() * c.n14() / 14.0 - k.c12() * c.h1() * c.c12() / 12.0);
        double actual = SCREENED.burn(80.0, 1.3e7, c).dc12Dt();
        assertThat(actual).isCloseTo(expected, within(1e-12 * Math.abs(expected)));
    }

    @Test
    void burnWithFactorsIsTheBurn() {
        // the rates that come with the factors are burn's to the last bit, with and without the deuterium and 7Li
        // that add reactions to the burn
        Composition birth = new Composition(0.70, 3.0e-5, 0.28, 0.0030, 0.0009, 0.0080,
                0.02 - 0.0030 - 0.0009 - 0.0080 - 3.0e-5 - 4.0e-5 - 1.0e-8, 4.0e-5, 1.0e-8);
        for (double[] p : POINTS) {
            for (Composition c : new Composition[] {FRESH, CENTRE, birth}) {
                assertThat(SCREENED.burnAndFactors(p[0], p[1], c).rate()).isEqualTo(SCREENED.burn(p[0], p[1], c));
            }
        }
    }

    private static void assertAgrees(HydrogenBurningNetwork network, double rho, double t, Composition c,
                                     double tolerance) {
        double[] x = fractions(c);
        double[][] analytic = new double[RateFactors.SPECIES][RateFactors.SPECIES];
        network.burnAndFactors(rho, t, c).factors().orElseThrow().addJacobian(x, 1.0, analytic);
        double[] rowScale = new double[RateFactors.SPECIES];
        for (int i = 0; i < RateFactors.SPECIES; i++) {
            for (double v : analytic[i]) {
                rowScale[i] = Math.max(rowScale[i], Math.abs(v));
            }
        }
        for (int j = 0; j < RateFactors.SPECIES; j++) {
            double h = 1.0e-4 * x[j];
            double[] up = rates(network, rho, t, c, j, h);
            double[] down = rates(network, rho, t, c, j, -h);
            for (int i = 0; i < RateFactors.SPECIES; i++) {
                double difference = (up[i] - down[i]) / (2.0 * h);
                assertThat(analytic[i][j]).as("d f_%d / d X_%d at rho=%g T=%g", i, j, rho, t)
                        .isCloseTo(difference, within(tolerance * rowScale[i]));
            }
        }
    }

    /** The six composition rates with X_j shifted by h, the other metals taking up the difference. */
    private static double[] rates(HydrogenBurningNetwork network, double rho, double t, Composition c, int j,
                                  double h) {
        double[] x = fractions(c);
        x[j] += h;
        Composition shifted = new Composition(x[0], x[1], x[2], x[3], x[4], x[5], c.otherMetals() - h);
        BurningRate r = network.burn(rho, t, shifted);
        return new double[] {r.dh1Dt(), r.dhe3Dt(), r.dhe4Dt(), r.dc12Dt(), r.dn14Dt(), r.do16Dt()};
    }

    private static double[] fractions(Composition c) {
        return new double[] {c.h1(), c.he3(), c.he4(), c.c12(), c.n14(), c.o16()};
    }
}
