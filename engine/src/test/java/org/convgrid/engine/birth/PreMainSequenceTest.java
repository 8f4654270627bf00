package org.convgrid.engine.birth;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;

import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.evolution.AgedModel;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

/**
 * Evolution from birth: contraction, deuterium burning, the radiative core, the arrival on the zero-age main
 * sequence, lithium, and the energy budget. Tracks use the default step limits and are shared between the checks
 * ({@link BirthTracks}).
 */
class PreMainSequenceTest {

    private static final double MYR = BirthTracks.MYR;

    private static BirthTrack solar() {
        return BirthTracks.track(1.0, 0.02, 1000, 1.0, 1, 10, 100, 1000);
    }

    @Test
    void solarMassIsFullyConvectiveAtOneMyrAndHasARadiativeCoreByTenMyr() {
        BirthTrack t = solar();
        AgedModel young = t.models().get(0);
        AgedModel older = t.models().get(1);
        // a 1 Msun star is fully convective on its Hayashi track for its first ~2 Myr and has a radiative core
        // well before 10 Myr (Iben 1965, ApJ 141, 993; Siess, Dufour & Forestini 2000, A&A 358, 593; from memory)
        assertThat(young.status()).isEqualTo(ModelStatus.OK);
        assertThat(young.model().convection().structureClass()).isEqualTo(StructureClass.FULLY_CONVECTIVE);
        assertThat(t.phaseAt(young.age())).isEqualTo(Phase.PRE_MAIN_SEQUENCE);
        assertThat(older.model().convection().structureClass()).isEqualTo(StructureClass.CONV_ENVELOPE);
        assertThat(t.events().radiativeCore()).isBetween(1.0 * MYR, 10.0 * MYR);
        // the requested ages are landed on exactly, not interpolated
        assertThat(young.age()).isEqualTo(1.0 * MYR);
        assertThat(t.points().stream().anyMatch(p -> p.age() == 10.0 * MYR)).isTrue();
        // non-regression (default limits): radiative core at 1.73 Myr (1.69 before the low-temperature tables of
        // Ferguson et al. 2005 became the default opacity: the cooler, larger Hayashi-track star contracts later;
        // 1.86 -> 1.73 when eps_grav took its two-step form before the ZAMS, second order in time: with every step
        // limit halved and quartered it is 1.70 and 1.68 Myr, ZamsArrivalProbe, against 1.77 and 1.72 before).
        // Frozen from our own run, last set 2026-12-03 (commit ab06333). Tolerance 0.1 Myr (our choice): the age is
        // first order in the step, and halving every limit moves it 0.03 Myr; the changes above moved it 0.04-0.13
        assertThat(t.events().radiativeCore() / MYR).isCloseTo(1.73, within(0.1));
    }

    @Test
    void deuteriumBurningHoldsUpTheContraction() {
        BirthTrack t = solar();
        double peak = 0.0;
        double peakAge = 0.0;
        for (TrackPoint p : t.points()) {
            if (p.age() < 1.0 * MYR && p.nuclearFraction() > peak) {
                peak = p.nuclearFraction();
                peakAge = p.age();
            }
        }
        // deuterium burning supplies most of the luminosity for a few 1e5 yr near T_c ~ 1e6 K (Stahler 1988,
        // ApJ 332, 804; Palla &amp; Stahler 1991; from memory)
        assertThat(peak).isGreaterThan(0.5);
        assertThat(peakAge).isBetween(2.0e4 * Constants.YEAR, 5.0e5 * Constants.YEAR);
        TrackPoint atOneMyr = t.points().stream().filter(p -> p.age() == 1.0 * MYR).findFirst().orElseThrow();
        assertThat(atOneMyr.centralDeuterium()).isLessThan(1.0e-3 * t.points().get(0).centralDeuterium());
    }

