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
     * A mixed zone's points whose captures, all together, add less than this share of the zone's sum so far are
     * not evaluated: each such term is below half a unit in the last place of the sum, so adding it leaves the sum
     * as it is, to the last bit. The captures rise with the temperature and the density at a fixed composition
     * (the Gamow factor: d ln lambda/d ln T = tau/3 - 2/3, tau = 3.7 / T9^(1/3) for d + p and 8.5 / T9^(1/3) for
     * 7Li + p, far above the screening's d ln f/d ln T of order -1 below 1e9 K; rho Y_p and the screening both rise
     * with rho; Clayton 1968, Principles of Stellar Evolution and Nucleosynthesis, ch. 4), so a point no hotter and
     * no denser than one whose rates times the zone's remaining mass are below it adds at most that much. Why: on
     * the main sequence of a 1 Msun star 7Li survives in the convective envelope, ~280 of 500 points, and the
     * captures at its ~225 outer points, cooler than ~1e6 K, are below 1e-18 of the zone's sum (measured); they were
     * two thirds of the light elements' rate evaluations of a step.
     */
    static final double NEGLIGIBLE_SHARE = 0x1p-60;

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
            double zoneMass = 0.0;
            for (int j = k; j <= end; j++) {
                zoneMass += w[j];
            }
            // the point whose rates bound those of every cooler and thinner point of the zone, once they are too
            // small to move the sums (see NEGLIGIBLE_SHARE); -1 until then
            int bound = -1;
            double boundD = 0.0;
            double boundLi = 0.0;
            for (int j = k; j <= end; j++) {
                mass += w[j];
                if (bound >= 0 && t[j] <= t[bound] && rho[j] <= rho[bound]) {
                    continue;
                }
                LightElementCaptures r = network.lightElementCaptures(rho[j], t[j], c);
                sumD += w[j] * r.deuterium();
                sumLi += w[j] * r.lithium();
                double rest = zoneMass - mass;
                if (r.deuterium() * rest <= NEGLIGIBLE_SHARE * sumD && r.lithium() * rest <= NEGLIGIBLE_SHARE * sumLi
                        && (bound < 0 || r.deuterium() <= boundD && r.lithium() <= boundLi)) {
                    bound = j;
                    boundD = r.deuterium();
                    boundLi = r.lithium();
                }
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
