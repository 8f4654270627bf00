package org.convgrid.engine.structure;

import org.convgrid.engine.error.ConvgridException;

/**
 * Newton-Raphson relaxation of a {@link DifferenceSystem} (the Henyey method: Henyey et al. 1959, ApJ 129, 628;
 * Henyey, Forbes &amp; Gould 1964, ApJ 139, 306; Kippenhahn, Weigert &amp; Weiss 2012, ch. 12), with the linear
 * system solved by a banded LU factorisation.
 *
 * <p>Each correction is scaled down so that no unknown moves by more than {@link Settings#maxStep()} (in ln
 * units); when the physics rejects the damped state, or gives non-finite residuals, the step is cut by
 * {@link #BACKTRACK_FACTOR} up to {@link #MAX_BACKTRACKS} times. Once a correction is below
 * {@link #REUSE_THRESHOLD} the following iterations reuse its factorised Jacobian (chord steps) for as long as
 * each correction shrinks by {@link #REUSE_CONTRACTION}; otherwise the Jacobian of the current state is taken and
 * the step redone. The relaxation stops when the largest undamped
 * correction is below {@link Settings#tolerance()}, returning the state it was computed at, which lies within the
 * tolerance of the solution and was the last one evaluated (so the system's scratch values describe it; applying
 * the correction would cost one more evaluation for a change below the tolerance), or with a failed
 * {@link SolveReport} when the budget runs out. Stateless and thread-safe.
 */
public final class HenyeySolver {

    /** Largest correction accepted as converged, ln units (common practice, no single source: 1e-8). */
    public static final double DEFAULT_TOLERANCE = 1.0e-8;
    /** Largest change of any ln unknown per iteration (common practice, no single source: 0.1-0.3). */
    public static final double DEFAULT_MAX_STEP = 0.2;
    /** Newton iterations allowed for one relaxation. */
    public static final int DEFAULT_ITERATION_BUDGET = 60;
    /** Step cuts tried when the physics rejects a damped state. */
    public static final int MAX_BACKTRACKS = 6;
    /**
     * The residual-decrease test is applied only when the undamped correction exceeds this many times the step
     * cap, i.e. far from the solution; near it plain Newton steps are taken.
     */
    public static final double LINE_SEARCH_THRESHOLD = 3.0;
    /**
     * Largest correction after which the next iteration reuses the factorised Jacobian instead of a new one
     * (the chord or modified Newton method; Kelley 2003, Solving Nonlinear Equations with Newton's Method, SIAM,
     * ch. 1, from memory): near the solution the Jacobian changes by about the size of the correction, so each
     * chord step still shrinks the correction by a factor of that order, while the Jacobian's extra
     * equation-of-state calls and the factorisation are saved. Practice, chosen here from measurements: the
     * first corrections of the 1 Msun evolution steps are ~1e-5 to 5e-4 and their chord steps contract by ~1e-4;
     * from 1e-2 the chord steps of a seeded zero-age model (measured when its Jacobian left out the slaved abundances)
     * contract by only ~0.1 and took two iterations more than Newton's. The default of
     * {@link Settings#reuseThreshold()}.
     */
    public static final double REUSE_THRESHOLD = 1.0e-3;
    /**
     * A reused Jacobian is replaced by the current state's when a correction is not smaller than this fraction
     * of the one before (slow linear convergence costs more evaluations than a new Jacobian).
     */
    public static final double REUSE_CONTRACTION = 0.1;
    /** Factor applied to the step at each cut. */
    public static final double BACKTRACK_FACTOR = 0.25;

    /**
     * @param tolerance largest correction accepted as converged
     * @param maxStep largest correction applied in one iteration
     * @param iterationBudget Newton iterations allowed
     * @param reuseThreshold largest correction after which the next iteration reuses the factorised Jacobian
     *                       ({@link #REUSE_THRESHOLD} by default)
     * @param giveUpRate a relaxation stops ({@link StopReason#ITERATION_BUDGET}) as soon as its largest correction
     *                   exceeds this many times the iterations left beyond {@link #FINISHING_ITERATIONS} (too much
     *                   to work off within the budget) or grows ({@link #hopeless}); infinite (the default) never
     *                   stops early
     */
    public record Settings(double tolerance, double maxStep, int iterationBudget, double reuseThreshold,
                           double giveUpRate) {
        public static final Settings DEFAULT = new Settings(DEFAULT_TOLERANCE, DEFAULT_MAX_STEP,
                DEFAULT_ITERATION_BUDGET);

        /** With the default {@link #REUSE_THRESHOLD}, never given up early. */
        public Settings(double tolerance, double maxStep, int iterationBudget) {
            this(tolerance, maxStep, iterationBudget, REUSE_THRESHOLD);
        }

        /** Never given up early. */
        public Settings(double tolerance, double maxStep, int iterationBudget, double reuseThreshold) {
            this(tolerance, maxStep, iterationBudget, reuseThreshold, Double.POSITIVE_INFINITY);
        }

        public Settings withIterationBudget(int budget) {
            return new Settings(tolerance, maxStep, budget, reuseThreshold, giveUpRate);
        }

        public Settings withTolerance(double largestCorrection) {
            return new Settings(largestCorrection, maxStep, iterationBudget, reuseThreshold, giveUpRate);
        }

        public Settings withReuseThreshold(double largestCorrection) {
            return new Settings(tolerance, maxStep, iterationBudget, largestCorrection, giveUpRate);
        }

        /** The same settings given up early at {@code rate} (see {@link #giveUpRate}). */
        public Settings withGiveUpRate(double rate) {
            return new Settings(tolerance, maxStep, iterationBudget, reuseThreshold, rate);
        }
    }

