package org.convgrid.engine.physics.eos;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.state.MetalMixture;
import org.convgrid.engine.units.Constants;

/**
 * The default equation of state for main-sequence stars: ideal ions (and neutral atoms) + black-body radiation +
 * non-relativistic electrons of arbitrary degeneracy (Fermi-Dirac integrals) + ionisation equilibrium of H,
 * He and the metals + pressure ionisation + a Coulomb correction.
 *
 * <p><b>Ionisation.</b> Saha with the degeneracy-aware electron factor, n_{r+1}/n_r = (U_{r+1}/U_r)
 * exp(-eta - chi_r/kT) (the coupling used by Eggleton, Faulkner &amp; Flannery 1973, A&amp;A 23, 325), with
 * ground-state partition functions (hydrogen's with its Planck-Larkin renormalisation, see {@link PlasmaPoint}, so
 * that hydrogen is fully ionised in hot gas); metals as described in {@link PlasmaElements}. eta is found from charge
 * neutrality by safeguarded Newton iteration on ln n_e(FD) - ln n_e(ions), which is monotonic in eta.
 *
 * <p><b>Molecular hydrogen.</b> Below {@link MolecularHydrogen#MAX_TEMPERATURE} neutral hydrogen atoms pair into
 * H2 by the law of mass action of {@link MolecularHydrogen}; molecules count as one particle in P, and carry
 * their binding (-D0) and rotation-vibration energy in u. This is what lowers nabla_ad and mu in M-dwarf envelopes
 * below ~4000 K (from memory; cf. Saumon, Chabrier &amp; van Horn 1995, ApJS 99, 713). Above that temperature
 * molecules are skipped altogether.
 *
 * <p><b>Pressure ionisation.</b> Occupation probabilities in the spirit of Hummer &amp; Mihalas 1988 (ApJ 331, 794):
 * the weight of every bound state is multiplied by w = exp(-(4 pi/3) r^3 n_nuc), a hard-sphere term with all nuclei
 * as point perturbers (the simplest form of their neutral-perturber term; the charged-microfield term is omitted).
 * Because w depends on density only through n_nuc, the free energy is F_ideal + kT sum_s N_s xi_s with
 * xi_s = -ln w_s, and consistency requires the extra pressure kT sum_s n_s xi_s (and no extra energy), which is
 * included. Bound hydrogen (r = 1.5 a_0) disappears near rho ~ 1-10 g cm^-3, so M-dwarf interiors are ionised.
 *
 * <p><b>Coulomb.</b> Chabrier &amp; Potekhin 1998 one-component-plasma free energy (see {@link CoulombPlasma}) per
 * nucleus, at an effective coupling whose Debye-Huckel limit equals the full Debye-Huckel correction with ion and
 * (partially degenerate) electron screening (Landau &amp; Lifshitz, Statistical Physics, par. 78-79); so it is
 * Debye-Huckel at small Gamma and saturates like the OCP (~ -0.9 Gamma) at large Gamma instead of diverging. The
 * ions' sum n_j Z_j^2 is approximated by z2 n_e with z2 = sum Y_j Z_j^2 / sum Y_j Z_j at full ionisation, so the term
 * depends on the state only through the free-electron density: it vanishes in neutral gas, and its chemical potential
 * dF_C/dN_e enters the Saha balance (a Debye-type lowering of every ionisation potential), which keeps P and u
 * exactly consistent.
 *
 * <p><b>Energy zero</b>: neutral atoms at rest, so u includes the ionisation energy. <b>Derivatives</b>: implicit
 * differentiation of the neutrality condition, d eta = -(dR/dx)/(dR/d eta) dx, with partial derivatives at fixed
 * eta taken analytically from the closed-form P, u and R (see {@link PlasmaPoint}; no re-solve, so no solver noise);
 * the remaining quantities follow from the thermodynamic identities (Cox &amp; Giuli 1968; Kippenhahn,
 * Weigert &amp; Weiss 2012, ch. 4 and 6). Thread-safe: the only mutable state is per thread, a
 * one-entry cache of composition constants and a scratch point, neither of which ever changes a result.
 */
