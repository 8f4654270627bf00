package org.convgrid.engine.physics.nuclear;

/**
 * Closed-form abundance evolution at fixed density and temperature, used to bring 3He and the CN pair towards
 * their equilibria over a stated time (derived here; standard calculus, no single source).
 */
final class AbundanceRelaxation {

    private AbundanceRelaxation() {
    }

    /**
     * Solution of {@code dn/dt = a - c n - b n^2} (3He: a = production by p+p, b from 3He+3He, c from 3He+4He)
     * after time t from n0 &gt;= 0. With {@code D = sqrt(c^2 + 4ab)} the fixed point is {@code n+ = 2a/(c + D)}
     * and {@code delta = n - n+} obeys the Bernoulli equation {@code d delta/dt = -D delta - b delta^2}, so
     * {@code delta(t) = delta0 e^(-Dt) / [1 + b delta0 (1 - e^(-Dt))/D]}. The denominator stays above 1/2 for
     * any n0 &gt;= 0 (because b n+ &lt;= D/2), and the D -&gt; 0 limit is handled by (1 - e^(-Dt))/D -&gt; t.
     *
     * @param a production rate, mol g^-1 s^-1
     * @param b quadratic destruction coefficient, g mol^-1 s^-1
     * @param c linear destruction rate, s^-1
     * @param n0 initial abundance, mol g^-1
     * @param time s
     * @return abundance after {@code time}, mol g^-1
     */
    static double quadratic(double a, double b, double c, double n0, double time) {
        double d = Math.sqrt(c * c + 4.0 * a * b);
        double fixedPoint = d + c > 0.0 ? 2.0 * a / (c + d) : 0.0;
        double delta0 = n0 - fixedPoint;
        double dt = d * time;
        double decay = Math.exp(-dt);
        double growth = dt > 1.0e-12 ? -Math.expm1(-dt) / d : time;
        double n = fixedPoint + delta0 * decay / (1.0 + b * delta0 * growth);
        return Math.max(0.0, n);
    }

    /**
     * The linear pair {@code y12 -&gt; y14} at rate k12 and {@code y14 -&gt; y12} at rate k14 (the lumped CN cycle):
     * the sum is conserved and y12 relaxes to {@code S k14/(k12 + k14)} with e-folding time 1/(k12 + k14).
     *
     * @param k12 destruction rate of 12C, s^-1
     * @param k14 destruction rate of 14N, s^-1
     * @param y12 initial 12C, mol g^-1
     * @param y14 initial 14N, mol g^-1
     * @param time s
     * @return 12C after {@code time}, mol g^-1 (14N is the sum minus this)
     */
    static double linearPair(double k12, double k14, double y12, double y14, double time) {
        double k = k12 + k14;
        if (!(k > 0.0)) {
            return y12;
        }
        double equilibrium = (y12 + y14) * (k14 / k);
        return equilibrium + (y12 - equilibrium) * Math.exp(-k * time);
    }

    /**
     * The change of {@link #quadratic}'s result when a, b and c change by da, db and dc (its derivative along that
     * direction, the same closed form differentiated; 0 where the result is clamped at zero).
     */
    static double quadraticSlope(double a, double b, double c, double n0, double time, double da, double db,
                                 double dc) {
        double d = Math.sqrt(c * c + 4.0 * a * b);
        if (!(d + c > 0.0)) {
            // c = 0 and a b = 0: with a = 0 (no production, so da = 0 along any change of the rates)
            // n = n0/(1 + b n0 t)
            double denominator = 1.0 + b * n0 * time;
            return -n0 * n0 * time * db / (denominator * denominator);
        }
        double dd = d > 0.0 ? (c * dc + 2.0 * (a * db + b * da)) / d : 0.0;
        double sum = c + d;
        double fixedPoint = 2.0 * a / sum;
        double dFixedPoint = 2.0 * da / sum - fixedPoint * (dc + dd) / sum;
        double delta0 = n0 - fixedPoint;
        double dt = d * time;
        double decay = Math.exp(-dt);
        double dDecay = -time * decay * dd;
        double growth;
        double dGrowth;
        if (dt > 1.0e-12) {
            growth = -Math.expm1(-dt) / d;
            dGrowth = dd * (time * decay - growth) / d;
        } else {
            // (1 - e^(-Dt))/D = t - D t^2/2 + ...
            growth = time;
            dGrowth = -0.5 * time * time * dd;
        }
        double denominator = 1.0 + b * delta0 * growth;
        double n = fixedPoint + delta0 * decay / denominator;
        if (n < 0.0) {
            return 0.0;
        }
        double numerator = delta0 * decay;
        double dNumerator = -dFixedPoint * decay + delta0 * dDecay;
        double dDenominator = db * delta0 * growth - b * dFixedPoint * growth + b * delta0 * dGrowth;
        return dFixedPoint + (dNumerator * denominator - numerator * dDenominator) / (denominator * denominator);
    }

    /**
     * The change of {@link #linearPair}'s result when k12 and k14 change by dk12 and dk14 (its derivative along
     * that direction).
     */
    static double linearPairSlope(double k12, double k14, double y12, double y14, double time, double dk12,
                                  double dk14) {
        double k = k12 + k14;
        if (!(k > 0.0)) {
            return 0.0;
        }
        double sum = y12 + y14;
        double share = k14 / k;
        double dShare = (dk14 * k12 - k14 * dk12) / (k * k);
        double decay = Math.exp(-k * time);
        double dDecay = -time * decay * (dk12 + dk14);
        return sum * dShare * (1.0 - decay) + (y12 - sum * share) * dDecay;
    }
}
