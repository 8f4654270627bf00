package org.convgrid.engine.birth;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.engine.evolution.FullyConvectiveMesh;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.physics.eos.EosState;
import org.convgrid.engine.physics.opacity.Opacity;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.EosCurvature;
import org.convgrid.engine.structure.HenyeySolver;
import org.convgrid.engine.structure.MeshPlanner;
import org.convgrid.engine.structure.ModelState;
import org.convgrid.engine.structure.SolveFailedException;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.structure.StellarProfile;
import org.convgrid.engine.structure.StructureSolver;
import org.convgrid.engine.units.Constants;

/**
 * Builds the start model of the pre-main sequence: a fully convective star contracting high on its Hayashi track,
 * with the homogeneous birth composition. The starting point is a central temperature,
 * {@link #DEFAULT_CENTRAL_TEMPERATURE} by default, raised in proportion to the mass above {@link #SCALING_MASS}:
 * below the ~1e6 K where the initial deuterium starts to burn in a solar-mass star, so that deuterium burning
 * happens on the track (common practice: evolution codes start their tracks before deuterium ignition); more
 * massive stars, at the same T_c, would start at radii above ~80 Rsun, where the relaxation of their tenuous
 * surfaces fails, and their lower central densities keep deuterium unburnt to higher T_c anyway (the burning rate
 * is ~rho T^12 there). The model is an n = 1.5 polytrope with an adiabatic envelope below the atmosphere
 * ({@link HayashiGuess}) relaxed with the energy release of homologous contraction at the rate x = -dlnR/dt
 * ({@link HomologousContraction}); x sets the radius (on a Hayashi track L ~ R^2 and L ~ x G M^2/R, so R^3 ~ x),
 * and it is corrected by secant steps in ln x (each at most {@link #MAX_RATE_STEP}) against ln T_c until T_c is
 * within {@link #CENTRAL_TEMPERATURE_TOLERANCE} of the target. Those intermediate relaxations stop at
 * {@link #INTERMEDIATE_TOLERANCE}; only the accepted one is relaxed to the solver's full tolerance. The guess is
 * relaxed with the physics itself; when that fails, with the opacity's
 * {@link org.convgrid.engine.physics.opacity.Opacity#relaxationAid()} first (for the default opacity: without the
 * low-temperature tables) and with the physics from there, a continuation, so the start model is that of the
 * physics. A mass whose guess does not relax is reached instead from {@link #ANCHOR_MASS} in mass steps of at most
 * {@link #MASS_WALK_FACTOR}, each start model scaled homologously to the next mass as its guess. Its age is zero:
 * at 1/x (~1e3-1e5 yr, the model's contraction time) any earlier history has been forgotten, so ages beyond a few
 * times that do not depend on the start (measured at 1 Msun, starting at 3.5e5 instead of 5e5 K: |D ln R| = 0.29
 * at 1e3 yr, 0.09 at 1e4 yr, 0.003 at 1e5 yr, 0.006 at 0.3 Myr, 0.0009-0.0012 at 1 Myr, the spread that of two
 * sets of requested ages, whose step sequences differ; re-measured with the guess's mixing-length envelope and the
 * low-gravity atmosphere table at the same five ages: 0.288, 0.087, 0.0024, 0.0033, 0.0007, the same to the digits
 * shown as before them). Immutable and thread-safe.
 */
public final class StartModelBuilder {