public final class StellarPlasmaEos implements EquationOfState {

    /** Newton budget of the neutrality solve. */
    public static final int SOLVE_BUDGET = 100;
    /** Convergence of the neutrality solve: |d eta| below this. */
    public static final double ETA_TOLERANCE = 1.0e-11;
    /**
     * Also converged when |ln n_e(FD) - ln n_e(ions)| is below this: the residual is then at its rounding floor, and
     * where its eta-slope is small that floor alone can keep the Newton step just above {@link #ETA_TOLERANCE}.
     */
    static final double RESIDUAL_TOLERANCE = 1.0e-13;
    /** Domain: density, g cm^-3. */
    public static final double MIN_DENSITY = 1.0e-16;
    public static final double MAX_DENSITY = 1.0e7;
    /** Domain: temperature, K. */
    public static final double MIN_TEMPERATURE = 5.0e2;
    public static final double MAX_TEMPERATURE = 1.0e9;
    private static final double MAX_NEWTON_STEP = 30.0;
    /** Below this starting eta the electrons are treated as non-degenerate for the ionisation-aware guess. */
    private static final double NON_DEGENERATE = -2.0;
    /** Re-reference the Saha constants when eta moves this far (see PlasmaPoint.LN_CLIP). */
    private static final double REREFERENCE = 100.0;

    private final PlasmaElements elements;
    private final boolean pressureIonisation;
    private final boolean coulombCorrection;
    /** Per thread, the constants of the last composition that thread used and a scratch point (see {@link #point}). */
    private final ThreadLocal<Scratch> scratch = ThreadLocal.withInitial(this::newScratch);

    /** Grevesse &amp; Sauval 1998 metals, pressure ionisation and Coulomb correction on. */
    public StellarPlasmaEos() {
        this(MetalMixture.GS98, true, true);
    }

    /**
     * @param mixture metal mixture (every element must have ionisation data)
     * @param pressureIonisation include the occupation-probability term
     * @param coulombCorrection include the Coulomb correction
     */
    public StellarPlasmaEos(MetalMixture mixture, boolean pressureIonisation, boolean coulombCorrection) {
        this.elements = new PlasmaElements(mixture);
        this.pressureIonisation = pressureIonisation;
        this.coulombCorrection = coulombCorrection;
    }

    /** Ideal plasma with Saha ionisation only: no pressure ionisation and no Coulomb term. */
    public static StellarPlasmaEos idealSaha() {
        return new StellarPlasmaEos(MetalMixture.GS98, false, false);
    }

    @Override
    public EosState atDensity(double density, double temperature, Composition composition) {
        checkDomain(density, temperature);
        return coldStart(point(composition), density, temperature);
    }

    /**
     * Starts the neutrality solve at the degeneracy of {@code nearby} carried to (rho, T) with its own slopes of eta:
     * next to a solved point the Newton iteration needs one or two steps instead of the five to ten from the fully
     * ionised guess (see {@link #nearbyGuess}).
     */
    @Override
    public EosState atDensity(double density, double temperature, Composition composition, EosState nearby) {
        checkDomain(density, temperature);
        return nearbyStart(point(composition), density, temperature, nearby);
    }

    /**
     * The composition constants made once for every call of the answer (where {@link #point}'s one-entry cache
     * would remake them at each point of a structure solve whose neighbouring shells differ in composition:
     * 26 MB of the 325 MB a 1 Msun zero-age track allocated); the calls use this thread's scratch point.
     */
    @Override
    public EosAtComposition atComposition(Composition composition) {
        PlasmaComposition constants = new PlasmaComposition(elements, composition);
        return (density, temperature, nearby) -> {
            checkDomain(density, temperature);
            PlasmaPoint p = scratch.get().point.use(constants);
            return nearby == null ? coldStart(p, density, temperature)
                    : nearbyStart(p, density, temperature, nearby);
        };
    }

    private static EosState coldStart(PlasmaPoint p, double density, double temperature) {
        solve(p, density, temperature, fullyIonisedEta(p, density, temperature));
        return state(p);
    }

