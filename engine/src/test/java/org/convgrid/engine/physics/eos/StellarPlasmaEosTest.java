package org.convgrid.engine.physics.eos;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.convgrid.engine.state.Composition;
import org.junit.jupiter.api.Test;

class StellarPlasmaEosTest {

    private static final StellarPlasmaEos EOS = new StellarPlasmaEos();
    private static final StellarPlasmaEos SAHA = StellarPlasmaEos.idealSaha();
    private static final Composition HYDROGEN = new Composition(1, 0, 0, 0, 0, 0, 0);
    private static final double CHI_H_OVER_K = AtomicData.HYDROGEN * 1.602176634e-12 / 1.380649e-16;

    @Test
    void pureHydrogenHalfIonisationTemperatures() {
        // x = 0.5 at T = 9930, 13440, 20330, 37850 K for rho = 1e-9, 1e-7, 1e-5, 1e-3 (derived
        // from the non-degenerate Saha equation with CODATA 2018, chi_H = 13.5984 eV and the Planck-Larkin weight
        // 2 (e^x - 1 - x) of the bound state; quoted to 4 figures; a bare weight 2 e^x gives 9930, 13440, 20340,
        // 38410). Tolerance 0.1 %: the EOS keeps the Fermi-Dirac electron factor, which at 1e-3 moves T by ~0.05 %.
        double[] rho = {1e-9, 1e-7, 1e-5, 1e-3};
        double[] expected = {9930, 13440, 20330, 37850};
        for (int i = 0; i < rho.length; i++) {
            double d = rho[i];
            double t = new BrentSolver(1e-6).solve(100,
                    temp -> SAHA.ionisation(d, temp, HYDROGEN).hydrogenIonised() - 0.5, 5e3, 1e5);
            assertThat(t).as("rho = %s", d).isCloseTo(expected[i], within(1e-3 * expected[i]));
        }
    }

    @Test
    void pureHydrogenNablaAdFollowsTheIonisationFormula() {
        // nabla_ad = [2 + x(1-x)(5/2 + chi/kT)] / [5 + x(1-x)(5/2 + chi/kT)^2] for an ionising pure-H ideal gas
        // without radiation (Kippenhahn, Weigert & Weiss 2012, ch. 14, formula from memory; limits derived). At
        // rho = 1e-5 radiation is ~1e-4 of P, so the EOS (which includes it) must agree to ~1 %.
        for (double t : new double[] {1.6e4, 2.0e4, 2.5e4}) {
            double x = SAHA.ionisation(1e-5, t, HYDROGEN).hydrogenIonised();
            double c = x * (1 - x) * (2.5 + CHI_H_OVER_K / t);
            double formula = (2 + c) / (5 + c * (2.5 + CHI_H_OVER_K / t));
            assertThat(SAHA.atDensity(1e-5, t, HYDROGEN).nablaAd()).as("T = %s", t)
                    .isCloseTo(formula, within(0.01 * formula));
        }
    }

    @Test
    void minimumNablaAdInTheHydrogenIonisationZone() {
        // Minimum over T of nabla_ad, pure H: 0.095 at rho = 1e-7, 0.136 at 1e-5, 0.206 at 1e-3 (derived from
        // the formula above and Saha, without radiation). Radiation (P_rad/P ~ 1e-3 at 1e-7) raises it slightly; 3 %
        // tolerance.
        double[] rho = {1e-7, 1e-5, 1e-3};
        double[] expected = {0.095, 0.136, 0.206};
        for (int i = 0; i < rho.length; i++) {
            double min = 1.0;
            for (double lt = 3.9; lt < 5.0; lt += 0.002) {
                min = Math.min(min, SAHA.atDensity(rho[i], Math.pow(10, lt), HYDROGEN).nablaAd());
            }
            assertThat(min).as("rho = %s", rho[i]).isCloseTo(expected[i], within(0.03 * expected[i]));
        }
    }

