package org.convgrid.engine.evolution;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.convection.MuGradient;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.overshoot.Overshoot;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.ModelSeismicScales;
import org.convgrid.engine.structure.HenyeySolver;
import org.convgrid.engine.structure.MassMesh;
import org.convgrid.engine.structure.MeshPlanner;
import org.convgrid.engine.structure.ModelState;
import org.convgrid.engine.structure.SolveFailedException;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.structure.StellarProfile;
import org.convgrid.engine.structure.StructureSolver;
import org.convgrid.engine.units.Constants;

/**
 * Evolves a zero-age main-sequence model in time until core-hydrogen exhaustion (central X below
 * {@link Settings#endCentralHydrogen()}) or the age limit. Each step, operator split (common practice): (1) the
 * convective zones of the previous model are homogenised ({@link ConvectiveMixing}); (2) the composition is
 * advanced over dt by {@link CompositionStep} at the density and temperature of the middle of the step (extrapolated
 * from the previous two models, carried onto the new mesh after a remesh), each mixed zone as
 * one composition with its mass-weighted rates, every other point on its own; (3) the
 * structure is relaxed with that composition and the gravothermal term eps_grav from the difference with the
 * previous model ({@link GravothermalEnergy}; before the zero-age main sequence its two-step form, second order in
 * time, {@link #YOUNG_TWO_STEP_RATIO}). Mixing (2) covers the convective zones and the points the physics'
 * {@link Overshoot} mixes with them, followed by the overshoot's diffusion when it has one (with the transport's
 * mixing length); under the Ledoux criterion
 * semiconvective layers are then mixed by diffusion ({@link SemiconvectiveMixing}) and the relaxation gets
 * nabla_mu from the mixed composition ({@link MuGradient}). Between steps the mesh is redistributed when uneven, with a cost
 * for composition gradients (|D X|/{@link #COMPOSITION_MESH_STEP} per interval, common practice, capped so that a
 * jump in X cannot shrink its interval below ~{@link #COMPOSITION_MESH_RESOLUTION} in m/M) and the composition
 * remapped conservatively ({@link MassRemap}); a redistribution that cannot be built keeps the previous mesh. Before
 * the zero-age main sequence a star with no radiative interior keeps the start model's number of points
 * ({@link FullyConvectiveMesh}) and a contracting one with a radiative core has {@link RadiativeContractionMesh}'s;
 * every other step uses this evolver's planner.
 *
 * <p>Time steps (common practice, no single source): the fall of X_c (a rise, from mixing, is not limited) at most
 * {@link Settings#maxCentralHydrogenChange()} while X_c &gt; 0.1, at most {@link Settings#exhaustionFraction()} X_c
 * below; |D ln L| at most
 * {@link Settings#maxLuminosityChange()}; growth at most {@link Settings#maxGrowth()} per step; while X_c &gt; 0.1 a
 * receding central convective zone paces the next step ({@link CoreRecession}); a step that
 * exceeds a limit by more than {@link #REJECTION_RATIO} is redone shorter, a failed relaxation is redone with
 * half the step, within {@link Settings#retryBudget()}. Requested ages are reached by landing a step exactly on
 * them (no interpolation). Deterministic; immutable and thread-safe (each call has its own state).
 *
 * <p>From a pre-main-sequence start model (nuclear luminosity below {@link NuclearLuminosity#ZERO_AGE_FRACTION}
 * of L) the same step runs, the gravothermal term carrying the contraction. Until the star first reaches that
 * fraction the steps are limited in ln L by {@link PreMainSequenceLimits} instead, and also in |D ln R|,
 * |D ln T_c|, the central deuterium and the surface 7Li burnt, and the next step is paced by |D ln X| of the
 * central 12C and 3He and, once the central deuterium is burnt, by |D ln(1 - L_nuc/L)|, the contraction's share of
 * L; while the centre is convective and L_nuc/L is below
 * {@link PreMainSequenceLimits#CONTRACTION_NUCLEAR_FRACTION} the looser contraction limit replaces those on ln L, ln R
 * and ln T_c, and until the ZAMS the composition update also bounds the relative change of every burning species per
 * sub-step ({@link #YOUNG_TRACE_CHANGE}); the first step is a fraction of the start model's Kelvin-Helmholtz time. On arrival the step is raised to at
 * least the first step of a zero-age track ({@link #FIRST_STEP_FRACTION}), as if the track started there. A track
 * that starts on the zero-age main sequence never sees these limits.
 */
public final class MainSequenceEvolver {

