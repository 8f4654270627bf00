package org.convgrid.engine.evolution;

import java.util.Arrays;
import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.engine.physics.nuclear.BurningAndFactors;
import org.convgrid.engine.physics.nuclear.BurningRate;
import org.convgrid.engine.physics.nuclear.NuclearNetwork;
import org.convgrid.engine.physics.nuclear.RateFactors;
import org.convgrid.engine.state.Composition;

/**
 * Advances the composition of one shell over a time step at fixed density and temperature by the backward
 * (implicit) Euler method, x_new = x_old + dt f(x_new), f the composition rates of the {@link NuclearNetwork}
 * (common practice: an implicit network step keeps the fast 3He and CN relaxations
 * stable at main-sequence time steps). Each sub-step is solved by a chord (simplified Newton) iteration whose
 * Jacobian is taken once at the start of the sub-step and factorised once: analytic from the network's
 * {@link RateFactors} (taken once per step, since density and temperature are fixed over it, from the same network
 * evaluation as the rates at the step's start; only the screening's weak dependence on composition, which the
 * chord iteration does not need, is then held at its start value), or by
 * finite differences of the rates for a network without them. Sub-steps are sized from the change they make
 * against its limit ({@link #MAX_SUBSTEP_CHANGE}, and the relative {@link #withTraceLimit trace limit}): the first
 * from the explicit change over the whole step, each next one from the change just taken (see {@link #pieces}); one
 * that changes some mass fraction by more than its limit is taken again shorter, one that does not converge is
 * halved. With rate factors the iteration first converges
 * on the rates at fixed screening (products of the factors and the abundances), then on the network's own. Newton
 * corrections are damped so that no
 * mass fraction goes negative. The rates conserve mass (abundances counted with mass numbers), and the result is
 * renormalised so the fractions sum to one to rounding. Deuterium and 7Li, destroyed by one proton capture each at a
 * rate linear in their own abundance, burn first in their own exact step ({@link LightElementBurning}); the Newton
 * step then holds them fixed and sees only the rest of the network. A point whose rates the network bounds so low
 * that they could not change any fraction by {@link #NEGLIGIBLE_CHANGE} over the step ({@link
 * NuclearNetwork#rateBound}: the cool envelope and, before the zero-age main sequence, most of the star) is not
 * evaluated: its rates are taken as zero, alone or among a mixed zone's points. Measured, 1 Msun, Z = 0.02 (burn
 * and burnAndFactors calls per track): zero-age track 164395 -> 103284, from birth 208549 -> 130177; the 1 Msun
 * birth track's reference digits unchanged but for surface 7Li at exhaustion, 2.193076113944e-9 -> 2.193076113943e-9.
 * Immutable and thread-safe.
 */
public final class CompositionStep {

    /** Largest change of any mass fraction in one sub-step (keeps the first-order method accurate). */
    public static final double MAX_SUBSTEP_CHANGE = 0.005;
    /**
     * Newton converged when no mass fraction moves by more than this (absolute): five orders of magnitude below
     * what the first-order method itself leaves in a sub-step of {@link #MAX_SUBSTEP_CHANGE} (~change^2, 1e-5),
     * and loose enough that the screening's dependence on composition, which the chord Jacobian leaves out, is
     * mostly converged after one evaluation of the network's own rates. Measured, 1 Msun, Z = 0.02 birth to
     * exhaustion, against 1e-14: network evaluations before the zero-age main sequence 41890 -> 38091, after it
     * 207615 -> 164957; exhaustion age moved by 3e-9 (relative).
     */
    public static final double NEWTON_TOLERANCE = 1.0e-10;
    /** Newton iterations per sub-step. */
    public static final int NEWTON_BUDGET = 30;
    /** Sub-steps (accepted and rejected together) allowed for one step. */
    public static final int SUBSTEP_BUDGET = 400;
    /**
     * Largest growth of the sub-step from one to the next (common practice: a factor of a few, so that a change
     * that speeds up is caught before it exceeds its limit by much).
     */
    private static final double SUBSTEP_GROWTH = 2.0;
    /**
     * Largest shrink of the sub-step from one estimate, a guard: the explicit change that sizes the first sub-step
     * overstates the backward-Euler change of a species relaxing fast towards its equilibrium (3He, 12C), and a
     * few doublings recover a sub-step shrunk too far by ten, where the bare estimate could shrink it without
     * bound. Measured, 1 Msun birth track before the zero-age main sequence, shrinks of at most 4 / 10 / 100: 30 /
     * 10 / 0 sub-steps rejected, network evaluations within 3 % of each other.
     */
    private static final double SUBSTEP_SHRINK = 0.1;
    /** Below this largest explicit change over the whole step, one explicit Euler step is exact enough. */
    public static final double NEGLIGIBLE_CHANGE = 1.0e-12;
    /**
     * Relative size of the finite-difference perturbation of a mass fraction: small enough that the perturbed
     * fractions still sum to one within {@link Composition#SUM_TOLERANCE}.
     */
    private static final double DIFFERENCE_STEP = 1.0e-9;
    /** Absolute floor of that perturbation. */
    private static final double DIFFERENCE_FLOOR = 1.0e-15;
    /** A Newton correction may take a fraction at most this close to zero in one iteration. */
    private static final double POSITIVITY_MARGIN = 0.9;

