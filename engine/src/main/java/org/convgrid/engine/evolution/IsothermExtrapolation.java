package org.convgrid.engine.evolution;

import org.convgrid.engine.structure.MassMesh;

/**
 * The time extrapolation of a step's starting guess in the outer layers taken along isotherms instead of at fixed
 * mass. Before the zero-age main sequence the outer layers of a contracting star hold a steep front, the
 * superadiabatic layer where hydrogen recombines (ln T falls by ~0.3 over a few mesh points), that moves through
 * the mass mesh by a point or two per step as surface gravity grows; the unknowns at a fixed mass point then change
 * in a way a line or parabola through the last models cannot follow (measured at 1 Msun, Z = 0.02, below 1e5 yr:
 * the first Newton correction ~0.12 in ln rho and ln T at the front, against ~1e-3 elsewhere, and five iterations a
 * step). Where each isotherm lies (its ln(1 - m/M)) and the density, radius and luminosity on it change smoothly,
 * so these are extrapolated at fixed ln T, with the same divided differences as at fixed mass, and read back at the
 * mesh points. Only the guess changes, never the solution it relaxes to. Below {@link #MAX_TEMPERATURE} only, where
 * T falls outwards steeply enough to label the layers; anywhere the isotherms cannot be matched (not monotonic, out
 * of range) the fixed-mass extrapolation stays.
 */
final class IsothermExtrapolation {

    /** Hottest layer extrapolated along isotherms, K: above the ionisation zones of hydrogen and helium. */
    static final double MAX_TEMPERATURE = 2.0e5;

    private IsothermExtrapolation() {
    }

    /**
     * Replaces, in the outer layers, the fixed-mass extrapolated change already added to {@code target} by the
     * change along isotherms. All arrays are ln r, ln rho, ln T, L per point on {@code mesh}; {@code target} holds
     * {@code base} (the guess's own unknowns) with the fixed-mass change of the line (first null) or parabola
     * through {@code now}, {@code before} (olderStep earlier) and {@code first} (oldestStep before that) over dt
     * added; none of the others is modified.
     */
    static void apply(double[][] target, double[][] base, double[][] now, double[][] before, double[][] first,
                      MassMesh mesh, double olderStep, double oldestStep, double dt) {
        int n = mesh.size();
        double lnLimit = Math.log(MAX_TEMPERATURE);
        int start = n - 1;
        while (start > 1 && now[2][start - 1] < lnLimit) {
            start--;
        }
        int last = n - 2;
        if (last - start < 3 || !falling(now[2], 1, last) || !falling(before[2], 1, last)
                || (first != null && !falling(first[2], 1, last))) {
            return;
        }
        double[] s = new double[n];
        for (int k = 1; k <= last; k++) {
            s[k] = Math.log(mesh.exteriorFraction(k));
        }
        int m = last - start + 1;
        // per isotherm of the previous model (tau_i = its ln T at point start + i): ln(1 - m/M), ln r, ln rho, L
        double[][] ahead = new double[4][m];
        boolean[] valid = new boolean[m];
        double[] fromBefore = new double[4];
        double[] fromFirst = new double[4];
        for (int i = 0; i < m; i++) {
            int k = start + i;
            double tau = now[2][k];
            if (!onIsotherm(before, s, tau, last, fromBefore)
                    || (first != null && !onIsotherm(first, s, tau, last, fromFirst))) {
                continue;
            }
            valid[i] = true;
            double[] atNow = {s[k], now[0][k], now[1][k], now[3][k]};
            for (int v = 0; v < 4; v++) {
                double slope = (atNow[v] - fromBefore[v]) / olderStep;
                double curvature = first == null ? 0.0
                        : (slope - (fromBefore[v] - fromFirst[v]) / oldestStep) / (olderStep + oldestStep);
                ahead[v][i] = atNow[v] + dt * slope + dt * (dt + olderStep) * curvature;
            }
        }
        for (int k = start; k <= last; k++) {
            for (int i = 0; i + 1 < m; i++) {
                if (!valid[i] || !valid[i + 1]) {
                    continue;
                }
                double hi = ahead[0][i];
                double lo = ahead[0][i + 1];
                if (!(hi > lo) || s[k] > hi || s[k] < lo) {
                    continue;
                }
                double w = (hi - s[k]) / (hi - lo);
                int p = start + i;
                target[0][k] = base[0][k] - now[0][k] + ahead[1][i] + w * (ahead[1][i + 1] - ahead[1][i]);
                target[1][k] = base[1][k] - now[1][k] + ahead[2][i] + w * (ahead[2][i + 1] - ahead[2][i]);
                target[2][k] = base[2][k] - now[2][k] + now[2][p] + w * (now[2][p + 1] - now[2][p]);
                target[3][k] = base[3][k] - now[3][k] + ahead[3][i] + w * (ahead[3][i + 1] - ahead[3][i]);
                break;
            }
        }
    }

    /** Whether values fall strictly from index from to to. */
    private static boolean falling(double[] values, int from, int to) {
        for (int k = from; k < to; k++) {
            if (!(values[k + 1] < values[k])) {
                return false;
            }
        }
        return true;
    }

    /**
     * ln(1 - m/M), ln r, ln rho and L of {@code model} where its ln T equals tau (linear between its points 1 to
     * last), into {@code out}; false when tau is outside that range.
     */
    private static boolean onIsotherm(double[][] model, double[] s, double tau, int last, double[] out) {
        double[] lnT = model[2];
        if (tau > lnT[1] || tau < lnT[last]) {
            return false;
        }
        int lo = 1;
        int hi = last;
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if (lnT[mid] >= tau) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        double w = (lnT[lo] - tau) / (lnT[lo] - lnT[hi]);
        out[0] = s[lo] + w * (s[hi] - s[lo]);
        out[1] = model[0][lo] + w * (model[0][hi] - model[0][lo]);
        out[2] = model[1][lo] + w * (model[1][hi] - model[1][lo]);
        out[3] = model[3][lo] + w * (model[3][hi] - model[3][lo]);
        return true;
    }
}