    private static EosState nearbyStart(PlasmaPoint p, double density, double temperature, EosState nearby) {
        double guess = withinEtaLimits(nearbyGuess(density, temperature, nearby));
        if (!Double.isFinite(guess)) {
            return coldStart(p, density, temperature);
        }
        p.prepare(density, temperature, guess);
        iterate(p, density, temperature, guess);
        return state(p);
    }

    /**
     * The eta of {@code nearby} moved to (rho, T) along its tangent, eta + (d eta/d ln rho) d ln rho + (d eta/d ln T)
     * d ln T: its error is second order in the move, so a point perturbed by 1e-6 in ln rho or ln T (the structure
     * solver's differenced Jacobian) starts within ~1e-12 of its root and converges at the first Newton step, and
     * a point moved by a structure iteration (1e-3 to 1e-2) needs one step fewer than from the bare eta. Where the
     * state does not give the slopes (another equation of state's), or the carry is not finite, its bare eta.
     */
    static double nearbyGuess(double density, double temperature, EosState nearby) {
        double eta = nearby.eta();
        // a differenced neighbour moves in rho or in T only: the other logarithm is zero, and costs nothing
        double lnRhoMove = density == nearby.density() ? 0.0 : Math.log(density / nearby.density());
        double lnTMove = temperature == nearby.temperature() ? 0.0 : Math.log(temperature / nearby.temperature());
        double carried = eta + nearby.dEtaDlnRho() * lnRhoMove + nearby.dEtaDlnT() * lnTMove;
        return Double.isFinite(carried) ? carried : eta;
    }

    @Override
    public EosState atPressure(double pressure, double temperature, Composition composition) {
        double radiation = radiationBelow(pressure, temperature);
        PlasmaPoint p = point(composition);
        // Ideal fully ionised gas as the first guess (the inversion brackets and corrects it).
        double guess = (pressure - radiation) * Constants.M_U
                / (Constants.K_B * temperature * (p.nuclei() + p.electronsFullyIonised()));
        guess = Math.max(MIN_DENSITY, Math.min(MAX_DENSITY, guess));
        return DensityInversion.invert(new WarmStart(p, temperature), pressure, temperature, guess);
    }

    /**
     * Starts the inversion at the density of {@code nearby} carried to this pressure and temperature with its own
     * chi_rho and chi_T, and the first neutrality solve at its degeneracy: along an atmosphere integration, whose
     * consecutive points lie close, that saves about half the forward evaluations of the ideal-gas start.
     */
    /**
     * Largest change of ln rho a nearby state is carried over by {@link #atPressure(double, double, Composition,
     * EosState)}; beyond it (or where partial ionisation makes chi_rho small) the linear carry can land far from the
     * solution, where the neutrality solve of a cool dense guess fails, so the ideal-gas start is used instead.
     */
    static final double MAX_NEARBY_STEP = 0.5;

    @Override
    public EosState atPressure(double pressure, double temperature, Composition composition, EosState nearby) {
        radiationBelow(pressure, temperature);
        double step = (Math.log(pressure / nearby.pressure())
                - nearby.chiT() * Math.log(temperature / nearby.temperature())) / nearby.chiRho();
        if (!(nearby.chiRho() > 0.0 && Math.abs(step) <= MAX_NEARBY_STEP && Double.isFinite(nearby.eta()))) {
            // too far for the linear carry (or a state that cannot say): the ideal-gas start is the safer one
            return atPressure(pressure, temperature, composition);
        }
        double lnRho = Math.log(nearby.density()) + step;
        double guess = Math.max(MIN_DENSITY, Math.min(MAX_DENSITY, Math.exp(lnRho)));
        // the first neutrality solve from the degeneracy of nearby carried to the guess along its own slopes
        double eta = withinEtaLimits(nearbyGuess(guess, temperature, nearby));
        return DensityInversion.invert(new WarmStart(point(composition), temperature, Math.log(guess), eta),
                pressure, temperature, guess);
    }