    private static final int N = MassFractions.BURNING;
    private static final int HELIUM4 = 2;

    /**
     * Floor of the abundance against which {@link #withTraceLimit a trace limit} measures a change: a species
     * building up from (almost) nothing is limited in absolute terms at this scale, not by ever smaller relative
     * sub-steps.
     */
    public static final double TRACE_FLOOR = 1.0e-6;

    private final NuclearNetwork network;
    /**
     * The network without the light elements' captures, for a step whose light elements burn at rates given to it
     * (the Newton iteration takes their share out of the rates anyway).
     */
    private final NuclearNetwork withoutCaptures;
    private final double maxRelativeChange;

    public CompositionStep(NuclearNetwork network) {
        this(network, Double.POSITIVE_INFINITY);
    }

    private CompositionStep(NuclearNetwork network, double maxRelativeChange) {
        this.network = network;
        this.withoutCaptures = network.withoutLightElementCaptures();
        this.maxRelativeChange = maxRelativeChange;
    }

    /**
     * The same network whose sub-steps also change no burning species by more than {@code maxRelativeChange} of
     * its abundance (at least {@link #TRACE_FLOOR}). The absolute limit {@link #MAX_SUBSTEP_CHANGE} leaves the trace
     * species (12C, 14N, 3He, a few 1e-3 and below) to one backward-Euler sub-step per step, first order in the
     * step; out of equilibrium (the approach to the zero-age main sequence, where 12C burns and 3He builds up over
     * the last contraction times) that error sets how the step converges. Bounding their relative change per
     * sub-step makes it small at any step, at the price of more sub-steps where they are out of equilibrium.
     *
     * @param maxRelativeChange largest relative change of a species per sub-step, positive
     */
    public CompositionStep withTraceLimit(double maxRelativeChange) {
        if (!(maxRelativeChange > 0.0)) {
            throw new IllegalArgumentException("the relative change per sub-step must be positive");
        }
        return new CompositionStep(network, maxRelativeChange);
    }

    /**
     * @param density g cm^-3
     * @param temperature K
     * @param start composition at the start of the step
     * @param dt time step, s (&gt;= 0)
     * @return the composition after dt; mass fractions non-negative and summing to one
     * @throws ConvgridException NOT_CONVERGED when the sub-step budget is exhausted
     */
    public Composition advance(double density, double temperature, Composition start, double dt) {
        return advance(density, temperature, start, dt, null, new Workspace());
    }

