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
}