    /** The radiation pressure at {@code temperature}, K, after checking that {@code pressure} exceeds it. */
    private static double radiationBelow(double pressure, double temperature) {
        ConvgridException.requireInRange("temperature", temperature, MIN_TEMPERATURE, MAX_TEMPERATURE, "K");
        double radiation = Constants.A_RAD * Math.pow(temperature, 4) / 3.0;
        if (!(pressure > radiation)) {
            throw new ConvgridException(ErrorKind.OUT_OF_RANGE, String.format(
                    "pressure %s dyn cm^-2 does not exceed the radiation pressure %s dyn cm^-2 at T = %s K",
                    pressure, radiation, temperature), "pressure", pressure, radiation, Double.MAX_VALUE);
        }
        return radiation;
    }

    /** The ionisation equilibrium at (rho, T): degeneracy, H and He ionisation fractions, free electrons. */
    public IonisationState ionisation(double density, double temperature, Composition composition) {
        checkDomain(density, temperature);
        PlasmaPoint p = point(composition);
        solve(p, density, temperature, fullyIonisedEta(p, density, temperature));
        return new IonisationState(p.lastEta, p.hydrogenIonised, p.heliumSingle, p.heliumDouble, p.electrons);
    }

    /** Fraction of the hydrogen nuclei bound in H2 at (rho, T) (see {@link MolecularHydrogen}). */
    public double molecularHydrogenFraction(double density, double temperature, Composition composition) {
        checkDomain(density, temperature);
        PlasmaPoint p = point(composition);
        solve(p, density, temperature, fullyIonisedEta(p, density, temperature));
        return p.hydrogenMolecular;
    }

    /**
     * This thread's scratch point, set to this composition; the composition constants are reused while a thread's
     * consecutive calls share a composition (a one-entry cache per thread, so threads never contend for it; the
     * constants are a pure function of the composition, and every scratch field is overwritten before it is read,
     * so no result depends on what the cache holds). One call uses the point at a time: nothing in this class
     * calls out while it holds it.
     */
    private PlasmaPoint point(Composition composition) {
        Scratch s = scratch.get();
        PlasmaComposition constants = s.constants;
        // the same object first: a record's equals compares all nine fractions even then
        if (constants == null || constants.composition != composition && !constants.composition.equals(composition)) {
            constants = new PlasmaComposition(elements, composition);
            s.constants = constants;
        }
        return s.point.use(constants);
    }

    private Scratch newScratch() {
        return new Scratch(new PlasmaPoint(elements, pressureIonisation, coulombCorrection));
    }

    /** One thread's reusable working space. */
    private static final class Scratch {
        private final PlasmaPoint point;
        private PlasmaComposition constants;

        Scratch(PlasmaPoint point) {
            this.point = point;
        }
    }

    private static void checkDomain(double density, double temperature) {
        ConvgridException.requireInRange("density", density, MIN_DENSITY, MAX_DENSITY, "g cm^-3");
        ConvgridException.requireInRange("temperature", temperature, MIN_TEMPERATURE, MAX_TEMPERATURE, "K");
    }

    static double fullyIonisedEta(PlasmaPoint p, double density, double temperature) {
        return initialEta(p.electronsFullyIonised() * density
                / (Constants.M_U * PlasmaPoint.ELECTRON_DENSITY_CONSTANT * Math.pow(temperature, 1.5)));
    }

    /** The state of a solved point: partials at fixed eta combined by implicit differentiation of neutrality. */
    private static EosState state(PlasmaPoint p) {
        double pressure = p.pressure;
        double perPressure = 1.0 / pressure;
        double perSlope = 1.0 / p.residualSlope;
        double dEtaDlnRho = -p.residualRho * perSlope;
        double dEtaDlnT = -p.residualT * perSlope;
        double chiRho = (p.pressureRho + p.pressureEta * dEtaDlnRho) * perPressure;
        double chiT = (p.pressureT + p.pressureEta * dEtaDlnT) * perPressure;
        double cv = (p.energyT + p.energyEta * dEtaDlnT) / p.temperature;
        return ThermoIdentities.complete(p.density, p.temperature, pressure, p.energy, chiRho, chiT, cv,
                1.0 / (p.heavyParticles + p.electrons), p.electrons, p.lastEta,
                (pressure - p.radiationPressure) * perPressure, dEtaDlnRho, dEtaDlnT);
    }