    @Test
    void energyRadiatedEqualsNuclearPlusGravothermalRelease() {
        // conservation of energy (common practice: the global energy budget of an evolution code, Kippenhahn,
        // Weigert & Weiss 2012, ch. 4): integral L dt = integral L_nuc dt - D(U + Omega), within 1 % of the energy
        // radiated. 1 Msun: deuterium burning, the Hayashi track, the radiative core and the approach to the ZAMS;
        // 0.5 Msun: a fully convective contraction still far from the ZAMS at 100 Myr; 2 Msun: the contraction with
        // a radiative core to 10 Myr, before its ZAMS. Measured (conservative eps_grav): 0.61 %, 0.98 %, 0.87 %
        // (0.28 %, 0.43 %, 0.73 % before the low-temperature opacity tables became the default); with
        // -c_P T (dlnT - nabla_ad dlnP)/dt at the end-of-step state the 0.5 Msun track closed to 1.43 %. Since the
        // two-step eps_grav before the ZAMS (second order in time) and with trapezoid sums: 0.52 %, 0.31 %, 0.64 %
        // (the right Riemann sums of the one-step form then gave 4.4 % for 0.5 Msun: L is no longer a step mean);
        // 0.55 %, 0.37 %, 0.69 % with the share of L and the central 12C and 3He paced at 0.3 and 0.4 in ln.
        assertEnergyCloses(solar(), 2, 100.0, 0.01);
        assertEnergyCloses(BirthTracks.track(0.5, 0.02, 300, 1.0, 100), 0, 100.0, 0.01);
        assertEnergyCloses(BirthTracks.track(2.0, 0.02, 10, 1.0, 10), 0, 10.0, 0.01);
    }

    /**
     * Over the track from birth to the requested age {@code endMyr} (the track's model number {@code model}), the
     * energy radiated equals the nuclear release plus the drop of the total energy, within {@code tolerance}
     * (relative to the energy radiated).
     */
    private static void assertEnergyCloses(BirthTrack t, int model, double endMyr, double tolerance) {
        PhysicsSet physics = BirthTracks.physics(0.02);
        List<TrackPoint> points = t.points();
        // trapezoid sums: before the ZAMS each model's L is the luminosity at its own age (two-step eps_grav,
        // second order), after it the mean release over the step that led to it, which the trapezoid rule also
        // integrates to second order
        BirthTracks.EmittedEnergy sums = BirthTracks.emitted(t, endMyr * MYR);
        double radiated = sums.radiated();
        double nuclear = sums.nuclear();

        // total energy E = integral (u - G m/r) dm (Kippenhahn, Weigert & Weiss 2012, ch. 3): the gravothermal
        // release is -D E, computed here from the two end models alone, independently of eps_grav
        StellarModel first = t.start().model();
        StellarModel end = t.models().get(model).model();
        assertThat(points.get(sums.last()).age()).isEqualTo(endMyr * MYR);
        double released = StarEnergy.total(first, physics) - StarEnergy.total(end, physics);
        assertThat(Math.abs(radiated - nuclear - released) / radiated).isLessThan(tolerance);
        // most of it is contraction: neither star has burnt much hydrogen by 100 Myr
        assertThat(released / radiated).isGreaterThan(0.3);
    }

