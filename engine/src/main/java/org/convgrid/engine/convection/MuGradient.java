package org.convgrid.engine.convection;

import org.convgrid.engine.state.Composition;

/**
 * nabla_mu = dln mu/dln P per mesh point for the Ledoux criterion (Kippenhahn, Weigert &amp; Weiss 2012, ch. 6), from
 * the composition profile: mu of a fully ionised gas, 1/mu = sum X_i (1 + Z_i)/A_i with the metals at (1 + Z)/A = 1/2
 * (the usual approximation, e.g. Kippenhahn, Weigert &amp; Weiss 2012, ch. 13). On each interval nabla_mu is the
 * difference quotient between its two points; a point takes the one of its two intervals that is smaller in
 * magnitude (zero when they differ in sign, a "minmod" choice of ours), so the point at the edge of a
 * homogeneous mixed zone sees the zero gradient of its own side and is not stabilised by the composition step
 * just outside it, while the first point outside sees that step. The evolution's Ledoux criterion and the profiles'
 * buoyancy frequency read the same term. Stateless.
 */
public final class MuGradient {

    private MuGradient() {
    }

    /** 1/mu of a fully ionised mixture. */
    public static double inverseMu(Composition c) {
        return 2.0 * c.h1() + c.he3() + 0.75 * c.he4() + 0.5 * (c.c12() + c.n14() + c.o16() + c.otherMetals());
    }

    /**
     * @param composition per point
     * @param lnPressure ln P per point (decreasing outwards)
     * @return nabla_mu per point (positive where mu increases inwards)
     */
    public static double[] of(Composition[] composition, double[] lnPressure) {
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
            double a = interval[k - 1];
            double b = interval[k];
            out[k] = a * b <= 0.0 ? 0.0 : (Math.abs(a) < Math.abs(b) ? a : b);
        }
        return out;
    }
}