    /** The burning zone is where eps_nuc exceeds this fraction of its maximum. */
    public static final double BURNING_THRESHOLD = 0.01;
    /** Composition change per mesh interval worth one unit of mesh cost (common practice: |D X| &lt; 0.01-0.02). */
    public static final double COMPOSITION_MESH_STEP = 0.01;
    /**
     * Narrowest interval, in m/M, that a composition gradient may ask for: the composition cost of an interval is
     * capped at its width over this (see {@link #compositionCost}). Practice, chosen here: far below the widths
     * smooth burning profiles need, far above double-precision rounding of m/M.
     */
    public static final double COMPOSITION_MESH_RESOLUTION = 1.0e-5;
    /** A step whose change exceeds its limit by more than this factor is rejected and redone shorter. */
    public static final double REJECTION_RATIO = 1.5;
    /** First step as a fraction of the step the central burning rate allows. */
    public static final double FIRST_STEP_FRACTION = 0.1;
    /**
     * On arrival at the zero-age main sequence from birth, the first main-sequence step is at most this fraction of
     * the star's age. Our choice, measured (AgeRequestDependenceProbe, Z = 0.02, the model at 150 Myr): with the
     * arrival step set by the burning rate and capped at 0.01 x the oldest requested age, the top of the 3He-driven
     * central convective zone came out 0.0006 / 0.0030 / 0.0055 (1 Msun) and 0.0066 / 0.0120 / 0.0178 (0.8 Msun)
     * when the oldest age was 150 / 600 / 2000 Myr, against 0.0000-0.0005 and 0.0055-0.0062 with every step limit
     * x0.25; the step cap of the 150 Myr case, 1.5 Myr at arrival near 38 Myr, is this fraction.
     */
    public static final double ARRIVAL_STEP_AGE_FRACTION = 0.04;
    /**
     * Longest first step of a track that starts on the zero-age main sequence, s (1 Myr): the step the central
     * burning rate allows is hundreds of Myr below ~0.5 Msun, too long for the zero-age transient (the first step
     * mixes the 3He and CN made at local equilibrium through a convective centre), and early on the steps then grow
     * by {@link Settings#maxGrowth()} whatever the limits, so this cap alone sets the young track's time-step error.
     * Our choice, measured (ZeroAgeRequestProbe, Z = 0.02, one run per age): 0.3 Msun at 60 Myr, caps 0.1 / 0.6 /
     * 1 / 3 Myr: L 0.0094919 / 0.0094926 / 0.0094930 / 0.0094968 Lsun, R 0.29799 / 0.29800 / 0.29801 / 0.29806 Rsun
     * (1 Msun: L 0.724572 / 0.724562 / 0.724571 / 0.724514 Lsun); at 150 Myr, caps 0.1 / 0.3 / 1 / 3 Myr, 1 Msun L
     * 0.72848 / 0.72846 / 0.72852 / 0.72844 Lsun and the 1.2 Msun central convective zone's top 0.00587 / 0.00588 /
     * 0.00585 / 0.00588 m/M. It is a fixed time, not a fraction of the oldest requested age as before, which made a
     * star's model depend on the other ages its grid asked for (1.2 Msun at 150 Myr, ages [150] against [150, 2000]
     * Myr: L 2e-4 and the core's top 14 % apart).
     */
    public static final double ZERO_AGE_FIRST_STEP_CAP = 1.0e-3 * Constants.GYR;
    /**
     * alpha_sc of the semiconvective diffusion coefficient under the Ledoux criterion (Langer, Sugimoto &amp;
     * Fricke 1983; values 0.01-0.1 are in use in the literature, from memory).
     */
    public static final double SEMICONVECTION_EFFICIENCY = 0.1;
    /**
     * Longest step, in units of the step before, over which the network's mid-step density and temperature are
     * extrapolated from the two previous models; beyond it the previous model's values are used (first order).
     * Common practice: a predictor is trusted only over step ratios of a few.
     */
    public static final double MAX_EXTRAPOLATION_RATIO = 4.0;
    /**
     * Before the zero-age main sequence, the largest relative change of a burning species (12C, 14N, 3He above all)
     * in one sub-step of the composition update ({@link CompositionStep#withTraceLimit}). Measured (ZamsArrivalProbe,
     * default limits of the time): the 1 Msun ZAMS age moves by 3.1 % instead of 3.6 % when every step limit is
     * halved, and by 0.8 % instead of 1.5 % at 3 Msun; it is what lets the 12C/3He pacing be 0.2 instead of 0.1.
     */
    public static final double YOUNG_TRACE_CHANGE = 0.05;
    /**
     * Before the zero-age main sequence eps_grav takes its two-step form ({@link
     * GravothermalEnergy#withEarlierStep}, second order in time) when the step is at most this many times the step
     * before; after a sliver that landed on a requested age, after the first step and after the ZAMS the one-step
     * form (implicit Euler) holds. The variable-step formula of order two is zero-stable for ratios below
     * 1 + sqrt(2) (Hairer, Norsett &amp; Wanner 1993, ch. III.5, from memory); 2 keeps clear of it and of the
     * growth limits (x1.5). Why (ZamsArrivalProbe, 0.5/1/1.5/2/3 Msun, Z = 0.02, every step limit x1, x0.5,
     * x0.25): with the one-step form the ZAMS ages were 161.2/156.9/154.9, 39.91/38.48/37.96, 26.53/26.26/25.99,
     * 11.44/11.16/10.93, 3.521/3.477/3.464 Myr, first order (halving the limits halves the change); with the
     * two-step form 154.3/153.3/153.2, 38.72/37.99/37.70, 26.29/25.95/25.84, 11.37/11.20/10.85, 3.494/3.472/3.460
     * at the same steps. Implicit Euler set dL/dm - eps_nuc at the end of the step equal to a difference centred
     * half a step earlier, so the contraction lagged by ~half a step all along the track. The composition update is
     * second order too (mid-step density and temperature, on remeshed steps as well; see {@code advance}).
     */
    public static final double YOUNG_TWO_STEP_RATIO = 2.0;
    /**
     * Change of ln of the central 12C in one main-sequence step's composition update above which the starting
     * guess takes its nuclear luminosity from the step's composition ({@link #withStepsNuclearLuminosity}). On a
     * zero-age track the central 12C moves by ~1 % per step (1 Msun); on arrival from the pre-main sequence by
     * 25-100 %; 0.1 separates them.
     */
    public static final double TRANSIENT_CARBON_CHANGE = 0.1;
    /** Newton budget of one step's structure relaxation (a failure halves the step). */
    public static final int RELAXATION_BUDGET = 30;
    /**
     * Before the zero-age main sequence, the largest Newton correction (ln units; L relative) at which a step's
     * relaxation returns its state, when the solver's own tolerance is tighter. Why: the state returned lies within
     * its last correction of the solution, and what the pre-main-sequence results need is far coarser: their time
     * discretisation moves the ZAMS age by ~1 % when every step limit is quartered (ZamsArrivalProbe). With the
     * solver's 1e-8 the last iteration of 20-30 of the 78 steps of a 1 Msun track only confirmed a correction of
     * 1e-8 to 1e-6 left by the one before (quadratic convergence: the next one was 1e-10 to 1e-12). Measured, 1 Msun,
     * Z = 0.02, birth to core-hydrogen exhaustion (BirthStepLimitProbe): 636 -> 604 Newton iterations (all before
     * the ZAMS), the same 224 steps, ZAMS 1.208157376716e15 -> 1.208157342292e15 s, exhaustion 3.084511530599e17
     * -> 3.084511523461e17 s, surface 7Li 2.193079048353e-9 -> 2.193077194853e-9 (1e-7: 615 iterations); the ZAMS
     * ages of 0.5-3 Msun at every step limit x1 and x0.25 the same to four digits. Practice, chosen here from these
     * measurements (no single source).
     */
    public static final double YOUNG_TOLERANCE = 1.0e-6;
    /**
     * Before the zero-age main sequence, the largest Newton correction after which a step's relaxation reuses its
     * factorised Jacobian ({@link HenyeySolver.Settings#reuseThreshold()}), instead of the solver's 1e-3. Why: the
     * first corrections of those steps are ~1e-2 (inner L, the outer layers' ln rho and ln T), and from there the
     * chord steps reach {@link #YOUNG_TOLERANCE} in as many iterations as Newton's, each without the Jacobian's extra
     * equation-of-state calls and factorisation (~40 % of an iteration's CPU before the ZAMS, thread CPU). Measured,
     * 1 Msun, Z = 0.02, the 78 steps before the ZAMS: 251 iterations with 178 Jacobians at 1e-3; 251 with 145 at
     * 1e-2; 256 with 135, 266 with 119 and 289 with 102 (14 of them retaken after a slow chord step) at 2e-2, 3e-2
     * and 1e-1. Thread CPU of those steps, per-step least of 15 runs summed, interleaved at load 5-7 on 2 cores:
     * 0.240/0.241 s at 1e-3, 0.238/0.232 s at 1e-2 (medians of the runs 0.310/0.309 and 0.290/0.281 s). Practice,
     * chosen here from these measurements (no single source).
     */
    public static final double YOUNG_REUSE_THRESHOLD = 1.0e-2;

    /**
     * Time-step and stopping settings.
     *
     * @param maxCentralHydrogenChange largest |D X_c| per step while X_c &gt; 0.1 (0.01-0.02 in practice)
     * @param exhaustionFraction largest |D X_c|/X_c per step below X_c = 0.1
     * @param maxLuminosityChange largest |D ln L| per step
     * @param maxGrowth largest ratio of consecutive steps
     * @param endCentralHydrogen central hydrogen that ends the main sequence
     * @param maxAge age limit, s
     * @param stepBudget accepted steps allowed
     * @param retryBudget rejected or failed steps allowed
     */
    public record Settings(double maxCentralHydrogenChange, double exhaustionFraction, double maxLuminosityChange,
                           double maxGrowth, double endCentralHydrogen, double maxAge, int stepBudget,
                           int retryBudget) {

        /** 0.01, 0.1 X_c, 0.05 in ln L, x1.25, X_c &lt; 1e-4, 20 Gyr (common practice), 3000 steps, 100 retries. */
        public static final Settings DEFAULT = new Settings(0.01, 0.1, 0.05, 1.25, 1.0e-4, 20.0 * Constants.GYR,
                3000, 100);

        /** All change limits multiplied by {@code factor} (e.g. 0.5 to halve the steps, 2 for a coarse test). */
        public Settings scaled(double factor) {
            return new Settings(factor * maxCentralHydrogenChange, factor * exhaustionFraction,
                    factor * maxLuminosityChange, maxGrowth, endCentralHydrogen, maxAge, stepBudget, retryBudget);
        }
    }

    private final PhysicsSet physics;
    private final MeshPlanner planner;
    private final StructureSolver solver;
    private final HenyeySolver.Settings solveSettings;
    /**
     * The relaxation settings of a step before the zero-age main sequence ({@link #YOUNG_TOLERANCE}, {@link
     * #YOUNG_REUSE_THRESHOLD}).
     */
    private final HenyeySolver.Settings youngSolveSettings;
    private final CompositionStep network;
    private final CompositionStep youngNetwork;
    private final Settings settings;
    private final boolean settling;
    private final PreMainSequenceLimits youngLimits;

    public MainSequenceEvolver(PhysicsSet physics, MeshPlanner planner, HenyeySolver.Settings solveSettings,
                               Settings settings) {
        this(physics, planner, solveSettings, settings, false, PreMainSequenceLimits.DEFAULT);
    }