    /** Solves charge neutrality at (rho, T) from etaGuess and completes P, u and the partials at the root. */
    static void solve(PlasmaPoint p, double density, double temperature, double etaGuess) {
        double eta = etaGuess;
        p.prepare(density, temperature, eta);
        if (eta < NON_DEGENERATE) {
            double better = p.ionisationGuess(eta);
            if (Double.isFinite(better)) {
                eta = Math.max(-PlasmaPoint.ETA_LIMIT + 1.0, Math.min(eta, better));
                if (Math.abs(eta - p.reference) > REREFERENCE) {
                    p.prepare(density, temperature, eta);
                }
            }
        }
        iterate(p, density, temperature, eta);
    }

    /** The safeguarded Newton iteration of {@link #solve} from eta, with the Saha constants already prepared. */
    private static void iterate(PlasmaPoint p, double density, double temperature, double start) {
        double eta = start;
        double lo = -PlasmaPoint.ETA_LIMIT;
        double hi = PlasmaPoint.ETA_LIMIT;
        double step = Double.NaN;
        double previousStep = Double.NaN;
        for (int i = 0; i < SOLVE_BUDGET; i++) {
            p.solveStep(eta);
            if (p.residual > 0.0) {
                hi = eta;
            } else {
                lo = eta;
            }
            step = -p.residual / p.residualSlope;
            step = Math.max(-MAX_NEWTON_STEP, Math.min(MAX_NEWTON_STEP, step));
            if (converged(step, p.residual)) {
                // Converged: eta is within the tolerance of the root, and fd and the Coulomb term are set for it.
                // Tested before the bracket: a step below one ulp leaves eta + step on the bracket's edge, which
                // would send it to the bisection point far away.
                p.evaluate();
                p.lastEta = eta;
                p.iterations = i + 1;
                return;
            }
            double next = eta + step;
            if (!(next > lo && next < hi)) {
                next = 0.5 * (lo + hi);
                // a bisection says nothing of the rate of the Newton steps
                previousStep = Double.NaN;
            } else if (lastStepPredicted(previousStep, step) && !(Math.abs(next - p.reference) > REREFERENCE)) {
                finishAt(p, next, i + 2);
                return;
            } else {
                previousStep = step;
            }
            if (Math.abs(next - p.reference) > REREFERENCE) {
                p.prepare(density, temperature, next);
            }
            eta = next;
        }
        throw new ConvgridException(ErrorKind.NOT_CONVERGED, String.format(
                "charge neutrality not solved in %d iterations at rho = %s g cm^-3, T = %s K (eta %s, step %s)",
                SOLVE_BUDGET, density, temperature, eta, step), density, temperature, eta, step);
    }

    /**
     * Whether the Newton step after {@code step} is certain to pass {@link #converged}, so that the iterate
     * eta + step can be completed without one more residual (a pass over every ionisation stage, which
     * {@link PlasmaPoint#evaluate} repeats anyway). The iteration is then quadratic, step_{k+1} ~ C step_k^2, and
     * the two last steps measure C = |step|/|previousStep|^2: the next step is predicted at |step|^3/|previousStep|^2
     * and must lie {@link #PREDICTION_MARGIN} below {@link #ETA_TOLERANCE}, after a shrink by at least
     * {@link #QUADRATIC_SHRINK} (which keeps out rounding-floor steps that stall near the tolerance). The completed
     * eta is the one the next iteration would have stopped at, so the state is bitwise the same; only a next step a
     * thousand times larger than predicted would have gone on, and the solver tests check that none does.
     */
    static boolean lastStepPredicted(double previousStep, double step) {
        double size = Math.abs(step);
        double before = Math.abs(previousStep);
        return before <= PREDICTION_RANGE && size < QUADRATIC_SHRINK * before
                && size * size * size < PREDICTION_MARGIN * ETA_TOLERANCE * before * before;
    }

