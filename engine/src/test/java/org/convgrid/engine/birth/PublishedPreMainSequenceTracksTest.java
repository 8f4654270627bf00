package org.convgrid.engine.birth;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Collectors;

import org.convgrid.engine.evolution.AgedModel;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Our pre-main sequence against the published tracks of Baraffe, Homeier, Allard &amp; Chabrier 2015 (A&amp;A 577, A42;
 * their "tracks and internal structure" table, the subset in
 * {@code reference/premainsequence/baraffe2015-tracks-subset.csv}, whose header says what was kept and how it was
 * checked): 0.1, 0.2, 0.3, 0.5, 0.7, 1.0, 1.2 and 1.4 Msun at the published rows nearest 1, 3, 10, 30 and 100 Myr,
 * and the ages at which each star grows its radiative core and halves its lithium.
 *
 * <p>Our tracks take their inputs as near as our options allow: Y = 0.271, Z = 0.0153, mixing length 1.6 (their
 * values, from memory). What cannot be matched: their non-grey model atmospheres (ours: the grey Krishna Swamy
 * relation), their metal mixture (Asplund et al. 2009; our opacities are the GN93 tables at the same Z) and their
 * equation of state. So this is not a validation to a few per cent: the bounds are KNOWN DISCREPANCIES, MEASURED ON
 * 2026-12-05 on this code, each with the cause where one is known. Each quantity has a bound per row a little
 * outside the largest difference measured (a change that takes us further away fails) and a band around the mean
 * difference over a mass group (a change that brings us closer fails too, so that the figures here and in README's
 * "Limits, in detail" get updated). It can fail: with the mixing length 1.8 instead of 1.6 the 1 Msun star at 30 Myr
 * comes out 223 K hotter than theirs; with 1.4, three of the four checks fail (0.3 Msun at 1 Myr 19 % larger, the
 * 0.7 Msun lithium halved too late, the 1.4 Msun radiative core too small).
 *
 * <p>The tracks land on the published ages exactly and run on to 1.6 times the oldest kept row (the 0.3 Msun track
 * to 257 Myr, past the end of its transient radiative core). Eight tracks: 5.1 s alone on one core (measured
 * 2026-12-05), up to ~16 s with the other core busy.
 */
class PublishedPreMainSequenceTracksTest {

    private static final String RESOURCE = "/reference/premainsequence/baraffe2015-tracks-subset.csv";
    /** Their inputs (Baraffe et al. 2015; from memory). */
    private static final double THEIR_HELIUM = 0.271;
    private static final double THEIR_METALS = 0.0153;
    private static final double THEIR_MIXING_LENGTH = 1.6;
    /** The solar luminosity and radius of their table (its header), erg/s and cm. */
    private static final double THEIR_L_SUN = 3.839e33;
    private static final double THEIR_R_SUN = 6.96e10;
    /** Rows whose published lithium is below this (log Li/Li0) are burnt out for comparison purposes. */
    private static final double BURNT_OUT_LOG_LITHIUM = -3.0;

    private static Map<Double, List<PublishedTrackRow>> published;
    private static Map<Double, BirthTrack> ours;

    /** Our star and theirs at one published age. */
    private record Pair(double mass, PublishedTrackRow theirs, AgedModel model, double lithium) {

        double teffDifference() {
            return model.model().global().effectiveTemperature() - theirs.teffK();
        }

        double logLuminosityDifference() {
            return Math.log10(model.model().global().luminosity() / THEIR_L_SUN) - theirs.logLuminosity();
        }

        double radiusRatio() {
            return model.model().global().radius() / (theirs.radiusRsun() * THEIR_R_SUN);
        }

        double ourLogLithium() {
            return lithium > 0.0 ? Math.log10(lithium) : Double.NEGATIVE_INFINITY;
        }

        /** Our radiative core in m/M: the base of the convective envelope (0 when fully convective). */
        double ourCoreMassFraction() {
            return model.model().convection().envelopeBaseMassFraction();
        }

