package org.convgrid.cli.run;

import org.convgrid.engine.request.AgeOrigin;
import org.convgrid.grids.GridSpec;

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
     * Cost of evolving one star to the demo grid's oldest age (0.6 Gyr), in zero-age models. Measured on the demo's
     * composition at 0.3-1.8 Msun, one thread (CPU time, the machine under load): zero-age models alone 13.3 s, the
     * same stars also evolved to 0.6 Gyr 18.7 s, with a start-up of a few seconds in both: 0.9-1.5; taken as 1.5.
     */
    static final double EVOLUTION_IN_ZERO_AGE_MODELS = 1.5;

    /**
     * Cost of evolving one star from birth to an age of the demo grid, in zero-age models, with no zero-age model of
     * its own. Measured with {@code star --mass 1 --z 0.02} on one quiet 2-core machine (user CPU beyond the same
     * command without an age): 4.5 s to 150 Myr and 4.7 s to 600 Myr from birth, against 1.1 s to 600 Myr from the
     * zero-age model, which counts as the 1.5 above: about 6.
     */
    static final double EVOLUTION_FROM_BIRTH_IN_ZERO_AGE_MODELS = 6.0;

    /** The median seconds per model of an earlier run of the same grid: its own mix of ages. */
    public static RunTimeEstimate measured(GridSpec grid, double secondsPerModel, int threads, String where) {
        return new RunTimeEstimate(grid.count() * secondsPerModel / threads,
                GridSummary.n(secondsPerModel) + " s per model (median of the run in " + where + ")");
    }

    /** From an assumed cost of one zero-age model, with the evolution of each star counted as above. */
    public static RunTimeEstimate assumed(GridSpec grid, double zeroAgeSeconds, int threads) {
        long ages = grid.ages().values().size();
        long stars = grid.count() / ages;
        double evolutions = !grid.ages().evolves() ? 0.0 : grid.ages().fractions() ? 2.0 : 1.0;
        boolean fromBirth = grid.ages().evolves() && grid.ages().origin() == AgeOrigin.BIRTH;
        double evolutionCost = fromBirth ? EVOLUTION_FROM_BIRTH_IN_ZERO_AGE_MODELS : EVOLUTION_IN_ZERO_AGE_MODELS;
        // a star evolved from birth needs no zero-age model of its own
        double perStar = zeroAgeSeconds * ((fromBirth ? 0.0 : 1.0) + evolutions * evolutionCost);
        String evolved = evolutions == 0.0 ? "zero-age models only"
                : "each of the " + stars + " stars evolved " + (fromBirth ? "from birth " : "")
                        + (evolutions == 2.0 ? "twice (lifetime, then ages)" : "once to its oldest age") + ", about "
                        + GridSummary.n(evolutionCost) + " zero-age models' time" + (evolutions == 2.0 ? " each" : "");
        return new RunTimeEstimate(stars * perStar / threads, GridSummary.n(zeroAgeSeconds)
                + " s per zero-age model, a rough default; " + evolved + "; a finished run records its own median");
    }
}
