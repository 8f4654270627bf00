package org.convgrid.engine.physics.nuclear;

/** Bare nuclear rates (f = 1): for comparisons with unscreened published rate formulas. */
public enum NoScreening implements Screening {
    INSTANCE;

    @Override
    public void exponentAndSlopes(int z1, int z2, PlasmaState plasma, double[] out) {
        out[0] = 0.0;
        out[1] = 0.0;
        out[2] = 0.0;
    }

    @Override
    public void couplingSlopes(int z1, int z2, PlasmaState plasma, double[] out) {
        out[0] = 0.0;
        out[1] = 0.0;
    }
}
