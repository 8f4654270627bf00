package org.convgrid.cli.run;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.convgrid.engine.request.AgeOrigin;
import org.convgrid.grids.GridSpec;
import org.convgrid.grids.words.Counts;
import org.convgrid.grids.words.MessageNumbers;

/**
 * What refining the transition masses after the sweep adds to a run, for {@code check}: the sweep's estimate
 * ({@link RunTimeEstimate}) leaves it out, and on the demo grid it is more models than the grid itself (90 models,
 * then 155 new ones). Each search bisects one mass bracket of one (Z, age, physics) slice down to the grid's
 * tolerance, one new model per halving, each model computed on its own (an evolution of its own, no ladder shared
 * with the grid's line), so its models cost more than the grid's.
 *
 * @param models new models expected, 0 when the grid does not refine
 * @param seconds their run time on the given threads, s
 * @param basis how it was reached, for the reader
 */
public record RefinementEstimate(long models, double seconds, String basis) {

    /**
     * Searches per (Z, age, physics) slice when the grid's masses reach the fully convective limit and the mass above
     * which every star has a core: the two, and where small cores come and go, that window's two ends (the turn-off
     * and the lithium depletion boundary, where there is one, are counted apart: {@link #oldAges},
     * {@link #lithiumAges}). Measured: the demo grid (grids/demo-cluster.yaml, 9 slices, brackets of 0.2 Msun
     * bisected 7 times to 0.002 Msun) added 155 models, 2.5 searches per slice; the 200-model zero-age grid
     * (benchmarks/grids/two-hundred-zero-age.yaml with refinement on, 4 slices, log-spaced masses) added 59, where
     * this count, from its median bracket of 0.16 Msun (7 halvings), gives 70. A grid that reaches only one of the
     * two gets {@link #FULLY_CONVECTIVE_SEARCHES} or {@link #CORE_SEARCHES} alone.
     */
    static final double SEARCHES_PER_SLICE = 2.5;
    /**
     * The fully convective limit's share of {@link #SEARCHES_PER_SLICE}, with the window of small cores just above it
     * (half a search on average: not every slice has one).
     */
    static final double FULLY_CONVECTIVE_SEARCHES = 1.5;
    /** The core onset's share of {@link #SEARCHES_PER_SLICE}: one search (a zero-age 1-2 Msun grid added 9 models). */
    static final double CORE_SEARCHES = SEARCHES_PER_SLICE - FULLY_CONVECTIVE_SEARCHES;
    /**
     * Masses, Msun, between which the fully convective limit lies at the ages a grid asks for (ours: 0.25 Msun at 70
     * Myr, 0.31-0.37 on the main sequence, 0.45-0.48 at 10 Myr): a grid whose masses do not reach into this range
     * has no search for it.
     */
    static final double FULLY_CONVECTIVE_LOW_MSUN = 0.25;
    static final double FULLY_CONVECTIVE_HIGH_MSUN = 0.5;
    /** As {@link #FULLY_CONVECTIVE_LOW_MSUN} for the core onset (ours: 1.03-1.2 Msun but for 3He cores at 150 Myr). */
    static final double CORE_ONSET_LOW_MSUN = 1.0;
    static final double CORE_ONSET_HIGH_MSUN = 1.3;

