package org.convgrid.engine.convection;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.engine.units.Constants;

/**
 * Local mixing-length convection after Böhm-Vitense (1958, Z. Astrophys. 46, 108) in the U, W form of
 * Kippenhahn, Weigert &amp; Weiss (2012, Stellar Structure and Evolution, 2nd ed., ch. 7).
 *
 * <p>With H_P = P/(rho g), l_m = alpha H_P, U = (3 a c T^3/(c_P rho^2 kappa l_m^2)) sqrt(8 H_P/(g delta)) and
 * W = nabla_rad - nabla_ad, the variable xi^2 = nabla - nabla_ad + U^2 solves
 * (xi - U)^3 + (8U/9)(xi^2 - U^2 - W) = 0. The code works with x = xi - U, which turns the cubic into
 * x^3 + (8U/9)(x^2 + 2Ux - W) = 0 on the bracket [0, W/(sqrt(U^2+W) + U)], and gives
 * nabla = nabla_ad + x(x + 2U), nabla_e = nabla_ad + 2Ux, v_c = sqrt(g delta/(8 H_P)) l_m x without any
 * difference of nearly equal numbers in either limit (U to 0: nabla to nabla_ad; U to infinity: nabla to
 * nabla_rad). The cubic is increasing and convex on the bracket, so Newton started from an upper bound
 * decreases monotonically to the root.
 *
 * <p>A point is convective when nabla_rad exceeds the stability gradient of the state (nabla_ad or the Ledoux
 * gradient); elsewhere nabla = nabla_rad, v_c = 0 and nabla_e is reported as nabla_ad. Immutable and thread-safe.
 */
public final class MixingLengthTheory implements ConvectiveTransport {

    /** Newton stops when the step is below this fraction of x. */
    public static final double ROOT_RELATIVE_TOLERANCE = 1.0e-14;
    /** Newton iteration budget; a few iterations suffice from the asymptotic starting value. */
    public static final int MAX_ITERATIONS = 60;
    /** Largest accepted alpha, in pressure scale heights. */
    public static final double MAX_ALPHA = 10.0;

    private static final double EIGHT_NINTHS = 8.0 / 9.0;
    private static final double THREE_AC = 3.0 * Constants.A_RAD * Constants.C;

    private final double alpha;

    /** @param alpha mixing length in pressure scale heights, in (0, {@value #MAX_ALPHA}] */
    public MixingLengthTheory(double alpha) {
        if (!(alpha > 0.0)) {
            throw new ConvgridException(ErrorKind.OUT_OF_RANGE, "mixing length alpha must be > 0, got " + alpha,
                    "alpha", alpha, 0.0, MAX_ALPHA);
        }
        this.alpha = ConvgridException.requireInRange("alpha", alpha, 0.0, MAX_ALPHA, "H_P");
    }

    /** The mixing-length parameter, in pressure scale heights. */
    public double alpha() {
        return alpha;
    }

    @Override
    public ConvectiveGradient gradient(LocalConvectionState state) {
        return solve(state).gradient();
    }

    /** {@link #solve}: the derivatives come from implicit differentiation of the cubic. */
    @Override
    public MixingLengthSolution withSlopes(LocalConvectionState state) {
        return solve(state);
    }

    /**
     * The gradient with its derivatives by nabla_rad, nabla_ad and ln U.
     *
     * @throws ConvgridException OUT_OF_RANGE when a state variable that must be positive is not
     */
    public MixingLengthSolution solve(LocalConvectionState s) {
        return solve(s.temperature(), s.density(), s.pressure(), s.gravity(), s.opacity(), s.cp(), s.delta(),
                s.nablaRad(), s.nablaAd(), s.nablaStability());
    }