    /**
     * {@link #advance(double, double, Composition, double)} with the deuterium and 7Li destruction rates per unit
     * abundance at this point already known ({@code captures}: {d, 7Li}, s^-1, &gt;= 0, e.g. from
     * {@link LightElementRates} at the same density, temperature and composition), so that the light elements'
     * exact step does not evaluate the whole network again for them; null evaluates them here. {@code work}: the
     * calling thread's work arrays, reused from point to point ({@link Workspace}).
     */
    Composition advance(double density, double temperature, Composition start, double dt, double[] captures,
                        Workspace work) {
        NuclearNetwork net = captures == null ? network : withoutCaptures;
        return advance(x -> rates(net.burn(density, temperature, MassFractions.composition(x))), x -> {
            Composition c = MassFractions.composition(x);
            if (negligible(net, density, temperature, c, dt)) {
                // no rates: the step below takes the change as zero
                return new Linearised(new double[N + 2], null, null);
            }
            BurningAndFactors point = net.burnAndFactors(density, temperature, c);
            RateFactors factors = point.factors().orElse(null);
            return new Linearised(rates(point.rate()),
                    factors == null ? null : (y, out) -> factors.addJacobian(y, 1.0, out), factors);
        }, start, dt, density, temperature, captures, work);
    }

    /**
     * Advances the one composition of a zone mixed on time scales far shorter than the step (a convective
     * zone): its rate of change is the mass-weighted mean of the rates at the zone's points,
     * dX/dt = sum_k w_k f(rho_k, T_k, X) / sum_k w_k. Burning each point on its own and mixing afterwards would
     * let species that relax faster than the step (3He, the CN pair) reach each point's local equilibrium, whose
     * average is not the zone's equilibrium: the hot centre of a convective core would then burn 3He mixed down
     * from its cool edge at several times its steady abundance, and the energy released would exceed the
     * hydrogen consumed by ~20 % at 2 Msun.
     *
     * @param densities g cm^-3, per point of the zone
     * @param temperatures K, per point
     * @param weights mass of each point's cell (any unit), positive
     * @param start the zone's (mixed) composition at the start of the step
     * @param dt time step, s (&gt;= 0)
     * @return the zone's composition after dt
     * @throws ConvgridException NOT_CONVERGED when the sub-step budget is exhausted
     */
    public Composition advanceMixed(double[] densities, double[] temperatures, double[] weights, Composition start,
                                    double dt) {
        return advanceMixed(densities, temperatures, weights, start, dt, null, new Workspace());
    }

    /**
     * {@link #advanceMixed(double[], double[], double[], Composition, double)} with the zone's mass-weighted
     * deuterium and 7Li destruction rates per unit abundance already known ({@code captures}, as in
     * {@link #advance(double, double, Composition, double, double[], Workspace)}); null evaluates them here.
     */
    Composition advanceMixed(double[] densities, double[] temperatures, double[] weights, Composition start,
                             double dt, double[] captures, Workspace work) {
        int n = densities.length;
        if (temperatures.length != n || weights.length != n || n == 0) {
            throw new IllegalArgumentException("a mixed zone needs one density, temperature and weight per point");
        }
        double total = 0.0;
        for (double w : weights) {
            total += w;
        }
        double mass = total;
        NuclearNetwork net = captures == null ? network : withoutCaptures;
        // one composition for all the zone's points, and their rates summed as they come (no array per point)
        // the points whose rates cannot matter (negligible) add nothing; the others' weights still count their mass
        Rates zone = x -> {
            Composition c = MassFractions.composition(x);
            double[] mean = new double[N + 2];
            for (int k = 0; k < n; k++) {
                if (!negligible(net, densities[k], temperatures[k], c, dt)) {
                    addRates(mean, weights[k], net.burn(densities[k], temperatures[k], c));
                }
            }
            return scaled(mean, mass);
        };
        Linearisation linearisation = x -> {
            Composition c = MassFractions.composition(x);
            double[] mean = new double[N + 2];
            // the evaluated points' factors and weights, in the first `used` entries
            RateFactors[] factors = new RateFactors[n];
            double[] factorWeights = new double[n];
            int used = 0;
            boolean analytic = true;
            for (int k = 0; k < n; k++) {
                if (negligible(net, densities[k], temperatures[k], c, dt)) {
                    continue;
                }
                BurningAndFactors point = net.burnAndFactors(densities[k], temperatures[k], c);
                addRates(mean, weights[k], point.rate());
                factors[used] = point.factors().orElse(null);
                factorWeights[used] = weights[k];
                analytic &= factors[used] != null;
                used++;
            }
            int points = used;
            Jacobian jacobian = (y, out) -> {
                for (int k = 0; k < points; k++) {
                    factors[k].addJacobian(y, factorWeights[k] / mass, out);
                }
            };
            return new Linearised(scaled(mean, mass), analytic ? jacobian : null, analytic
                    ? RateFactors.weightedMean(Arrays.copyOf(factors, used), Arrays.copyOf(factorWeights, used), mass)
                    : null);
        };
        return advance(zone, linearisation, start, dt, densities[0], temperatures[0], captures, work);
    }