    /**
     * Age, Myr, at which a 0.2 Msun star from birth has burnt 99 % of its lithium, in the scaling t = this x (M / 0.2
     * Msun)^-{@value #LITHIUM_MASS_EXPONENT} by which {@code check} guesses which slices have a lithium depletion
     * boundary among their masses. Fitted to ours (a 0.1-0.6 Msun grid, Z = 0.014 and 0.02, 2026-12-05: 0.15 / 0.2 /
     * 0.3 / 0.45 Msun at 43-44 / 31-32 / 19-20 / 12 Myr; the scaling gives 45, 31, 18.5 and 11.6).
     */
    static final double LITHIUM_GONE_AT_0_2_MSUN_MYR = 31.0;
    static final double LITHIUM_MASS_EXPONENT = 1.3;
    /**
     * The highest mass, Msun, that burns 99 % of its lithium early enough to bound the boundary from above: heavier
     * stars burn theirs no sooner (ours: 0.6 Msun at 10-13 Myr, 0.8 Msun at 20 Myr at Z = 0.02, none at Z = 0.008).
     */
    static final double LITHIUM_FASTEST_BURNER_MSUN = 0.6;
    /**
     * The earliest age, Myr, at which any star from birth has burnt 99 % of its lithium (ours: 10.0 Myr, 0.6 Msun at
     * Z = 0.02; 11.1 Myr, 0.5 Msun at Z = 0.014): the scaling above, fitted at 0.15-0.45 Msun, gives 7.4 Myr at 0.6
     * Msun, too early.
     */
    static final double EARLIEST_LITHIUM_GONE_MYR = 10.0;

    /**
     * One-thread seconds of one new model whose star is evolved from birth to its slice's age. Measured (one quiet
     * 2-core AMD EPYC, OpenJDK 17, 2026-12-03): the demo grid's 155 new models (ages 20, 150 and 600 Myr) took 19-25
     * s on 2 threads, 0.25-0.32 s each.
     */
    static final double BIRTH_MODEL_SECONDS = 0.3;

    /**
     * The age, Gyr, at which a new model from birth costs twice {@link #BIRTH_MODEL_SECONDS}: its cost grows linearly
     * with the age it must be evolved to, BIRTH_MODEL_SECONDS (1 + age / this). {@code check} had assumed 0.3 s at
     * every age, 18 s for the 88 new models of a 1-13 Gyr grid that took 67 s on one thread (0.76 s each,
     * on a loaded machine: the process had 61 % of a core, 0.46 s of CPU each). Measured with
     * {@code /usr/bin/time ./convgrid star --mass M --z 0.002 --age-gyr A} (2-core machine, load average 8, 2026-12-05),
     * user CPU less the same star at age 0 (the JVM and the start model, 0.5 s): 0.5 Msun 1.9 s at 0.1 Gyr, 2.3 s at
     * 1 Gyr, 2.5 s at 13 Gyr; 1 Msun 2.0, 1.7 and 3.0 s. Mean 1.93 s at 0.1 Gyr, 2.72 s at 13 Gyr: a factor 1.41 over
     * 12.9 Gyr, 1 + age / 31 Gyr. The pre-main sequence costs most of a track; main-sequence steps add the rest.
     * With it that grid comes to 0.37 s per model, 32 s for 88 models on a quiet core.
     */
    static final double BIRTH_COST_DOUBLING_GYR = 31.0;

    /**
     * Main-sequence lifetime of a 1 Msun star, Gyr, in the scaling t = this x (M / Msun)^-{@value
     * #LIFETIME_MASS_EXPONENT} by which {@code check} guesses which slices are old enough for the grid's heaviest star
     * to have left the main sequence, so that the turn-off gets a search of its own (common practice, from memory;
     * ours: 1 Msun at Z = 0.02 exhausts its centre at 9.77 Gyr, 1.2 Msun at [Fe/H] -2 before 5 Gyr, so it is rough).
     */
    static final double SOLAR_LIFETIME_GYR = 10.0;
    static final double LIFETIME_MASS_EXPONENT = 2.5;

    /**
     * One-thread seconds of one new zero-age model, computed on a mass line of its own. Measured (same machine, quiet,
     * 2026-12-04): the 200-model zero-age grid's 59 new models took 3 s on one thread in two runs out of two.
     */
    static final double ZERO_AGE_MODEL_SECONDS = 0.05;

    /** Nothing to add: the grid does not refine, or its mass axis has no bracket. */
    public static RefinementEstimate none(String why) {
        return new RefinementEstimate(0, 0.0, why);
    }