    /** Central temperature of the start model, K. */
    public static final double DEFAULT_CENTRAL_TEMPERATURE = 5.0e5;
    /** Largest |ln T_c - ln target| accepted. */
    public static final double CENTRAL_TEMPERATURE_TOLERANCE = 0.01;
    /** Corrections of the contraction rate allowed. */
    public static final int RATE_BUDGET = 12;
    /**
     * Largest correction of ln x in one secant step. Where T_c changes abruptly with x (Z = 1e-4 near 10 Msun,
     * where a radiative interior appears) steps of up to 1.7 failed even when halved, and the start was walked from
     * 6.7 Msun (2167 Newton iterations); steps of 0.75 relax there in 7-9 iterations or after one to three halvings
     * (432 in all).
     */
    public static final double MAX_RATE_STEP = 0.75;
    /** Times a correction of the contraction rate whose relaxation fails is halved before the start is refused. */
    public static final int RATE_STEP_HALVINGS = 3;
    /** Newton budget of the relaxation to the full tolerance. */
    public static final int RELAXATION_BUDGET = 80;
    /**
     * Newton budget of a relaxation from a guess (the Hayashi guess, or a start model scaled to another mass):
     * those that converge take at most 32 iterations (measured 0.1-10 Msun every 0.1 dex, Z 1e-4-0.04), those
     * that do not stall with corrections of 1-1e6 in the outer layers, so a larger budget only makes a failure
     * dearer.
     */
    public static final int GUESS_BUDGET = 50;
    /**
     * Newton budget of a relaxation at a corrected contraction rate: those that converge take at most 20
     * iterations (measured as above); a correction that fails is halved.
     */
    public static final int CORRECTION_BUDGET = 30;
    /**
     * Tolerance of the relaxations on the way to the contraction rate (guess, remesh passes, secant steps): their
     * T_c is needed to ~1e-3 (the target's tolerance is 0.01), their state only as the next one's start. Measured
     * at 0.3-3 Msun, Z = 0.02 and 0.04: 2-8 fewer iterations per start model than relaxing each to the full
     * tolerance (1e-3 saves no more).
     */
    public static final double INTERMEDIATE_TOLERANCE = 1.0e-4;
    /** Above this mass (g) the start's central temperature grows in proportion to the mass. */
    public static final double SCALING_MASS = 4.0 * Constants.M_SUN;
    /** Mass whose start model the polytropic guess reaches directly; others may be walked from it. */
    public static final double ANCHOR_MASS = Constants.M_SUN;
    /** Largest mass ratio of one step of that walk. */
    public static final double MASS_WALK_FACTOR = 1.5;
    /** Times a failed step of that walk is split in two (in ln M) before the start model is refused. */
    public static final int WALK_HALVINGS = 3;
    /** Remesh-and-relax passes per contraction rate. */
    public static final int MAX_REMESH_PASSES = 3;
    /** Largest ln step per Newton iteration. */
    public static final double MAX_NEWTON_STEP = 0.3;

    private final PhysicsSet physics;
    private final MeshPlanner planner;
    private final StructureSolver solver;
    /** Relaxes a guess the physics does not, with the opacity's relaxation aid; null when that is the opacity. */
    private final StructureSolver aidSolver;
    private final HenyeySolver.Settings settings;
    private final HenyeySolver.Settings fromGuess;
    private final HenyeySolver.Settings corrected;
    private final double centralTemperature;

    /**
     * @param centralTemperature T_c of the start model, K (below deuterium ignition, ~1e6 K)
     */
    public StartModelBuilder(PhysicsSet physics, MeshPlanner planner, double centralTemperature) {
        this.physics = physics;
        this.planner = planner;
        this.settings = new HenyeySolver.Settings(HenyeySolver.DEFAULT_TOLERANCE, MAX_NEWTON_STEP,
                RELAXATION_BUDGET);
        this.solver = new StructureSolver(physics, settings);
        this.fromGuess = new HenyeySolver.Settings(INTERMEDIATE_TOLERANCE, MAX_NEWTON_STEP, GUESS_BUDGET);
        this.corrected = new HenyeySolver.Settings(INTERMEDIATE_TOLERANCE, MAX_NEWTON_STEP, CORRECTION_BUDGET);
        Opacity aid = physics.opacity().relaxationAid();
        this.aidSolver = aid == physics.opacity() ? null : new StructureSolver(new PhysicsSet(physics.eos(), aid,
                physics.nuclear(), physics.convection(), physics.criterion(), physics.surface(), physics.overshoot()),
                settings);
        this.centralTemperature = ConvgridException.requireInRange("start central temperature",
                centralTemperature, 1.0e5, 3.0e6, "K");
    }

    /** The default central temperature, on the mesh of a fully convective star ({@link FullyConvectiveMesh}). */
    public StartModelBuilder(PhysicsSet physics) {
        this(physics, FullyConvectiveMesh.planner(), DEFAULT_CENTRAL_TEMPERATURE);
    }

    /**
     * @param mass g
     * @param birth the homogeneous birth composition (e.g. {@link org.convgrid.engine.state.BirthAbundances})
     * @throws SolveFailedException when a relaxation fails
     * @throws ConvgridException NOT_CONVERGED when T_c does not reach its target within the budget
     */
    public StartModel build(double mass, Composition birth) {
        int[] spent = {0};
        StartModel built = build(mass, birth, spent);
        return new StartModel(built.model(), built.contractionRate(), spent[0]);
    }