        double theirCoreMassFraction() {
            return theirs.radiativeCoreMassMsun() / mass;
        }

        @Override
        public String toString() {
            return String.format("%.1f Msun %.2f Myr: dTeff %.0f K, dlogL %.3f, R ratio %.3f, logLi %.2f/%.2f,"
                            + " core m/M %.3f/%.3f", mass, theirs.ageMyr(), teffDifference(), logLuminosityDifference(),
                    radiusRatio(), ourLogLithium(), theirs.logLithium(), ourCoreMassFraction(), theirCoreMassFraction());
        }
    }

    @BeforeAll
    static void evolveAtTheirInputs() {
        published = PublishedTrackRow.read(RESOURCE).stream()
                .collect(Collectors.groupingBy(PublishedTrackRow::massMsun, TreeMap::new, Collectors.toList()));
        ours = new TreeMap<>();
        published.forEach((mass, rows) -> {
            double[] ages = ageRows(mass).stream().mapToDouble(PublishedTrackRow::ageMyr).toArray();
            double end = 1.6 * rows.stream().mapToDouble(PublishedTrackRow::ageMyr).max().orElseThrow();
            ours.put(mass, BirthTracks.trackWith(mass, THEIR_HELIUM, THEIR_METALS, THEIR_MIXING_LENGTH, end, ages));
        });
    }

    private static List<PublishedTrackRow> ageRows(double mass) {
        return published.get(mass).stream().filter(r -> r.role().equals("age_row"))
                .sorted(Comparator.comparingDouble(PublishedTrackRow::logAgeYr)).toList();
    }

    private static PublishedTrackRow row(double mass, String role) {
        return published.get(mass).stream().filter(r -> r.role().equals(role)).findFirst().orElseThrow();
    }

    private static List<Pair> pairs() {
        List<Pair> pairs = new ArrayList<>();
        ours.forEach((mass, track) -> {
            List<PublishedTrackRow> rows = ageRows(mass);
            for (int i = 0; i < rows.size(); i++) {
                AgedModel model = track.models().get(i);
                assertThat(model.age() / BirthTracks.MYR).isCloseTo(rows.get(i).ageMyr(), within(1.0e-6));
                pairs.add(new Pair(mass, rows.get(i), model, track.surfaceLithiumAt(model)));
            }
        });
        return pairs;
    }

    private static double mean(List<Pair> pairs, java.util.function.ToDoubleFunction<Pair> f) {
        return pairs.stream().mapToDouble(f).average().orElseThrow();
    }

    @Test
    void hrDiagramPositionsWithinTheMeasuredOffsets() {
        List<Pair> all = pairs();
        assertThat(all).hasSize(40);
        List<Pair> mDwarfs = all.stream().filter(p -> p.mass() <= 0.5).toList();
        List<Pair> solarType = all.stream().filter(p -> p.mass() >= 0.7).toList();
        for (Pair p : all) {
            // KNOWN DISCREPANCY (measured 2026-12-05): -138 to +174 K. Below 0.5 Msun ours is cooler at every age past
            // 1 Myr (to -138 K at 0.1 Msun, 100 Myr): grey atmospheres misplace cool, molecule-dominated
            // photospheres by 100-200 K (Chabrier & Baraffe 1997, A&A 327, 1039; from memory). At 1.0-1.4 Msun
            // near the zero-age main sequence (30-100 Myr) ours is 63-174 K hotter: our stars reach it a little
            // earlier and hotter (1.4 Msun: R within 1 %, L 0.04 dex above)
            assertThat(Math.abs(p.teffDifference())).as("%s", p).isLessThanOrEqualTo(200.0);
            // measured -0.050 to +0.109 dex (1.4 Msun at 10 Myr, on its way to the main sequence)
            assertThat(Math.abs(p.logLuminosityDifference())).as("%s", p).isLessThanOrEqualTo(0.13);
            // measured 0.990 to 1.141: ours larger at 1 Myr below 0.5 Msun (0.2 / 0.3 Msun: +14 %), where the start
            // of the contraction still shows (README: ages below ~0.1 Myr depend on the start model), then 1-5 %
            assertThat(p.radiusRatio()).as("%s", p).isBetween(0.97, 1.17);
        }
        // group means, frozen from our own run (2026-12-05), bands of about a third of the spread: 0.1-0.5 Msun
        // -53 K, +0.010 dex, +4.6 % in R; 0.7-1.4 Msun +33 K, +0.032 dex, +2.9 %
        assertThat(mean(mDwarfs, Pair::teffDifference)).as("%s", mDwarfs).isCloseTo(-53.0, within(20.0));
        assertThat(mean(solarType, Pair::teffDifference)).as("%s", solarType).isCloseTo(33.0, within(20.0));
        assertThat(mean(mDwarfs, Pair::logLuminosityDifference)).isCloseTo(0.010, within(0.012));
        assertThat(mean(solarType, Pair::logLuminosityDifference)).isCloseTo(0.032, within(0.012));
        assertThat(mean(mDwarfs, Pair::radiusRatio)).isCloseTo(1.046, within(0.015));
        assertThat(mean(solarType, Pair::radiusRatio)).isCloseTo(1.029, within(0.015));
    }