    /**
     * Iterations a relaxation keeps for its last corrections when it asks whether the budget can still be met
     * ({@link Settings#giveUpRate}): from a largest correction of ~1 the seeded zero-age models took 6-8 iterations
     * to the tolerance.
     */
    public static final int FINISHING_ITERATIONS = 8;
    /**
     * A largest correction at or below this is never given up ({@link Settings#giveUpRate}): a relaxation there is
     * near its solution and ends, converged or out of budget, within a few iterations.
     */
    public static final double GIVE_UP_FLOOR = 1.0;
    /**
     * A relaxation that may be given up ({@link Settings#giveUpRate}) is also given up when its largest correction
     * (above {@link #GIVE_UP_FLOOR}) exceeds this many times the smallest one before it: the iteration is moving
     * away from the solution. The converging seeded zero-age models grew by at most a factor of 1.34 from one
     * iteration to a later one (6.1 to 8.2, then converged), the failing ones by 2 to 20 before they blew up.
     */
    public static final double GIVE_UP_GROWTH = 2.0;

    /**
     * Whether a relaxation with the largest correction {@code largest} at iteration {@code iteration} (the smallest
     * before it {@code smallest}) is to be given up: above {@link #GIVE_UP_FLOOR} and either more than
     * {@link Settings#giveUpRate} per iteration left, keeping {@link #FINISHING_ITERATIONS} for the end, or more than
     * {@link #GIVE_UP_GROWTH} times {@code smallest}. Never with an infinite rate.
     */
    static boolean hopeless(double largest, double smallest, int iteration, Settings settings) {
        if (!(settings.giveUpRate() < Double.POSITIVE_INFINITY) || !(largest > GIVE_UP_FLOOR)) {
            return false;
        }
        int left = settings.iterationBudget() - iteration - FINISHING_ITERATIONS;
        return largest > settings.giveUpRate() * Math.max(0, left) || largest > GIVE_UP_GROWTH * smallest;
    }

    /**
     * The outcome of a relaxation.
     *
     * @param solution the last state (the converged one when the report says so)
     * @param report how it went
     */
    public record Result(double[] solution, SolveReport report) {
    }

    /** The name of the unknown at flat index {@code index} of the solution vector; empty for none (negative). */
    private static String unknownAt(DifferenceSystem system, int index) {
        return index < 0 ? "" : system.unknownName(index % system.variables());
    }

