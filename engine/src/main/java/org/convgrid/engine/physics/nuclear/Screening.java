package org.convgrid.engine.physics.nuclear;

/**
 * Electron screening of a charged-particle reaction: the rate is enhanced by {@code f = exp(H)}.
 * Implementations are immutable and thread-safe. Derivatives are at fixed composition.
 */
public interface Screening {

    /**
     * @param z1 charge of the first nucleus
     * @param z2 charge of the second nucleus
     * @param plasma the plasma at the point
     * @return H = ln f, dimensionless, &gt;= 0
     */
    double exponent(int z1, int z2, PlasmaState plasma);

    /** dH/d ln T at fixed density (equal to d ln f/d ln T). */
    double dExponentDlnT(int z1, int z2, PlasmaState plasma);

    /** dH/d ln rho at fixed temperature. */
    double dExponentDlnRho(int z1, int z2, PlasmaState plasma);
}
