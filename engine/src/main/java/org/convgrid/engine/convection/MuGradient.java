package org.convgrid.engine.convection;

import java.util.function.DoubleBinaryOperator;
import org.convgrid.engine.state.Composition;

/**
 * nabla_mu = dln mu/dln P per mesh point for the Ledoux criterion (Kippenhahn, Weigert &amp; Weiss 2012, ch. 6), from
 * the composition profile: mu of a fully ionised gas, 1/mu = sum X_i (1 + Z_i)/A_i with the metals at (1 + Z)/A = 1/2
 * (the usual approximation, e.g. Kippenhahn, Weigert &amp; Weiss 2012, ch. 13). On each interval nabla_mu is the
 * difference quotient between its two points; a point takes the one of its two intervals that is smaller in
 * magnitude (zero when they differ in sign, a "minmod" choice of ours), so the point at the edge of a
 * homogeneous mixed zone sees the zero gradient of its own side and is not stabilised by the composition step
 * just outside it, while the first point outside sees that step. The profiles' buoyancy frequency reads the same
 * intervals with a smoother point rule ({@link #harmonicMeanOf}). Stateless.
 */
public final class MuGradient {

    private MuGradient() {
    }

    /** 1/mu of a fully ionised mixture. */
    public static double inverseMu(Composition c) {
        return 2.0 * c.h1() + c.he3() + 0.75 * c.he4() + 0.5 * (c.c12() + c.n14() + c.o16() + c.otherMetals());
    }

    /**
     * The Ledoux criterion's nabla_mu: at each point the smaller in magnitude of its two intervals' slopes (minmod).
     *
     * @param composition per point
     * @param lnPressure ln P per point (decreasing outwards)
     * @return nabla_mu per point (positive where mu increases inwards)
     */
    public static double[] of(Composition[] composition, double[] lnPressure) {
        return atPoints(composition, lnPressure, (a, b) -> a * b <= 0.0 ? 0.0 : (Math.abs(a) < Math.abs(b) ? a : b));
    }

    /**
     * nabla_mu for the buoyancy frequency: at each point the harmonic mean 2ab/(a + b) of its two intervals' slopes
     * a and b, zero where they differ in sign or one is zero (van Leer 1974, J. Comput. Phys. 14, 361; from memory).
     * Like {@link #of} it leaves the edge point of a mixed zone at zero and never changes sign, but where the profile
     * is smooth it follows the slope to second order where minmod, always taking the smaller side, reads low and
     * jumps when the mesh spacing changes: 1 Msun at 4.57 Gyr, the composition part of N^2 at r/R 0.093-0.097
     * went 5.78, 5.85, 5.61 (1e-6 s^-2) with minmod, 5.87, 5.88, 5.77 with this. At a step the mesh does not resolve
     * it gives at most twice the minmod value.
     *
     * @param composition per point
     * @param lnPressure ln P per point (decreasing outwards)
     * @return nabla_mu per point (positive where mu increases inwards)
     */
    public static double[] harmonicMeanOf(Composition[] composition, double[] lnPressure) {
        return atPoints(composition, lnPressure, (a, b) -> a * b <= 0.0 ? 0.0 : 2.0 * a * b / (a + b));
    }

    /**
     * The slopes of the intervals on each side of a point, taken to it by a rule (the end points take their one
     * interval's slope).
     */
    private static double[] atPoints(Composition[] composition, double[] lnPressure, DoubleBinaryOperator rule) {
        int n = composition.length;
        double[] interval = new double[n - 1];
        for (int k = 0; k < n - 1; k++) {
            double dLnMu = Math.log(inverseMu(composition[k]) / inverseMu(composition[k + 1]));
            double dLnP = lnPressure[k + 1] - lnPressure[k];
            interval[k] = dLnP == 0.0 ? 0.0 : dLnMu / dLnP;
        }
        double[] out = new double[n];
        out[0] = interval[0];
        out[n - 1] = interval[n - 2];
        for (int k = 1; k < n - 1; k++) {
            out[k] = rule.applyAsDouble(interval[k - 1], interval[k]);
        }
        return out;
    }
}