    /**
     * As many new models as an earlier run of the same grid added (its catalogue's rows beyond the grid's models), at
     * the assumed cost of such a model: the run's median is its sweep's, whose zero-age models come cheaper from their
     * line's ladder.
     */
    public static RefinementEstimate measured(GridSpec grid, long catalogueRows, int threads, String where) {
        if (!grid.transitions().refine()) {
            return none("off (transitions: refine: false)");
        }
        long models = Math.max(0, catalogueRows - grid.count());
        if (models == 0) {
            return none("none expected (the run in " + where + " added no models)");
        }
        double perModel = modelSeconds(grid);
        return new RefinementEstimate(models, models * perModel / threads, "as many as the run in " + where
                + " added, about " + MessageNumbers.format(RunTimeEstimate.twoDigits(perModel)) + " s per model");
    }

    /**
     * From the assumed costs above: per slice, a search for each transition the grid's masses reach (up to
     * {@link #SEARCHES_PER_SLICE}, one more for a turn-off or a lithium depletion boundary), each halving the grid's
     * median mass bracket down to the tolerance.
     */
    public static RefinementEstimate assumed(GridSpec grid, int threads) {
        if (!grid.transitions().refine()) {
            return none("off (transitions: refine: false)");
        }
        List<Double> masses = grid.massesMsun();
        if (masses.size() < 2) {
            return none("none (one mass: no bracket to narrow)");
        }
        if (grid.ages().fractions()) {
            return none("none (" + org.convgrid.survey.refine.TransitionRefiner.FRACTION_AGES_NOT_REFINED + ")");
        }
        List<Double> gaps = new ArrayList<>();
        for (int i = 1; i < masses.size(); i++) {
            gaps.add(masses.get(i) - masses.get(i - 1));
        }
        Collections.sort(gaps);
        double medianGap = gaps.get(gaps.size() / 2);
        double tolerance = grid.transitions().toleranceMsun();
        if (medianGap <= tolerance) {
            // said "0 halvings of a ... bracket each" before: true, but the reader had to work out what it meant
            return none("none expected (the grid's mass step, " + MessageNumbers.format(RunTimeEstimate.twoDigits(medianGap))
                    + " Msun at the median, is already within the tolerance of " + MessageNumbers.format(tolerance)
                    + " Msun)");
        }
        long halvings = (long) Math.ceil(Math.log(medianGap / tolerance) / Math.log(2.0));
        long perAge = (long) grid.metallicities().size() * grid.physics().size();
        long slices = perAge * grid.ages().values().size();
        long turnoffSlices = perAge * oldAges(grid);
        long lithiumSlices = perAge * lithiumAges(grid);
        double perSlice = searchesPerSlice(masses);
        long models = Math.round((slices * perSlice + turnoffSlices + lithiumSlices) * halvings);
        if (models == 0) {
            return none("none expected (the grid's masses, " + MessageNumbers.format(masses.get(0)) + "-"
                    + MessageNumbers.format(masses.get(masses.size() - 1)) + " Msun, reach none of the transitions)");
        }
        double perModel = modelSeconds(grid);
        List<String> searches = new ArrayList<>();
        if (perSlice > 0) {
            searches.add(MessageNumbers.format(perSlice) + (perSlice == 1.0 ? " search" : " searches")
                    + " per (Z, age, physics) slice");
        }
        if (turnoffSlices > 0) {
            searches.add((searches.isEmpty() ? "one" : "one more") + " for the turn-off in "
                    + Counts.of(turnoffSlices, "slice") + " old enough to have one");
        }
        if (lithiumSlices > 0) {
            searches.add((searches.isEmpty() ? "one" : "one more") + " for the lithium depletion boundary in "
                    + Counts.of(lithiumSlices, "slice") + " young enough to have one");
        }
        return new RefinementEstimate(models, models * perModel / threads, String.join(", ", searches)
                + ", " + Counts.of(halvings, "halving") + " of a "
                + MessageNumbers.format(RunTimeEstimate.twoDigits(medianGap)) + " Msun bracket each, about "
                + MessageNumbers.format(RunTimeEstimate.twoDigits(perModel)) + " s per model");
    }

