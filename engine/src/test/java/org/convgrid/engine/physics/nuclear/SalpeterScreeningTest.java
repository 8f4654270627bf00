package org.convgrid.engine.physics.nuclear;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.state.Composition;
import org.junit.jupiter.api.Test;

class SalpeterScreeningTest {

    private static final HydrogenBurningNetwork NETWORK = new HydrogenBurningNetwork();
    private static final Screening SCREENING = SalpeterScreening.INSTANCE;

    @Test
    void screeningConstantsFollowFromCodata() {
        // Weak: H = 0.188 Z1 Z2 zeta rho^(1/2) T6^(-3/2); strong: 0.205 [...] (rho/mu_e)^(1/3)/T6 with
        // Gamma_e = 0.2275 (rho/mu_e)^(1/3)/T6 (Salpeter 1954, Aust. J. Phys. 7, 373; constants derived
        // from the CODATA 2018 e, k, N_A).
        assertThat(PlasmaState.DEBYE_COEFFICIENT).isCloseTo(0.1879, within(2e-4));
        assertThat(PlasmaState.ELECTRON_COUPLING_COEFFICIENT).isCloseTo(0.2275, within(2e-4));
        assertThat(0.9 * PlasmaState.ELECTRON_COUPLING_COEFFICIENT).isCloseTo(0.205, within(5e-4));
        // KWW 2012 writes the weak form as 5.92e-3 Z1 Z2 (zeta^2 rho/T7^3)^(1/2) (from memory): 5.92e-3 10^1.5.
        assertThat(PlasmaState.DEBYE_COEFFICIENT).isCloseTo(5.92e-3 * Math.pow(10.0, 1.5), within(2e-3));
    }

    @Test
    void solarCentreIsInTheWeakRegime() {
        // Derived from Salpeter 1954: pp at the solar centre, H_weak = 0.049, H_strong = 0.071 (BS05 centre:
        // Bahcall, Serenelli & Basu 2005, T = 1.567e7 K, rho = 152.9, X = 0.346).
        PlasmaState p = NETWORK.plasma(152.9, 1.567e7, Composition.scaledSolar(0.346, 0.0188));
        assertThat(SalpeterScreening.weakExponent(1, 1, p)).isCloseTo(0.049, within(0.003));
        assertThat(SalpeterScreening.strongExponent(1, 1, p)).isCloseTo(0.071, within(0.003));
        assertThat(SCREENING.exponent(1, 1, p)).isCloseTo(0.049, within(0.003));
    }

    @Test
    void lowMassStarCentreIsIntermediate() {
        // Derived from Salpeter 1954 (rounded, "~"): rho 500, T6 4, X 0.7 gives H_weak ~ 0.7, H_strong ~ 0.45.
        PlasmaState p = NETWORK.plasma(500.0, 4.0e6, Composition.scaledSolar(0.70, 0.02));
        assertThat(SalpeterScreening.weakExponent(1, 1, p)).isCloseTo(0.7, within(0.07));
        assertThat(SalpeterScreening.strongExponent(1, 1, p)).isCloseTo(0.45, within(0.03));
        double h = SCREENING.exponent(1, 1, p);
        assertThat(h).isLessThan(SalpeterScreening.strongExponent(1, 1, p)).isGreaterThan(0.4);
    }

    @Test
    void blendTendsToEachLimitWhereItHolds() {
        // Construction (our choice, documented in SalpeterScreening): smooth minimum of the two limits.
        PlasmaState dilute = new PlasmaState(1.0, 1.0e7, 1e-4, 1.0);
        assertThat(SCREENING.exponent(1, 7, dilute) / SalpeterScreening.weakExponent(1, 7, dilute)).isCloseTo(1.0, within(1e-9));
        PlasmaState dense = new PlasmaState(1.0, 1.0e7, 100.0, 1.0);
        assertThat(SCREENING.exponent(2, 2, dense) / SalpeterScreening.strongExponent(2, 2, dense)).isCloseTo(1.0, within(1e-6));
        PlasmaState equal = new PlasmaState(1.0, 1.0e7, 0.5, 0.5 / (0.9 * (Math.pow(2, 5.0 / 3) - 2)));
        assertThat(SCREENING.exponent(1, 1, equal) / 0.5).isCloseTo(Math.pow(2.0, -0.25), within(1e-9));
    }

    @Test
    void derivativesMatchFiniteDifferences() {
        // The couplings scale as rho^(1/2) T^(-3/2) and rho^(1/3) T^(-1) at fixed composition (PlasmaState).
        Composition c = Composition.scaledSolar(0.7, 0.02);
        double h = 1.0e-5;
        for (double[] point : new double[][] {{152.9, 1.567e7}, {500.0, 4.0e6}, {10.0, 3.0e7}}) {
            double rho = point[0];
            double t = point[1];
            for (int[] z : new int[][] {{1, 1}, {2, 2}, {1, 7}}) {
                double dT = (SCREENING.exponent(z[0], z[1], NETWORK.plasma(rho, t * Math.exp(h), c))
                        - SCREENING.exponent(z[0], z[1], NETWORK.plasma(rho, t * Math.exp(-h), c))) / (2 * h);
                double dRho = (SCREENING.exponent(z[0], z[1], NETWORK.plasma(rho * Math.exp(h), t, c))
                        - SCREENING.exponent(z[0], z[1], NETWORK.plasma(rho * Math.exp(-h), t, c))) / (2 * h);
                PlasmaState p = NETWORK.plasma(rho, t, c);
                assertThat(SCREENING.dExponentDlnT(z[0], z[1], p)).isCloseTo(dT, within(1e-7 + 1e-6 * Math.abs(dT)));
                assertThat(SCREENING.dExponentDlnRho(z[0], z[1], p)).isCloseTo(dRho, within(1e-7 + 1e-6 * Math.abs(dRho)));
            }
        }
    }

    @Test
    void exponentAndSlopesInOneCallAreTheSeparateValues() {
        // the network asks for all three at once; they must be exactly the three separate answers, in the weak,
        // intermediate and strong regimes
        double[] out = new double[3];
        double[][] points = {{152.9, 1.567e7}, {300.0, 6.0e6}, {1.0e3, 1.0e6}};
        for (double[] pt : points) {
            PlasmaState p = NETWORK.plasma(pt[0], pt[1], Composition.scaledSolar(0.70, 0.0188));
            for (int[] z : new int[][] {{1, 1}, {2, 2}, {7, 1}}) {
                SCREENING.exponentAndSlopes(z[0], z[1], p, out);
                assertThat(out[0]).isEqualTo(SCREENING.exponent(z[0], z[1], p));
                assertThat(out[1]).isEqualTo(SCREENING.dExponentDlnT(z[0], z[1], p));
                assertThat(out[2]).isEqualTo(SCREENING.dExponentDlnRho(z[0], z[1], p));
            }
        }
    }
}