    /**
     * Whether the network's rates at this point provably cannot matter over dt: its bound of every |dX_i/dt|
     * ({@link NuclearNetwork#rateBound}) times dt is below {@link #NEGLIGIBLE_CHANGE}, the change this step already
     * takes as negligible. Such a point's rates are taken as zero, without evaluating the network: the change this
     * leaves out is below that of the explicit step the step takes for a change of that size, and in a mixed zone
     * the zone's mean rates move by less than the bound (the left-out points' mass fraction times it). With
     * the hydrogen-burning network's bound (gas below 5e5 K, 1e5 K with deuterium: 4.7e-30 s^-1) the steps of
     * up to 2e17 s skip it.
     */
    private static boolean negligible(NuclearNetwork net, double density, double temperature, Composition c,
                                      double dt) {
        return net.rateBound(density, temperature, c) * dt < NEGLIGIBLE_CHANGE;
    }

    /** sum / mass, in place. */
    private static double[] scaled(double[] sum, double mass) {
        for (int i = 0; i < sum.length; i++) {
            sum[i] /= mass;
        }
        return sum;
    }

    /** Composition rates (d x_i/dt for the burning species) as a function of the burning mass fractions. */
    @FunctionalInterface
    private interface Rates {
        double[] at(double[] x);
    }

    /** Adds d f_i/d x_j of the burning species' rates at x to out[i][j]. */
    @FunctionalInterface
    private interface Jacobian {
        void addAt(double[] x, double[][] out);
    }

    /**
     * The rates at x with the analytic {@link Jacobian} from the network's rate factors taken there, both from one
     * evaluation of the network per point ({@link NuclearNetwork#burnAndFactors}).
     */
    @FunctionalInterface
    private interface Linearisation {
        Linearised at(double[] x);
    }

    /**
     * @param rates the composition rates at x, as {@link Rates} gives them
     * @param jacobian their analytic Jacobian, or null to difference the rates
     * @param factors the rate factors the Jacobian is made of (a zone's mass-weighted mean), or null
     */
    private record Linearised(double[] rates, Jacobian jacobian, RateFactors factors) {
    }

    /**
     * Work arrays of the chord iterations, so that their loops allocate nothing: one per thread, reused for every
     * point of a step (the caller makes it; every array is written before it is read at each sub-step, so reuse
     * changes no result). Not thread-safe. Measured, 1 Msun, Z = 0.02 zero-age track, against one per point:
     * thread allocated bytes 256.6 -> 234.5 MB, from birth 384.4 -> 358.1 MB.
     */
    static final class Workspace {
        final double[][] matrix = new double[N][N];
        final int[] pivots = new int[N];
        final double[] delta = new double[N];
        /** Rates at fixed screening at the sub-step's start and at the iterate, and f0 shifted by their difference. */
        final double[] fixedStart = new double[N];
        final double[] fixedNow = new double[N];
        final double[] shifted = new double[N];
        /** The rates at the last iterate of the last converged sub-step, before its final correction. */
        double[] convergedRates;
    }

