package org.convgrid.engine.calibration;

import java.util.function.Consumer;

import org.convgrid.engine.request.LifeStage;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.ModelSeismicScales;
import org.convgrid.engine.units.Constants;

/**
 * Solar calibration: the mixing length alpha and initial helium Y for which a 1 Msun model at the solar age has
 * the IAU 2015 nominal radius and luminosity (Prša et al. 2016), with Z tied to Y by the fixed Z/X
 * ({@link CalibrationSettings}). The two unknowns solve F(alpha, Y) = (ln R/R_sun, ln L/L_sun) = 0; each F is a
 * full evolution from the zero-age main sequence (the usual procedure of standard solar models, e.g. Bahcall,
 * Serenelli &amp; Basu 2005, whose physics differs from ours).
 *
 * <p>Method: Newton's method in two dimensions with a forward-difference Jacobian at the start (steps
 * {@link #ALPHA_STEP}, {@link #HELIUM_STEP}), then Broyden's (1965) rank-one secant update after every trial,
 * in variables scaled by those steps so the update's norm weighs both alike. Each step is capped
 * ({@link #MAX_ALPHA_CHANGE}, {@link #MAX_HELIUM_CHANGE}) and halved while it does not reduce |F|; below
 * {@link #MIN_DAMPING} the Jacobian is recomputed by differences. Converged when both residuals are within the
 * tolerance; the whole search is limited to {@link CalibrationSettings#evolutionBudget()} evolutions and fails
 * with {@link ErrorKind#NOT_CONVERGED} and the best point found. A last evolution of the calibrated star to
 * core-hydrogen exhaustion gives the main-sequence lifetime. With settling ({@link CalibrationSettings#settling()})
 * the envelope loses metals to the interior, so the Z/X aimed at is the envelope's at the solar age and the
 * initial Z/X is found around the calibration by fixed-point passes ({@link #MAX_RATIO_ITERATIONS},
 * {@link #RATIO_TOLERANCE}), each pass starting from the previous alpha and Y. Deterministic; immutable and
 * thread-safe.
 */
public final class SolarCalibration {

    /** Forward-difference step in alpha (residual changes ~1e-3, far above the evolution's noise). */
    public static final double ALPHA_STEP = 0.05;
    /** Forward-difference step in Y. */
    public static final double HELIUM_STEP = 0.005;
    /** Largest change of alpha in one Newton step. */
    public static final double MAX_ALPHA_CHANGE = 0.4;
    /** Largest change of Y in one Newton step. */
    public static final double MAX_HELIUM_CHANGE = 0.03;
    /** Below this damping factor the secant Jacobian is distrusted and recomputed by differences. */
    public static final double MIN_DAMPING = 0.2;
    /** Search box for alpha, pressure scale heights. */
    public static final double MIN_ALPHA = 0.5;
    public static final double MAX_ALPHA = 4.0;
    /** Search box for Y. */
    public static final double MIN_HELIUM = 0.2;
    public static final double MAX_HELIUM = 0.4;

    /** Passes of the initial-Z/X iteration allowed with settling. */
    public static final int MAX_RATIO_ITERATIONS = 5;
    /** Relative tolerance on the envelope Z/X with settling. */
    public static final double RATIO_TOLERANCE = 1.0e-3;

    private final CalibrationSettings settings;
    private final SolarTrack track;

    public SolarCalibration(CalibrationSettings settings) {
        this.settings = settings;
        this.track = new SolarTrack(settings);
    }

    /** Calibrates without progress reports. */
    public CalibratedSun calibrate() {
        return calibrate(trial -> { });
    }