    /** As {@link #build(double, Composition)}; {@code spent[0]} counts every Newton iteration, failed ones too. */
    private StartModel build(double mass, Composition birth, int[] spent) {
        double target = centralTemperature(mass);
        ModelState guess = new HayashiGuess(planner.points(), physics).guess(mass, birth, target);
        // virial estimate: L = (3/7) x G M^2 / R for an n = 1.5 polytrope
        double radius = Math.exp(guess.lnRadius(guess.size() - 1));
        double rate = guess.surfaceLuminosity() * radius / (3.0 / 7.0 * Constants.G * mass * mass);
        try {
            return converged(guess, rate, target, spent, true);
        } catch (ConvgridException direct) {
            double ratio = mass / ANCHOR_MASS;
            if (mass == ANCHOR_MASS) {
                throw direct;
            }
            // the Hayashi guess does not relax for this mass: walk from the anchor mass by homology (a mass within
            // one walk step of the anchor starts from the anchor itself: at Z = 0.04, 1.26 and 1.41 Msun failed
            // directly while 1 Msun converged)
            double nearer = Math.abs(Math.log(ratio)) <= Math.log(MASS_WALK_FACTOR) ? ANCHOR_MASS
                    : mass / Math.pow(MASS_WALK_FACTOR, Math.signum(Math.log(ratio)));
            return walked(build(nearer, birth, spent), mass, WALK_HALVINGS, spent);
        }
    }

    /**
     * The start model of {@code mass} (g) from that of a nearby mass by homology; when that fails, through the
     * geometric mid-mass first, at most {@code halvings} times (with the bare polytrope as the guess, Z = 1e-4,
     * 10 Msun was reached 6.7 -> 8.2 -> 9.0 -> 9.5 -> 10 Msun).
     */
    private StartModel walked(StartModel from, double mass, int halvings, int[] spent) {
        double target = centralTemperature(mass);
        try {
            return converged(homologous(from.model().state(), mass, target), homologousRate(from, mass, target),
                    target, spent, false);
        } catch (ConvgridException failed) {
            if (halvings == 0) {
                throw failed;
            }
            StartModel mid = walked(from, Math.sqrt(from.model().mass() * mass), halvings - 1, spent);
            return walked(mid, mass, halvings - 1, spent);
        }
    }

    /**
     * The state scaled to another mass along the Hayashi track at the new target T_c: R ~ M/T_c (ideal gas),
     * rho ~ M/R^3, T ~ T_c, L ~ R^2 (effective temperature unchanged).
     */
    private static ModelState homologous(ModelState state, double mass, double target) {
        double fm = mass / state.mesh().totalMass();
        double fr = fm * Math.exp(state.lnTemperature(0)) / target;
        double[] lnR = state.lnRadii();
        double[] lnRho = state.lnDensities();
        double[] lnT = state.lnTemperatures();
        double[] lum = state.luminosities();
        double dlnT = Math.log(target) - state.lnTemperature(0);
        for (int k = 0; k < lnR.length; k++) {
            lnR[k] += Math.log(fr);
            lnRho[k] += Math.log(fm) - 3.0 * Math.log(fr);
            lnT[k] += dlnT;
            lum[k] *= fr * fr;
        }
        return new ModelState(state.mesh().scaledTo(mass), state.compositions(), lnR, lnRho, lnT, lum);
    }

    /** The contraction rate scaled with the model: x ~ L R/M^2 ~ R^3/M^2. */
    private static double homologousRate(StartModel from, double mass, double target) {
        double fm = mass / from.model().mass();
        double fr = fm * from.model().global().centralTemperature() / target;
        return from.contractionRate() * fr * fr * fr / (fm * fm);
    }

    /**
     * Relaxes from {@code start} (with the relaxation aid when the physics fails and it is the Hayashi guess,
     * {@code rough}), correcting the contraction rate until T_c is on target, then relaxes the accepted model to the
     * full tolerance. A correction whose relaxation fails is halved, up to {@link #RATE_STEP_HALVINGS} times (the
     * guess misses T_c by up to e^0.6 near 10 Msun, where larger corrections fail in the outer layers).
     */
    private StartModel converged(ModelState start, double firstRate, double target, int[] spent, boolean rough) {
        double lnX = Math.log(firstRate);
        StellarModel model = rough ? relaxedFromGuess(start, firstRate, spent)
                : relaxed(solver, start, firstRate, spent, fromGuess);
        double lnTarget = Math.log(target);
        double prevLnX = Double.NaN;
        double prevMiss = Double.NaN;
        for (int k = 0; k < RATE_BUDGET; k++) {
            double miss = Math.log(model.global().centralTemperature()) - lnTarget;
            if (Math.abs(miss) <= CENTRAL_TEMPERATURE_TOLERANCE) {
                if (model.report().lastCorrection() <= settings.tolerance()) {
                    return new StartModel(model, Math.exp(lnX), spent[0]);
                }
                // on target: the same rate to the full tolerance (T_c moves by ~1e-4, checked again)
                model = relaxed(solver, model, Math.exp(lnX), spent, settings);
                continue;
            }
            // R^3 ~ x and T_c ~ 1/R: dln T_c/dln x ~ -1/3; later steps use the measured slope
            double slope = Double.isNaN(prevLnX) ? -1.0 / 3.0 : (miss - prevMiss) / (lnX - prevLnX);
            if (!(slope < -0.03 && slope > -3.0)) {
                slope = -1.0 / 3.0;
            }
            prevLnX = lnX;
            prevMiss = miss;
            double step = Math.max(-MAX_RATE_STEP, Math.min(MAX_RATE_STEP, miss / slope));
            for (int halving = 0; ; halving++) {
                try {
                    model = relaxed(solver, model, Math.exp(lnX - step), spent, corrected);
                    break;
                } catch (SolveFailedException failed) {
                    if (halving == RATE_STEP_HALVINGS) {
                        throw failed;
                    }
                    step *= 0.5;
                }
            }
            lnX -= step;
        }
        double mass = start.mesh().totalMass();
        throw new ConvgridException(ErrorKind.NOT_CONVERGED, String.format(
                "start model of %.4g Msun: T_c %.4g K, target %.4g K after %d corrections", mass / Constants.M_SUN,
                model.global().centralTemperature(), target, RATE_BUDGET), mass,
                model.global().centralTemperature());
    }

