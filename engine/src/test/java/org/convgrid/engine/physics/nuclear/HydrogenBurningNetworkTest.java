package org.convgrid.engine.physics.nuclear;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.state.MetalMixture;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

class HydrogenBurningNetworkTest {

    private static final HydrogenBurningNetwork DEFAULT = new HydrogenBurningNetwork();
    /** Relaxes 3He and CN for 4.57 Gyr, the age of the Sun in standard solar models (from memory). */
    private static final HydrogenBurningNetwork SOLAR_AGE =
            new HydrogenBurningNetwork(SalpeterScreening.INSTANCE, MetalMixture.GS98, 4.57 * Constants.GYR);
    /** Unscreened and fully relaxed, for comparisons with the unscreened textbook formulas. */
    private static final HydrogenBurningNetwork BARE =
            new HydrogenBurningNetwork(NoScreening.INSTANCE, MetalMixture.GS98, 1.0e3 * Constants.GYR);
    private static final HydrogenBurningNetwork RELAXED =
            new HydrogenBurningNetwork(SalpeterScreening.INSTANCE, MetalMixture.GS98, 1.0e3 * Constants.GYR);

    private static final Composition SOLAR = Composition.scaledSolar(0.70, 0.02);
    /** Solar X, Z with all of C+N+O as 14N: the CNO-equilibrium assumption behind the textbook crossover. */
    private static final Composition SOLAR_ALL_N = SOLAR.withCno(0.0, SOLAR.cno(), 0.0);
    private static final double MEV_PER_MOLE = Constants.N_A * Constants.MEV;

    @Test
    void heliumCapturesShareTheirScreeningBitForBit() {
        // burn screens the pair (2, 2) once for 3He+3He and 3He+4He: their charges must stay equal, and each rate
        // must be exactly the one screened on its own (numerical check, no published value)
        assertThat(SolarFusionRates.HE3_HE4.z1()).isEqualTo(SolarFusionRates.HE3_HE3.z1());
        assertThat(SolarFusionRates.HE3_HE4.z2()).isEqualTo(SolarFusionRates.HE3_HE3.z2());
        double rho = 152.9;
        double t = 1.567e7;
        Composition centre = DEFAULT.equilibrium(rho, t, Composition.scaledSolar(0.346, 0.0188));
        RateFactors factors = DEFAULT.burnAndFactors(rho, t, centre).factors().orElseThrow();
        double[] work = new double[3];
        double t9 = t * 1.0e-9;
        double cbrtT9 = Math.cbrt(t9);
        PlasmaState plasma = DEFAULT.plasma(rho, t, centre);
        ChargedParticleRate he33 = SolarFusionRates.HE3_HE3;
        ChargedParticleRate he34 = SolarFusionRates.HE3_HE4;
        SalpeterScreening.INSTANCE.exponentAndSlopes(he33.z1(), he33.z2(), plasma, work);
        double h33 = work[0];
        SalpeterScreening.INSTANCE.exponentAndSlopes(he34.z1(), he34.z2(), plasma, work);
        double h34 = work[0];
        assertThat(factors.he3He3()).isEqualTo(rho * SolarFusionRates.HE3_HE3.rate(t9, cbrtT9, h33));
        assertThat(factors.he3He4()).isEqualTo(rho * SolarFusionRates.HE3_HE4.rate(t9, cbrtT9, h34));
    }