    private MainSequenceEvolver(PhysicsSet physics, MeshPlanner planner, HenyeySolver.Settings solveSettings,
                                Settings settings, boolean settling, PreMainSequenceLimits youngLimits) {
        this.physics = physics;
        this.planner = planner;
        this.solveSettings = solveSettings;
        this.youngSolveSettings = solveSettings.withTolerance(Math.max(solveSettings.tolerance(), YOUNG_TOLERANCE))
                .withReuseThreshold(Math.max(solveSettings.reuseThreshold(), YOUNG_REUSE_THRESHOLD));
        this.solver = new StructureSolver(physics, solveSettings);
        this.network = new CompositionStep(physics.nuclear());
        this.youngNetwork = network.withTraceLimit(YOUNG_TRACE_CHANGE);
        this.settings = settings;
        this.settling = settling;
        this.youngLimits = youngLimits;
    }

    public MainSequenceEvolver(PhysicsSet physics, Settings settings) {
        this(physics, new MeshPlanner(MeshPlanner.DEFAULT_POINTS),
                HenyeySolver.Settings.DEFAULT.withIterationBudget(RELAXATION_BUDGET), settings);
    }

    /**
     * The same evolver with microscopic diffusion of helium and metals ({@link GravitationalSettling},
     * {@link SettlingStep}) after each step's burning and mixing, when {@code on}.
     */
    public MainSequenceEvolver withSettling(boolean on) {
        return new MainSequenceEvolver(physics, planner, solveSettings, settings, on, youngLimits);
    }

    /** The same evolver with other pre-main-sequence step limits. */
    public MainSequenceEvolver withPreMainSequenceLimits(PreMainSequenceLimits limits) {
        return new MainSequenceEvolver(physics, planner, solveSettings, settings, settling, limits);
    }

    public PhysicsSet physics() {
        return physics;
    }

    public Settings settings() {
        return settings;
    }

    /**
     * @param zeroAge a converged zero-age model (its per-point compositions are the starting abundances)
     * @param ages requested ages, s (any order; 0 gives the zero-age model)
     * @return the models at the requested ages and every step
     */
    public EvolutionResult evolve(StellarModel zeroAge, double[] ages) {
        return evolve(zeroAge, ages, StepObserver.NONE);
    }

    /**
     * Evolves a zero-age main-sequence model or a pre-main-sequence start model.
     *
     * @param zeroAge a converged start model (its per-point compositions are the starting abundances)
     * @param ages requested ages since that model, s (any order; 0 gives the start model)
     * @param observer receives every accepted model, the start model first
     * @return the models at the requested ages and every step
     */
    public EvolutionResult evolve(StellarModel zeroAge, double[] ages, StepObserver observer) {
        double[] sorted = ages.clone();
        Arrays.sort(sorted);
        List<Double> landedAges = new ArrayList<>();
        List<StellarModel> landed = new ArrayList<>();
        List<EvolutionStep> steps = new ArrayList<>();
        steps.add(summary(zeroAge, 0.0, 0.0, 0));
        observer.accepted(0.0, 0.0, zeroAge);
        boolean young = !NuclearLuminosity.onMainSequence(zeroAge);
        double startDeuterium = zeroAge.state().composition(0).h2();
        double startLithium = surfaceLithium(zeroAge);
        StellarModel current = zeroAge;
        double age = 0.0;
        int next = 0;
        while (next < sorted.length && sorted[next] <= 0.0) {
            landedAges.add(sorted[next++]);
            landed.add(zeroAge);
        }
        double dt = young ? youngLimits.firstStepFraction() * kelvinHelmholtzTime(zeroAge) : firstStep(zeroAge);
        int retries = 0;
        EvolutionResult.EndReason end = null;
        String detail = "";
        double exhaustion = Double.NaN;
        double lastXc = current.global().centralHydrogen();
        int spent = 0;
        StellarModel before = null;
        double previousStep = 0.0;
        StellarModel earlier = null;
        double earlierStep = 0.0;
        double[] gravRates = null;
        // the light elements' rates of the current model, kept from the step that made it (see advance)
        LightElementRates lightRates = null;
        for (int accepted = 0; end == null; ) {
            double xc = current.global().centralHydrogen();
            if (xc < settings.endCentralHydrogen()) {
                end = EvolutionResult.EndReason.HYDROGEN_EXHAUSTED;
                break;
            }
            if (age >= settings.maxAge() * (1.0 - 1.0e-12)) {
                end = EvolutionResult.EndReason.AGE_LIMIT;
                break;
            }
            if (accepted >= settings.stepBudget() || retries > settings.retryBudget()) {
                end = EvolutionResult.EndReason.FAILED;
                // root locale: status_detail text, the same in every session
                detail = String.format(Locale.ROOT, "budget used: %d steps, %d retries, at age %.4g Gyr, X_c = %.3g",
                        accepted, retries, age / Constants.GYR, xc);
                break;
            }
            double h = Math.min(dt, settings.maxAge() - age);
            boolean landing = false;
            if (next < sorted.length && age + h >= sorted[next] * (1.0 - 1.0e-12)) {
                h = sorted[next] - age;
                landing = true;
            }
            StellarModel trial;
            double[] trialGravRates;
            LightElementRates trialLightRates;
            try {
                Stepped stepped = advance(current, age, before, previousStep, earlier, earlierStep, gravRates,
                        lightRates, h, young);
                trial = stepped.model();
                trialGravRates = stepped.gravRates();
                trialLightRates = stepped.lightRates();
            } catch (ConvgridException e) {
                if (e instanceof SolveFailedException f) {
                    spent += f.report().iterations();
                }
                retries++;
                dt = 0.5 * h;
                detail = e.getMessage();
                continue;
            }
            double limit = xc > 0.1 ? settings.maxCentralHydrogenChange()
                    : Math.min(settings.maxCentralHydrogenChange(), settings.exhaustionFraction() * xc);
            double dLnL = Math.abs(Math.log(trial.global().luminosity() / current.global().luminosity()));
            // only the fall of X_c (burning) is limited: a rise comes from mixing a convective core with a
            // richer zone it has reached (seen at 20 Msun: +0.024 in one step), which is instantaneous in this
            // scheme, so a shorter step cannot make it smaller and rejecting it would only spend the retry budget
            double burned = Math.max(0.0, xc - trial.global().centralHydrogen());
            double ratio = Math.max(burned / limit,
                    dLnL / (young ? youngLimits.structureLimit(youngLimits.maxLuminosityChange(),
                            NuclearLuminosity.fraction(current), convectiveCentre(current))
                            : settings.maxLuminosityChange()));
            if (young) {
                ratio = Math.max(ratio, youngRatio(current, trial, startDeuterium, startLithium));
            }
            if (ratio > REJECTION_RATIO) {
                spent += trial.report().iterations();
                retries++;
                dt = h * 0.8 / ratio;
                continue;
            }
            accepted++;
            age = landing ? sorted[next] : age + h;
            lastXc = xc;
            earlier = before;
            earlierStep = previousStep;
            before = current;
            previousStep = h;
            current = trial;
            gravRates = trialGravRates;
            lightRates = trialLightRates;
            steps.add(summary(current, age, h, current.report().iterations() + spent));
            observer.accepted(age, h, current);
            boolean arrived = young && NuclearLuminosity.onMainSequence(current);
            young = young && !arrived;
            spent = 0;
            double newXc = current.global().centralHydrogen();
            if (newXc < settings.endCentralHydrogen()) {
                exhaustion = age - h + h * crossing(lastXc, newXc, settings.endCentralHydrogen());
            }
            while (landing && next < sorted.length && sorted[next] <= age) {
                landedAges.add(sorted[next++]);
                landed.add(current);
            }
            double growth = young ? youngLimits.maxGrowth() : settings.maxGrowth();
            double paced = young ? Math.max(ratio, pacingRatio(before, current, startDeuterium)) : ratio;
            double grown = h * Math.min(growth, 0.9 / Math.max(paced, 1.0e-3));
            if (!young && xc > 0.1) {
                // on the main sequence a receding central core paces the next step (CoreRecession), while X_c > 0.1
                // (below it the exhaustion limit already shortens the steps in which cores of the upper main
                // sequence end), down to a floor of a fraction of the age (CoreRecession.MIN_STEP_AGE_FRACTION)
                double receding = h * Math.min(growth, 0.9 / Math.max(Math.max(paced,
                        CoreRecession.ratio(before, current)), 1.0e-3));
                grown = Math.max(receding, Math.min(grown, CoreRecession.MIN_STEP_AGE_FRACTION * age));
            }
            dt = landing ? Math.max(dt, grown) : grown;
            if (arrived) {
                // the pre-main-sequence steps near the ZAMS are paced for its age; from here the main-sequence
                // limits (with rejection) hold, so start from the step a zero-age track starts with instead of
                // growing by x1.25 from ~1e5 yr (1 Msun: ~20 steps between 37 Myr and 1e8 yr saved, measured)
                // ... but no longer than a fraction of the age: the step the burning rate allows (~12 Myr at 1 Msun)
                // left the young main sequence's 3He-driven central cores unresolved, and the zero-age cap of
                // 0.01 x the oldest requested age made a star's model depend on which other ages were requested
                dt = Math.max(dt, Math.min(burningStep(current), ARRIVAL_STEP_AGE_FRACTION * age));
            }
        }
        List<AgedModel> answers = answers(ages, landedAges, landed, end, age, detail);
        return new EvolutionResult(answers, steps, end, age, exhaustion,
                end == EvolutionResult.EndReason.FAILED ? detail : "");
    }