    /**
     * Largest step from which the rate of the next is measured: farther from the root the quadratic constant still
     * changes along the path (after a step of 2.8, C was measured 70 times too small in cool helium gas).
     */
    static final double PREDICTION_RANGE = 0.01;

    /** A step this much smaller than the one before it, at least, is taken as the quadratic regime. */
    static final double QUADRATIC_SHRINK = 0.1;
    /** The predicted next step must lie this fraction of {@link #ETA_TOLERANCE} below it. */
    static final double PREDICTION_MARGIN = 0.05;

    /**
     * Completes a solve whose last step was predicted (see {@link #lastStepPredicted}) at eta; out of line, so that
     * the warm solves, which converge before any prediction, compile as before.
     */
    private static void finishAt(PlasmaPoint p, double eta, int iterations) {
        p.completeAt(eta);
        p.lastEta = eta;
        p.iterations = iterations;
    }

    /**
     * Convergence test of the neutrality solve: the Newton step is below {@link #ETA_TOLERANCE}, or the residual (a
     * relative mismatch of the electron densities) is below {@link #RESIDUAL_TOLERANCE}, where rounding alone can
     * hold the step at ~1e-11 (reported near rho 0.06-0.1 g cm^-3, T ~ 1.5e4 K in 0.08-0.10 Msun models).
     */
    static boolean converged(double step, double residual) {
        return Math.abs(step) < ETA_TOLERANCE || Math.abs(residual) < RESIDUAL_TOLERANCE;
    }

    /**
     * The forward EOS along one isotherm for {@link DensityInversion}, started at each new density from the last
     * eta moved by the known d eta/d ln rho, so the neutrality solve needs one or two Newton steps.
     */
    private static final class WarmStart implements DensityInversion.Isotherm {
        private final PlasmaPoint point;
        private final double temperature;
        private double lastLnRho = Double.NaN;
        private double lastEta;
        private double etaSlope;

        WarmStart(PlasmaPoint point, double temperature) {
            this.point = point;
            this.temperature = temperature;
        }

        /** Started at degeneracy {@code eta} for the density exp(lnRho) (from a solved state nearby). */
        WarmStart(PlasmaPoint point, double temperature, double lnRho, double eta) {
            this(point, temperature);
            this.lastLnRho = lnRho;
            this.lastEta = eta;
            this.etaSlope = 0.0;
        }

        @Override
        public EosState at(double lnRho) {
            double density = Math.exp(lnRho);
            checkDomain(density, temperature);
            double guess = Double.isNaN(lastLnRho) ? fullyIonisedEta(point, density, temperature)
                    : lastEta + etaSlope * (lnRho - lastLnRho);
            guess = withinEtaLimits(guess);
            solve(point, density, temperature, guess);
            lastLnRho = lnRho;
            lastEta = point.lastEta;
            etaSlope = -point.residualRho / point.residualSlope;
            return state(point);
        }
    }

    /**
     * Approximate inverse of F_{1/2}: ln u + u/sqrt(8) with u = 2F/sqrt(pi) (leading terms of Joyce &amp; Dixon
     * 1977, Appl. Phys. Lett. 31, 354) when non-degenerate, (3F/2)^(2/3) (Sommerfeld leading term) otherwise.
     */
    static double initialEta(double f) {
        double u = 2.0 * f / Math.sqrt(Math.PI);
        double eta = u < 4.0 ? Math.log(u) + u / Math.sqrt(8.0) : Math.pow(1.5 * f, 2.0 / 3.0);
        return withinEtaLimits(eta);
    }

    /** A starting eta moved inside the neutrality solve's bracket, one unit clear of its ends (NaN stays NaN). */
    private static double withinEtaLimits(double eta) {
        return Math.max(-PlasmaPoint.ETA_LIMIT + 1.0, Math.min(PlasmaPoint.ETA_LIMIT - 1.0, eta));
    }
}
