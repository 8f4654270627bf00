package org.convgrid.engine.evolution;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.function.ToDoubleFunction;
import java.util.stream.Collectors;

import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.physics.StandardPhysics;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.structure.StellarProfile;
import org.convgrid.engine.units.Constants;
import org.convgrid.engine.zams.ZamsBuilder;
import org.convgrid.engine.zams.ZamsResult;
import org.convgrid.engine.zams.ZamsTrack;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Our main sequence of 1.5-15 Msun against the published tracks of Bertelli, Girardi, Marigo &amp; Nasi 2008 (A&amp;A
 * 484, 815; 1.5 Msun) and Bertelli, Nasi, Girardi &amp; Marigo 2009 (A&amp;A 508, 355; 2.5-15 Msun), their
 * Z = 0.017, Y = 0.30 set: the subset in {@code reference/mainsequence/bertelli2008-z017-y030-upper-ms.csv}, whose
 * header says what was kept, how it was read and what their inputs are.
 *
 * <p>Our tracks take their inputs as near as our options allow: X = 0.683, Z = 0.017, Y = 0.30, mixing length 1.68,
 * and uniform (step) overshoot of 0.25 pressure scale heights above the Schwarzschild boundary, the distance their
 * overshoot parameter 0.5 (measured across the boundary) corresponds to (their papers' statement, from memory). What
 * cannot be matched: their equation of state, nuclear rates and opacities in detail, their overshoot formalism
 * (ours has no penetration beyond the mixed region and is capped at 0.25 r_core in small cores), and their mass loss
 * (their 15 Msun track loses 1.1 % of its mass by core-hydrogen exhaustion, computed from their own log g, L and
 * Teff; none up to 8 Msun). The bounds are MEASURED DIFFERENCES (2026-12-05, this code), a little outside the largest
 * measured: a change that takes us further from the published tracks fails, and so does one that moves a mean by
 * more than its band (then update these figures and README's "Limits, in detail"). It can fail: with the lifetime
 * bound 1.03 instead of 1.07, or the mid-main-sequence core bound 0 instead of -0.01..0.025, the 1.5 Msun row fails
 * (lifetime ratio 1.047, core +0.003); without overshoot every lifetime is 12-25 % short (checked below).
 *
 * <p>Time steps are twice the default (|D X_c| &lt;= 0.02): with the default steps the lifetimes come out 0.5-0.8 %
 * shorter (ours / theirs 1.014-1.040 against 1.020-1.047 here). Ten tracks: the class took 11.7 s under load (2026-12-05).
 */
class PublishedUpperMainSequenceTest {

    private static final String RESOURCE = "/reference/mainsequence/bertelli2008-z017-y030-upper-ms.csv";
    /** Their composition and mixing length (Bertelli et al. 2008, 2009: the Z = 0.017, Y = 0.30 set, alpha 1.68). */
    private static final double THEIR_METALS = 0.017;
    private static final double THEIR_HELIUM = 0.30;
    private static final double THEIR_MIXING_LENGTH = 1.68;
    /** Step overshoot above the boundary equivalent to their 0.5 H_P across it (Bertelli et al. 2008; from memory). */
    private static final double THEIR_OVERSHOOT_HP = 0.25;
    /** Our early model, at this fraction of their lifetime: the mixed core is then visible in the hydrogen profile. */
    private static final double EARLY_FRACTION = 0.02;
    /** Our models around their mid-main-sequence row, at these multiples of its age (ours are 1-5 % slower). */
    private static final double[] MID_AGE_FACTORS = {1.0, 1.035, 1.07};

    private static Map<Double, List<PublishedMainSequenceRow>> published;
    private static List<Comparison> comparisons;
    private static Map<Double, Double> lifetimeWithoutOvershoot;

    /** Our track and their rows for one mass. */
    private record Comparison(double mass, StellarModel zeroAge, EvolutionResult track,
                              PublishedMainSequenceRow zams, PublishedMainSequenceRow mid,
                              PublishedMainSequenceRow exhausted) {

        double logLuminosityDifference() {
            return Math.log10(zeroAge.global().luminosity() / Constants.L_SUN) - zams.logLuminosity();
        }

        double logTeffDifference() {
            return Math.log10(zeroAge.global().effectiveTemperature()) - zams.logTeff();
        }

        /** Ours / theirs: core-hydrogen exhaustion (ours X_c = 1e-4; theirs the first row printing X_c 0.0000). */
        double lifetimeRatio() {
            return track.exhaustionAge() / (exhausted.ageYr() * Constants.YEAR);
        }

        /** Our mixed core early on, less their core at zero age. */
        double earlyCoreDifference() {
            return mixedCore(track.models().get(0).model()) - zams.coreMassFraction();
        }

        /** Our mixed core at their mid-main-sequence central hydrogen (interpolated), less theirs. */
        double midCoreDifference() {
            for (int i = 2; i < track.models().size(); i++) {
                StellarModel a = track.models().get(i - 1).model();
                StellarModel b = track.models().get(i).model();
                double xa = a.profile().hydrogen(0);
                double xb = b.profile().hydrogen(0);
                if (xa >= mid.centralHydrogen() && xb <= mid.centralHydrogen()) {
                    double f = (xa - mid.centralHydrogen()) / (xa - xb);
                    return mixedCore(a) + f * (mixedCore(b) - mixedCore(a)) - mid.coreMassFraction();
                }
            }
            throw new AssertionError(mass + " Msun: no pair of models brackets X_c " + mid.centralHydrogen());
        }

        @Override
        public String toString() {
            return String.format("%.1f Msun: dlogL %.4f, dlogTeff %.4f, lifetime ratio %.3f, core m/M early %+.3f,"
                            + " mid %+.3f", mass, logLuminosityDifference(), logTeffDifference(), lifetimeRatio(),
                    earlyCoreDifference(), midCoreDifference());
        }
    }

    @BeforeAll
    static void evolveAtTheirInputs() {
        published = PublishedMainSequenceRow.read(RESOURCE).stream().collect(
                Collectors.groupingBy(PublishedMainSequenceRow::massMsun, TreeMap::new, Collectors.toList()));
        Composition composition = Composition.scaledSolar(1.0 - THEIR_HELIUM - THEIR_METALS, THEIR_METALS);
        PhysicsSet overshooting = physics(composition, THEIR_OVERSHOOT_HP);
        PhysicsSet plain = physics(composition, 0.0);
        ZamsTrack zeroAges = new ZamsTrack(new ZamsBuilder(overshooting), composition);
        comparisons = new ArrayList<>();
        lifetimeWithoutOvershoot = new TreeMap<>();
        published.forEach((mass, rows) -> {
            PublishedMainSequenceRow zams = row(rows, "zams");
            PublishedMainSequenceRow mid = row(rows, "mid");
            PublishedMainSequenceRow exhausted = row(rows, "exhausted");
            ZamsResult z = zeroAges.solve(mass * Constants.M_SUN);
            assertThat(z.converged()).as("%s Msun zero-age model: %s", mass, z.failure()).isTrue();
            StellarModel zeroAge = z.model().model();
            double[] ages = new double[1 + MID_AGE_FACTORS.length];
            ages[0] = EARLY_FRACTION * exhausted.ageYr() * Constants.YEAR;
            for (int i = 0; i < MID_AGE_FACTORS.length; i++) {
                ages[i + 1] = MID_AGE_FACTORS[i] * mid.ageYr() * Constants.YEAR;
            }
            EvolutionResult track = evolver(overshooting).evolve(zeroAge, ages);
            assertThat(track.end()).as(track.detail()).isEqualTo(EvolutionResult.EndReason.HYDROGEN_EXHAUSTED);
            comparisons.add(new Comparison(mass, zeroAge, track, zams, mid, exhausted));
            EvolutionResult withoutOvershoot = evolver(plain).evolve(zeroAge, new double[0]);
            lifetimeWithoutOvershoot.put(mass, withoutOvershoot.exhaustionAge() / (exhausted.ageYr() * Constants.YEAR));
        });
    }

    private static PhysicsSet physics(Composition composition, double overshootHp) {
        return StandardPhysics.create(new PhysicsOptions(THEIR_MIXING_LENGTH, overshootHp,
                StabilityCriterion.SCHWARZSCHILD, 1.0), composition);
    }

    private static MainSequenceEvolver evolver(PhysicsSet physics) {
        return new MainSequenceEvolver(physics, MainSequenceEvolver.Settings.DEFAULT.scaled(2.0));
    }

    private static PublishedMainSequenceRow row(List<PublishedMainSequenceRow> rows, String role) {
        return rows.stream().filter(r -> r.role().equals(role)).findFirst().orElseThrow();
    }

    private static double mean(ToDoubleFunction<Comparison> f) {
        return comparisons.stream().mapToDouble(f).average().orElseThrow();
    }

    @Test
    void zeroAgeMainSequenceWithinTheMeasuredOffsets() {
        assertThat(comparisons).hasSize(5);
        for (Comparison c : comparisons) {
            // Bertelli et al. 2008 / 2009, zero-age rows: measured log L -0.0003 (4 Msun) to +0.0135 dex (2.5 Msun)
            assertThat(c.logLuminosityDifference()).as("%s", c).isBetween(-0.01, 0.02);
            // ours hotter at every mass: +0.0064 (1.5 Msun, 1.5 % in Teff) to +0.0121 dex (2.5 Msun, 2.8 %)
            assertThat(c.logTeffDifference()).as("%s", c).isBetween(0.0, 0.016);
        }
        // means over the five masses (Bertelli et al. 2008 / 2009): +0.0079 dex in L, +0.0098 dex in Teff
        assertThat(mean(Comparison::logLuminosityDifference)).as("%s", comparisons).isCloseTo(0.0079, within(0.004));
        assertThat(mean(Comparison::logTeffDifference)).as("%s", comparisons).isCloseTo(0.0098, within(0.003));
    }

    @Test
    void coreHydrogenLifetimesWithinTheMeasuredOffsets() {
        for (Comparison c : comparisons) {
            // Bertelli et al. 2008 / 2009, first row with X_c printed 0.0000: ours / theirs measured 1.020 (4 Msun) to
            // 1.047 (1.5 Msun); with the default time steps 1.014-1.040
            assertThat(c.lifetimeRatio()).as("%s", c).isBetween(1.0, 1.07);
            // the same tracks without overshoot are 12-25 % short (0.746 at 1.5 Msun to 0.877 at 15 Msun): the
            // overshoot, not the rest of the physics, is what brings us to their lifetimes
            assertThat(lifetimeWithoutOvershoot.get(c.mass())).as("%s Msun without overshoot", c.mass())
                    .isBetween(0.70, 0.90);
        }
        // mean ours / theirs 1.029 (Bertelli et al. 2008 / 2009)
        assertThat(mean(Comparison::lifetimeRatio)).as("%s", comparisons).isCloseTo(1.029, within(0.012));
    }

    @Test
    void mixedCoresWithinTheMeasuredOffsets() {
        for (Comparison c : comparisons) {
            // their core column is the mixed region, overshoot included: our mixed core at 2 % of their lifetime
            // against their zero-age row (Bertelli et al. 2008 / 2009) measured -0.001 (15 Msun) to +0.012 in m/M
            // (1.5 Msun: 0.197 against 0.185)
            assertThat(c.earlyCoreDifference()).as("%s", c).isBetween(-0.01, 0.02);
            // at their mid-main-sequence row (X_c 0.34-0.36), at the same X_c (Bertelli et al. 2008 / 2009): measured
            // +0.003 (1.5 Msun) to +0.014 (15 Msun: 0.376 against 0.362)
            assertThat(c.midCoreDifference()).as("%s", c).isBetween(-0.01, 0.025);
        }
        // means (Bertelli et al. 2008 / 2009): early +0.006, mid-main-sequence +0.009 in m/M
        assertThat(mean(Comparison::earlyCoreDifference)).as("%s", comparisons).isCloseTo(0.006, within(0.006));
        assertThat(mean(Comparison::midCoreDifference)).as("%s", comparisons).isCloseTo(0.009, within(0.006));
    }

    /** m/M to which the composition is the centre's: the convective core with its overshoot region. */
    private static double mixedCore(StellarModel m) {
        StellarProfile p = m.profile();
        int k = 0;
        while (k + 1 < p.size() && Math.abs(p.hydrogen(k + 1) - p.hydrogen(0)) < 1e-9) {
            k++;
        }
        return p.mass(k) / m.mass();
    }
}