    @Test
    void standardSolarModelCentre() {
        // BS05(OP) centre: T = 1.567e7 K, rho = 152.9, X = 0.346, Z ~ 0.0188; eps ~ 16.5 erg/g/s
        // (Bahcall, Serenelli & Basu 2005, ApJ 621, L85, structure table; eps derived from it). 3He and CN
        // relaxed for 4.57 Gyr from a scaled-solar start (both at equilibrium at the solar centre).
        Composition centre = SOLAR_AGE.equilibrium(152.9, 1.567e7, Composition.scaledSolar(0.346, 0.0188));
        BurningRate r = DEFAULT.burn(152.9, 1.567e7, centre);
        assertThat(r.eps()).isCloseTo(16.5, within(0.25 * 16.5));
        // The CN cycle is a small part at the solar centre (SSMs give ~1 % of L overall, more at the centre; from
        // memory, no single source checked).
        assertThat(r.epsCno() / r.eps()).isBetween(0.01, 0.10);
        // Non-regression (frozen from our own run on 2026-12-01, commit 3561edf, not a published value; re-validate
        // if it moves). Tolerance 0.05 erg/g/s (0.3 %, our choice): a rate or screening change of a few 0.1 % shows.
        assertThat(r.eps()).isCloseTo(16.95, within(0.05));
    }

    @Test
    void ppTemperatureExponentIsAboutFour() {
        // nu_pp = 3.9 at 15 MK (tau/3 - 2/3 of the p+p step, derived; the textbook "~4" from memory). The p+p step
        // alone must match closely; the whole chain with 3He at equilibrium is a little steeper because the PP-II
        // share grows with T (psi, KWW 2012 sect. 18.5).
        List<String[]> rows = ReferenceRows.read("temperature-exponents.csv");
        for (String[] row : rows) {
            double t = Double.parseDouble(row[0]);
            double t9 = t * 1e-9;
            double screening = SalpeterScreeningTest.screening(1, 1, DEFAULT.plasma(100.0, t, SOLAR))[1];
            double ppStep = SolarFusionRates.PP.dlnRateDlnT(t9, Math.cbrt(t9)) + screening;
            assertThat(ppStep).as("p+p at " + t).isCloseTo(Double.parseDouble(row[1]), within(0.25));
        }
        double h = 1.0e-3;
        double up = chainPp(1.5e7 * Math.exp(h));
        double down = chainPp(1.5e7 * Math.exp(-h));
        assertThat(Math.log(up / down) / (2 * h)).isBetween(3.7, 4.8);
    }

    private static double chainPp(double t) {
        return RELAXED.burn(100.0, t, RELAXED.equilibrium(100.0, t, SOLAR_ALL_N)).epsPp();
    }

    @Test
    void cnoTemperatureExponentIsEighteenToTwenty() {
        // nu_CNO = 19.9 at 15 MK (unscreened, tau/3 - 2/3, derived), "~18-20" in textbooks (from memory); ours
        // includes screening and S'/S < 0, which lower it slightly.
        Composition cn = RELAXED.equilibrium(100.0, 1.5e7, SOLAR_ALL_N);
        double h = 1.0e-3;
        double up = RELAXED.burn(100.0, 1.5e7 * Math.exp(h), cn).epsCno();
        double down = RELAXED.burn(100.0, 1.5e7 * Math.exp(-h), cn).epsCno();
        assertThat(Math.log(up / down) / (2 * h)).isBetween(18.0, 20.0);
    }

    @Test
    void ppEqualsCnoNearEighteenMillionKelvin() {
        // Crossover 17.4-17.8 MK for X = 0.70, X_CNO = 0.010-0.014, derived from the unscreened textbook rates
        // (Carroll & Ostlie 2007, eqs. 10.46 and 10.58, from memory); "17-18 MK" commonly quoted. Assumption: all
        // C+N+O as 14N with 12C at CN equilibrium, rho = 100. Our 14N(p,g) rate is ~0.53x the old one and
        // eps_CNO ~ T^15 relative to eps_pp, so the crossover moves up by 1.9^(1/15) ~ 4 %: we accept 17.5-19.0 MK.
        double crossover = new BrentSolver(1.0).solve(100, t -> {
            BurningRate r = RELAXED.burn(100.0, t, RELAXED.equilibrium(100.0, t, SOLAR_ALL_N));
            return Math.log(r.epsCno() / r.epsPp());
        }, 1.2e7, 2.5e7);
        assertThat(crossover).isBetween(1.75e7, 1.90e7);
    }

