package org.convgrid.engine.zams;

import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Set;

import org.convgrid.engine.physics.eos.EosState;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.ModelState;
import org.convgrid.engine.structure.SolveFailedException;
import org.convgrid.engine.structure.SolveReport;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.units.Constants;

/**
 * Zero-age models along one line of constant composition and physics, each seeded by homology from the nearest
 * converged neighbours ({@link HomologySeeder}; where the neighbours' thin outer convective zones recede fast, the
 * seed's outer envelope integrated again with the new mass's own gradient, {@link EnvelopeSweep}) and walked there
 * in steps of at most {@link #MAX_STEP} in ln M, halved when a step fails. The first model comes from the polytropic guess at the requested mass where that is
 * reliable ({@link #coldStartReliable}), otherwise (or if it fails) at {@link #ANCHOR_MASS}, and is walked from
 * there; a track given the line's {@link ZamsLadder} starts instead from the two ladder rungs next to its first mass
 * (shared by every chunk of the line) and falls back to the cold starts only when the ladder has no rung. The walk
 * depends only on the requests, their order and the line, never on timing, so results are reproducible. Not
 * thread-safe: one track per line and thread.
 *
 * <p>Typical use by a grid: one track per chunk of a line of constant composition and physics, masses requested
 * in increasing order ({@link #solve}); {@link #solveOne} for a single request with an optional seed.
 */
public final class ZamsTrack {

    /** Largest |ln(M'/M)| of one homology step. */
    public static final double MAX_STEP = 0.3;
    /** A step that converged within this many iterations lets the next step double. */
    public static final int EASY_ITERATIONS = 8;
    /** Smallest step tried before a request is given up. */
    public static final double MIN_STEP = 0.004;
    /** Mass of the fallback cold start, g (the Sun: the polytropic guess suits it best). */
    public static final double ANCHOR_MASS = Constants.M_SUN;
    /** Cold starts are tried at or above this mass, Msun. */
    public static final double COLD_START_MIN_MASS = 0.18;
    /** No cold starts strictly between these masses, Msun. */
    public static final double COLD_START_GAP_LOW = 1.6;
    public static final double COLD_START_GAP_HIGH = 4.0;
    /** Masses closer than this relative difference are the same model. */
    public static final double SAME_MASS = 1.0e-9;
    /**
     * A second seeding model closer to the nearest one than this fraction of the step is too close to measure
     * shell-by-shell exponents from ({@link #partner}); at 0.56 Msun a pair half a step apart still seeds better than
     * one a whole step apart (6 iterations against 13).
     */
    public static final double CLOSE_PAIR = 0.25;
    /** Relaxations allowed for one request (cold starts, intermediate masses and retries together). */
    public static final int ATTEMPT_BUDGET = 150;

    private final ZamsBuilder builder;
    private final Composition composition;
    private final HomologySeeder seeder = new HomologySeeder();
    private final EnvelopeSweep envelope;
    private final List<ZamsModel> converged = new ArrayList<>();
    private final ZamsLadder ladder;
    private final Set<ZamsModel> fromLadder = Collections.newSetFromMap(new IdentityHashMap<>());

    public ZamsTrack(ZamsBuilder builder, Composition composition) {
        this(builder, composition, null);
    }

    /**
     * @param ladder the line's shared rungs to start from (same builder settings and composition), or null for
     *        cold starts
     */
    public ZamsTrack(ZamsBuilder builder, Composition composition, ZamsLadder ladder) {
        this.builder = builder;
        this.composition = composition;
        this.ladder = ladder;
        this.envelope = new EnvelopeSweep(builder.physics());
    }

    /**
     * One request on its own: the zero-age model of {@code mass} (g), seeded from {@code seed} when given (a
     * converged model of the same composition and physics, e.g. the previous mass of a grid line), otherwise
     * from the polytropic guess (falling back to a walk from {@link #ANCHOR_MASS}). Never throws for a
     * non-converging model: the result carries the report.
     */
    public static ZamsResult solveOne(ZamsBuilder builder, Composition composition, double mass, ZamsModel seed) {
        ZamsTrack track = new ZamsTrack(builder, composition);
        if (seed != null) {
            track.add(seed);
        }
        return track.solve(mass);
    }