    @Test
    void zeroAgeMainSequenceArrivalAgainstPublishedContractionTimes() {
        // contraction times to the main sequence, Z = 0.02 (Iben 1965, ApJ 141, 993, table of pre-main-sequence
        // times; from memory): 0.5 Msun 1.5e8 yr, 1 Msun 5.0e7, 1.5 Msun 1.8e7, 3 Msun 2.5e6; 2 Msun 8.1e6 yr
        // interpolated in log-log between his 1.5 and 2.25 Msun (5.9e6). Published sets differ by tens of per
        // cent through their start and opacities, and the ZAMS is defined differently (Iben: the end of
        // contraction; here L_nuc >= 0.99 L, which CN-burning stars approach slowly): within a factor 2.2.
        double[][] cases = {{0.5, 300, 150}, {1.0, 1000, 50}, {1.5, 60, 18}, {2.0, 40, 8.1}, {3.0, 12, 2.5}};
        double previous = Double.MAX_VALUE;
        double previousCore = Double.MAX_VALUE;
        // non-regression (default limits), Myr
        // (0.5 and 1 Msun re-frozen when the surface-lithium step limit changed their step sequences: 200.7 -> 191.2
        // and 48.85 -> 44.25 Myr; re-frozen with the conservative eps_grav: 191.2 -> 190.1, 44.25 -> 46.18,
        // 31.81 -> 32.58, 17.15 -> 17.02, 4.51 -> 4.549; re-frozen when the steps became paced by the central 12C
        // and 3He and the contraction's share of L, which made these ages converge in time (every limit halved moves
        // them by 1.3-3.4 %, ZamsArrivalProbe, against 3-21 % before): 190.1 -> 134.8, 46.18 -> 36.69,
        // 32.58 -> 25.84, 17.02 -> 11.11, 4.549 -> 3.426; re-frozen when the low-temperature tables of Ferguson et
        // al. 2005 became the default opacity (cooler, larger pre-main-sequence stars contract more slowly): 134.8 ->
        // 158.9, 36.69 -> 39.88, 25.84 -> 26.66, 11.11 -> 11.41, 3.426 -> 3.530)
        // 158.9 -> 154.3, 39.88 -> 38.71, 26.66 -> 26.29, 11.41 -> 11.37, 3.530 -> 3.494 when eps_grav took its
        // two-step form before the ZAMS (second order in time; the one-step form made these ages first order in the
        // step limits, 2-7 % above the converged values, MainSequenceEvolver#YOUNG_TWO_STEP_RATIO)
        // 154.3 -> 154.1, 38.71 -> 39.20, 26.29 -> 25.88, 11.37 -> 11.32, 3.494 -> 3.492 when the pacing by the
        // contraction's share of L went from 0.1 to 0.3 and by the central 12C and 3He from 0.2 to 0.4 in ln (the
        // two-step eps_grav no longer needs them tight: 20-33 % fewer steps before the ZAMS, PreMainSequenceLimits)
        // 154.1 -> 154.0, 39.20 -> 38.35, 25.88 -> 25.65, 11.32 -> 11.08, 3.492 -> 3.482, re-frozen after they had
        // drifted inside the band (1 Msun by 2.2 % of its 3 %) through redistributed steps burning at mid-step values,
        // the mesh's boundary cost scaled with the number of points and the 300-point mesh of the contraction with a
        // radiative core (each within the step and mesh errors in README's Limits, ZamsArrivalProbe,
        // MeshConvergenceProbe). Frozen from our own run, last set 2026-12-03 (commit 7e54a01)
        double[] frozen = {154.0, 38.35, 25.65, 11.08, 3.482};
        double[] measured = new double[cases.length];
        for (int i = 0; i < cases.length; i++) {
            double[] c = cases[i];
            BirthTrack t = c[0] == 1.0 ? solar() : BirthTracks.track(c[0], 0.02, c[1], 1.0, 100);
            double zams = t.events().zeroAgeMainSequence() / MYR;
            assertThat(zams).as("ZAMS age of %s Msun", c[0]).isBetween(c[2] / 2.2, c[2] * 2.2);
            assertThat(zams).isLessThan(previous);
            measured[i] = zams;
            // the radiative-core onset comes earlier with mass above the fully convective limit (Iben 1965)
            assertThat(t.events().radiativeCore()).isLessThan(previousCore);
            previous = zams;
            previousCore = t.events().radiativeCore();
        }
        for (int i = 0; i < cases.length; i++) {
            assertThat(measured[i]).as("ZAMS ages %s Myr", java.util.Arrays.toString(measured))
                    .isCloseTo(frozen[i], within(0.03 * frozen[i]));
        }
    }

    @Test
    void hayashiTrackAtOneMyrAgainstAPublishedTrack() {
        // Baraffe et al. 2015 (A&A 577, A42), published 1 Msun model at 1 Myr: Teff 4377 K, log L/Lsun 0.28,
        // R 2.435 Rsun (their isochrone table; non-grey atmospheres, alpha 1.6, Z ~ 0.015). Published sets with other
        // atmospheres and mixing lengths differ by ~100-150 K there: the tolerance, 150 K.
        var g = solar().models().get(0).model().global();
        double teff = g.effectiveTemperature();
        assertThat(teff).isCloseTo(4377.0, within(150.0));
        // non-regression: 4425 K (R 2.49, L 2.14); 4718 K (R 2.29, L 2.35) with the analytic cool opacity, 0.3-0.5 dex
        // below the published low-temperature tables of Ferguson et al. 2005 where the photosphere sits (log T 3.674,
        // log R 0.28), before those tables became the default. Frozen from our own run, last set 2026-12-02
        // (commit 02cc0fb). Tolerance 15 K (our choice): a tenth of the published sets' spread, far above round-off
        assertThat(teff).isCloseTo(4425.0, within(15.0));
    }