    /**
     * One step of length dt from {@code previous}. The network runs at the density and temperature of the
     * middle of the step, extrapolated linearly in ln rho and ln T from the previous two models (which makes the
     * operator split second order in time), on the main sequence both carried onto this step's mesh when it is
     * not theirs; at the previous model's when there is no trusted model before it or, before the zero-age main
     * sequence, when the mesh changed.
     *
     * @param age the age of {@code previous} since the start model, s
     * @param older the model before {@code previous}, or null
     * @param olderStep the step from {@code older} to {@code previous}, s
     * @param oldest the model before {@code older}, or null
     * @param oldestStep the step from {@code oldest} to {@code older}, s
     * @param olderGravRates the one-step eps_grav of the step from {@code older} to {@code previous} at the points
     *                       of {@code previous}, erg g^-1 s^-1, or null
     * @param previousLight the deuterium and 7Li rates of {@code previous} as the step that made it took them at
     *                      its end ({@link #lightElementsEnd}), or null
     * @param young before the zero-age main sequence: the composition update is trace-limited and the starting
     *              guess extrapolates in ln of the age ({@link #guessClock})
     */
    private Stepped advance(StellarModel previous, double age, StellarModel older, double olderStep,
                            StellarModel oldest, double oldestStep, double[] olderGravRates,
                            LightElementRates previousLight, double dt, boolean young) {
        CompositionStep burning = young ? youngNetwork : network;
        double[] cost = compositionCost(previous);
        MeshPlanner stepPlanner = plannerFor(previous, young);
        boolean remesh = stepPlanner.needsRemesh(previous, cost);
        StepStart start = StepStart.of(previous);
        if (remesh) {
            try {
                start = StepStart.remeshed(previous, stepPlanner, cost, physics);
            } catch (ConvgridException e) {
                // a redistribution that cannot be built (degenerate mesh) does not depend on the step length, so
                // halving the step would only burn the retry budget; the previous mesh is valid: keep it
                remesh = false;
            }
        }
        int n = start.state().size();
        // the light elements' rates of the start-of-step model, for their trapezoid in time (lightElementsEnd)
        double[] startRho = start.density();
        double[] startT = start.temperature();
        double[] rho = start.density().clone();
        double[] t = start.temperature().clone();
        // the slope from the step before is trusted only when that step was not much shorter than this one: after
        // the sliver that lands on a requested age, dt/olderStep reaches hundreds, and extrapolating that far
        // multiplies the solver's noise into an odd-even sawtooth of L (seen at 1 Msun after landing on 4.57 Gyr)
        boolean trusted = older != null && olderStep > 0.0 && dt <= MAX_EXTRAPOLATION_RATIO * olderStep;
        boolean sameMesh = trusted && !remesh && older.state().mesh() == previous.state().mesh();
        // across a remesh: the previous two models carried onto this step's mesh (for the network and, on the main
        // sequence, the starting guess)
        double[][] carriedNow = null;
        double[][] carriedBefore = null;
        // before the ZAMS the guess takes them with the outermost interval filled (see CarriedUnknowns.onto)
        double[][] filledNow = null;
        double[][] filledBefore = null;
        if (sameMesh) {
            double w = 0.5 * dt / olderStep;
            StellarProfile p = older.profile();
            for (int k = 0; k < n; k++) {
                rho[k] *= Math.pow(rho[k] / p.density(k), w);
                t[k] *= Math.pow(t[k] / p.temperature(k), w);
            }
        } else if (trusted) {
            // across a remesh (this step's, or the last one's) the same mid-step extrapolation, its slope from the two
            // models carried onto this step's mesh alike (also onto the larger mesh of the step that leaves
            // FullyConvectiveMesh). Without it every remeshed step burnt at the start-of-step rho and T, first order
            // in time, and which steps remesh changes with the number of points: on the main sequence, 1 Msun,
            // Z = 0.02, zero-age track, 0 / 0 / 28 / 136 / 145 of 146 steps remeshed at 500 / 700 / 1000 / 1400 /
            // 2000 points (while the planner's boundary cost was fixed), exhaustion at 9.723 / 9.735 / 9.866 / 9.988
            // / 9.990 Gyr without this, 9.723 / 9.735 / 9.743 / 9.744 / 9.746 with it; before the ZAMS (12-14 of the
            // 56 steps before 10 Myr remeshed), 1 Msun from birth, ZAMS at 39.04 / 38.24 / 38.30 / 39.11 / 38.28 Myr
            // without it, 38.32 / 38.32 / 38.29 / 38.27 / 38.32 with it at 500 / 700 / 1000 / 1400 / 2000 points
            // (MeshConvergenceProbe), and 38.33 / 38.04 / 37.81 Myr with every step limit x1 / x0.5 / x0.25 against
            // 39.75 / 38.23 / 37.82 without it (YoungStepAccuracyProbe). Since the light elements burn with the
            // trapezoid of start- and end-of-step rates (lightElementsEnd) this no longer moves the envelope's
            // lithium off its time-step limit (1 Msun log Li/Li0 at 1 Gyr -0.566 / -0.565 / -0.576 at those limits)
            double w = 0.5 * dt / olderStep;
            if (young) {
                CarriedUnknowns.BothWays now = CarriedUnknowns.bothWays(previous.state(), start.state().mesh());
                CarriedUnknowns.BothWays before = CarriedUnknowns.bothWays(older.state(), start.state().mesh());
                carriedNow = now.clamped();
                carriedBefore = before.clamped();
                filledNow = now.filled();
                filledBefore = before.filled();
            } else {
                carriedNow = CarriedUnknowns.onto(previous.state(), start.state().mesh(), false);
                carriedBefore = CarriedUnknowns.onto(older.state(), start.state().mesh(), false);
            }
            for (int k = 0; k < n; k++) {
                rho[k] *= Math.exp(w * (carriedNow[1][k] - carriedBefore[1][k]));
                t[k] *= Math.exp(w * (carriedNow[2][k] - carriedBefore[2][k]));
            }
        }
        MassMesh mesh = start.state().mesh();
        boolean[] mixed = AtmosphereMixing.joined(mesh,
                physics.overshoot().mixedPoints(mesh::mass, start.convective(), previous.profile()));
        // the light elements' rates in the step's zones (youngLightRates, startOfStepLightRates), before the
        // burning, which takes them from here instead of evaluating the network once more per point for them
        Composition[] startComp = start.state().compositions();
        double[] cellMass = LightElementRates.anyIn(startComp) ? PointCells.masses(mesh) : null;
        LightElementTrapezoid light = null;
        if (cellMass != null) {
            light = young
                    ? youngLightRates(previousLight, remesh, cellMass, mixed, startComp, rho, t, startRho, startT,
                            trusted, dt)
                    : new LightElementTrapezoid(startOfStepLightRates(previousLight, remesh, cellMass, mixed,
                            startComp, startRho, startT), dt);
        }
        Composition[] comp = burn(burning, start.state(), mixed, rho, t, dt, light == null ? null : light.used());
        if (settling) {
            // settling is driven by the previous structure; the zones it reaches are mixed again at once
            comp = ConvectiveMixing.mix(mesh, SettlingStep.apply(previous, mesh, remesh, comp, mixed, dt), mixed);
        }
        Optional<double[]> overshootDiffusion = physics.overshoot().diffusion(previous.profile(),
                physics.convection().alpha());
        if (overshootDiffusion.isPresent()) {
            double[] s = overshootDiffusion.get();
            comp = SemiconvectiveMixing.diffuse(mesh, comp, SemiconvectiveMixing.capped(mesh,
                    remesh ? SemiconvectiveMixing.onMesh(previous.profile(), s, mesh) : s, dt), dt);
        }
        double[] nablaMu = null;
        if (physics.criterion() == StabilityCriterion.LEDOUX) {
            double[] s = SemiconvectiveMixing.coefficients(previous, physics.eos(), SEMICONVECTION_EFFICIENCY);
            comp = SemiconvectiveMixing.diffuse(mesh, comp,
                    remesh ? SemiconvectiveMixing.onMesh(previous.profile(), s, mesh) : s, dt);
            nablaMu = MuGradient.of(comp, start.lnPressure());
        }
        GravothermalEnergy oneStep = GravothermalEnergy.since(start, dt);
        GravothermalEnergy kept = young ? oneStep : null;
        // before the ZAMS, the two-step eps_grav (second order in time, see YOUNG_TWO_STEP_RATIO)
        GravothermalEnergy grav = young && olderGravRates != null && olderStep > 0.0
                && dt <= YOUNG_TWO_STEP_RATIO * olderStep
                ? oneStep.withEarlierStep(CarriedUnknowns.valuesOnto(previous.state().mesh(), olderGravRates, mesh),
                        olderStep)
                : oneStep;
        // the guess's clock: ln(age) before the ZAMS, the age itself after it (see guessClock)
        double[] clock = young && older != null ? guessClock(age, olderStep, oldest == null ? 0.0 : oldestStep, dt)
                : null;
        double gOlder = clock == null ? olderStep : clock[0];
        double gOldest = clock == null ? oldestStep : clock[1];
        double gDt = clock == null ? dt : clock[2];
        ModelState guess = start.state().withCompositions(comp);
        HenyeySolver.Settings stepSettings = young ? youngSolveSettings : solveSettings;
        if (sameMesh) {
            try {
                // the curvature from a third model under the same trust rule as the slope
                boolean curved = oldest != null && oldest.state().mesh() == older.state().mesh()
                        && oldestStep > 0.0 && dt <= MAX_EXTRAPOLATION_RATIO * oldestStep;
                ModelState extrapolatedGuess = extrapolated(guess, older.state(), gOlder,
                        curved ? oldest.state() : null, gOldest, gDt, young);
                // also when the transient shows only in the steps the extrapolation goes through: the parabola through
                // models whose nuclear luminosity still fell with the 12C carries that fall on after the 12C has
                // settled (see withStepsNuclearLuminosity)
                if (!young && (burningTransient(startComp[0], comp[0])
                        || burningTransient(older.state().composition(0), previous.state().composition(0))
                        || curved && burningTransient(oldest.state().composition(0), older.state().composition(0)))) {
                    extrapolatedGuess = withStepsNuclearLuminosity(extrapolatedGuess, previous, older,
                            curved ? oldest : null, gOlder, gOldest, gDt);
                }
                return stepped(lightElementsEnd(solver.relax(extrapolatedGuess, grav, nablaMu, stepSettings,
                        start.eos(), start.curvature()), light), kept);
            } catch (SolveFailedException e) {
                // an extrapolation that overshoots (e.g. across a change of the convective zones) is no worse
                // than no extrapolation: fall back to the previous model as the guess
            }
        } else if (trusted) {
            // across a remesh (this step's or one of the last two): the same extrapolation with the older models
            // carried onto this step's mesh; before the ZAMS the planner remeshes every third step or so, and
            // without this the two steps after each remesh start from a copy and take 5-6 iterations instead of 3-4
            try {
                boolean curved = oldest != null && oldestStep > 0.0 && dt <= MAX_EXTRAPOLATION_RATIO * oldestStep;
                double[][] now = young ? filledNow : carriedNow;
                double[][] before = young ? filledBefore : carriedBefore;
                return stepped(lightElementsEnd(solver.relax(carried(guess, now, before, gOlder,
                        curved ? oldest.state() : null, gOldest, gDt, young), grav, nablaMu, stepSettings,
                        start.eos(), start.curvature()), light), kept);
            } catch (SolveFailedException e) {
                // as above: fall back to the previous model as the guess
            }
        }
        return stepped(lightElementsEnd(solver.relax(guess, grav, nablaMu, stepSettings, start.eos(),
                start.curvature()), light), kept);
    }

