package org.convgrid.engine.physics.nuclear;

/**
 * The density- and temperature-dependent factors {@code k = rho N_A<sigma v>} (screened) of the six reactions of
 * {@link HydrogenBurningNetwork} that change 1H, 3He, 4He, 12C, 14N and 16O, at one point. The reaction rates are
 * products of these factors and the abundances ({@code r = k Y_j Y_k / (1 + delta_jk)}), so the Jacobian of the
 * composition rates with respect to the mass fractions follows by differentiating the products: the entry of a
 * reaction in abundance j is its factor times the other abundance (derived; the rate form as in
 * {@link HydrogenBurningNetwork}). The screening's own weak dependence on composition (through the plasma's mean
 * charges) is held fixed at the composition the factors were taken at: the Jacobian is exact at fixed screening.
 * Deuterium and 7Li burning are not included (their rates are linear in their own abundance and solved apart).
 * Immutable and thread-safe.
 *
 * @param pp p + p, {@code rho N_A<sigma v>} in g mol^-1 s^-1 (times two abundances in mol g^-1: reactions
 *           per gram per second, in moles)
 * @param he3He3 3He + 3He, same unit
 * @param he3He4 3He + 4He
 * @param c12 12C + p
 * @param n14 14N + p
 * @param o16 16O + p
 */
public record RateFactors(double pp, double he3He3, double he3He4, double c12, double n14, double o16) {

    /** Number of species in the Jacobian: 1H, 3He, 4He, 12C, 14N, 16O, in that order. */
    public static final int SPECIES = 6;

    /**
     * Adds {@code weight} times d(dX_i/dt)/dX_j to {@code out[i][j]}, i, j over the {@link #SPECIES} mass fractions
     * 1H, 3He, 4He, 12C, 14N, 16O, with the rates of the six reactions alone (no deuterium or 7Li burning).
     *
     * @param x mass fractions, the first {@link #SPECIES} entries in the order above (more entries are ignored)
     * @param weight factor applied to every entry (1 for one point, a mass weight for a mixed zone)
     * @param out SPECIES x SPECIES, added to
     */
    public void addJacobian(double[] x, double weight, double[][] out) {
        double y1 = x[0];
        double y3 = x[1] / 3.0;
        double y4 = x[2] / 4.0;
        double y12 = x[3] / 12.0;
        double y14 = x[4] / 14.0;
        double y16 = x[5] / 16.0;
        // d r / d X_j = (1/A_j) d r / d Y_j, for r11 = k Y1^2/2, r33 = k Y3^2/2, r34 = k Y3 Y4, r1z = k Y1 Yz
        double r11d1 = pp * y1;
        double r33d3 = he3He3 * y3 / 3.0;
        double r34d3 = he3He4 * y4 / 3.0;
        double r34d4 = he3He4 * y3 / 4.0;
        double r12d1 = c12 * y12;
        double r12d12 = c12 * y1 / 12.0;
        double r14d1 = n14 * y14;
        double r14d14 = n14 * y1 / 14.0;
        double r16d1 = o16 * y16;
        double r16d16 = o16 * y1 / 16.0;
        // each column j: the reactions that depend on X_j, through the mass-fraction rates of
        // HydrogenBurningNetwork#burn (dX_i/dt = A_i dY_i/dt); written out so nothing is allocated
        double cno1 = r12d1 + r14d1 + r16d1;
        out[0][0] += weight * (-3.0 * r11d1 - 2.0 * cno1);
        out[1][0] += weight * 3.0 * r11d1;
        out[2][0] += weight * 4.0 * (r14d1 + r16d1);
        out[3][0] += weight * 12.0 * (r14d1 - r12d1);
        out[4][0] += weight * 14.0 * (r12d1 - r14d1 + r16d1);
        out[5][0] += weight * -16.0 * r16d1;
        out[0][1] += weight * (2.0 * r33d3 - r34d3);
        out[1][1] += weight * 3.0 * (-2.0 * r33d3 - r34d3);
        out[2][1] += weight * 4.0 * (r33d3 + r34d3);
        out[0][2] += weight * -r34d4;
        out[1][2] += weight * -3.0 * r34d4;
        out[2][2] += weight * 4.0 * r34d4;
        out[0][3] += weight * -2.0 * r12d12;
        out[3][3] += weight * -12.0 * r12d12;
        out[4][3] += weight * 14.0 * r12d12;
        out[0][4] += weight * -2.0 * r14d14;
        out[2][4] += weight * 4.0 * r14d14;
        out[3][4] += weight * 12.0 * r14d14;
        out[4][4] += weight * -14.0 * r14d14;
        out[0][5] += weight * -2.0 * r16d16;
        out[2][5] += weight * 4.0 * r16d16;
        out[4][5] += weight * 14.0 * r16d16;
        out[5][5] += weight * -16.0 * r16d16;
    }

    /**
     * The six mass-fraction rates dX_i/dt of these reactions at x, at fixed screening, into {@code out}: the products
     * r = k Y_j Y_k / (1 + delta_jk) through the mass-fraction rates of {@link HydrogenBurningNetwork#burn} (the
     * form {@link #addJacobian} differentiates), without deuterium and 7Li.
     *
     * @param x mass fractions, the first {@link #SPECIES} entries as in {@link #addJacobian}
     * @param out the {@link #SPECIES} rates, s^-1 (overwritten)
     */
    public void ratesAtFixedScreening(double[] x, double[] out) {
        double y1 = x[0];
        double y3 = x[1] / 3.0;
        double y4 = x[2] / 4.0;
        double r11 = 0.5 * pp * y1 * y1;
        double r33 = 0.5 * he3He3 * y3 * y3;
        double r34 = he3He4 * y3 * y4;
        double r12 = c12 * y1 * (x[3] / 12.0);
        double r14 = n14 * y1 * (x[4] / 14.0);
        double r16 = o16 * y1 * (x[5] / 16.0);
        out[0] = -3.0 * r11 + 2.0 * r33 - r34 - 2.0 * (r12 + r14 + r16);
        out[1] = 3.0 * (r11 - 2.0 * r33 - r34);
        out[2] = 4.0 * (r33 + r34 + r14 + r16);
        out[3] = 12.0 * (r14 - r12);
        out[4] = 14.0 * (r12 - r14 + r16);
        out[5] = -16.0 * r16;
    }

    /**
     * The mass-weighted mean of several points' factors: a mixed zone's rates at fixed screening are the rate
     * products with these factors, since the products are linear in the factors at one composition.
     *
     * @param weights each point's weight (its mass)
     * @param mass the sum of the weights
     */
    public static RateFactors weightedMean(RateFactors[] factors, double[] weights, double mass) {
        double[] k = new double[SPECIES];
        for (int p = 0; p < factors.length; p++) {
            double w = weights[p] / mass;
            RateFactors f = factors[p];
            k[0] += w * f.pp;
            k[1] += w * f.he3He3;
            k[2] += w * f.he3He4;
            k[3] += w * f.c12;
            k[4] += w * f.n14;
            k[5] += w * f.o16;
        }
        return new RateFactors(k[0], k[1], k[2], k[3], k[4], k[5]);
    }
}