    /**
     * Relaxes {@code system} from {@code start} (not modified).
     */
    public Result solve(DifferenceSystem system, double[] start, Settings settings) {
        int n = system.points() * system.variables();
        if (start.length != n) {
            throw new IllegalArgumentException("start vector has " + start.length + " entries, expected " + n);
        }
        BandMatrix jacobian = new BandMatrix(n, system.lowerBandwidth(), system.upperBandwidth());
        double[] y = start.clone();
        double[] residual = new double[n];
        double[] delta = new double[n];
        double[] trial = new double[n];
        try {
            system.evaluate(y, residual, jacobian);
        } catch (ConvgridException e) {
            return new Result(y, new SolveReport(StopReason.BAD_STATE, 0, Double.NaN, -1, "",
                    "start state rejected: " + e.getMessage()));
        }
        int nv = system.variables();
        double largest = Double.NaN;
        int worst = -1;
        // true while the factorised Jacobian is the one of y (false after a chord step evaluated without it)
        boolean fresh = true;
        double previousLargest = Double.POSITIVE_INFINITY;
        // the smallest largest correction of the iterations before this one (for hopeless)
        double smallest = Double.POSITIVE_INFINITY;
        for (int iteration = 1; iteration <= settings.iterationBudget(); iteration++) {
            if (fresh && !jacobian.factor()) {
                return new Result(y, new SolveReport(StopReason.SINGULAR_JACOBIAN, iteration, largest,
                        worst < 0 ? -1 : worst / nv, unknownAt(system, worst), ""));
            }
            worst = correct(system, y, residual, jacobian, delta);
            largest = system.correctionSize(y, worst, delta[worst]);
            if (!fresh && largest > settings.tolerance() && !(largest <= REUSE_CONTRACTION * previousLargest)) {
                // the reused Jacobian no longer contracts fast enough: take the Jacobian of y and redo the step
                jacobian.clear();
                try {
                    system.evaluate(y, residual, jacobian);
                } catch (ConvgridException e) {
                    return new Result(y, new SolveReport(StopReason.BAD_STATE, iteration, largest, worst / nv,
                            unknownAt(system, worst), "accepted state rejected: " + e.getMessage()));
                }
                fresh = true;
                if (!jacobian.factor()) {
                    return new Result(y, new SolveReport(StopReason.SINGULAR_JACOBIAN, iteration, largest,
                            worst / nv, unknownAt(system, worst), ""));
                }
                worst = correct(system, y, residual, jacobian, delta);
                largest = system.correctionSize(y, worst, delta[worst]);
            }
            if (!Double.isFinite(largest)) {
                return new Result(y, new SolveReport(StopReason.BAD_STATE, iteration, largest, worst / nv,
                        unknownAt(system, worst), "non-finite correction"));
            }
            if (largest <= settings.tolerance()) {
                // y is within the tolerance of the solution, and the last evaluation (residuals and the system's
                // scratch values) was at y: return it as it is
                return new Result(y, new SolveReport(StopReason.CONVERGED, iteration, largest, worst / nv,
                        unknownAt(system, worst), ""));
            }
            if (hopeless(largest, smallest, iteration, settings)) {
                return new Result(y, new SolveReport(StopReason.ITERATION_BUDGET, iteration, largest, worst / nv,
                        unknownAt(system, worst), "given up: correction too large for the " + (settings.iterationBudget() - iteration)
                        + " iterations left"));
            }
            double lambda = Math.min(1.0, settings.maxStep() / largest);
            double norm = sumOfSquares(residual);
            String rejection = null;
            boolean accepted = false;
            boolean searching = largest > settings.maxStep() * LINE_SEARCH_THRESHOLD;
            // near the solution the next step reuses this factorisation (chord, or modified Newton): the
            // Jacobian of the next state differs from this one by about the size of the correction
            boolean reuse = largest <= settings.reuseThreshold();
            boolean withJacobian = false;
            for (int cut = 0; cut <= MAX_BACKTRACKS && !accepted; cut++) {
                damp(y, delta, lambda, trial);
                // a rejected chord trial is retried with a Jacobian of its own
                withJacobian = !(reuse && cut == 0);
                if (withJacobian) {
                    jacobian.clear();
                }
                try {
                    system.evaluate(trial, residual, withJacobian ? jacobian : null);
                    accepted = allFinite(residual);
                    rejection = accepted ? null : "non-finite residual";
                    // far from the solution, also ask the residuals to shrink (the last cut is taken anyway)
                    if (accepted && searching && cut < MAX_BACKTRACKS && sumOfSquares(residual) > norm) {
                        accepted = false;
                        rejection = "residuals grew";
                    }
                } catch (ConvgridException e) {
                    rejection = e.getMessage();
                }
                if (!accepted) {
                    lambda *= BACKTRACK_FACTOR;
                }
            }
            if (!accepted) {
                return new Result(y, new SolveReport(StopReason.BAD_STATE, iteration, largest, worst / nv,
                        unknownAt(system, worst), "every damped step was rejected: " + rejection));
            }
            System.arraycopy(trial, 0, y, 0, n);
            fresh = withJacobian;
            previousLargest = largest;
            smallest = Math.min(smallest, largest);
        }
        return new Result(y, new SolveReport(StopReason.ITERATION_BUDGET, settings.iterationBudget(), largest,
                worst / nv, unknownAt(system, worst), ""));
    }

    /**
     * The Newton correction of y with the factorised Jacobian into {@code delta}; returns the index of its
     * largest entry by {@link DifferenceSystem#correctionSize}.
     */
    private static int correct(DifferenceSystem system, double[] y, double[] residual, BandMatrix jacobian,
                               double[] delta) {
        for (int i = 0; i < delta.length; i++) {
            delta[i] = -residual[i];
        }
        jacobian.solve(delta);
        double largest = 0.0;
        int worst = 0;
        for (int i = 0; i < delta.length; i++) {
            double size = system.correctionSize(y, i, delta[i]);
            if (!(size <= largest)) {
                largest = size;
                worst = i;
            }
        }
        return worst;
    }

    /**
     * trial = y + lambda delta. A loop of its own, not inline in {@link #solve}: its back edges over every unknown
     * made the JIT compile the whole of solve on stack replacement, with the system's evaluation inlined into it,
     * and again after each deoptimisation (measured on the 200-model zero-age grid: 4-6 optimising compilations of
     * solve per run, 90-120 KB of machine code, more than any other method of ours). Solve itself loops only over
     * iterations, so it now stays in the quick compiler's code, where it spends next to nothing: the time is in
     * its callees, which are compiled on their own.
     */
    private static void damp(double[] y, double[] delta, double lambda, double[] trial) {
        for (int i = 0; i < trial.length; i++) {
            trial[i] = y[i] + lambda * delta[i];
        }
    }

    private static double sumOfSquares(double[] values) {
        double sum = 0.0;
        for (double v : values) {
            sum += v * v;
        }
        return sum;
    }

    private static boolean allFinite(double[] values) {
        for (double v : values) {
            if (!Double.isFinite(v)) {
                return false;
            }
        }
        return true;
    }
}
