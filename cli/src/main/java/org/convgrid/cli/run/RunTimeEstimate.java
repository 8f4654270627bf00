package org.convgrid.cli.run;

import org.convgrid.engine.request.AgeOrigin;
import org.convgrid.grids.GridSpec;
import org.convgrid.grids.words.MessageNumbers;
import org.convgrid.plotting.label.SliceLabels;

/**
 * How long {@code run} will take, for {@code check}. A grid's cost is per star, not per model: each star (mass, Z,
 * physics) gets one zero-age model, and when the grid asks for ages above the zero age it is evolved once to its
 * oldest age, every requested age landed on by that one evolution. With main-sequence fractions it is evolved
 * twice: to core-hydrogen exhaustion to find its lifetime, then to the ages. A star whose ages count from birth is
 * evolved from its contracting start model instead, with no zero-age model of its own.
 *
 * @param seconds the estimate on the given threads, s
 * @param basis how it was reached, for the reader
 */
public record RunTimeEstimate(double seconds, String basis) {

    /**
     * One-thread seconds of what every run pays once: JVM start, the JIT's first compilations, the shipped tables, the
     * charts. With {@link #LINE_SECONDS} and {@link #ZERO_AGE_MODEL_SECONDS} fitted to whole zero-age grids on one
     * thread through the launcher (one quiet 2-core AMD EPYC, OpenJDK 17, 2026-12-03): 200 models on 4 lines
     * (benchmarks/grids/two-hundred-zero-age.yaml) 4.6 s, 1 000 models on 4 lines (thousand-zero-age.yaml) 8.5 s,
     * 10 000 models on 10 lines (ten-thousand-zero-age.yaml) 51 s; the fit gives 4.5, 8.5 and 56 s.
     */
    static final double START_SECONDS = 1.5;

    /** One-thread seconds of a (Z, Y, physics) line's zero-age ladder, which its masses are answered from. */
    static final double LINE_SECONDS = 0.5;

    /** One-thread seconds of one zero-age model answered from its line's ladder. */
    static final double ZERO_AGE_MODEL_SECONDS = 0.005;

    /**
     * One-thread seconds of evolving one star from its zero-age model to ages like the demo grid's (up to 0.6 Gyr),
     * every requested age landed on by the one evolution. Measured (same machine and day, quiet): 10 stars of 0.2-2 Msun
     * at Z = 0.014 evolved from their zero-age models to 20, 150 and 600 Myr took 3.7-4.1 s on one thread against
     * 1.9 s for the zero-age models alone: ~0.2 s per star.
     */
    static final double EVOLUTION_FROM_ZERO_AGE_SECONDS = 0.2;

    /** The oldest age of the demo grid (grids/demo-cluster.yaml), Gyr, which the evolution costs were measured to. */
    static final double DEMO_OLDEST_AGE_GYR = 0.6;

    /**
     * One-thread seconds of evolving one star from its contracting start model to ages like the demo grid's (20, 150
     * and 600 Myr), with no zero-age model of its own. Measured (same machine and day, quiet): the same 10 stars from birth took
     * 6.6-7.4 s on one thread, ~0.55 s per star beyond the start; the demo grid's 30 stars (three Z) without
     * refinement 16 s on 2 threads, ~1 s per star; taken as 0.8. The low-mass stars' long contraction makes most of it.
     */
    static final double EVOLUTION_FROM_BIRTH_SECONDS = 0.8;

    /**
     * How much longer a star's evolution takes when its oldest requested age is older than the demo's, as (oldest
     * age in Gyr, factor) nodes, interpolated in log age and held beyond the ends. Measured (quiet, one thread,
     * 2026-12-04): the demo's 10 masses 0.2-2 Msun at Z = 0.014, one age, --no-refine, the start and the zero-age
     * models taken off: from birth 0.52 / 0.85 / 1.01 s per star at 0.6 / 2 / 10 Gyr, from the zero-age main sequence
     * 0.16 / 0.29 / 0.36 s (ratios 1 / 1.63 / 1.94 and 1 / 1.8 / 2.2; a practitioner's 1-2 Gyr grid ran twice as long
     * as the estimate without them). Stars past exhaustion stop early, which flattens the rise. Main-sequence
     * fractions evolve every star to exhaustion: taken as the last node.
     */
    static final double[][] OLDEST_AGE_FACTORS = {{0.6, 1.0}, {2.0, 1.7}, {10.0, 2.0}};

