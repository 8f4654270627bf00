package org.convgrid.engine.birth;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.evolution.NuclearLuminosity;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.structure.MeshPlanner;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

class StartModelTest {

    private static final double MYR = BirthTracks.MYR;

    @Test
    void startModelsAreFullyConvectiveContractingAndOnTarget() {
        assertStartModels(0.02, 0.1, 1.0, 3.0);
    }

    @Test
    void metalRichStartModelsNearTheAnchorMassAreReached() {
        // Z = 0.04: the bare polytrope did not relax at 1.26 and 2.0 Msun (its surface layers failed), and they were
        // walked from the 1 Msun start model; the guess with its adiabatic envelope relaxes directly (measured)
        assertStartModels(0.04, 1.26, 2.0);
    }

    @Test
    void metalPoorStartModelsRelax() {
        // Z = 1e-4: with the default opacity's relaxation aid (the OPAL tables without the low-temperature ones) the
        // bare polytrope failed at every mass; the guess with its adiabatic envelope relaxes with the default
        // (measured 0.1-10 Msun)
        assertStartModels(1.0e-4, 0.3, 1.0);
    }

    @Test
    void metalPoorTenSolarMassesIsReachedWithHalvedRateCorrections() {
        // Z = 1e-4, 10 Msun: T_c jumps with the contraction rate as the radiative interior appears, and corrections
        // across the jump fail; halved ones reach it from its own guess (with the bare polytrope it was walked
        // 6.7 -> 8.2 -> 9.0 -> 9.5 -> 10 Msun). It is hotter than the Hayashi line at Z = 0.02 (measured Teff
        // 5095 K; the line moves to higher Teff at higher mass and lower metallicity, from memory) and not fully
        // convective: at this low metal opacity the
        // interior is radiative, the convective envelope reaching down to m/M = 0.972 (measured); so the star is more
        // centrally condensed than an n = 1.5 polytrope, and its virial luminosity lies towards that of n = 3,
        // L = (3/4) x G M^2 / R, 7/4 of the n = 1.5 one (Chandrasekhar 1939, ch. IV; measured 1.60). Teff below
        // 5500 K, base 0.972 and 1.4-1.75 frozen from our own run (2026-12-02, commit 3db178d)
        assertStartModelsWith(1.0e-4, 5500.0, 0.972, 1.4, 1.75, 10.0);
    }

    private static void assertStartModels(double z, double... masses) {
        assertStartModelsWith(z, 5000.0, 0.0, 0.7, 1.4, masses);
    }

    /**
     * @param hottest the largest Teff accepted, K
     * @param zoneBase mass fraction at the base of the one convective zone: 0 for a fully convective star
     * @param virialLow smallest L / ((3/7) x G M^2 / R) accepted
     * @param virialHigh largest one
     */
    private static void assertStartModelsWith(double z, double hottest, double zoneBase, double virialLow,
                                              double virialHigh, double... masses) {
        PhysicsSet physics = BirthTracks.physics(z);
        StartModelBuilder builder = new StartModelBuilder(physics);
        for (double m : masses) {
            StartModel s = builder.build(m * Constants.M_SUN, BirthTracks.birth(z));
            var g = s.model().global();
            assertThat(Math.log(g.centralTemperature() / builder.centralTemperature(m * Constants.M_SUN)))
                    .isCloseTo(0.0, within(StartModelBuilder.CENTRAL_TEMPERATURE_TOLERANCE));
            // one convective zone from the centre (or zoneBase) through the star (above it only the radiative
            // atmosphere)
            var zones = s.model().convection().zones();
            assertThat(zones).hasSize(1);
            if (zoneBase == 0.0) {
                assertThat(zones.get(0).innerMassFraction()).isZero();
            } else {
                assertThat(zones.get(0).innerMassFraction()).isCloseTo(zoneBase, within(0.01));
            }
            assertThat(zones.get(0).outerMassFraction()).isGreaterThan(0.999);
            // high on the Hayashi track: Teff of a few 1000 K (Hayashi 1961, PASJ 13, 450), no nuclear burning
            assertThat(g.effectiveTemperature()).isBetween(2800.0, hottest);
            assertThat(NuclearLuminosity.fraction(s.model())).isLessThan(1.0e-3);
            // the virial theorem for an n = 1.5 polytrope, L = (3/7) x G M^2 / R (Chandrasekhar 1939, ch. IV),
            // holds to the departures from an ideal-gas polytrope (ionisation zones, the surface layers)
            double virial = 3.0 / 7.0 * s.contractionRate() * Constants.G * Math.pow(m * Constants.M_SUN, 2)
                    / g.radius();
            assertThat(g.luminosity() / virial).isBetween(virialLow, virialHigh);
        }
    }

    @Test
    void agesAboveAFewContractionTimesForgetTheStart() {
        // the same 1 Msun star started at T_c = 5e5 K (default) and 3.5e5 K (about twice the radius)
        PhysicsSet physics = BirthTracks.physics(0.02);
        MainSequenceEvolver.Settings d = MainSequenceEvolver.Settings.DEFAULT;
        MainSequenceEvolver evolver = new MainSequenceEvolver(physics, new MainSequenceEvolver.Settings(
                d.maxCentralHydrogenChange(), d.exhaustionFraction(), d.maxLuminosityChange(), d.maxGrowth(),
                d.endCentralHydrogen(), 2.0 * MYR, d.stepBudget(), d.retryBudget()));
        double[] ages = {0.01 * MYR, 0.1 * MYR, 1.0 * MYR};
        BirthTrack hot = new BirthEvolution(new StartModelBuilder(physics), evolver, 1.0e-3)
                .evolve(Constants.M_SUN, BirthTracks.birth(0.02), ages);
        BirthTrack cool = new BirthEvolution(new StartModelBuilder(physics,
                new MeshPlanner(MeshPlanner.DEFAULT_POINTS), 3.5e5), evolver, 1.0e-3)
                .evolve(Constants.M_SUN, BirthTracks.birth(0.02), ages);
        double[] change = new double[ages.length];
        for (int i = 0; i < ages.length; i++) {
            change[i] = Math.abs(Math.log(hot.models().get(i).model().global().radius()
                    / cool.models().get(i).model().global().radius()));
        }
        // the start's memory fades over a few contraction times (1.3e4 and 5e3 yr): measured |D ln R| 0.095 at
        // 1e4 yr, 0.003 at 1e5 yr (the two step sequences differ, and so does their error), 0.0009 at 1 Myr (and,
        // with StartModelProbe's ages, 0.29 at 1e3 yr, 0.006 at 0.3 Myr, 0.0012 at 1 Myr). Bounds frozen from our own
        // runs (set 2026-12-02, commit 54fa5cd; figures re-measured 2026-12-03, commit a7baf0f), not published values
        assertThat(change[0]).isBetween(0.04, 0.15);
        assertThat(change[1]).isLessThan(0.01);
        assertThat(change[2]).isLessThan(3.0e-3);
    }
}
