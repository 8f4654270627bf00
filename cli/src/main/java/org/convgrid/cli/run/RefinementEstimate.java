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
     * Searches per (Z, age, physics) slice: the fully convective limit, the mass above which every star has a core
     * and, where small cores come and go, that window's two ends (the turn-off, where there is one, is counted apart:
     * {@link #oldAges}). Measured: the demo grid
     * (grids/demo-cluster.yaml, 9 slices, brackets of 0.2 Msun bisected 7 times to 0.002 Msun) added 155 models,
     * 2.5 searches per slice; the 200-model zero-age
     * grid (benchmarks/grids/two-hundred-zero-age.yaml with refinement on, 4 slices, log-spaced masses) added 59,
     * where this count, from its median bracket of 0.16 Msun (7 halvings), gives 70.
     */
    static final double SEARCHES_PER_SLICE = 2.5;

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
     * From the assumed costs above: {@link #SEARCHES_PER_SLICE} searches per slice, each halving the grid's median mass
     * bracket down to the tolerance.
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
        long models = Math.round((slices * SEARCHES_PER_SLICE + turnoffSlices) * halvings);
        double perModel = modelSeconds(grid);
        return new RefinementEstimate(models, models * perModel / threads, MessageNumbers.format(SEARCHES_PER_SLICE)
                + " searches per (Z, age, physics) slice" + (turnoffSlices == 0 ? ""
                : ", one more for the turn-off in " + Counts.of(turnoffSlices, "slice") + " old enough to have one")
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
