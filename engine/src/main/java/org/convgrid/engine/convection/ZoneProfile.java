package org.convgrid.engine.convection;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;

/**
 * What {@link ConvectiveZoneFinder} needs from a converged model. Arrays run from the centre to the surface
 * and have one entry per mesh point; they are copied on the way in and on the way out.
 *
 * @param totalMass M, g
 * @param totalRadius R, cm
 * @param mass m at each point, g, non-decreasing
 * @param radius r at each point, cm, non-decreasing
 * @param stabilityExcess nabla_rad - nabla_stability at each point; positive means convective
 * @param convectiveVelocity v_c at each point, cm s^-1 (0 where stable)
 * @param pressureScaleHeight H_P at each point, cm
 * @param mixingLengthAlpha mixing length in pressure scale heights
 */
public record ZoneProfile(double totalMass, double totalRadius, double[] mass, double[] radius,
                          double[] stabilityExcess, double[] convectiveVelocity, double[] pressureScaleHeight,
                          double mixingLengthAlpha) {

    public ZoneProfile {
        if (!(totalMass > 0.0) || !(totalRadius > 0.0) || !(mixingLengthAlpha > 0.0)) {
            throw new ConvgridException(ErrorKind.BAD_DATA, String.format(
                    "zone profile needs M > 0 g, R > 0 cm and alpha > 0, got %s, %s, %s",
                    totalMass, totalRadius, mixingLengthAlpha), totalMass, totalRadius, mixingLengthAlpha);
        }
        int n = mass.length;
        if (n < 2 || radius.length != n || stabilityExcess.length != n || convectiveVelocity.length != n
                || pressureScaleHeight.length != n) {
            throw new ConvgridException(ErrorKind.BAD_DATA, String.format(
                    "zone profile arrays need equal lengths >= 2, got %d, %d, %d, %d, %d", n, radius.length,
                    stabilityExcess.length, convectiveVelocity.length, pressureScaleHeight.length), n);
        }
        for (int k = 1; k < n; k++) {
            if (!(mass[k] >= mass[k - 1]) || !(radius[k] >= radius[k - 1])) {
                throw new ConvgridException(ErrorKind.BAD_DATA, String.format(
                        "zone profile mass and radius must not decrease outwards (point %d: m = %s g, r = %s cm)",
                        k, mass[k], radius[k]), k, mass[k], radius[k]);
            }
        }
        mass = mass.clone();
        radius = radius.clone();
        stabilityExcess = stabilityExcess.clone();
        convectiveVelocity = convectiveVelocity.clone();
        pressureScaleHeight = pressureScaleHeight.clone();
    }

    /** Number of mesh points. */
    public int size() {
        return mass.length;
    }

    @Override
    public double[] mass() {
        return mass.clone();
    }

    @Override
    public double[] radius() {
        return radius.clone();
    }

    @Override
    public double[] stabilityExcess() {
        return stabilityExcess.clone();
    }

    @Override
    public double[] convectiveVelocity() {
        return convectiveVelocity.clone();
    }

    @Override
    public double[] pressureScaleHeight() {
        return pressureScaleHeight.clone();
    }
}