    /**
     * The light-element rates a step applied ({@code used}: before the ZAMS at the network's mid-step density and
     * temperature in the start-of-step zones, on the main sequence the start-of-step rates) and those of the
     * start-of-step model itself, for {@link #lightElementsEnd}.
     */
    private record LightElementTrapezoid(LightElementRates used, LightElementRates atStart, double dt) {

        /** A step whose network burnt the light elements at the start-of-step rates themselves. */
        LightElementTrapezoid(LightElementRates atStart, double dt) {
            this(atStart, atStart, dt);
        }
    }

    /**
     * Before the zero-age main sequence: the network burns deuterium and 7Li at the rates of its own mid-step
     * density and temperature ({@code rho}, {@code t}), and the trapezoid starts from the start-of-step rates at the
     * start-of-step rho and T whenever the network's were extrapolated: with the extrapolated rates in their place
     * on redistributed steps the trapezoid leant towards the end of the step and the envelope burnt too much
     * lithium (1 Msun, Z = 0.02, log Li/Li0 at 1 Gyr -0.71 / -0.59 / -0.58 with every step limit x1 / x0.5 / x0.25,
     * against -0.566 / -0.565 / -0.576; YoungStepAccuracyProbe). The start-of-step rates are the previous step's
     * end-of-step ones when the mesh is kept ({@link #startOfStepLightRates}).
     */
    private LightElementTrapezoid youngLightRates(LightElementRates previousLight, boolean remesh, double[] cellMass,
                                                  boolean[] mixed, Composition[] startComp, double[] rho,
                                                  double[] t, double[] startRho, double[] startT, boolean trusted,
                                                  double dt) {
        LightElementRates used = LightElementRates.of(physics.nuclear(), cellMass, mixed, startComp, rho, t);
        return new LightElementTrapezoid(used, trusted
                ? startOfStepLightRates(previousLight, remesh, cellMass, mixed, startComp, startRho, startT)
                : used, dt);
    }

    /**
     * The start-of-step rates of deuterium and 7Li: the previous step's end-of-step rates when this step keeps its
     * mesh, else evaluated. On the main sequence the network also burns the traces at them, so a step evaluates
     * the rates once (at its end, {@link #lightElementsEnd}) instead of three times. Why both are
     * sound: (1) whatever rates the network burns the traces at, {@link LightElementBurning#corrected} re-burns
     * them to the trapezoid mean of the start- and end-of-step rates, so their end abundances do not depend on
     * {@code used}; only the 1H, 3He and 4He the network sees during the step do, by the traces' own mass
     * (X_Li ~ 1e-8), far inside the network's tolerance. (2) Without a remesh the start of this step is the end
     * of the last: same mesh, mixed zones, density and temperature, and the composition differs only by that
     * step's trapezoid correction of the traces, which moves the capture rates (through X_H and the screening)
     * by a few parts in 1e16. Measured, 1 Msun, Z = 0.02: the light elements' rates were 2.5 % of the main
     * sequence's CPU from birth (0.015 of 0.58 s, three evaluations a step at ~330 points; thread CPU); with one
     * the exhaustion age moves from 3.087411862292e17 to 3.087411862291e17 s, the surface 7Li at exhaustion
     * (2.193252067494e-9) and the Newton iterations (635) not at all.
     */
    private LightElementRates startOfStepLightRates(LightElementRates previousLight, boolean remesh,
                                                    double[] cellMass, boolean[] mixed, Composition[] startComp,
                                                    double[] startRho, double[] startT) {
        if (!remesh && previousLight != null && previousLight.deuterium().length == startComp.length) {
            return previousLight;
        }
        return LightElementRates.of(physics.nuclear(), cellMass, mixed, startComp, startRho, startT);
    }