    /**
     * @param progress told about every trial Sun as it is computed (e.g. to print progress)
     * @throws ConvgridException NOT_CONVERGED when the budget runs out (parameters: best alpha, Y, worst
     *                           residual, evolutions) or when the first trial cannot be computed
     */
    public CalibratedSun calibrate(Consumer<SolarTrial> progress) {
        if (!settings.settling()) {
            return calibrateAtFixedRatio(progress, settings.metalsToHydrogen());
        }
        // settling lowers the envelope's Z/X over the Sun's life: find the initial Z/X whose envelope ends at the
        // aim by fixed-point iteration (the drop is nearly proportional, so two or three passes suffice)
        double target = settings.metalsToHydrogen();
        double initial = target;
        SolarCalibration pass = this;
        int evolutions = 0;
        for (int i = 0; i < MAX_RATIO_ITERATIONS; i++) {
            CalibratedSun sun = pass.calibrateAtFixedRatio(progress, target);
            evolutions += sun.evolutions();
            double miss = sun.envelopeMetalsToHydrogen() / target - 1.0;
            if (Math.abs(miss) <= RATIO_TOLERANCE) {
                return sun.withEvolutions(evolutions);
            }
            initial /= 1.0 + miss;
            pass = new SolarCalibration(settings.withMetalsToHydrogen(initial)
                    .withStart(sun.mixingLength(), sun.helium()));
        }
        throw new ConvgridException(ErrorKind.NOT_CONVERGED, String.format(
                "the envelope Z/X of the calibrated Sun did not settle to %.5f within %d passes (last initial Z/X "
                        + "%.5f)", target, MAX_RATIO_ITERATIONS, initial), "Z/X", target, "passes",
                MAX_RATIO_ITERATIONS);
    }

    /**
     * One calibration of alpha and Y at this instance's initial Z/X ({@code settings.metalsToHydrogen()}).
     *
     * @param target the present surface Z/X the result reports as its aim
     */
    private CalibratedSun calibrateAtFixedRatio(Consumer<SolarTrial> progress, double target) {
        Search search = new Search(progress);
        SolarTrial current = search.trial(settings.startMixingLength(), settings.startHelium());
        double[][] jacobian = search.jacobian(current);
        double damping = 1.0;
        int steps = 0;
        while (current.worstResidual() > settings.tolerance()) {
            double[] f = residuals(current);
            double[] step = cap(solve(jacobian, f));
            double alpha = clamp(current.mixingLength() - damping * step[0] * ALPHA_STEP, MIN_ALPHA, MAX_ALPHA);
            double y = clamp(current.helium() - damping * step[1] * HELIUM_STEP, MIN_HELIUM, MAX_HELIUM);
            SolarTrial next = search.tryTrial(alpha, y);
            if (next != null) {
                broyden(jacobian, current, next);
            }
            if (next != null && norm(residuals(next)) < norm(f)) {
                current = next;
                damping = 1.0;
                steps++;
            } else if ((damping *= 0.5) < MIN_DAMPING) {
                jacobian = search.jacobian(current);
                damping = 1.0;
            }
        }
        SolarTrial whole = track.run(current.mixingLength(), current.helium(), true);
        search.evolutions++;
        progress.accept(whole);
        return result(whole, search.evolutions, steps, target);
    }

    private CalibratedSun result(SolarTrial t, int evolutions, int steps, double target) {
        if (t.worstResidual() > settings.tolerance()) {
            // the whole-life run lands on the same steps as the trial; a difference means that assumption broke
            throw new ConvgridException(ErrorKind.NOT_CONVERGED, String.format(
                    "the whole-life run of the calibrated Sun (alpha = %.5f, Y = %.5f) misses R or L by %.3g",
                    t.mixingLength(), t.helium(), t.worstResidual()), "alpha", t.mixingLength(), "Y", t.helium(),
                    "residual", t.worstResidual());
        }
        ModelRequest request = new ModelRequest(CalibratedSun.MODEL_ID, Constants.M_SUN, t.metals(), t.helium(),
                settings.age(), SolarTrack.options(t.mixingLength(), settings));
        var m = t.model();
        ModelOutcome outcome = new ModelOutcome.Solved(request, m.global(), m.convection(), t.iterationsToAge(),
                LifeStage.MAIN_SEQUENCE_UNTRACED, Double.NaN, ModelSeismicScales.of(m));
        Composition envelope = EnvelopeComposition.of(m);
        return new CalibratedSun(t.mixingLength(), t.helium(), t.metals(), target,
                settings.age(), outcome, m, t.radiusResidual(), t.luminosityResidual(), t.zeroAgeLuminosity(),
                t.evolution().exhaustionAge(), m.convection().envelopeBaseRadiusFraction(),
                m.global().centralTemperature(), m.global().centralDensity(), evolutions, steps,
                settings.metalsToHydrogen(), envelope.y(),
                EnvelopeComposition.metalsToHydrogen(envelope));
    }

    private static double[] residuals(SolarTrial t) {
        return new double[] {t.radiusResidual(), t.luminosityResidual()};
    }

