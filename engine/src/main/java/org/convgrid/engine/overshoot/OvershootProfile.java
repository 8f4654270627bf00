package org.convgrid.engine.overshoot;

/**
 * What an overshoot scheme reads of the previous model, point by point from the centre outwards, cgs units.
 * The structure's profile implements it, so the schemes sit below the structure solver.
 */
public interface OvershootProfile {

    /** Number of points. */
    int size();

    /** Mass inside point k, g. */
    double mass(int k);

    /** Radius of point k, cm. */
    double radius(int k);

    /** Density at point k, g cm^-3. */
    double density(int k);

    /** Hydrogen mass fraction at point k. */
    double hydrogen(int k);

    /** Whether point k is convective. */
    boolean convective(int k);

    /** The stability excess at point k (positive where convective), dimensionless. */
    double stabilityExcess(int k);

    /** Pressure scale height at point k, cm. */
    double pressureScaleHeight(int k);

    /** Convective velocity at every point, cm s^-1 (0 where radiative). */
    double[] convectiveVelocities();

    /** Pressure scale height at every point, cm. */
    double[] pressureScaleHeights();
}