    /**
     * The converged end-of-step model with its deuterium and 7Li re-burnt at the trapezoid mean of the start- and
     * end-of-step rates, each model with its own mixed zones ({@link LightElementBurning#corrected}); unchanged when
     * the star holds neither ({@code light} null). The structure is not solved again: both are traces.
     */
    private EndOfStep lightElementsEnd(StellarModel end, LightElementTrapezoid light) {
        if (light == null) {
            return new EndOfStep(end, null);
        }
        // the density, temperature and convective flags alone, read from the profile (a StepStart would also copy
        // the pressures, energies and equation-of-state states, which the rates do not need)
        StellarProfile p = end.profile();
        MassMesh mesh = end.state().mesh();
        boolean[] mixed = AtmosphereMixing.joined(mesh,
                physics.overshoot().mixedPoints(mesh::mass, p.convectiveFlags(), p));
        Composition[] comp = end.state().compositions();
        LightElementRates atEnd = LightElementRates.of(physics.nuclear(), PointCells.masses(mesh), mixed, comp,
                p.densities(), p.temperatures());
        Composition[] corrected = LightElementBurning.corrected(comp, light.used(), light.atStart(), atEnd,
                light.dt());
        return new EndOfStep(new StellarModel(end.state().withCompositions(corrected), end.profile(), end.global(),
                end.convection(), end.report()), atEnd);
    }

    /**
     * A step's converged model, its light elements corrected, with the end-of-step light-element rates that
     * correction took (null when the star holds neither), which the next step takes as its start-of-step rates.
     */
    private record EndOfStep(StellarModel model, LightElementRates lightRates) {
    }

    /**
     * The planner of the step from {@code previous}: before the zero-age main sequence, while the star has no
     * radiative interior ({@link FullyConvectiveMesh#holds}), one that keeps the previous model's number of points
     * (the start model's, e.g. {@link FullyConvectiveMesh#POINTS}); then, while it contracts with a radiative core
     * ({@link RadiativeContractionMesh#holds}) on a mesh no larger, {@link RadiativeContractionMesh#POINTS} when
     * that is fewer than this evolver's; else this evolver's, whose size, when it differs, makes the step remesh
     * onto it. A track from the zero-age main sequence always has this evolver's planner.
     */
    private MeshPlanner plannerFor(StellarModel previous, boolean young) {
        int size = previous.state().size();
        if (!young || size == planner.points()) {
            return planner;
        }
        if (FullyConvectiveMesh.holds(previous)) {
            return size == FullyConvectiveMesh.POINTS ? FullyConvectiveMesh.planner() : new MeshPlanner(size);
        }
        boolean contracting = size <= RadiativeContractionMesh.POINTS
                && RadiativeContractionMesh.POINTS < planner.points() && RadiativeContractionMesh.holds(previous);
        return contracting ? RadiativeContractionMesh.planner() : planner;
    }

    /**
     * A step's model with the one-step eps_grav of the step at its points, for the two-step form of the next step
     * (null after the zero-age main sequence, where the one-step form holds), and its end-of-step light-element
     * rates ({@link EndOfStep}).
     */
    private record Stepped(StellarModel model, double[] gravRates, LightElementRates lightRates) {
    }

    private static Stepped stepped(EndOfStep end, GravothermalEnergy oneStep) {
        StellarModel model = end.model();
        return new Stepped(model, oneStep == null ? null : oneStep.oneStepRates(model.profile()), end.lightRates());
    }

    /**
     * The compositions after dt: each instantaneously mixed zone (a run of mixed points, convective or overshoot)
     * first homogenised ({@link ConvectiveMixing}, which also takes in material the zone has just engulfed) and
     * then burnt as one composition with the zone's mass-weighted rates ({@link CompositionStep#advanceMixed}),
     * every other point burnt on its own.
     */
    private static Composition[] burn(CompositionStep network, ModelState state, boolean[] mixed, double[] rho,
                                      double[] t, double dt, LightElementRates light) {
        int n = state.size();
        double[] w = PointCells.masses(state.mesh());
        Composition[] start = state.compositions();
        Composition[] comp = new Composition[n];
        // one {d, 7Li} pair refilled for every point or zone (the network reads it at once and keeps no reference)
        double[] captures = light == null ? null : new double[2];
        // one set of the network step's work arrays for the whole step (this thread's)
        CompositionStep.Workspace work = new CompositionStep.Workspace();
        int k = 0;
        while (k < n) {
            int end = ConvectiveMixing.runEnd(mixed, k);
            if (end == k) {
                comp[k] = network.advance(rho[k], t[k], start[k], dt, captures(light, k, captures), work);
            } else {
                Composition mean = ConvectiveMixing.mean(w, start, k, end);
                Composition burnt = network.advanceMixed(Arrays.copyOfRange(rho, k, end + 1),
                        Arrays.copyOfRange(t, k, end + 1), Arrays.copyOfRange(w, k, end + 1), mean, dt,
                        captures(light, k, captures), work);
                Arrays.fill(comp, k, end + 1, burnt);
            }
            k = end + 1;
        }
        return comp;
    }

    /**
     * The deuterium and 7Li destruction rates per unit abundance at point k (its zone's, the same as the network
     * gives there for the zone's composition), for {@link CompositionStep}, written into {@code pair}; null when
     * the star holds neither.
     */
    private static double[] captures(LightElementRates light, int k, double[] pair) {
        if (light == null) {
            return null;
        }
        pair[0] = light.deuterium()[k];
        pair[1] = light.lithium()[k];
        return pair;
    }

    /**
     * The steps olderStep, oldestStep and dt of the guess's extrapolation ({@link #extrapolated}) measured in ln of
     * the age instead of the age, or null when the oldest model used is the start model (age 0). Before the zero-age
     * main sequence the contraction is close to a power law of the age (on the Hayashi track R ~ t^(-1/3) and
     * L ~ t^(-2/3): a fully convective star radiating its binding energy at nearly fixed T_eff; Kippenhahn, Weigert
     * &amp; Weiss 2012, ch. 28, from memory) and the steps grow with the age (dt/t 0.1-0.4 from 1e4 yr to a few Myr
     * at 1 Msun), so a parabola in ln t follows the unknowns where a parabola in t misses the curvature. Measured at
     * 1 Msun, Z = 0.02, birth to core-hydrogen exhaustion (BirthStepLimitProbe): 740 -> 731 Newton iterations, every
     * step the same; the guess changes only the work, not the solution (first model past the ZAMS and exhaustion age
     * within 3e-10, surface 7Li at exhaustion within 5e-9, relative).
     *
     * @param age the age of the previous model, s
     * @param olderStep the step before, s
     * @param oldestStep the step before that, s (0 when there is none)
     * @param dt this step, s
     */
    private static double[] guessClock(double age, double olderStep, double oldestStep, double dt) {
        double firstAge = age - olderStep - oldestStep;
        if (!(firstAge > 1.0e-6 * age)) {
            return null;
        }
        double lnOlder = Math.log(age - olderStep);
        return new double[] {Math.log(age) - lnOlder, oldestStep > 0.0 ? lnOlder - Math.log(firstAge) : 0.0,
                Math.log(age + dt) - Math.log(age)};
    }

    /**
     * The starting guess of a step: the unknowns of the previous model ({@code previous}, with the step's
     * composition) extrapolated in time by dt through the model before it ({@code older}, olderStep earlier) and,
     * when given, the one before that ({@code oldest}, oldestStep before {@code older}): the parabola through the
     * three in Newton's divided-difference form, or the line through the two (before the zero-age main sequence,
     * {@code isotherms}: in the outer layers along isotherms, {@link IsothermExtrapolation}). All share a mesh.
     * The structure drifts smoothly on the main sequence, so this removes the first- and second-order parts of the
     * change: with the line the first Newton correction of a 1 Msun track is ~4e-4 and every step takes three
     * iterations, with the parabola most take two (measured).
     */
    private static ModelState extrapolated(ModelState previous, ModelState older, double olderStep,
                                           ModelState oldest, double oldestStep, double dt, boolean isotherms) {
        double[][] now = {previous.lnRadii(), previous.lnDensities(), previous.lnTemperatures(),
                previous.luminosities()};
        double[][] before = {older.lnRadii(), older.lnDensities(), older.lnTemperatures(), older.luminosities()};
        double[][] first = oldest == null ? null : new double[][] {oldest.lnRadii(), oldest.lnDensities(),
                oldest.lnTemperatures(), oldest.luminosities()};
        addExtrapolatedChange(now, now, before, first, olderStep, oldestStep, dt,
                isotherms ? previous.mesh() : null);
        return new ModelState(previous.mesh(), previous.compositions(), now[0], now[1], now[2], now[3]);
    }

