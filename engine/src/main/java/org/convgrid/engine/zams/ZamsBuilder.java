package org.convgrid.engine.zams;

import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.physics.eos.EosState;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.ExtraEnergy;
import org.convgrid.engine.structure.HenyeySolver;
import org.convgrid.engine.structure.MeshPlanner;
import org.convgrid.engine.structure.ModelState;
import org.convgrid.engine.structure.ShellComposition;
import org.convgrid.engine.structure.SolveFailedException;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.structure.StructureSolver;

/**
 * Builds one homogeneous zero-age main-sequence model in thermal equilibrium from a starting state, with 3He
 * and the CN isotopes at their local equilibrium abundances
 * ({@link org.convgrid.engine.physics.nuclear.NuclearNetwork#equilibrium}) recomputed from the trial state of
 * every shell at each Newton iteration (so structure and abundances converge together), and the mesh
 * redistributed and the model relaxed again while the mesh is uneven ({@link MeshPlanner}). Immutable and
 * thread-safe.
 */
public final class ZamsBuilder {

    /** Remesh-and-relax passes allowed. */
    public static final int MAX_REMESH_PASSES = 3;
    /** Newton budget of the first relaxation from a neighbour's seed: fail fast so the walk can halve its step. */
    public static final int SEEDED_BUDGET = 25;
    /**
     * The first relaxation from a neighbour's seed is given up as soon as it cannot converge within its
     * {@link #SEEDED_BUDGET} at this rate of decrease of its largest correction, or moves away from the solution
     * ({@link HenyeySolver.Settings#giveUpRate}), instead of running out the budget: the walk halves its step either
     * way. Measured on the ladders of four lines of 50 masses 0.1-20 Msun (Z = 0.004 to 0.03, 21 failing and 110
     * converging seeded relaxations): each failure took 25 iterations and 30-190 ms, over half the rungs' CPU, from
     * largest corrections of 2-600 that stalled, grew or blew up; the converging ones fell by up to ~3 per iteration
     * while large (from 18 at the first iteration, converged in 19), so the limit (32 at the first iteration) leaves
     * a factor of 1.75, and grew at most by 1.34 (the growth limit is 2). 19 of the 21 failures stop after 1-17
     * iterations, 350 of their 525 iterations saved; no converging relaxation is stopped.
     */
    public static final double SEEDED_GIVE_UP_RATE = 2.0;
    /** Newton budget of a relaxation that starts from the polytropic guess. */
    public static final int COLD_START_BUDGET = 80;
    /** Above this mass (g) a cold start tries the burning-rate homotopy before the direct relaxation. */
    public static final double HOMOTOPY_FIRST_MASS = 1.8 * org.convgrid.engine.units.Constants.M_SUN;
    /** Largest ln step per Newton iteration from the polytropic guess. */
    public static final double COLD_START_MAX_STEP = 0.3;

    /** Largest ln change of the cold-start burning factor per relaxation. */
    public static final double HOMOTOPY_STEP = 1.5;
    /** Smallest ln step of the burning factor tried before a cold start is given up. */
    public static final double MIN_HOMOTOPY_STEP = 0.05;
    /** Bound on the initial burning factor (and its inverse). */
    public static final double MAX_BURNING_FACTOR = 1.0e6;

    private final PhysicsSet physics;
    private final MeshPlanner planner;
    private final HenyeySolver.Settings settings;
    private final StructureSolver solver;

    public ZamsBuilder(PhysicsSet physics, MeshPlanner planner, HenyeySolver.Settings settings) {
        this.physics = physics;
        this.planner = planner;
        this.settings = settings;
        this.solver = new StructureSolver(physics, settings);
    }

    public ZamsBuilder(PhysicsSet physics) {
        this(physics, new MeshPlanner(MeshPlanner.DEFAULT_POINTS), HenyeySolver.Settings.DEFAULT);
    }

    public PhysicsSet physics() {
        return physics;
    }

    /**
     * A model from the polytropic guess, relaxed directly or by a homotopy in the burning rate (relaxed with eps
     * scaled to the guessed luminosity, then the factor walked back to one); the other way is tried when the
     * first fails.
     *
     * @param mass g
     * @throws SolveFailedException when a relaxation fails (its report counts every iteration spent)
     */
    public ZamsModel coldStart(double mass, Composition composition) {
        ModelState guess = new PolytropicGuess(planner.points()).guess(mass, composition);
        HenyeySolver.Settings cold = new HenyeySolver.Settings(settings.tolerance(), COLD_START_MAX_STEP,
                COLD_START_BUDGET);
        // the direct relaxation works best for low masses, the homotopy for high ones (measured)
        boolean homotopyFirst = mass > HOMOTOPY_FIRST_MASS;
        int spent = 0;
        SolveFailedException last = null;
        for (int attempt = 0; attempt < 2; attempt++) {
            try {
                ZamsModel z = (attempt == 0) == homotopyFirst ? homotopy(guess, composition, cold)
                        : build(guess, composition, cold, true);
                return new ZamsModel(z.model(), composition, z.iterations() + spent, true);
            } catch (SolveFailedException e) {
                spent += e.report().iterations();
                last = e;
            }
        }
        throw new SolveFailedException("cold start of " + mass + " g",
                last.report().plusIterations(spent - last.report().iterations()));
    }