    /** Adds an externally converged model (same composition and physics) as a neighbour for seeding. */
    public void add(ZamsModel model) {
        converged.add(model);
        converged.sort(Comparator.comparingDouble(z -> z.model().mass()));
    }

    /** The converged models so far, by increasing mass. */
    public List<ZamsModel> models() {
        return List.copyOf(converged);
    }

    /**
     * The zero-age model of {@code mass} (g), never throwing for a non-converging model.
     */
    public ZamsResult solve(double mass) {
        for (ZamsModel z : converged) {
            if (Math.abs(z.model().mass() / mass - 1.0) <= SAME_MASS) {
                // a rung was solved for the line, not for this track: its own iterations, not 0
                return ZamsResult.success(z, fromLadder.contains(z) ? z.iterations() : 0);
            }
        }
        if (converged.isEmpty() && ladder != null) {
            for (ZamsModel rung : ladder.startFor(mass)) {
                add(rung);
                fromLadder.add(rung);
            }
        }
        int spent = 0;
        SolveReport coldFailure = null;
        if (converged.isEmpty() && !coldStartReliable(mass)) {
            try {
                ZamsModel z = builder.coldStart(ANCHOR_MASS, composition);
                add(z);
                spent += z.iterations();
            } catch (SolveFailedException e) {
                return ZamsResult.failed(e.report(), e.report().iterations());
            }
        }
        if (converged.isEmpty()) {
            try {
                ZamsModel z = builder.coldStart(mass, composition);
                add(z);
                return ZamsResult.success(z, z.iterations());
            } catch (SolveFailedException e) {
                coldFailure = e.report();
                spent += e.report().iterations();
            }
            if (Math.abs(Math.log(mass / ANCHOR_MASS)) < MIN_STEP) {
                return ZamsResult.failed(coldFailure, spent);
            }
            try {
                ZamsModel z = builder.coldStart(ANCHOR_MASS, composition);
                add(z);
                spent += z.iterations();
            } catch (SolveFailedException e) {
                return ZamsResult.failed(coldFailure, spent + e.report().iterations());
            }
        }
        double step = MAX_STEP;
        for (int attempt = 0; attempt < ATTEMPT_BUDGET; attempt++) {
            ZamsModel nearest = nearest(converged, mass, null);
            double remaining = Math.log(mass / nearest.model().mass());
            // a step that reaches the mass to round-off lands on it: one ulp short, it left the mass to a relaxation
            // of its own (one iteration, with the seeding and the remesh check; at four rungs of a ladder line)
            double target = Math.abs(remaining) <= step + SAME_MASS ? mass
                    : nearest.model().mass() * Math.exp(Math.copySign(step, remaining));
            ZamsModel other = partner(converged, nearest, target);
            try {
                ModelState seed = seeder.seed(nearest.model(), other == null ? null : other.model(), target);
                if (other != null) {
                    seed = envelope.refine(seed, nearest.model(), other.model(), target);
                }
                ZamsModel z = builder.fromSeed(seed, composition, equationOfStateOf(nearest.model(), seed));
                add(z);
                spent += z.iterations();
                if (target == mass) {
                    return ZamsResult.success(z, spent);
                }
                if (z.iterations() <= EASY_ITERATIONS) {
                    step = Math.min(MAX_STEP, 2.0 * step);
                }
            } catch (SolveFailedException e) {
                spent += e.report().iterations();
                // halve the step that failed, not the allowance: with the mass closer than the allowance, halving
                // the allowance alone would retry the same target from the same seed and fail again (25 iterations
                // lost at 1.49 Msun on a line of 50 masses 0.1-20 Msun)
                step = 0.5 * Math.min(step, Math.abs(remaining));
                if (step < MIN_STEP) {
                    return lastResort(mass, e.report(), spent);
                }
            }
        }
        return ZamsResult.failed(new SolveReport(org.convgrid.engine.structure.StopReason.ITERATION_BUDGET,
                spent, Double.NaN, -1, "", "homology walk used its " + ATTEMPT_BUDGET + " relaxations"), spent);
    }