    @Test
    void deepSolarEnvelopeIsFullyIonisedAndHasTheStandardModelsPressure() {
        // Bahcall, Serenelli & Basu 2005 (ApJ 621, L85), BS05(OP) model table, whose equation of state is OPAL's:
        // rows at r/R = 0.71351 (envelope base), 0.75006 and 0.90205 give (rho, T, X, Y, 3He) and P to 4 figures.
        // At their own (rho, T, X, Z) our P agrees to 0.1 % (measured 0.005 %, -0.08 %, -0.09 %); with a bare
        // ground-state weight for hydrogen ~1.3 % of it stayed neutral at the base and P was 0.37 % low
        double[][] rows = {{0.1858, 2.182e6, 5.565e13}, {0.1403, 1.813e6, 3.490e13}, {0.02504, 5.825e5, 1.976e12}};
        Composition envelope = Composition.scaledSolar(0.74045, 1.0 - 0.74045 - 0.24248 - 9.93e-5);
        for (double[] row : rows) {
            assertThat(EOS.atDensity(row[0], row[1], envelope).pressure()).as("T = %s", row[1])
                    .isCloseTo(row[2], within(1e-3 * row[2]));
            assertThat(EOS.ionisation(row[0], row[1], envelope).hydrogenIonised()).isGreaterThan(0.9995);
        }
    }

    @Test
    void pressureIonisationIonisesMDwarfInteriors() {
        // Plain Saha leaves H at rho = 100, T = 1e6 K largely neutral (measured: 42 % neutral with the Planck-Larkin
        // weight; ~80 % with a bare ground-state weight, derived), while real M-dwarf interiors are pressure-ionised
        // (Hummer & Mihalas 1988; Saumon, Chabrier & van Horn 1995).
        Composition sun = Composition.scaledSolar(0.7, 0.02);
        assertThat(SAHA.ionisation(100, 1e6, sun).hydrogenIonised()).isLessThan(0.7);
        assertThat(EOS.ionisation(100, 1e6, sun).hydrogenIonised()).isGreaterThan(0.99);
        assertThat(EOS.ionisation(10, 3e5, sun).hydrogenIonised()).isGreaterThan(0.99);
        assertThat(EOS.ionisation(30, 1e5, sun).hydrogenIonised()).isGreaterThan(0.99);
        // ...and leaves the low-density ionisation balance alone (the half-ionisation test above uses plain Saha);
        // the Coulomb term adds a Debye-type lowering that shifts x by ~0.006 there (Debye-Huckel; Landau & Lifshitz,
        // par. 78).
        StellarPlasmaEos noCoulomb = new StellarPlasmaEos(org.convgrid.engine.state.MetalMixture.GS98, true, false);
        double plain = SAHA.ionisation(1e-7, 13440, HYDROGEN).hydrogenIonised();
        assertThat(noCoulomb.ionisation(1e-7, 13440, HYDROGEN).hydrogenIonised()).isCloseTo(plain, within(1e-3));
        assertThat(EOS.ionisation(1e-7, 13440, HYDROGEN).hydrogenIonised()).isCloseTo(plain, within(0.01));
    }

    @Test
    void degenerateElectronsGiveChiRhoFiveThirds() {
        // Non-relativistic degenerate electrons: P_e ~ rho^(5/3) (derived: (dlnP_e/dln n_e)_T -> 5/3).
        // At rho = 1e5, T = 1e6 K (pure He), eta ~ 400 and ions carry ~0.4 % of P, lowering chi_rho by ~0.003.
        StellarPlasmaEos noCoulomb = new StellarPlasmaEos(org.convgrid.engine.state.MetalMixture.GS98, true, false);
        EosState s = noCoulomb.atDensity(1e5, 1e6, Composition.scaledSolar(0.0, 0.0));
        assertThat(s.eta()).isGreaterThan(100);
        assertThat(s.chiRho()).isCloseTo(5.0 / 3.0, within(0.01));
    }