    @Test
    void ppRateAgreesWithTheCompactTextbookForm() {
        // KWW 2012 sect. 18.5 (from memory; checked as rate times Q, derived): eps_pp = 2.57e4 psi g11 rho X^2
        // T9^(-2/3) exp(-3.381 T9^(-1/3)), unscreened (f11 = 1), psi taken from our own branching (energy per p+p
        // reaction over the PP-I 13.10 MeV). Agreement within 10 %: NACRE S(0) vs SF-II, and g11 vs FCZ terms.
        for (double t : new double[] {1.0e7, 1.5e7, 2.0e7}) {
            double t9 = t * 1e-9;
            BurningRate r = BARE.burn(100.0, t, BARE.equilibrium(100.0, t, SOLAR_ALL_N));
            double ppReactions = 0.5 * 100.0 * 0.7 * 0.7 * SolarFusionRates.PP.rate(t9, Math.cbrt(t9));
            double psi = r.epsPp() / (MEV_PER_MOLE * ppReactions * 13.10);
            double g11 = 1 + 3.82 * t9 + 1.51 * t9 * t9 + 0.144 * t9 * t9 * t9 - 0.0114 * t9 * t9 * t9 * t9;
            double kww = 2.57e4 * psi * g11 * 100.0 * 0.49 * Math.pow(t9, -2.0 / 3) * Math.exp(-3.381 / Math.cbrt(t9));
            assertThat(r.epsPp() / kww).as("at " + t).isCloseTo(1.0, within(0.10));
            assertThat(psi).isBetween(1.0, 1.5);
        }
    }

    @Test
    void cnoRateIsAboutHalfTheOldTextbookForm() {
        // KWW 2012 sect. 18.5: eps_CNO = 8.24e25 g14 X_CNO X rho T9^(-2/3) exp(-15.231 T9^(-1/3) - (T9/0.8)^2)
        // rests on S_1,14 ~ 3.2 keV b; the modern 1.66 keV b (Runkle et al. 2005; Adelberger et al. 2011) halves
        // it (derived: ~4.3e25/8.24e25 = 0.52).
        double t = 1.5e7;
        double t9 = t * 1e-9;
        BurningRate r = BARE.burn(100.0, t, BARE.equilibrium(100.0, t, SOLAR_ALL_N));
        double g14 = 1 - 2.00 * t9 + 3.41 * t9 * t9 - 2.43 * t9 * t9 * t9;
        double kww = 8.24e25 * g14 * SOLAR.cno() * 0.7 * 100.0 * Math.pow(t9, -2.0 / 3)
                * Math.exp(-15.231 / Math.cbrt(t9) - (t9 / 0.8) * (t9 / 0.8));
        assertThat(r.epsCno() / kww).isBetween(0.45, 0.60);
    }

    @Test
    void energyMatchesTheHydrogenConsumed() {
        // Energy conservation (derived): at CN and 3He equilibrium and PP-I dominance, eps = -dX/dt E_H with
        // E_H = Q_eff/(4 m_H) ~ 6.3e18 erg/g for 26.2 MeV; the mix of chains keeps it within 5 %. 26.2 MeV is the
        // PP-I sum of ReactionEnergy: Q-values from atomic masses, neutrino energies from Bahcall 1989, Neutrino
        // Astrophysics (from memory).
        Composition c = RELAXED.equilibrium(100.0, 1.3e7, SOLAR_ALL_N);
        BurningRate r = RELAXED.burn(100.0, 1.3e7, c);
        double perGram = r.eps() / -r.dh1Dt();
        assertThat(perGram).isCloseTo(26.2 * Constants.MEV / (4.0 * Constants.MASS_H1_AMU * Constants.M_U), within(0.05 * 6.3e18));
    }

