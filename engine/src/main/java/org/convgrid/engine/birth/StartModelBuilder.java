package org.convgrid.engine.birth;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.physics.opacity.Opacity;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.HenyeySolver;
import org.convgrid.engine.structure.MeshPlanner;
import org.convgrid.engine.structure.ModelState;
import org.convgrid.engine.structure.SolveFailedException;
import org.convgrid.engine.structure.StellarModel;
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
 * is ~rho T^12 there). The model is an n = 1.5 polytrope ({@link HayashiGuess}) relaxed with the energy release of
 * homologous contraction at the rate x = -dlnR/dt ({@link HomologousContraction}); x sets the radius (on a
 * Hayashi track L ~ R^2 and L ~ x G M^2/R, so R^3 ~ x), and it is corrected by secant steps in ln x against
 * ln T_c until T_c is within {@link #CENTRAL_TEMPERATURE_TOLERANCE} of the target. The polytrope is first relaxed
 * with the opacity's {@link org.convgrid.engine.physics.opacity.Opacity#relaxationAid()} (for the default opacity:
 * without the low-temperature tables; the polytrope's outer layers lie beyond their density edge at log R = +1),
 * then with the physics itself from there: a continuation, so the start model is that of the physics; if that
 * fails, directly. A mass whose
 * polytrope does not
 * relax is reached instead from {@link #ANCHOR_MASS} in mass steps of at most {@link #MASS_WALK_FACTOR}, each
 * start model scaled homologously to the next mass as its guess. Its age is zero: at 1/x
 * (~1e3-1e5 yr, the model's contraction time) any earlier history has been forgotten, so ages beyond a few
 * times that do not depend on the start (measured at 1 Msun, starting at 3.5e5 instead of 5e5 K: |D ln R| = 0.08
 * at 1e4 yr, 0.001-0.004 at 1e5 yr, 0.0017 at 1 Myr). Immutable and thread-safe.
 */
public final class StartModelBuilder {

    /** Central temperature of the start model, K. */
    public static final double DEFAULT_CENTRAL_TEMPERATURE = 5.0e5;
    /** Largest |ln T_c - ln target| accepted. */
    public static final double CENTRAL_TEMPERATURE_TOLERANCE = 0.01;
    /** Corrections of the contraction rate allowed. */
    public static final int RATE_BUDGET = 12;
    /** Times a correction of the contraction rate whose relaxation fails is halved before the start is refused. */
    public static final int RATE_STEP_HALVINGS = 3;
    /** Newton budget of each relaxation. */
    public static final int RELAXATION_BUDGET = 80;
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
    /** Relaxes the polytrope first, with the opacity's relaxation aid; null when that is the opacity itself. */
    private final StructureSolver aidSolver;
    private final HenyeySolver.Settings settings;
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
        Opacity aid = physics.opacity().relaxationAid();
        this.aidSolver = aid == physics.opacity() ? null : new StructureSolver(new PhysicsSet(physics.eos(), aid,
                physics.nuclear(), physics.convection(), physics.criterion(), physics.surface(), physics.overshoot()),
                settings);
        this.centralTemperature = ConvgridException.requireInRange("start central temperature",
                centralTemperature, 1.0e5, 3.0e6, "K");
    }

    public StartModelBuilder(PhysicsSet physics) {
        this(physics, new MeshPlanner(MeshPlanner.DEFAULT_POINTS), DEFAULT_CENTRAL_TEMPERATURE);
    }

    /**
     * @param mass g
     * @param birth the homogeneous birth composition (e.g. {@link org.convgrid.engine.state.BirthAbundances})
     * @throws SolveFailedException when a relaxation fails
     * @throws ConvgridException NOT_CONVERGED when T_c does not reach its target within the budget
     */
    public StartModel build(double mass, Composition birth) {
        double target = centralTemperature(mass);
        ModelState guess = new HayashiGuess(planner.points()).guess(mass, birth, target);
        // virial estimate: L = (3/7) x G M^2 / R for an n = 1.5 polytrope
        double radius = Math.exp(guess.lnRadius(guess.size() - 1));
        double rate = guess.surfaceLuminosity() * radius / (3.0 / 7.0 * Constants.G * mass * mass);
        try {
            return converged(guess, rate, target, 0, true);
        } catch (ConvgridException direct) {
            double ratio = mass / ANCHOR_MASS;
            if (mass == ANCHOR_MASS) {
                throw direct;
            }
            // the polytrope is too poor a guess for this mass: walk from the anchor mass by homology (a mass within
            // one walk step of the anchor starts from the anchor itself: at Z = 0.04, 1.26 and 1.41 Msun failed
            // directly while 1 Msun converged)
            double nearer = Math.abs(Math.log(ratio)) <= Math.log(MASS_WALK_FACTOR) ? ANCHOR_MASS
                    : mass / Math.pow(MASS_WALK_FACTOR, Math.signum(Math.log(ratio)));
            return walked(build(nearer, birth), mass, WALK_HALVINGS);
        }
    }

    /**
     * The start model of {@code mass} (g) from that of a nearby mass by homology; when that fails, through the
     * geometric mid-mass first, at most {@code halvings} times (at Z = 1e-4 the step 6.7 -> 10 Msun fails in the
     * outer layers' density and temperature while 6.7 -> 8.2 -> 9.0 -> 9.5 -> 10 relaxes, with halved rate corrections).
     */
    private StartModel walked(StartModel from, double mass, int halvings) {
        double target = centralTemperature(mass);
        try {
            return converged(homologous(from.model().state(), mass, target), homologousRate(from, mass, target),
                    target, from.iterations(), false);
        } catch (ConvgridException failed) {
            if (halvings == 0) {
                throw failed;
            }
            StartModel mid = walked(from, Math.sqrt(from.model().mass() * mass), halvings - 1);
            return walked(mid, mass, halvings - 1);
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
     * Relaxes from {@code start} (with the relaxation aid first when it is the polytrope, {@code rough}), correcting
     * the contraction rate until T_c is on target. Off the polytrope (a walked start), a correction whose relaxation
     * fails is halved, up to {@link #RATE_STEP_HALVINGS} times: the homologous guess misses T_c by up to e^0.5 near
     * 10 Msun, and the full correction (x up to e^1.6 at once) fails in the outer layers; from the polytrope a
     * failure goes on to the walk as before.
     */
    private StartModel converged(ModelState start, double firstRate, double target, int alreadySpent,
                                 boolean rough) {
        double lnX = Math.log(firstRate);
        int[] spent = {alreadySpent};
        StellarModel model = rough && aidSolver != null ? relaxedWithAid(start, firstRate, spent)
                : relaxed(solver, start, firstRate, spent);
        double lnTarget = Math.log(target);
        double prevLnX = Double.NaN;
        double prevMiss = Double.NaN;
        for (int k = 0; k < RATE_BUDGET; k++) {
            double miss = Math.log(model.global().centralTemperature()) - lnTarget;
            if (Math.abs(miss) <= CENTRAL_TEMPERATURE_TOLERANCE) {
                return new StartModel(model, Math.exp(lnX), spent[0]);
            }
            // R^3 ~ x and T_c ~ 1/R: dln T_c/dln x ~ -1/3; later steps use the measured slope
            double slope = Double.isNaN(prevLnX) ? -1.0 / 3.0 : (miss - prevMiss) / (lnX - prevLnX);
            if (!(slope < -0.03 && slope > -3.0)) {
                slope = -1.0 / 3.0;
            }
            prevLnX = lnX;
            prevMiss = miss;
            double step = Math.max(-3.0, Math.min(3.0, miss / slope));
            for (int halving = 0; ; halving++) {
                try {
                    model = relaxed(solver, model.state(), Math.exp(lnX - step), spent);
                    break;
                } catch (SolveFailedException failed) {
                    if (rough || halving == RATE_STEP_HALVINGS) {
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
     * Relaxes the polytrope with the relaxation aid, then with the physics from there; when either fails, with the
     * physics directly from the polytrope (at Z = 1e-4 the aid's path fails at every mass, where the direct one
     * relaxes 0.1-3 Msun; at Z = 0.02 and 0.04 the aid's succeeds and the direct one fails at 0.5-2 Msun).
     */
    private StellarModel relaxedWithAid(ModelState start, double rate, int[] spent) {
        try {
            return relaxed(solver, relaxed(aidSolver, start, rate, spent).state(), rate, spent);
        } catch (SolveFailedException aidFailed) {
            return relaxed(solver, start, rate, spent);
        }
    }

    /**
     * Relaxes at one contraction rate, then remeshes and relaxes again while the mesh is uneven (the polytrope's
     * mesh does not follow the surface layers of the relaxed model); {@code spent[0]} counts the iterations.
     */
    private StellarModel relaxed(StructureSolver with, ModelState start, double rate, int[] spent) {
        HomologousContraction source = new HomologousContraction(rate);
        StellarModel m = with.relax(start, source, null, settings);
        spent[0] += m.report().iterations();
        for (int pass = 0; pass < MAX_REMESH_PASSES && planner.needsRemesh(m); pass++) {
            m = with.relax(planner.remesh(m), source, null, settings);
            spent[0] += m.report().iterations();
        }
        return m;
    }
}
