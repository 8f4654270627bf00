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

    /**
     * H, dH/d ln T and dH/d ln rho of the pair into {@code out[0..2]}, the same values as {@link #exponent},
     * {@link #dExponentDlnT} and {@link #dExponentDlnRho}: a network that needs all three calls this once per
     * reaction, so that an implementation can share the work between them.
     */
    default void exponentAndSlopes(int z1, int z2, PlasmaState plasma, double[] out) {
        out[0] = exponent(z1, z2, plasma);
        out[1] = dExponentDlnT(z1, z2, plasma);
        out[2] = dExponentDlnRho(z1, z2, plasma);
    }
}