    @Test
    void helium3EquilibriumMatchesTheClassicalFormulaWhere34IsNegligible() {
        // X_3 = 3 X [<sv>_11/(2 <sv>_33)]^(1/2) (derived from the 3He balance): at 11 MK 3He+4He destroys little
        // 3He; at the solar centre it lowers X_3 (our exact solution keeps it).
        Composition cool = RELAXED.equilibrium(100.0, 1.1e7, SOLAR);
        assertThat(cool.he3() / RELAXED.helium3Equilibrium(100.0, 1.1e7, SOLAR)).isCloseTo(1.0, within(0.02));
        Composition sun = Composition.scaledSolar(0.346, 0.0188);
        double ratio = RELAXED.equilibrium(152.9, 1.567e7, sun).he3() / RELAXED.helium3Equilibrium(152.9, 1.567e7, sun);
        assertThat(ratio).isBetween(0.6, 0.99);
    }

    @Test
    void equilibriumKeepsSlowSpeciesAndMovesMassThroughHydrogen() {
        // Below ~8 MK the 3He equilibration time exceeds Gyr (from memory): in 1e8 yr at 5 MK 3He barely
        // grows; CN is untouched at 8 MK; both relax completely at 25 MK.
        Composition start = SOLAR.withHydrogenAndHelium(0.70 - 1e-4, 1e-4, SOLAR.he4());
        HydrogenBurningNetwork shortRelaxation = new HydrogenBurningNetwork(SalpeterScreening.INSTANCE,
                org.convgrid.engine.state.MetalMixture.GS98, 1.0e8 * org.convgrid.engine.units.Constants.YEAR);
        Composition cold = shortRelaxation.equilibrium(50.0, 5.0e6, start);
        assertThat(cold.he3()).isCloseTo(1e-4, within(0.5e-4));
        assertThat(cold.c12()).isCloseTo(start.c12(), within(1e-3 * start.c12()));
        Composition hot = DEFAULT.equilibrium(50.0, 2.5e7, start);
        assertThat(hot.c12() / hot.n14()).isLessThan(0.01);
        assertThat(hot.he4()).isEqualTo(start.he4());
        assertThat(hot.o16()).isEqualTo(start.o16());
        double moved = (hot.he3() - start.he3()) + (hot.c12() - start.c12()) + (hot.n14() - start.n14());
        assertThat(hot.h1()).isCloseTo(start.h1() - moved, within(1e-15));
    }

    @Test
    void freshHydrogenWithoutHelium3BurnsOnlyTheFirstStep() {
        // With X(3He) = 0 only p+p -> 3He (6.67 MeV) runs: half the PP-I energy per p+p reaction (derived).
        BurningRate r = BARE.burn(100.0, 1.5e7, new Composition(0.70, 0.0, 0.30, 0.0, 0.0, 0.0, 0.0));
        double ppReactions = 0.5 * 100.0 * 0.49 * SolarFusionRates.PP.rate(0.015, Math.cbrt(0.015));
        assertThat(r.epsPp() / (MEV_PER_MOLE * ppReactions)).isCloseTo(ReactionEnergy.PP_TO_HE3, within(1e-9));
    }

    @Test
    void rejectsUnphysicalStates() {
        assertThatThrownBy(() -> DEFAULT.burn(-1.0, 1e7, SOLAR)).isInstanceOfSatisfying(ConvgridException.class,
                e -> {
                    assertThat(e.kind()).isEqualTo(ErrorKind.OUT_OF_RANGE);
                    assertThat(e.parameters()).element(0).isEqualTo("density");
                });
        assertThatThrownBy(() -> DEFAULT.burn(1.0, Double.NaN, SOLAR)).isInstanceOf(ConvgridException.class);
        assertThat(DEFAULT.burn(1.0, 1.0e5, SOLAR).eps()).isGreaterThanOrEqualTo(0.0).isLessThan(1e-20);
    }
}
