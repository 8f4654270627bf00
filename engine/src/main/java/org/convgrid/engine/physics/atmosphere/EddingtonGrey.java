package org.convgrid.engine.physics.atmosphere;

/**
 * The Eddington grey atmosphere, q = 2/3: T^4 = (3/4) Teff^4 (tau + 2/3) (Chandrasekhar 1935, Proc. Camb.
 * Phil. Soc. 31, 390). T = Teff at tau = 2/3.
 */
public record EddingtonGrey() implements TemperatureTauRelation {

    /** The constant Hopf function of the Eddington approximation. */
    public static final double HOPF = 2.0 / 3.0;

    @Override
    public double hopf(double tau) {
        return HOPF;
    }

    @Override
    public double hopfSlope(double tau) {
        return 0.0;
    }

    @Override
    public double photosphericDepth() {
        return HOPF;
    }
}