    private Composition advance(Rates rates, Linearisation linearisation, Composition start, double dt,
                                double density, double temperature, double[] captures, Workspace work) {
        ConvgridException.requireInRange("time step", dt, 0.0, Double.MAX_VALUE, "s");
        double[] x = MassFractions.of(start);
        if (captures != null) {
            // the same rates as the network's at x, given per unit abundance
            LightElementBurning.burnPerUnitAbundance(x, captures[0], captures[1], dt);
        } else if (x[MassFractions.H2] > 0.0 || x[MassFractions.LI7] > 0.0) {
            double[] light = rates.at(x);
            LightElementBurning.burn(x, light[N], light[N + 1], dt);
        }
        // the rates and the Jacobian at the sub-steps' start from one network evaluation per point
        Linearised atStart = linearisation.at(x);
        double[] f = atStart.rates();
        double largest = 0.0;
        for (int i = 0; i < N; i++) {
            largest = Math.max(largest, Math.abs(f[i]) * dt);
        }
        if (largest < NEGLIGIBLE_CHANGE) {
            // burning too slow to matter over this step: explicit Euler is accurate to ~largest^2
            for (int i = 0; i < N; i++) {
                x[i] += dt * f[i];
            }
            return normalised(x);
        }
        Jacobian analytic = atStart.jacobian();
        work.convergedRates = null;
        double remaining = dt;
        double sub = dt / pieces(explicitRatio(x, f, dt), dt, dt, Double.POSITIVE_INFINITY);
        // the rates at x, kept while x is (the start, and after a rejected sub-step) so they are not evaluated again
        double[] ratesAtX = f;
        for (int attempt = 0; attempt < SUBSTEP_BUDGET; attempt++) {
            if (ratesAtX == null) {
                ratesAtX = rates.at(x);
            }
            double[] next = implicitSubstep(rates, analytic, atStart.factors(), work, x, ratesAtX, sub);
            if (next == null) {
                sub *= 0.5;
                continue;
            }
            double ratio = changeRatio(x, next);
            if (ratio > 1.0) {
                // too large a change: the same remainder in pieces sized from the change just measured
                sub = remaining / pieces(ratio, sub, remaining, 1.0);
                continue;
            }
            x = next;
            // the network's rates at the iterate before the last, converged, correction, which moved x by at most
            // NEWTON_TOLERANCE: as good a start for the next sub-step's iteration as the rates at x (that
            // iteration ends on the network's own rates anyway), and one network evaluation fewer per sub-step.
            // Not for a differenced Jacobian, whose differences of a fraction near zero (perturbed by
            // DIFFERENCE_FLOOR, below that tolerance) need the rates at x itself
            ratesAtX = analytic != null ? work.convergedRates : null;
            remaining -= sub;
            if (remaining <= 0.0 || remaining <= 1.0e-14 * dt) {
                return normalised(x);
            }
            sub = remaining / pieces(ratio, sub, remaining, SUBSTEP_GROWTH);
        }
        throw new ConvgridException(ErrorKind.NOT_CONVERGED, String.format(
                "composition step of %.3g s at rho = %.3g g cm^-3, T = %.3g K used its %d sub-steps",
                dt, density, temperature, SUBSTEP_BUDGET), dt, density, temperature);
    }

    /**
     * In how many equal sub-steps to take the time {@code remaining} after a sub-step of length h whose change was
     * {@code ratio} times its limit ({@link #changeRatio}; for the first, the explicit change over the step,
     * {@link #explicitRatio}). Common practice for step control: the next sub-step is
     * h min(growth, 1 / ratio), the change taken as proportional to the sub-step, and here shrunk by at most
     * {@link #SUBSTEP_SHRINK}; aimed at the limit itself rather than at a safety fraction of it, since the change of
     * a species slows as it nears depletion or equilibrium (measured: 10 of 4750 sub-steps rejected before the
     * zero-age main sequence, 1 Msun track, and none after). Equal pieces instead of a remainder: no last sliver
     * costing a sub-step of its own.
     * Measured, 1 Msun, Z = 0.02 track from birth to core-hydrogen exhaustion, before the zero-age main sequence /
     * after it, against halving a sub-step on rejection and doubling it after acceptance starting from the whole
     * step: sub-steps tried 6014 -> 4750 / 36011 -> 33403 (1246 -> 10 / 2850 -> 0 rejected), network evaluations
     * 48965 -> 41890 / 227851 -> 207615 (with the rates kept from the converged iteration). Larger sub-steps where
     * the old ones overshot by little, but closer to the sub-step-converged answer: ZAMS ages at 1, 1.5, 2 Msun
     * 38.35, 25.65, 11.08 -> 38.23, 25.60, 11.00 Myr against 38.17, 25.45, 10.91 with both sub-step limits
     * quartered (ZamsArrivalProbe, default time-step limits).
     */
    private static double pieces(double ratio, double h, double remaining, double growth) {
        double longest = h * Math.max(SUBSTEP_SHRINK, Math.min(growth, 1.0 / ratio));
        // (1 - 1e-12): a remainder that is a whole number of longest sub-steps to rounding is not one more
        return Math.max(1.0, Math.ceil(remaining / longest * (1.0 - 1.0e-12)));
    }