    /**
     * {@link #solve(LocalConvectionState)} on the state's components. Why a method of its own: this one is too large
     * for the JIT to inline, and the state record handed to it was allocated at every convective point of every
     * structure evaluation (a 1 Msun zero-age track: 12 MB of its 280 MB); the small method above is inlined, so the
     * record its caller makes stays off the heap.
     */
    private MixingLengthSolution solve(double temperature, double density, double pressure, double gravity,
                                       double opacity, double cp, double delta, double nablaRad, double nablaAd,
                                       double nablaStability) {
        double t = positive("temperature", temperature);
        double rho = positive("density", density);
        double g = positive("gravity", gravity);
        double hp = positive("pressure", pressure) / (rho * g);
        double lm = alpha * hp;
        double w = nablaRad - nablaAd;
        if (!(nablaRad > nablaStability) || !(w > 0.0)) {
            // Stable, or Ledoux-unstable with nabla_rad below nabla_ad (negative mu gradient): no convective flux.
            return new MixingLengthSolution(new ConvectiveGradient(nablaRad, nablaAd, 0.0, lm,
                    nablaRad > nablaStability), 0.0, 1.0, 0.0, 0.0);
        }
        double gDelta = g * positive("delta", delta);
        double u = THREE_AC * t * t * t
                / (positive("cp", cp) * rho * rho * positive("opacity", opacity) * lm * lm)
                * Math.sqrt(8.0 * hp / gDelta);
        double x = solveCubic(u, w);
        double nabla = nablaAd + x * (x + 2.0 * u);
        double nablaE = nablaAd + 2.0 * u * x;
        double v = Math.sqrt(gDelta / (8.0 * hp)) * lm * x;
        // Implicit differentiation of f(x; U, W) = x^3 + (8U/9)(x^2 + 2Ux - W) = 0; on the root
        // (8/9)(x^2 + 2Ux - W) = -x^3/U, which keeps df/dU free of cancellation.
        double fx = 3.0 * x * x + 2.0 * EIGHT_NINTHS * u * (x + u);
        double dxdw = EIGHT_NINTHS * u / fx;
        double dxdu = -(-x * x * x / u + 2.0 * EIGHT_NINTHS * u * x) / fx;
        double dNablaDw = 2.0 * (x + u) * dxdw;
        double dNablaDlnU = u * (2.0 * (x + u) * dxdu + 2.0 * x);
        return new MixingLengthSolution(new ConvectiveGradient(nabla, nablaE, v, lm, true), u, dNablaDw,
                1.0 - dNablaDw, dNablaDlnU);
    }

    /**
     * The root x = xi - U of x^3 + (8U/9)(x^2 + 2Ux - W) = 0 in [0, W/(sqrt(U^2+W) + U)].
     *
     * @param u efficiency parameter U &gt; 0
     * @param w nabla_rad - nabla_ad &gt; 0
     * @throws ConvgridException NOT_CONVERGED when the iteration budget is exhausted
     */
    static double solveCubic(double u, double w) {
        double c = EIGHT_NINTHS * u;
        // Three upper bounds of the root (f >= 0 at each): the bracket end, the efficient limit
        // (8UW/9)^(1/3) and the inefficient limit W/(2U). Their minimum is within a few per cent of the root.
        double x = Math.min(w / (Math.sqrt(u * u + w) + u), Math.min(Math.cbrt(c * w), w / (2.0 * u)));
        for (int i = 0; i < MAX_ITERATIONS; i++) {
            double f = x * x * x + c * (x * (x + 2.0 * u) - w);
            if (f <= 0.0) {
                return x; // reached the root to rounding: Newton from the right never crosses it otherwise
            }
            double step = f / (3.0 * x * x + 2.0 * c * (x + u));
            x -= step;
            if (step <= ROOT_RELATIVE_TOLERANCE * x) {
                return x;
            }
        }
        throw new ConvgridException(ErrorKind.NOT_CONVERGED,
                String.format("mixing-length cubic did not converge in %d iterations (U = %s, W = %s, x = %s)",
                        MAX_ITERATIONS, u, w, x), MAX_ITERATIONS, u, w, x);
    }

    private static double positive(String name, double value) {
        if (!(value > 0.0) || value == Double.POSITIVE_INFINITY) {
            throw new ConvgridException(ErrorKind.OUT_OF_RANGE,
                    String.format("%s = %s must be positive and finite for mixing-length convection", name, value),
                    name, value, 0.0, Double.POSITIVE_INFINITY);
        }
        return value;
    }
}
