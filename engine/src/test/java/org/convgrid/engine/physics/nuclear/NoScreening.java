package org.convgrid.engine.physics.nuclear;

/** Bare nuclear rates (f = 1): for comparisons with unscreened published rate formulas. */
public enum NoScreening implements Screening {
    INSTANCE;

    @Override
    public double exponent(int z1, int z2, PlasmaState plasma) {
        return 0.0;
    }

    @Override
    public double dExponentDlnT(int z1, int z2, PlasmaState plasma) {
        return 0.0;
    }

    @Override
    public double dExponentDlnRho(int z1, int z2, PlasmaState plasma) {
        return 0.0;
    }
}