    @Test
    void surfaceLithiumAgainstStandardModels() {
        // Baraffe et al. 2015 (A&A 577, A42), the published 1 Msun track: log Li/Li0 = -0.51 from ~30 Myr to beyond
        // 4 Gyr (a standard model burns its lithium on the pre-main sequence only: -0.41 dex by 10 Myr); standard
        // models under-deplete the Sun, which shows log(Li/Li_0) = 1.05 - 3.26 = -2.2 at 4.57 Gyr (Asplund et al.
        // 2009, Table 1, photosphere against meteorites). Sets differ by a few tenths of a dex (their Z, opacities,
        // mixing length: depletion grows with Z, and Baraffe et al. use Z ~ 0.015 against our 0.02), so a validation
        // would ask for -0.5 +- 0.5 dex: the tolerance. It must at least burn some: below -0.3.
        AgedModel gyr = solar().models().get(3);
        double logLi = Math.log10(solar().surfaceLithiumAt(gyr));
        assertThat(logLi).isLessThan(-0.3);
        assertThat(logLi).isCloseTo(-0.51, within(0.5));
        // Non-regression: -0.91 since the low-temperature tables of Ferguson et al. 2005 became the default opacity
        // (the Hayashi track ~290 K cooler, the envelope base cooler at 2-5 Myr); before, -2.90, ~2.4 dex more than
        // the published track, and the history of that discrepancy follows: -3.10, ~2.6 dex more than published.
        // Not the rate (7Li(p,a) within 10 % of Caughlan & Fowler 1988, LightElementRatesTest) nor the mixing (each
        // convective zone burns once per step with its mass-weighted rate). Measured cause: the envelope base sits at
        // ~4.07e6 K from the radiative core's onset (1.7 Myr) to ~5 Myr, and the star reaches each stage earlier,
        // because its Hayashi track is ~340 K too hot (see above: the cool opacity). With that opacity raised by
        // 0.4 dex below log T 3.70 (PreMainSequenceProbe -Dprobe.coolDex=0.4) the base holds 3.80e6 K, T_c at 10 Myr
        // is 6.06e6 K (Baraffe et al. 2015: 6.08e6 K; ours now 6.69e6 K), the envelope base at 10 Myr m/M = 0.555
        // (their radiative core 0.55 Msun) and log Li/Li0 = -0.89 from 50 Myr on. With the surface-lithium step limit
        // (30 %) the value no longer depends on the requested ages (-3.09 / -3.10 for two age sets); a 10 % limit
        // gives -2.74: the default is still ~0.4 dex from the converged value. Re-frozen -3.10 -> -2.90 when the
        // equation of state gave hydrogen's bound state its Planck-Larkin weight and the pre-main-sequence steps
        // became paced by the central 12C and 3He and the contraction's share of L (eps_grav conservative); -2.90 ->
        // -0.91 with the low-temperature tables; -0.91 -> -0.83 when the share of L stopped pacing steps during
        // deuterium burning (the same physics on another step history: lithium is still step-sensitive at ~0.1 dex);
        // -0.83 -> -0.94 when the pacing by the central 12C and 3He went from 0.1 to 0.2 in ln and the fully
        // convective contraction got steps of 0.2 in ln L, ln R, ln T_c (again another step history, -0.11 dex).
        // -0.94 -> -0.98 when eps_grav took its two-step form before the ZAMS (the envelope base follows the
        // contraction half a step earlier than with implicit Euler; lithium burning is still first order, see
        // PreMainSequenceLimits#maxLithiumBurnt). -0.98 -> -0.58 (+0.40 dex) when the light elements burnt with
        // the trapezoid of the start- and end-of-step zones' rates (LightElementBurning#corrected): second order in
        // the step; with every limit scaled by 1 / 0.5 / 0.25 (YoungStepAccuracyProbe) -0.580 / -0.573 / -0.571,
        // against -0.968 / -0.823 / -0.712 before, so -0.98 was a first-order error of ~0.35 dex, not the model.
        // Frozen from our own run, last set 2026-12-03 (commit 19b4f7a). Tolerance 0.05 dex (our choice): five times
        // the step-halving spread (-0.580 / -0.573 / -0.571), below every step-history change recorded above.
        assertThat(logLi).isCloseTo(-0.58, within(0.05));
        // 0.5 Msun at 100 Myr: Baraffe et al. 2015 keep Li/Li0 = 0.000 in their table (below 5e-4) from 15 Myr on;
        // the lithium of a 0.5-0.6 Msun star is gone well before the zero-age main sequence
        BirthTrack half = BirthTracks.track(0.5, 0.02, 300, 1.0, 100);
        assertThat(half.surfaceLithiumAt(half.models().get(0))).isLessThan(5.0e-4);
        // the halving happens on the pre-main sequence for both (common practice)
        assertThat(half.events().lithiumHalved()).isLessThan(half.events().zeroAgeMainSequence());
        assertThat(solar().events().lithiumHalved()).isLessThan(solar().events().zeroAgeMainSequence());
        // the 1 % level (li_one_percent_myr): Baraffe et al. 2015 tabulate 0.000 for 0.5 Msun from 15 Myr on, so it
        // falls below 1 % by then, after the halving (the table's step, not a date: from memory of that table's
        // layout); the Sun keeps -0.58 dex, so it never gets there
        assertThat(half.events().lithiumOnePercent()).isGreaterThan(half.events().lithiumHalved())
                .isLessThan(15.0 * BirthTracks.MYR);
        assertThat(solar().events().lithiumOnePercent()).isNaN();
    }
}