    @Test
    void radiativeCoresAppearWhenTheirsDoAndGrowSomewhatFaster() {
        // fully convective throughout, as in the published tracks (every 0.1 and 0.2 Msun row read: Mrad = 0)
        assertThat(ours.get(0.1).events().radiativeCore()).isNaN();
        assertThat(ours.get(0.2).events().radiativeCore()).isNaN();
        for (double mass : new double[] {0.3, 0.5, 0.7, 1.0, 1.2, 1.4}) {
            double theirs = 0.5 * (row(mass, "core_none_before").ageMyr() + row(mass, "core_first").ageMyr());
            double ratio = ours.get(mass).events().radiativeCore() / BirthTracks.MYR / theirs;
            // measured ours/theirs: 0.908 (0.3), 0.902 (0.5), 0.915 (0.7), 0.995 (1.0), 1.025 (1.2), 1.046 (1.4);
            // below 1 Msun ours appear 8-10 % earlier (at Z = 0.02 instead of 0.0153 they are 3-5 % later:
            // the central opacity, RadiativeCoreOnsetCentreTest)
            assertThat(ratio).as("%s Msun radiative core onset, ours / theirs (%.3f Myr)", mass, theirs)
                    .isBetween(0.85, 1.10);
        }
        // the radiative core's mass while it grows (their Mrad/M between 0.01 and 0.95): KNOWN DISCREPANCY, ours is
        // larger at every such row, by 0.012-0.053 in m/M (mean 0.038; 1 Msun at 10 Myr: 0.612 against 0.559): a
        // thinner envelope, which burns less lithium (below). At Z = 0.02 (our default) it would be 0.570.
        List<Pair> growing = pairs().stream()
                .filter(p -> p.theirCoreMassFraction() > 0.01 && p.theirCoreMassFraction() < 0.95).toList();
        assertThat(growing).hasSize(13);
        for (Pair p : growing) {
            assertThat(p.ourCoreMassFraction() - p.theirCoreMassFraction()).as("%s", p).isBetween(0.0, 0.08);
        }
        assertThat(mean(growing, p -> p.ourCoreMassFraction() - p.theirCoreMassFraction())).as("%s", growing)
                .isCloseTo(0.038, within(0.012));
    }