    /**
     * Whether the step's composition update changed the central 12C by more than {@link #TRANSIENT_CARBON_CHANGE}
     * in ln: the CN cycle still burning the 12C the pre-main sequence left towards its equilibrium.
     */
    private static boolean burningTransient(Composition before, Composition after) {
        return before.c12() > 0.0 && after.c12() > 0.0
                && Math.abs(Math.log(after.c12() / before.c12())) > TRANSIENT_CARBON_CHANGE;
    }

    /**
     * The guess with its luminosity's nuclear part taken from this step's composition instead of extrapolated:
     * L = extrapolated (L - L_nuc) + L_nuc of the guess's rho and T with the step's composition, L_nuc(m) the
     * integral of eps_nuc to m by the structure's own trapezoid. Why: on arrival from the pre-main sequence the
     * central 12C is out of CN equilibrium (3e-3 against 8e-6, 1 Msun) and falls by a factor 1.4-3 per step for
     * a dozen steps; the energy it releases follows it, which no polynomial in time through the last models does,
     * so the first Newton correction of the core's L was 3-9 % (1e-3 on the zero-age track) and each of those
     * steps took 4 iterations instead of 3. Measured, 1 Msun, Z = 0.02 from birth: the first correction of the
     * 5th-10th main-sequence steps 6-9e-2 -> 2e-3-1e-2, 4 -> 3 iterations each (main sequence 360 -> 354; 500
     * network calls in each of the ~10 steps it runs, a fifth of one Newton iteration's work); the 1st-4th keep 4
     * (their first correction lies elsewhere: envelope density, surface L). The 11th and 12th, the first two after
     * the central 12C has settled, take it too because the parabola through models whose L_nuc still fell carried
     * that fall on (first correction 1.5e-2 and 4.4e-3 in L near the centre -> 1.2e-3 and 8e-4, 4 -> 3 iterations
     * each; main sequence 355 -> 353). Tried and not kept: the test on the 12C of every point instead of the
     * centre holds at every step of both tracks (the core's edge burns its 12C all along): birth 360 -> 352, the
     * zero-age track 345 -> 346, at 500 network calls a step. A guess the network cannot evaluate is left as it
     * was. All models share the guess's mesh.
     */
    private ModelState withStepsNuclearLuminosity(ModelState guess, StellarModel previous, StellarModel older,
                                                  StellarModel oldest, double olderStep, double oldestStep,
                                                  double dt) {
        MassMesh mesh = guess.mesh();
        int n = guess.size();
        double[] eps = new double[n];
        try {
            for (int k = 0; k < n; k++) {
                eps[k] = physics.nuclear().burn(Math.exp(guess.lnDensity(k)), Math.exp(guess.lnTemperature(k)),
                        guess.composition(k)).eps();
            }
        } catch (ConvgridException e) {
            return guess;
        }
        double[][] extrapolatedNuclear = {nuclearLuminosity(mesh, previous.profile())};
        addExtrapolatedChange(extrapolatedNuclear, extrapolatedNuclear,
                new double[][] {nuclearLuminosity(mesh, older.profile())},
                oldest == null ? null : new double[][] {nuclearLuminosity(mesh, oldest.profile())}, olderStep,
                oldestStep, dt, null);
        double[] now = nuclearLuminosity(mesh, eps);
        double[] lum = guess.luminosities();
        for (int k = 0; k < n; k++) {
            lum[k] += now[k] - extrapolatedNuclear[0][k];
        }
        return new ModelState(mesh, guess.compositions(), guess.lnRadii(), guess.lnDensities(),
                guess.lnTemperatures(), lum);
    }

    private static double[] nuclearLuminosity(MassMesh mesh, StellarProfile profile) {
        double[] eps = new double[profile.size()];
        for (int k = 0; k < eps.length; k++) {
            eps[k] = profile.eps(k);
        }
        return nuclearLuminosity(mesh, eps);
    }

    /** The integral of eps to each point, as the structure's luminosity equation sums it. */
    private static double[] nuclearLuminosity(MassMesh mesh, double[] eps) {
        double[] out = new double[eps.length];
        out[0] = eps[0] * mesh.mass(0);
        for (int k = 0; k < eps.length - 1; k++) {
            out[k + 1] = out[k] + 0.5 * (eps[k] + eps[k + 1]) * mesh.intervalMass(k);
        }
        return out;
    }

    /**
     * As {@link #extrapolated}, when the models do not all share the mesh of {@code guess} (the previous model,
     * possibly remeshed, with the step's composition): each is carried onto that mesh ({@link CarriedUnknowns}; its
     * outermost interval filled before the zero-age main sequence, {@code isotherms}) and the extrapolated change of
     * the carried values is added to the guess's own unknowns.
     *
     * @param now the previous model's unknowns carried onto the mesh of {@code guess} (read only)
     * @param before the older model's, likewise
     */
    private static ModelState carried(ModelState guess, double[][] now, double[][] before, double olderStep,
                                      ModelState oldest, double oldestStep, double dt, boolean isotherms) {
        MassMesh mesh = guess.mesh();
        double[][] first = oldest == null ? null : CarriedUnknowns.onto(oldest, mesh, isotherms);
        double[][] unknowns = {guess.lnRadii(), guess.lnDensities(), guess.lnTemperatures(), guess.luminosities()};
        addExtrapolatedChange(unknowns, now, before, first, olderStep, oldestStep, dt, isotherms ? mesh : null);
        return new ModelState(mesh, guess.compositions(), unknowns[0], unknowns[1], unknowns[2], unknowns[3]);
    }

    /**
     * Adds to {@code target} the change over dt of the line through {@code before} (olderStep earlier) and
     * {@code now}, or, when {@code first} (oldestStep before {@code before}) is given, of the parabola through the
     * three in Newton's divided-difference form. {@code target} may be {@code now} itself: each value is read
     * before it is written. With {@code isotherms} (the mesh all share; before the zero-age main sequence) the
     * outer layers take the change along isotherms instead ({@link IsothermExtrapolation}).
     */
    private static void addExtrapolatedChange(double[][] target, double[][] now, double[][] before,
                                              double[][] first, double olderStep, double oldestStep, double dt,
                                              MassMesh isotherms) {
        double[][] base = null;
        double[][] then = now;
        if (isotherms != null) {
            base = copy(target);
            then = copy(now);
        }
        for (int v = 0; v < target.length; v++) {
            for (int k = 0; k < target[v].length; k++) {
                double slope = (now[v][k] - before[v][k]) / olderStep;
                double curvature = first == null ? 0.0
                        : (slope - (before[v][k] - first[v][k]) / oldestStep) / (olderStep + oldestStep);
                target[v][k] += dt * slope + dt * (dt + olderStep) * curvature;
            }
        }
        if (isotherms != null) {
            IsothermExtrapolation.apply(target, base, then, before, first, isotherms, olderStep, oldestStep, dt);
        }
    }

    private static double[][] copy(double[][] values) {
        double[][] out = new double[values.length][];
        for (int v = 0; v < values.length; v++) {
            out[v] = values[v].clone();
        }
        return out;
    }

    /**
     * |D X| / {@link #COMPOSITION_MESH_STEP} per interval, at most D(m/M) / {@link #COMPOSITION_MESH_RESOLUTION}:
     * the mesh cost of composition gradients. Without the cap a jump in X (left where a convective zone stopped
     * mixing, e.g. at the edge of the receding core of a massive star) costs the same however narrow the interval
     * holding it, so every remesh packs points into it and the interval shrinks geometrically until two points
     * coincide in double precision (seen at 15 Msun: D(m/M) 7e-12, 3e-13, 1e-14, 2e-15, then a mesh that is not
     * increasing). With the cap a discontinuity is resolved down to a few times that width and no further; smooth
     * gradients (|dX/d(m/M)| far below 0.01/1e-5 = 1000) are untouched.
     */
    private static double[] compositionCost(StellarModel model) {
        StellarProfile p = model.profile();
        MassMesh mesh = model.state().mesh();
        double[] cost = new double[p.size() - 1];
        for (int k = 0; k < cost.length; k++) {
            double width = mesh.fraction(k + 1) - mesh.fraction(k);
            cost[k] = Math.min(Math.abs(p.hydrogen(k + 1) - p.hydrogen(k)) / COMPOSITION_MESH_STEP,
                    width / COMPOSITION_MESH_RESOLUTION);
        }
        return cost;
    }