    /** The start model's central temperature for this mass (g), K. */
    public double centralTemperature(double mass) {
        return centralTemperature * Math.max(1.0, mass / SCALING_MASS);
    }

    /**
     * Relaxes the Hayashi guess with the physics; when that fails, with the relaxation aid first and then with the
     * physics from there. With the bare polytrope as the guess the physics failed at 0.5-2 Msun (Z = 0.02 and
     * 0.04) and the aid at every mass at Z = 1e-4; with the adiabatic envelope the physics relaxes it at every mass
     * 0.1-10 Msun, Z 1e-4-0.04, every 0.1 dex, but one (4.0 Msun, Z = 0.02, where the aid's path takes over), where
     * the aid, its remesh passes and the physics took 40-60 iterations before (1 Msun, Z = 0.02: 53 + 5, with the
     * adiabatic envelope 23, with its superadiabatic layer 7).
     */
    private StellarModel relaxedFromGuess(ModelState start, double rate, int[] spent) {
        try {
            return relaxed(solver, start, rate, spent, fromGuess);
        } catch (SolveFailedException direct) {
            if (aidSolver == null) {
                throw direct;
            }
            return relaxed(solver, relaxed(aidSolver, start, rate, spent, fromGuess), rate, spent, fromGuess);
        }
    }

    /**
     * Relaxes at one contraction rate, then remeshes and relaxes again while the mesh is uneven (the guess's mesh
     * does not follow the surface layers of the relaxed model); {@code spent[0]} counts the iterations, those of
     * failed relaxations included.
     */
    private StellarModel relaxed(StructureSolver with, ModelState start, double rate, int[] spent,
                                 HenyeySolver.Settings how) {
        return relaxed(with, start, null, rate, spent, how);
    }

    /**
     * As {@link #relaxed(StructureSolver, ModelState, double, int[], HenyeySolver.Settings)} from a model relaxed
     * before (at another contraction rate, or with the relaxation aid), its equation-of-state states and second
     * derivatives starting the first evaluation's (as an evolution step's start from the previous model's): the
     * model is within a few per cent of the new solution, so each point's neutrality solve starts one or two
     * Newton steps from its root instead of five to ten from the fully ionised guess.
     */
    private StellarModel relaxed(StructureSolver with, StellarModel from, double rate, int[] spent,
                                 HenyeySolver.Settings how) {
        return relaxed(with, from.state(), from.profile(), rate, spent, how);
    }

    private StellarModel relaxed(StructureSolver with, ModelState start, StellarProfile near, double rate,
                                 int[] spent, HenyeySolver.Settings how) {
        HomologousContraction source = new HomologousContraction(rate);
        StellarModel m = counted(with, start, near, source, how, spent);
        for (int pass = 0; pass < MAX_REMESH_PASSES && planner.needsRemesh(m); pass++) {
            m = counted(with, planner.remesh(m), null, source, how, spent);
        }
        return m;
    }

    /** One relaxation, the equation of state started from {@code near}'s states when given (same mesh). */
    private static StellarModel counted(StructureSolver with, ModelState start, StellarProfile near,
                                        HomologousContraction source, HenyeySolver.Settings how, int[] spent) {
        EosState[] eos = near == null ? null : near.eosStates();
        EosCurvature[] curvature = near == null ? null : near.eosCurvatures();
        try {
            StellarModel m = with.relax(start, source, null, how, eos, curvature);
            spent[0] += m.report().iterations();
            return m;
        } catch (SolveFailedException failed) {
            spent[0] += failed.report().iterations();
            throw failed;
        }
    }
}