    @Test
    void threeTenthsSolarMassGrowsATransientRadiativeCoreAsThePublishedTrackDoes() {
        // The published 0.3 Msun track is NOT fully convective throughout: a radiative core from 37.3-38.5 Myr (first
        // row with a core radius) to 156.6-160.7 Myr, at most 0.0440 Msun (m/M 0.147, at ~100 Myr). Ours, at their
        // inputs: 34.2 Myr to 213 Myr (measured 2026-12-05), at most m/M ~0.20: KNOWN DISCREPANCY in its size and end,
        // not in its existence (at Z = 0.02: 39.0 to ~168 Myr, m/M 0.19; LowMassBirthTest).
        BirthTrack t = ours.get(0.3);
        assertThat(t.events().radiativeCore() / BirthTracks.MYR).isBetween(row(0.3, "core_none_before").ageMyr() * 0.85,
                row(0.3, "core_first").ageMyr() * 1.10);
        double theirEnd = 0.5 * (row(0.3, "core_last").ageMyr() + row(0.3, "core_gone_after").ageMyr());
        assertThat(t.events().radiativeCoreEnd() / BirthTracks.MYR / theirEnd).isBetween(1.15, 1.55);
        double largest = 0.0;
        for (TrackPoint p : t.points()) {
            largest = Math.max(largest, p.step().convectiveZones().get(0).innerMassFraction());
        }
        double theirLargest = row(0.3, "core_largest").radiativeCoreMassMsun() / 0.3;
        assertThat(largest / theirLargest).isBetween(1.15, 1.6);
    }

    @Test
    void lithiumIsBurntLessThanInThePublishedTracksAtTheirInputs() {
        // the age at which surface lithium halves (published: interpolated in log t between the two bracketing
        // rows): ours / theirs measured 1.125 (0.1), 1.021 (0.2), 0.985 (0.3), 1.040 (0.5), 1.247 (0.7 Msun)
        for (double mass : new double[] {0.1, 0.2, 0.3, 0.5, 0.7}) {
            List<PublishedTrackRow> b = published.get(mass).stream()
                    .filter(r -> r.role().equals("li_half_bracket"))
                    .sorted(Comparator.comparingDouble(PublishedTrackRow::logAgeYr)).toList();
            double f = (Math.log10(0.5) - b.get(0).logLithium()) / (b.get(1).logLithium() - b.get(0).logLithium());
            double theirs = Math.pow(10.0, b.get(0).logAgeYr() + f * (b.get(1).logAgeYr() - b.get(0).logAgeYr()))
                    / 1.0e6;
            double ratio = ours.get(mass).events().lithiumHalved() / BirthTracks.MYR / theirs;
            assertThat(ratio).as("%s Msun lithium halved, ours / theirs (%.2f Myr)", mass, theirs)
                    .isBetween(0.92, 1.35);
        }
        // KNOWN DISCREPANCY at their inputs: 1 Msun never halves its lithium (theirs at 7.0 Myr) and keeps
        // 10^-0.20 from 30 Myr on against their 10^-0.51; at our default Z = 0.02, alpha 1.8 it keeps 10^-0.56.
        // Measured cause: the radiative core grows faster at this Z (above), the envelope base is shallower and
        // cooler; with Z = 0.0153 and alpha 1.8 it keeps 10^-0.27, so 0.29 dex is the composition, 0.07 the
        // mixing length
        BirthTrack sun = ours.get(1.0);
        assertThat(sun.events().lithiumHalved()).isNaN();
        double kept = Math.log10(sun.surfaceLithiumAt(sun.models().get(sun.models().size() - 1)));
        assertThat(kept).isCloseTo(-0.20, within(0.08));
        for (Pair p : pairs()) {
            if (p.theirs().logLithium() >= BURNT_OUT_LOG_LITHIUM) {
                // measured ours - theirs: -0.01 to +0.66 dex (0.7 Msun at 10 Myr: -0.79 against -1.45; 0.5 Msun at
                // 10 Myr +0.63, 0.2 Msun at 30 Myr +0.59): ours under-deplete while the lithium burns
                assertThat(p.ourLogLithium() - p.theirs().logLithium()).as("%s", p).isBetween(-0.1, 0.8);
            } else {
                // theirs burnt out: so is ours, except 0.7 Msun, which keeps 10^-2.0 / 10^-2.1 at 30 / 99 Myr
                // (theirs 10^-4.5 / 10^-5.1): KNOWN DISCREPANCY, the same shallower envelope
                assertThat(p.ourLogLithium()).as("%s", p).isLessThan(-1.8);
            }
        }
    }
}