    /** The largest change a sub-step may make to a mass fraction that starts at x0. */
    private double changeLimit(double x0) {
        return Math.min(MAX_SUBSTEP_CHANGE, maxRelativeChange * Math.max(x0, TRACE_FLOOR));
    }

    /** The largest change of the sub-step x0 -> x over its limit ({@link #changeLimit}). */
    private double changeRatio(double[] x0, double[] x) {
        double ratio = 0.0;
        for (int i = 0; i < N; i++) {
            ratio = Math.max(ratio, Math.abs(x[i] - x0[i]) / changeLimit(x0[i]));
        }
        return ratio;
    }

    /**
     * The largest change of the explicit step x -> x + h f over its limit: for a species that depletes or nears its
     * equilibrium, an upper bound of the backward-Euler change, whose rate at the end is the smaller.
     */
    private double explicitRatio(double[] x, double[] f, double h) {
        double ratio = 0.0;
        for (int i = 0; i < N; i++) {
            ratio = Math.max(ratio, Math.abs(f[i]) * h / changeLimit(x[i]));
        }
        return ratio;
    }

    /**
     * One backward-Euler sub-step from x0 (where the rates are f0), or null when the iteration fails; the rates at
     * the last iterate before the converged correction are left in {@code work}. With the rate factors
     * ({@code factors}, null without) the chord iteration first converges on the rates at fixed screening,
     * f0 + r(x) - r(x0) with r the rate products ({@link RateFactors#ratesAtFixedScreening}), which cost next to
     * nothing beside a network evaluation at every point of a zone; the network's own rates then correct the
     * screening's small dependence on composition, to the same convergence test as without. Measured,
     * 1 Msun, Z = 0.02, birth to the zero-age main sequence (7432 sub-steps): network evaluations for the rates 16859
     * -> 12575 at single points and 25051 -> 18249 at the points of mixed zones; the results move within that
     * convergence test (ZAMS age and exhaustion age by 2e-13 and 5e-13, relative).
     */
    private double[] implicitSubstep(Rates rates, Jacobian analytic, RateFactors factors, Workspace work,
                                     double[] x0, double[] f0, double h) {
        double[] x = x0.clone();
        double[][] matrix = work.matrix;
        if (analytic != null) {
            for (double[] row : matrix) {
                Arrays.fill(row, 0.0);
            }
            analytic.addAt(x, matrix);
            for (int i = 0; i < N; i++) {
                for (int j = 0; j < N; j++) {
                    matrix[i][j] = (i == j ? 1.0 : 0.0) - h * matrix[i][j];
                }
            }
        } else {
            differenceMatrix(rates, x, f0, h, matrix);
        }
        // the 4He row is replaced by mass conservation (sum of the six = their initial sum), which a Jacobian of a
        // stiff step would only keep to its rounding error times h |df/dx|
        Arrays.fill(matrix[HELIUM4], 1.0);
        if (!SmallLinearSolver.factorise(matrix, work.pivots)) {
            return null;
        }
        double[] f = f0;
        if (factors != null) {
            double[] r0 = work.fixedStart;
            factors.ratesAtFixedScreening(x0, r0);
            boolean settled = false;
            for (int iteration = 0; iteration < NEWTON_BUDGET && !settled; iteration++) {
                settled = correct(work, x, x0, f, h);
                if (!settled) {
                    double[] r = work.fixedNow;
                    factors.ratesAtFixedScreening(x, r);
                    f = work.shifted;
                    for (int i = 0; i < N; i++) {
                        f[i] = f0[i] + (r[i] - r0[i]);
                    }
                }
            }
            if (settled) {
                f = rates.at(x);
            } else {
                // no better start than x0 itself
                x = x0.clone();
                f = f0;
            }
        }
        for (int iteration = 0; iteration < NEWTON_BUDGET; iteration++) {
            if (correct(work, x, x0, f, h)) {
                work.convergedRates = f;
                return x;
            }
            f = rates.at(x);
        }
        return null;
    }