    private ZamsModel homotopy(ModelState guess, Composition composition, HenyeySolver.Settings cold) {
        // homotopy in the burning rate: first relax with the burning scaled to the guessed luminosity, then
        // walk the factor back to one in steps of at most HOMOTOPY_STEP in ln, halving a step that fails
        double lnFactor = Math.log(Math.min(MAX_BURNING_FACTOR, Math.max(1.0 / MAX_BURNING_FACTOR,
                solver.matchingBurningFactor(guess))));
        int spent = 0;
        StellarModel model;
        try {
            model = solver.relax(guess, ExtraEnergy.NONE, null, cold, Math.exp(lnFactor), equilibrium(composition));
        } catch (SolveFailedException e) {
            throw new SolveFailedException("cold start at burning factor " + Math.exp(lnFactor), e.report());
        }
        spent += model.report().iterations();
        double step = HOMOTOPY_STEP;
        while (lnFactor != 0.0) {
            double next = Math.abs(lnFactor) <= step ? 0.0 : lnFactor - Math.copySign(step, lnFactor);
            try {
                model = solver.relax(model.state(), ExtraEnergy.NONE, null, settings, Math.exp(next),
                        equilibrium(composition));
                spent += model.report().iterations();
                lnFactor = next;
                step = Math.min(HOMOTOPY_STEP, 2.0 * step);
            } catch (SolveFailedException e) {
                spent += e.report().iterations();
                step *= 0.5;
                if (step < MIN_HOMOTOPY_STEP) {
                    throw new SolveFailedException("cold start at burning factor " + Math.exp(next),
                            e.report().plusIterations(spent - e.report().iterations()));
                }
            }
        }
        ZamsModel z = build(model.state(), composition, settings, true);
        return new ZamsModel(z.model(), composition, z.iterations() + spent, true);
    }

    /**
     * A model from a seed state (e.g. {@link HomologySeeder#seed}) for the seed's mass.
     *
     * @throws SolveFailedException when a relaxation fails (its report counts every iteration spent)
     */
    public ZamsModel fromSeed(ModelState seed, Composition composition) {
        return fromSeed(seed, composition, null);
    }

    /**
     * As {@link #fromSeed(ModelState, Composition)}, the first evaluation's equation-of-state solve at each point of
     * the seed started from {@code nearbyEos[k]} (e.g. the states of the model the seed was scaled from, on the
     * same mesh; null for cold starts).
     *
     * @throws SolveFailedException when a relaxation fails (its report counts every iteration spent)
     */
    public ZamsModel fromSeed(ModelState seed, Composition composition, EosState[] nearbyEos) {
        // a good seed converges in a handful of iterations; a poor one is better retried with a smaller step
        return build(seed, composition,
                settings.withIterationBudget(Math.min(settings.iterationBudget(), SEEDED_BUDGET))
                        .withGiveUpRate(SEEDED_GIVE_UP_RATE), false, nearbyEos);
    }

    private ZamsModel build(ModelState start, Composition composition, HenyeySolver.Settings first,
                            boolean cold) {
        return build(start, composition, first, cold, null);
    }

    private ZamsModel build(ModelState start, Composition composition, HenyeySolver.Settings first,
                            boolean cold, EosState[] nearbyEos) {
        ShellComposition rule = equilibrium(composition);
        int spent = 0;
        StellarModel model;
        try {
            model = solver.relax(start, ExtraEnergy.NONE, null, first, 1.0, rule, nearbyEos);
            spent += model.report().iterations();
            for (int pass = 0; pass < MAX_REMESH_PASSES && planner.needsRemesh(model); pass++) {
                model = solver.relax(planner.remesh(model), ExtraEnergy.NONE, null, settings, 1.0, rule);
                spent += model.report().iterations();
            }
        } catch (SolveFailedException e) {
            throw new SolveFailedException("zero-age model of " + start.mesh().totalMass() + " g",
                    e.report().plusIterations(spent));
        }
        return new ZamsModel(model, composition, spent, cold);
    }

    /** 3He and CN at local equilibrium from the initial composition (the zero-age assumption). */
    private ShellComposition equilibrium(Composition initial) {
        return new LocalEquilibriumComposition(physics.nuclear(), initial);
    }
}