    /** The evolution cost factor of a grid's oldest age ({@link #OLDEST_AGE_FACTORS}). */
    static double oldestAgeFactor(GridSpec grid) {
        return grid.ages().fractions() ? OLDEST_AGE_FACTORS[OLDEST_AGE_FACTORS.length - 1][1]
                : oldestAgeFactor(grid.ages().values().stream().mapToDouble(Double::doubleValue).max().orElse(0.0));
    }

    /** The factor of an oldest age, Gyr. */
    static double oldestAgeFactor(double oldest) {
        double[][] nodes = OLDEST_AGE_FACTORS;
        if (oldest <= nodes[0][0]) {
            return nodes[0][1];
        }
        for (int i = 1; i < nodes.length; i++) {
            if (oldest <= nodes[i][0]) {
                double w = Math.log(oldest / nodes[i - 1][0]) / Math.log(nodes[i][0] / nodes[i - 1][0]);
                return nodes[i - 1][1] + w * (nodes[i][1] - nodes[i - 1][1]);
            }
        }
        return nodes[nodes.length - 1][1];
    }

    /** The median seconds per model of an earlier run of the same grid: its own mix of ages. */
    public static RunTimeEstimate measured(GridSpec grid, double secondsPerModel, int threads, String where) {
        return new RunTimeEstimate(grid.count() * secondsPerModel / threads,
                MessageNumbers.format(twoDigits(secondsPerModel)) + " s per model (median of the run in " + where + ")");
    }

    /** A measured time to two significant digits: its third is noise between runs. */
    static double twoDigits(double seconds) {
        return Double.parseDouble(String.format(java.util.Locale.ROOT, "%.2g", seconds));
    }

    /**
     * From the assumed costs above: the start, each line's ladder and zero-age models (none for stars evolved from
     * birth), each star's evolution (twice with main-sequence fractions: to core-hydrogen exhaustion for its
     * lifetime, then to the ages), the lines and stars shared out over the threads.
     */
    public static RunTimeEstimate assumed(GridSpec grid, int threads) {
        long ages = grid.ages().values().size();
        long stars = grid.count() / ages;
        long lines = (long) grid.physics().size() * grid.metallicities().size();
        double evolutions = !grid.ages().evolves() ? 0.0 : grid.ages().fractions() ? 2.0 : 1.0;
        boolean fromBirth = grid.ages().evolves() && grid.ages().origin() == AgeOrigin.BIRTH;
        double ageFactor = oldestAgeFactor(grid);
        double evolutionSeconds = ageFactor
                * (fromBirth ? EVOLUTION_FROM_BIRTH_SECONDS : EVOLUTION_FROM_ZERO_AGE_SECONDS);
        // a star evolved from birth needs no zero-age model of its own, nor its line a ladder
        double zeroAge = fromBirth ? 0.0 : lines * LINE_SECONDS + stars * ZERO_AGE_MODEL_SECONDS;
        double shared = zeroAge + stars * evolutions * evolutionSeconds;
        String evolved = evolutions == 0.0 ? "zero-age models only"
                : (stars == 1 ? "the one star" : "each of the " + stars + " stars") + " evolved "
                        + (fromBirth ? "from birth " : "")
                        + (evolutions == 2.0 ? "twice (lifetime, then ages)" : "once to its oldest age") + ", about "
                        + MessageNumbers.format(twoDigits(evolutionSeconds)) + " s" + (evolutions == 2.0 ? " each" : "")
                        + (ageFactor == 1.0 ? " for ages up to the demo's " + SliceLabels.age(DEMO_OLDEST_AGE_GYR)
                        : " (" + MessageNumbers.format(twoDigits(ageFactor)) + " x the demo's, whose ages end at "
                        + SliceLabels.age(DEMO_OLDEST_AGE_GYR) + ")");
        String basis = fromBirth ? "" : MessageNumbers.format(LINE_SECONDS) + " s per metallicity and physics line and "
                + MessageNumbers.format(ZERO_AGE_MODEL_SECONDS) + " s per zero-age model, ";
        return new RunTimeEstimate(START_SECONDS + shared / threads, basis + MessageNumbers.format(START_SECONDS)
                + " s to start, rough defaults from one 2-core machine; " + evolved
                + "; a finished run records its own median");
    }
}