    @Test
    void limitsOfTheAdiabaticGradient() {
        // Ionised gas + radiation: nabla_ad = 2(4-3 beta)/(32-24 beta-3 beta^2), 0.4 at beta = 1, 0.25 at beta -> 0
        // (Kippenhahn, Weigert & Weiss 2012, form from memory; re-derived). Metal-free so that all is ionised;
        // the residual degeneracy (eta ~ -9) is below 1e-4.
        Composition hhe = Composition.scaledSolar(0.7, 0.0);
        for (double[] point : new double[][] {{1e-2, 3e6}, {1e-4, 3e6}, {1e-10, 1e8}}) {
            EosState s = SAHA.atDensity(point[0], point[1], hhe);
            double b = s.gasPressureFraction();
            assertThat(s.nablaAd()).isCloseTo(2 * (4 - 3 * b) / (32 - 24 * b - 3 * b * b), within(2e-4));
        }
        // With Coulomb, degeneracy and metal ionisation the solar-centre value is a little below 0.4 (~0.397; from
        // memory, no published table checked).
        assertThat(EOS.atDensity(152.9, 1.567e7, Composition.scaledSolar(0.346, 0.0188)).nablaAd())
                .isBetween(0.39, 0.4);
    }

    @Test
    void fullyIonisedMeanMolecularWeight() {
        // mu = 4/(3 + 5X - Z): 0.6173 at X = 0.70, Z = 0.02 (derived with A_H = 1; true masses
        // make mu ~0.7 % larger).
        EosState s = EOS.atDensity(1e-2, 3e7, Composition.scaledSolar(0.7, 0.02));
        assertThat(s.mu()).isCloseTo(0.6173, within(0.01 * 0.6173));
    }

    @Test
    void solarCentrePressure() {
        // BS05(OP) standard solar model centre: T = 1.567e7 K, rho = 152.9, X = 0.346, P = 2.357e17 dyn cm^-2
        // (Bahcall, Serenelli & Basu 2005, ApJ 621, L85, structure table). 3 %.
        EosState s = EOS.atDensity(152.9, 1.567e7, Composition.scaledSolar(0.346, 0.0188));
        assertThat(s.pressure()).isCloseTo(2.357e17, within(0.03 * 2.357e17));
    }

    @Test
    void coulombFitHasTheDebyeHuckelLimitAndMatchesSlatteryDoolenDeWitt() {
        // Debye-Huckel limit u_ex/NkT = -(sqrt 3/2) Gamma^(3/2) (Landau & Lifshitz, Statistical Physics, par. 78).
        double g = 1e-4;
        assertThat(CoulombPlasma.energy(g)).isCloseTo(-Math.sqrt(3) / 2 * Math.pow(g, 1.5), within(1e-3 * 1e-6));
        // Slattery, Doolen & DeWitt 1982 fit at Gamma = 10: -7.996 (coefficients from memory,
        // an independent recollection of an independent fit; loose 0.5 % tolerance).
        double sdd = -0.897744 * 10 + 0.95043 * Math.pow(10, 0.25) + 0.18956 * Math.pow(10, -0.25) - 0.81487;
        assertThat(CoulombPlasma.energy(10)).isCloseTo(sdd, within(0.005 * Math.abs(sdd)));
        // u = Gamma df/dGamma (thermodynamic consistency of the two fitted functions).
        double h = 1e-6;
        double dfdg = (CoulombPlasma.freeEnergy(2 + h) - CoulombPlasma.freeEnergy(2 - h)) / (2 * h);
        assertThat(CoulombPlasma.energy(2)).isCloseTo(2 * dfdg, within(1e-8));
    }

    @Test
    void coulombCorrectionIsAboutOnePerCentAtTheSolarCentre() {
        // Expected size ~1 % of P at the solar centre (from memory: loose bounds 0.3-2 %).
        Composition c = Composition.scaledSolar(0.346, 0.0188);
        StellarPlasmaEos noCoulomb = new StellarPlasmaEos(org.convgrid.engine.state.MetalMixture.GS98, true, false);
        double ratio = EOS.atDensity(152.9, 1.567e7, c).pressure() / noCoulomb.atDensity(152.9, 1.567e7, c).pressure();
        assertThat(1 - ratio).isBetween(0.003, 0.02);
    }
}