    /**
     * The equation-of-state states of {@code model} point by point, to start the seed's first evaluation from
     * (the seed is scaled from it on its own mesh: {@link HomologySeeder#seed}), or null when the seed has another
     * number of points. Why: from the fully ionised guess every point's neutrality solve took five to ten Newton
     * steps at the first evaluation of a seeded model; from the neighbour's degeneracy carried to the seed's
     * density and temperature, one or two.
     */
    private static EosState[] equationOfStateOf(StellarModel model, ModelState seed) {
        return model.state().size() == seed.size() ? model.profile().eosStates() : null;
    }

    /**
     * A walk that cannot get closer still has the cold start at the requested mass, where one is usually reliable:
     * with tabulated opacities the seeded surface of a walk towards 100 Msun can land where no grey atmosphere is
     * in hydrostatic equilibrium (the iron bump pushes kappa L / (4 pi c G M) above 1), while the cold start finds
     * its own surface.
     */
    private ZamsResult lastResort(double mass, SolveReport walkFailure, int spent) {
        if (!coldStartReliable(mass)) {
            return ZamsResult.failed(walkFailure, spent);
        }
        try {
            ZamsModel z = builder.coldStart(mass, composition);
            add(z);
            return ZamsResult.success(z, spent + z.iterations());
        } catch (SolveFailedException e) {
            return ZamsResult.failed(walkFailure, spent + e.report().iterations());
        }
    }

    /**
     * Whether a cold start at this mass usually converges (measured with the standard physics: it fails below
     * ~0.12 Msun and is slow or fails between ~1.8 and ~4 Msun, where the convective core appears); elsewhere
     * the track starts at {@link #ANCHOR_MASS} and walks.
     */
    static boolean coldStartReliable(double mass) {
        double m = mass / Constants.M_SUN;
        return m >= COLD_START_MIN_MASS && (m <= COLD_START_GAP_LOW || m >= COLD_START_GAP_HIGH);
    }

    /**
     * The second model of {@code known} (the converged models; shared with LadderCostProbe, which replays the walk) to
     * seed {@code target} (g) from with {@code nearest}: the model nearest to it, unless
     * that lies within {@link #CLOSE_PAIR} of the step from {@code nearest} to the target; then the model nearest to
     * {@code nearest} that lies far enough for the seeder to extrapolate shell by shell
     * ({@link HomologySeeder#MAX_EXTRAPOLATION}), if there is one. Two models almost at one mass (a ladder rung and a
     * requested mass next to it) give exponents that are mostly noise, and the global homology the seeder falls back
     * to misses the shells' own changes: at 1.49 Msun, Z = 0.02, seeded from 1.340 and 1.350 Msun, the walk failed
     * before it got there (41 Newton iterations; 12 with a partner far enough).
     */
    static ZamsModel partner(List<ZamsModel> known, ZamsModel nearest, double target) {
        double m = nearest.model().mass();
        ZamsModel closest = nearest(known, m, nearest);
        double reach = Math.abs(Math.log(target / m));
        if (closest == null || Math.abs(Math.log(closest.model().mass() / m)) >= CLOSE_PAIR * reach) {
            return closest;
        }
        double needed = Math.max(HomologySeeder.MIN_NEIGHBOUR_SPACING, reach / HomologySeeder.MAX_EXTRAPOLATION);
        ZamsModel best = closest;
        double distance = Double.POSITIVE_INFINITY;
        for (ZamsModel z : known) {
            double d = Math.abs(Math.log(z.model().mass() / m));
            if (z != nearest && d >= needed && d < distance) {
                best = z;
                distance = d;
            }
        }
        return best;
    }

    /** The model of {@code known} nearest to {@code mass} in ln M, other than {@code excluded}; null if none. */
    static ZamsModel nearest(List<ZamsModel> known, double mass, ZamsModel excluded) {
        ZamsModel best = null;
        double distance = Double.POSITIVE_INFINITY;
        for (ZamsModel z : known) {
            double d = Math.abs(Math.log(z.model().mass() / mass));
            if (z != excluded && d < distance) {
                best = z;
                distance = d;
            }
        }
        return best;
    }
}
