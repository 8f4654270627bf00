package org.convgrid.engine.evolution;

import org.convgrid.engine.physics.nuclear.LightElementCaptures;
import org.convgrid.engine.physics.nuclear.NuclearNetwork;
import org.convgrid.engine.state.Composition;

/**
 * The destruction rates per unit abundance of deuterium and 7Li, lambda_i = -(dX_i/dt)/X_i (s^-1), at every point
 * of a model as {@link LightElementBurning} applies them: a point of an instantaneously mixed zone (a run of mixed
 * points) gets the zone's mass-weighted mean rate, taken at the zone's mean composition, every other point its own.
 * Both captures are linear in the fragile species' abundance (Clayton 1968, Principles of Stellar Evolution and
 * Nucleosynthesis, ch. 5), so lambda does not depend on it; a species absent from a point gets rate 0 there (there
 * is nothing for it to burn). An immutable pair of arrays.
 *
 * @param deuterium lambda_D per point, s^-1 (not negative)
 * @param lithium lambda_Li per point, s^-1 (not negative)
 */
record LightElementRates(double[] deuterium, double[] lithium) {

    /**
     * @param network the network whose captures give the rates ({@link NuclearNetwork#lightElementCaptures})
     * @param w mass of each point's cell (any unit)
     * @param mixed which points are mixed
     * @param comp composition per point (a mixed zone's is averaged over it first)
     * @param rho density per point, g cm^-3
     * @param t temperature per point, K
     */
    static LightElementRates of(NuclearNetwork network, double[] w, boolean[] mixed, Composition[] comp,
                                double[] rho, double[] t) {
        int n = comp.length;
        double[] d = new double[n];
        double[] li = new double[n];
        int k = 0;
        while (k < n) {
            int end = ConvectiveMixing.runEnd(mixed, k);
            if (!anyIn(comp, k, end)) {
                // a zone without either species (a convective core) burns none: no mean composition needed
                k = end + 1;
                continue;
            }
            Composition c = end == k ? comp[k] : ConvectiveMixing.mean(w, comp, k, end);
            double sumD = 0.0;
            double sumLi = 0.0;
            double mass = 0.0;
            for (int j = k; j <= end; j++) {
                LightElementCaptures r = network.lightElementCaptures(rho[j], t[j], c);
                sumD += w[j] * r.deuterium();
                sumLi += w[j] * r.lithium();
                mass += w[j];
            }
            double meanD = mass > 0.0 ? Math.max(0.0, sumD / mass) : 0.0;
            double meanLi = mass > 0.0 ? Math.max(0.0, sumLi / mass) : 0.0;
            for (int j = k; j <= end; j++) {
                d[j] = meanD;
                li[j] = meanLi;
            }
            k = end + 1;
        }
        return new LightElementRates(d, li);
    }

    /** Whether any point of {@code comp} holds deuterium or 7Li. */
    static boolean anyIn(Composition[] comp) {
        return anyIn(comp, 0, comp.length - 1);
    }

    /** Whether any of the points lo..hi (inclusive) holds deuterium or 7Li. */
    private static boolean anyIn(Composition[] comp, int lo, int hi) {
        for (int j = lo; j <= hi; j++) {
            if (comp[j].h2() > 0.0 || comp[j].li7() > 0.0) {
                return true;
            }
        }
        return false;
    }
}