    /** Solves J d = f for the 2x2 system (Cramer's rule); fails when J is singular. */
    private static double[] solve(double[][] j, double[] f) {
        double det = j[0][0] * j[1][1] - j[0][1] * j[1][0];
        if (!(Math.abs(det) > 0.0) || !Double.isFinite(det)) {
            throw new ConvgridException(ErrorKind.NOT_CONVERGED,
                    "singular Jacobian of (ln R, ln L) in (alpha, Y): determinant " + det, "determinant", det);
        }
        return new double[] {(f[0] * j[1][1] - f[1] * j[0][1]) / det, (j[0][0] * f[1] - j[1][0] * f[0]) / det};
    }

    /** Scales a step (in units of the difference steps) so that neither unknown moves more than its cap. */
    private static double[] cap(double[] d) {
        double scale = Math.min(1.0, Math.min(MAX_ALPHA_CHANGE / Math.abs(d[0] * ALPHA_STEP),
                MAX_HELIUM_CHANGE / Math.abs(d[1] * HELIUM_STEP)));
        return new double[] {scale * d[0], scale * d[1]};
    }

    /** Broyden's (1965) good update J += (dF - J ds) ds^T / (ds . ds), in the scaled variables. */
    private static void broyden(double[][] j, SolarTrial from, SolarTrial to) {
        double[] ds = {(to.mixingLength() - from.mixingLength()) / ALPHA_STEP,
            (to.helium() - from.helium()) / HELIUM_STEP};
        double[] f0 = residuals(from);
        double[] f1 = residuals(to);
        double dd = ds[0] * ds[0] + ds[1] * ds[1];
        if (dd == 0.0) {
            return;
        }
        for (int i = 0; i < 2; i++) {
            double miss = f1[i] - f0[i] - (j[i][0] * ds[0] + j[i][1] * ds[1]);
            j[i][0] += miss * ds[0] / dd;
            j[i][1] += miss * ds[1] / dd;
        }
    }

    private static double norm(double[] f) {
        return Math.hypot(f[0], f[1]);
    }

    private static double clamp(double v, double lo, double hi) {
        return Math.max(lo, Math.min(hi, v));
    }

    /** The evolution count, the best trial so far and the budget of one calibration. */
    private final class Search {
        private final Consumer<SolarTrial> progress;
        private int evolutions;
        private SolarTrial best;

        Search(Consumer<SolarTrial> progress) {
            this.progress = progress;
        }

        SolarTrial trial(double alpha, double y) {
            if (evolutions >= settings.evolutionBudget()) {
                throw new ConvgridException(ErrorKind.NOT_CONVERGED, String.format(
                        "solar calibration used its %d evolutions; best: alpha = %.5f, Y = %.5f, "
                                + "|ln R/R_sun|, |ln L/L_sun| up to %.3g (tolerance %.3g)", evolutions,
                        best.mixingLength(), best.helium(), best.worstResidual(), settings.tolerance()),
                        "alpha", best.mixingLength(), "Y", best.helium(), "residual", best.worstResidual(),
                        "evolutions", evolutions);
            }
            evolutions++;
            SolarTrial t = track.run(alpha, y, false);
            progress.accept(t);
            if (best == null || norm(residuals(t)) < norm(residuals(best))) {
                best = t;
            }
            return t;
        }

        /** A trial, or null when its zero-age model or evolution fails (the step is then shortened). */
        SolarTrial tryTrial(double alpha, double y) {
            try {
                return trial(alpha, y);
            } catch (ConvgridException e) {
                if (e.parameters().contains("evolutions")) { // the budget is spent: give up
                    throw e;
                }
                return null;
            }
        }

        /** Forward differences of (ln R, ln L) per unit of the scaled unknowns (alpha/ALPHA_STEP, Y/HELIUM_STEP). */
        double[][] jacobian(SolarTrial at) {
            SolarTrial a = trial(at.mixingLength() + ALPHA_STEP, at.helium());
            SolarTrial y = trial(at.mixingLength(), at.helium() + HELIUM_STEP);
            return new double[][] {
                {a.radiusResidual() - at.radiusResidual(), y.radiusResidual() - at.radiusResidual()},
                {a.luminosityResidual() - at.luminosityResidual(), y.luminosityResidual() - at.luminosityResidual()}};
        }
    }
}
