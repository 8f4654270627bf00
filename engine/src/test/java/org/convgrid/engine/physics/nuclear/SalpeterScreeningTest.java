package org.convgrid.engine.physics.nuclear;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.state.Composition;
import org.junit.jupiter.api.Test;

class SalpeterScreeningTest {

    private static final HydrogenBurningNetwork NETWORK = new HydrogenBurningNetwork();
    private static final Screening SCREENING = SalpeterScreening.INSTANCE;

    /** H, dH/dlnT and dH/dlnrho of the pair, as the network asks for them. */
    static double[] screening(int z1, int z2, PlasmaState plasma) {
        double[] out = new double[3];
        SCREENING.exponentAndSlopes(z1, z2, plasma, out);
        return out;
    }

    private static double exponent(int z1, int z2, PlasmaState plasma) {
        return screening(z1, z2, plasma)[0];
    }

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
        assertThat(exponent(1, 1, p)).isCloseTo(0.049, within(0.003));
    }

    @Test
    void lowMassStarCentreIsIntermediate() {
        // Derived from Salpeter 1954 (rounded, "~"): rho 500, T6 4, X 0.7 gives H_weak ~ 0.7, H_strong ~ 0.45.
        PlasmaState p = NETWORK.plasma(500.0, 4.0e6, Composition.scaledSolar(0.70, 0.02));
        assertThat(SalpeterScreening.weakExponent(1, 1, p)).isCloseTo(0.7, within(0.07));
        assertThat(SalpeterScreening.strongExponent(1, 1, p)).isCloseTo(0.45, within(0.03));
        double h = exponent(1, 1, p);
        assertThat(h).isLessThan(SalpeterScreening.strongExponent(1, 1, p)).isGreaterThan(0.4);
    }

    @Test
    void blendTendsToEachLimitWhereItHolds() {
        // Construction (our choice, documented in SalpeterScreening): smooth minimum of the two limits.
        PlasmaState dilute = new PlasmaState(1.0, 1.0e7, 1e-4, 1.0);
        assertThat(exponent(1, 7, dilute) / SalpeterScreening.weakExponent(1, 7, dilute)).isCloseTo(1.0, within(1e-9));
        PlasmaState dense = new PlasmaState(1.0, 1.0e7, 100.0, 1.0);
        assertThat(exponent(2, 2, dense) / SalpeterScreening.strongExponent(2, 2, dense)).isCloseTo(1.0, within(1e-6));
        PlasmaState equal = new PlasmaState(1.0, 1.0e7, 0.5, 0.5 / (0.9 * (Math.pow(2, 5.0 / 3) - 2)));
        assertThat(exponent(1, 1, equal) / 0.5).isCloseTo(Math.pow(2.0, -0.25), within(1e-9));
    }

    @Test
    void noCouplingMeansNoScreening() {
        // Construction: a pair in a plasma without coupling (zero density) is not screened, slopes included.
        assertThat(screening(1, 1, new PlasmaState(0.0, 1.0e7, 0.0, 0.0))).containsExactly(0.0, 0.0, 0.0);
        assertThat(screening(1, 7, new PlasmaState(1.0, 1.0e7, 1e-3, 0.0))).containsExactly(0.0, 0.0, 0.0);
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
                double dT = (exponent(z[0], z[1], NETWORK.plasma(rho, t * Math.exp(h), c))
                        - exponent(z[0], z[1], NETWORK.plasma(rho, t * Math.exp(-h), c))) / (2 * h);
                double dRho = (exponent(z[0], z[1], NETWORK.plasma(rho * Math.exp(h), t, c))
                        - exponent(z[0], z[1], NETWORK.plasma(rho * Math.exp(-h), t, c))) / (2 * h);
                double[] slopes = screening(z[0], z[1], NETWORK.plasma(rho, t, c));
                assertThat(slopes[1]).isCloseTo(dT, within(1e-7 + 1e-6 * Math.abs(dT)));
                assertThat(slopes[2]).isCloseTo(dRho, within(1e-7 + 1e-6 * Math.abs(dRho)));
            }
        }
    }

    @Test
    void couplingSlopesAddUpToTheDensitySlopeAndMatchDifferences() {
        // at fixed composition the Debye coupling goes as rho^(1/2) and Gamma_e as rho^(1/3) (PlasmaState), so
        // dH/dln rho = dH/dln(Debye)/2 + dH/dln(Gamma_e)/3; each slope also against a central difference of H in
        // its own coupling (relative step 1e-5); weak, intermediate and strong screening (derived here)
        double[] slopes = new double[2];
        for (double[] point : new double[][] {{150.0, 1.5e7}, {1.0e4, 8.0e6}, {1.0e6, 1.0e7}}) {
            PlasmaState plasma = NETWORK.plasma(point[0], point[1], Composition.scaledSolar(0.7, 0.02));
            for (int[] pair : new int[][] {{1, 1}, {2, 2}, {1, 7}}) {
                SCREENING.couplingSlopes(pair[0], pair[1], plasma, slopes);
                double[] h = screening(pair[0], pair[1], plasma);
                assertThat(0.5 * slopes[0] + slopes[1] / 3.0).isCloseTo(h[2], within(1e-12 + 1e-10 * h[0]));
                double step = 1.0e-5;
                double up = Math.exp(step);
                double byDebye = (exponent(pair[0], pair[1], new PlasmaState(plasma.density(), plasma.temperature(),
                        plasma.debyeCoupling() * up, plasma.electronCoupling()))
                        - exponent(pair[0], pair[1], new PlasmaState(plasma.density(), plasma.temperature(),
                        plasma.debyeCoupling() / up, plasma.electronCoupling()))) / (2.0 * step);
                double byElectrons = (exponent(pair[0], pair[1], new PlasmaState(plasma.density(),
                        plasma.temperature(), plasma.debyeCoupling(), plasma.electronCoupling() * up))
                        - exponent(pair[0], pair[1], new PlasmaState(plasma.density(), plasma.temperature(),
                        plasma.debyeCoupling(), plasma.electronCoupling() / up))) / (2.0 * step);
                assertThat(slopes[0]).isCloseTo(byDebye, within(1e-8 * h[0]));
                assertThat(slopes[1]).isCloseTo(byElectrons, within(1e-8 * h[0]));
            }
        }
    }
}