    /** The largest change of a pre-main-sequence step over its limit ({@link PreMainSequenceLimits}). */
    private double youngRatio(StellarModel current, StellarModel trial, double startDeuterium,
                              double startLithium) {
        var a = current.global();
        var b = trial.global();
        double f = NuclearLuminosity.fraction(current);
        boolean centre = convectiveCentre(current);
        double ratio = Math.max(Math.abs(Math.log(b.radius() / a.radius()))
                        / youngLimits.structureLimit(youngLimits.maxRadiusChange(), f, centre),
                Math.abs(Math.log(b.centralTemperature() / a.centralTemperature()))
                        / youngLimits.structureLimit(youngLimits.maxCentralTemperatureChange(), f, centre));
        double d = current.state().composition(0).h2();
        if (d > PreMainSequenceLimits.DEUTERIUM_FLOOR * startDeuterium && d > 0.0) {
            double burnt = (d - trial.state().composition(0).h2()) / d;
            ratio = Math.max(ratio, burnt / youngLimits.maxDeuteriumBurnt());
        }
        double li = surfaceLithium(current);
        if (li > PreMainSequenceLimits.LITHIUM_FLOOR * startLithium && li > 0.0) {
            double burnt = (li - surfaceLithium(trial)) / li;
            ratio = Math.max(ratio, burnt / youngLimits.maxLithiumBurnt());
        }
        return ratio;
    }

    /**
     * The largest |D ln X| of the central 12C and 3He over the step and |D ln(1 - L_nuc/L)|, each over its limit
     * ({@link PreMainSequenceLimits#maxCentralBurningChange()}, {@link
     * PreMainSequenceLimits#maxContractionShareChange()}); it paces the next step only. The contraction's share
     * counts only once the central deuterium is below {@link PreMainSequenceLimits#DEUTERIUM_FLOOR} of its start:
     * while it burns, L_nuc/L rises to ~0.8 and falls back within ~2e5 yr at 1 Msun, and the deuterium limit already
     * paces that (the share spent ~30 steps there, measured with BirthStepLimitProbe, without moving the ZAMS age).
     */
    private double pacingRatio(StellarModel before, StellarModel after, double startDeuterium) {
        Composition a = before.state().composition(0);
        Composition b = after.state().composition(0);
        double change = 0.0;
        if (a.c12() > 0.0 && b.c12() > 0.0) {
            change = Math.abs(Math.log(b.c12() / a.c12()));
        }
        if (a.he3() > 0.0 && b.he3() > 0.0) {
            change = Math.max(change, Math.abs(Math.log(b.he3() / a.he3())));
        }
        if (before.state().composition(0).h2() > PreMainSequenceLimits.DEUTERIUM_FLOOR * startDeuterium) {
            return change / youngLimits.maxCentralBurningChange();
        }
        double floor = 1.0 - NuclearLuminosity.ZERO_AGE_FRACTION;
        double shareBefore = Math.max(1.0 - NuclearLuminosity.fraction(before), floor);
        double shareAfter = Math.max(1.0 - NuclearLuminosity.fraction(after), floor);
        return Math.max(change / youngLimits.maxCentralBurningChange(),
                Math.abs(Math.log(shareAfter / shareBefore)) / youngLimits.maxContractionShareChange());
    }

    /** Whether the centre is convective (nabla_rad above the stability limit there). */
    private static boolean convectiveCentre(StellarModel model) {
        return model.profile().stabilityExcess(0) > 0.0;
    }

    /** 7Li mass fraction at the surface (the convective envelope's, {@link SurfaceComposition}). */
    private static double surfaceLithium(StellarModel model) {
        return SurfaceComposition.of(model).li7();
    }

    /** G M^2/(R L), s. */
    private static double kelvinHelmholtzTime(StellarModel model) {
        var g = model.global();
        return Constants.G * model.mass() * model.mass() / (g.radius() * g.luminosity());
    }

    private double firstStep(StellarModel zeroAge) {
        return Math.min(burningStep(zeroAge), ZERO_AGE_FIRST_STEP_CAP);
    }

    /** {@link #FIRST_STEP_FRACTION} of the step in which the central burning rate uses the X_c change allowed. */
    private double burningStep(StellarModel model) {
        StellarProfile p = model.profile();
        double rate = Math.abs(physics.nuclear().burn(p.density(0), p.temperature(0),
                model.state().composition(0)).dh1Dt());
        return FIRST_STEP_FRACTION * settings.maxCentralHydrogenChange() / Math.max(rate, 1.0e-30);
    }

    /** Fraction of the step at which X_c crossed {@code end}, interpolated in ln X_c (linear if X_c hit 0). */
    private static double crossing(double before, double after, double end) {
        if (after <= 0.0) {
            return (before - end) / (before - after);
        }
        return Math.log(before / end) / Math.log(before / after);
    }

    private List<AgedModel> answers(double[] ages, List<Double> landedAges, List<StellarModel> landed,
                                    EvolutionResult.EndReason end, double endAge, String detail) {
        List<AgedModel> out = new ArrayList<>();
        for (double a : ages) {
            int i = landedAges.indexOf(a);
            if (i >= 0 && landed.get(i).global().centralHydrogen() >= settings.endCentralHydrogen()) {
                out.add(new AgedModel(a, ModelStatus.OK, landed.get(i), ""));
            } else if (i >= 0 || end == EvolutionResult.EndReason.HYDROGEN_EXHAUSTED) {
                out.add(new AgedModel(a, ModelStatus.PAST_MAIN_SEQUENCE, null, String.format(
                        "core hydrogen exhausted (X_c < %.3g) by %.4g Gyr", settings.endCentralHydrogen(),
                        endAge / Constants.GYR)));
            } else if (end == EvolutionResult.EndReason.AGE_LIMIT) {
                out.add(new AgedModel(a, ModelStatus.FAILED, null, String.format(
                        "age beyond the evolution limit of %.4g Gyr", settings.maxAge() / Constants.GYR)));
            } else {
                out.add(new AgedModel(a, ModelStatus.NOT_CONVERGED, null, String.format(
                        "evolution stopped at %.4g Gyr: %s", endAge / Constants.GYR, detail)));
            }
        }
        return out;
    }

    /**
     * The track row of a model. Its Pi_0 reads the equation-of-state values the solve left on the model: ~20 us per
     * step once compiled (1.5 Msun at 1 Gyr); 0.24 % of the demo grid's CPU samples (JFR, 9 of 3687).
     */
    private EvolutionStep summary(StellarModel model, double age, double dt, int iterations) {
        StellarProfile p = model.profile();
        double top = 0.0;
        for (int k = 0; k < p.size(); k++) {
            top = Math.max(top, p.eps(k));
        }
        double inner = Double.NaN;
        double outer = Double.NaN;
        double mass = model.mass();
        for (int k = 0; k < p.size(); k++) {
            if (top > 0.0 && p.eps(k) >= BURNING_THRESHOLD * top) {
                if (Double.isNaN(inner)) {
                    inner = k == 0 ? 0.0 : p.mass(k) / mass;
                }
                outer = p.mass(k) / mass;
            }
        }
        var g = model.global();
        return new EvolutionStep(age, dt, g.luminosity(), g.radius(), g.effectiveTemperature(),
                g.centralTemperature(), g.centralDensity(), g.centralHydrogen(), model.convection().zones(), inner,
                outer, iterations, ModelSeismicScales.of(model),
                physics.overshoot().mixedCoreTop(model.profile()) / mass, model.convection().turnoverTimeLocal(),
                model.convection().turnoverTimeGlobal(), g.momentOfInertia(), g.envelopeMomentOfInertia());
    }
}
