package org.convgrid.engine.refine;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleFunction;
import java.util.function.DoubleUnaryOperator;
import java.util.function.Function;
import java.util.function.Predicate;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelRequest;

/**
 * Narrows a mass bracket around a change of convective state by bisection (the textbook method: halve the bracket,
 * keep the half whose ends differ). Both ends are first recomputed on the line, lower end first, so every new model
 * has converged neighbours on both sides; a {@link MassLine} that seeds from its nearest converged models (the
 * production {@link ZamsMassLines}) then seeds each midpoint from the nearer bracket end. The loop runs until the
 * bracket is narrower than the tolerance, a model fails (the bracket stays as it was before that model; no guess is
 * made past it), no representable mass is left between the ends, or {@link #STEP_BUDGET} midpoints were spent. A line
 * whose models do not seed one another (each model evolved from scratch to an age) gains nothing from the recomputed
 * ends: {@link #refineWithinKnownEnds} takes the caller's word for them and computes midpoints only. Deterministic: the answer depends only on the line's answers. Thread-safe (stateless once built).
 */
public final class MassBisection {

    /** Midpoints computed at most for one bracket: 2^-60 of any bracket is far below every mass resolution. */
    public static final int STEP_BUDGET = 60;

    private final double tolerance;
    private final DoubleUnaryOperator representable;

    /**
     * @param tolerance the final bracket must be narrower than this, g, &gt; 0
     * @param representable maps a midpoint mass (g) to the mass actually computed (g), for example one the
     *     caller's tables write exactly; {@link DoubleUnaryOperator#identity()} keeps midpoints as they are
     */
    public MassBisection(double tolerance, DoubleUnaryOperator representable) {
        if (!(tolerance > 0.0 && Double.isFinite(tolerance))) {
            throw new IllegalArgumentException("the tolerance must be a positive mass in g, got " + tolerance);
        }
        this.tolerance = tolerance;
        this.representable = representable;
    }

    /** The tolerance, g. */
    public double tolerance() {
        return tolerance;
    }

    /**
     * @param line computes the models (in the order: lower end, upper end, then each midpoint)
     * @param requestAt the request for a mass (g) of the line
     * @param lowMass the mass below the transition, g, whose model is on the low side
     * @param highMass the mass above it, g, &gt; lowMass, whose model is on the high side
     * @param lowSide whether a usable outcome is on the low side of the transition
     */
    public Refinement refine(MassLine line, DoubleFunction<ModelRequest> requestAt, double lowMass, double highMass,
                             Predicate<ModelOutcome.Solved> lowSide) {
        return refine(line, requestAt, lowMass, highMass, solvedSide(lowSide), true);
    }

    /**
     * As {@link #refine}, but the ends are taken as the caller says (their models already computed, on the low and
     * the high side): the line is asked for midpoints only. For lines whose models do not seed one another.
     */
    public Refinement refineWithinKnownEnds(MassLine line, DoubleFunction<ModelRequest> requestAt, double lowMass,
                                            double highMass, Predicate<ModelOutcome.Solved> lowSide) {
        return refine(line, requestAt, lowMass, highMass, solvedSide(lowSide), false);
    }

    /**
     * As {@link #refine}, with the side decided from any outcome, failed ones included: for a transition a status
     * marks (a model past the main sequence is on the high side of the turn-off) as for one a structure marks.
     *
     * @param sideOf the side of an outcome; {@link BracketSide#UNUSABLE} stops the bisection before it
     */
    public Refinement refineBySide(MassLine line, DoubleFunction<ModelRequest> requestAt, double lowMass,
                                   double highMass, Function<ModelOutcome, BracketSide> sideOf) {
        return refine(line, requestAt, lowMass, highMass, sideOf, true);
    }

    /**
     * As {@link #refineWithinKnownEnds}, with the side decided from any outcome, failed ones included (see
     * {@link #refineBySide}).
     *
     * @param sideOf the side of an outcome; {@link BracketSide#UNUSABLE} stops the bisection before it
     */
    public Refinement refineWithinKnownEndsBySide(MassLine line, DoubleFunction<ModelRequest> requestAt,
                                                  double lowMass, double highMass,
                                                  Function<ModelOutcome, BracketSide> sideOf) {
        return refine(line, requestAt, lowMass, highMass, sideOf, false);
    }

    /** A structure's side: solved models by the predicate, the others unusable. */
    private static Function<ModelOutcome, BracketSide> solvedSide(Predicate<ModelOutcome.Solved> lowSide) {
        return o -> !(o instanceof ModelOutcome.Solved solved) ? BracketSide.UNUSABLE
                : lowSide.test(solved) ? BracketSide.LOW : BracketSide.HIGH;
    }

    private Refinement refine(MassLine line, DoubleFunction<ModelRequest> requestAt, double lowMass, double highMass,
                              Function<ModelOutcome, BracketSide> sideOf, boolean recomputeEnds) {
        if (!(lowMass > 0.0 && highMass > lowMass && Double.isFinite(highMass))) {
            throw new IllegalArgumentException("a bracket needs 0 < low < high (g), got " + lowMass + " and "
                    + highMass);
        }
        List<ModelOutcome> added = new ArrayList<>();
        for (double end : recomputeEnds ? new double[] {lowMass, highMass} : new double[0]) {
            ModelOutcome o = line.solve(requestAt.apply(end));
            BracketSide side = sideOf.apply(o);
            if (side == BracketSide.UNUSABLE) {
                return new Refinement(lowMass, highMass, added, BisectionStop.END_NOT_USABLE, end, o.statusDetail());
            }
            if ((side == BracketSide.LOW) != (end == lowMass)) {
                return new Refinement(lowMass, highMass, added, BisectionStop.END_DISAGREES, end, "");
            }
        }
        double lo = lowMass;
        double hi = highMass;
        for (int step = 0; hi - lo >= tolerance; step++) {
            if (step == STEP_BUDGET) {
                return new Refinement(lo, hi, added, BisectionStop.BUDGET, Double.NaN, "");
            }
            double mid = representable.applyAsDouble(0.5 * (lo + hi));
            if (!(mid > lo && mid < hi)) {
                return new Refinement(lo, hi, added, BisectionStop.RESOLUTION, Double.NaN, "");
            }
            ModelOutcome o = line.solve(requestAt.apply(mid));
            added.add(o);
            BracketSide side = sideOf.apply(o);
            if (side == BracketSide.UNUSABLE) {
                return new Refinement(lo, hi, added, BisectionStop.MODEL_NOT_USABLE, mid, o.statusDetail());
            }
            if (side == BracketSide.LOW) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return new Refinement(lo, hi, added, BisectionStop.NARROW_ENOUGH, Double.NaN, "");
    }
}
