package org.convgrid.engine.physics.nuclear;

/**
 * Electron screening of a charged-particle reaction: the rate is enhanced by {@code f = exp(H)}.
 * Implementations are immutable and thread-safe. Derivatives are at fixed composition.
 */
public interface Screening {

    /**
     * H = ln f (dimensionless, &gt;= 0) of the pair into {@code out[0]}, dH/d ln T at fixed density (equal to
     * d ln f/d ln T) into {@code out[1]} and dH/d ln rho at fixed temperature into {@code out[2]}: one call per
     * reaction and point, so that an implementation shares the work between the three and allocates nothing.
     *
     * @param z1 charge of the first nucleus
     * @param z2 charge of the second nucleus
     * @param plasma the plasma at the point
     * @param out at least three elements, overwritten
     */
    void exponentAndSlopes(int z1, int z2, PlasmaState plasma, double[] out);

    /**
     * H's slopes in the plasma's two couplings ({@link PlasmaState}) at fixed density and temperature: dH/d ln of the
     * Debye coupling (~ zeta, so d ln(zeta^2)/2 where the composition changes) into {@code out[0]} and dH/d ln
     * Gamma_e (~ (1/mu_e)^(1/3)) into {@code out[1]}. For a caller whose composition follows the state (the burning
     * slopes along the zero-age equilibrium abundances).
     *
     * @param z1 charge of the first nucleus
     * @param z2 charge of the second nucleus
     * @param plasma the plasma at the point
     * @param out at least two elements, overwritten
     */
    void couplingSlopes(int z1, int z2, PlasmaState plasma, double[] out);
}