    /**
     * The grid's ages at which its heaviest star has likely left the main sequence ({@link #SOLAR_LIFETIME_GYR}), so
     * that the slice has a turn-off to refine; none for zero-age and main-sequence-fraction ages (never past it).
     */
    private static long oldAges(GridSpec grid) {
        if (!grid.ages().evolves() || grid.ages().fractions()) {
            return 0;
        }
        double heaviest = grid.massesMsun().stream().mapToDouble(Double::doubleValue).max().orElse(0.0);
        double lifetimeGyr = SOLAR_LIFETIME_GYR * Math.pow(heaviest, -LIFETIME_MASS_EXPONENT);
        return grid.ages().values().stream().filter(age -> age >= lifetimeGyr).count();
    }

    /** The searches of a slice whose masses are {@code masses} (increasing), by the transitions they reach. */
    private static double searchesPerSlice(List<Double> masses) {
        double lowest = masses.get(0);
        double highest = masses.get(masses.size() - 1);
        return (lowest <= FULLY_CONVECTIVE_HIGH_MSUN && highest >= FULLY_CONVECTIVE_LOW_MSUN
                ? FULLY_CONVECTIVE_SEARCHES : 0.0)
                + (lowest <= CORE_ONSET_HIGH_MSUN && highest >= CORE_ONSET_LOW_MSUN ? CORE_SEARCHES : 0.0);
    }

    /**
     * The grid's ages at which its lowest star still keeps its lithium but a heavier one of its masses has burnt it
     * ({@link #LITHIUM_GONE_AT_0_2_MSUN_MYR}), so that the slice has a lithium depletion boundary to refine; none when
     * lithium is not followed (ages from the ZAMS, main-sequence fractions).
     */
    private static long lithiumAges(GridSpec grid) {
        if (!grid.ages().evolves() || grid.ages().fractions() || grid.ages().origin() != AgeOrigin.BIRTH) {
            return 0;
        }
        List<Double> masses = grid.massesMsun();
        double lowestGoneGyr = lithiumGoneGyr(masses.get(0));
        double fastestGoneGyr = Math.max(1e-3 * EARLIEST_LITHIUM_GONE_MYR,
                lithiumGoneGyr(Math.min(masses.get(masses.size() - 1), LITHIUM_FASTEST_BURNER_MSUN)));
        return grid.ages().values().stream().filter(age -> age < lowestGoneGyr && age >= fastestGoneGyr).count();
    }

    /** Roughly when a star of {@code massMsun} from birth has burnt 99 % of its lithium, Gyr. */
    static double lithiumGoneGyr(double massMsun) {
        return 1e-3 * LITHIUM_GONE_AT_0_2_MSUN_MYR * Math.pow(massMsun / 0.2, -LITHIUM_MASS_EXPONENT);
    }

    /** One-thread seconds of one new model evolved from birth to {@code ageGyr}. */
    static double birthModelSeconds(double ageGyr) {
        return BIRTH_MODEL_SECONDS * (1.0 + ageGyr / BIRTH_COST_DOUBLING_GYR);
    }

    /** One new model's one-thread seconds for the grid's kind of ages. */
    private static double modelSeconds(GridSpec grid) {
        if (!grid.ages().evolves()) {
            return ZERO_AGE_MODEL_SECONDS;
        }
        if (grid.ages().origin() == AgeOrigin.BIRTH) {
            // every age has as many slices, hence new models, as every other: their mean cost is the mean age's
            double meanAgeGyr = grid.ages().fractions() ? 0.0
                    : grid.ages().values().stream().mapToDouble(Double::doubleValue).average().orElse(0.0);
            return birthModelSeconds(meanAgeGyr);
        }
        // a zero-age model, then its evolution (twice with main-sequence fractions, as in the sweep)
        double evolutions = grid.ages().fractions() ? 2.0 : 1.0;
        return ZERO_AGE_MODEL_SECONDS + evolutions * RunTimeEstimate.EVOLUTION_FROM_ZERO_AGE_SECONDS;
    }
}