    /**
     * One chord correction of x towards x - x0 = h f (f the rates at x) with the factorised matrix of {@code work},
     * damped so that no fraction goes negative; true when it was undamped and no larger than
     * {@link #NEWTON_TOLERANCE} (converged).
     */
    private static boolean correct(Workspace work, double[] x, double[] x0, double[] f, double h) {
        double[] delta = work.delta;
        double drift = 0.0;
        for (int i = 0; i < N; i++) {
            delta[i] = -(x[i] - x0[i] - h * f[i]);
            drift += x[i] - x0[i];
        }
        delta[HELIUM4] = -drift;
        SmallLinearSolver.solveFactorised(work.matrix, work.pivots, delta);
        double lambda = 1.0;
        double size = 0.0;
        for (int i = 0; i < N; i++) {
            size = Math.max(size, Math.abs(delta[i]));
            if (delta[i] < 0.0 && x[i] + delta[i] < 0.0) {
                lambda = Math.min(lambda, POSITIVITY_MARGIN * x[i] / -delta[i]);
            }
        }
        for (int i = 0; i < N; i++) {
            x[i] = Math.max(0.0, x[i] + lambda * delta[i]);
        }
        return lambda == 1.0 && size <= NEWTON_TOLERANCE;
    }

    /** The matrix {@code 1 - h df/dx} by forward differences of the rates, for a network without rate factors. */
    private static void differenceMatrix(Rates rates, double[] x, double[] f0, double h, double[][] matrix) {
        for (int j = 0; j < N; j++) {
            double step = Math.max(DIFFERENCE_STEP * x[j], DIFFERENCE_FLOOR);
            double[] xp = x.clone();
            xp[j] += step;
            double[] fp = rates.at(xp);
            for (int i = 0; i < N; i++) {
                matrix[i][j] = (i == j ? 1.0 : 0.0) - h * (fp[i] - f0[i]) / step;
            }
        }
    }

    /**
     * The rates of the six network species without the part that comes from deuterium and 7Li burning (that part
     * belongs to {@link LightElementBurning}), then d(deuterium)/dt and d(7Li)/dt, from the network's rate at the
     * point (0 for those two, and nothing to take out, from the network without their captures).
     */
    private static double[] rates(BurningRate r) {
        double[] f = new double[N + 2];
        addRates(f, 1.0, r);
        return f;
    }

    /**
     * sum += weight f, f the rates of {@link #rates(BurningRate)}, element by element (a zone's points summed
     * without an array each).
     */
    private static void addRates(double[] sum, double weight, BurningRate r) {
        double d = r.dh2Dt();
        double li = r.dli7Dt();
        // d + p -> 3He moves mass 2:1 -> 3, 7Li + p -> 2 4He 7:1 -> 8 (rates are negative: destruction)
        sum[0] += weight * (r.dh1Dt() - LightElementBurning.HYDROGEN_PER_DEUTERIUM * d
                - LightElementBurning.HYDROGEN_PER_LITHIUM * li);
        sum[1] += weight * (r.dhe3Dt() + LightElementBurning.HELIUM3_PER_DEUTERIUM * d);
        sum[2] += weight * (r.dhe4Dt() + LightElementBurning.HELIUM4_PER_LITHIUM * li);
        sum[3] += weight * r.dc12Dt();
        sum[4] += weight * r.dn14Dt();
        sum[5] += weight * r.do16Dt();
        sum[6] += weight * d;
        sum[7] += weight * li;
    }

    /** Clips rounding-level negatives and rescales the burning species so all the fractions sum to one. */
    private static Composition normalised(double[] x) {
        double sum = 0.0;
        for (int i = 0; i < N; i++) {
            x[i] = Math.max(0.0, x[i]);
            sum += x[i];
        }
        double scale = (1.0 - x[MassFractions.OTHER_METALS] - x[MassFractions.H2] - x[MassFractions.LI7]) / sum;
        for (int i = 0; i < N; i++) {
            x[i] *= scale;
        }
        return MassFractions.composition(x);
    }
}
