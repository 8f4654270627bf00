package org.convgrid.engine.structure;

/**
 * The moment of inertia of a spherical star about an axis through its centre, I = (2/3) integral of r^2 dm (a thin
 * spherical shell of mass dm and radius r has (2/3) r^2 dm; common practice, no single source), and the part of it
 * outside a given mass coordinate: the convective envelope's, which spin-evolution models with a decoupled core and
 * envelope take apart from the radiative interior's. A trapezoid in m on the model's own points, r^2 linear across
 * each interval, from the centre (r = 0 at m = 0) to the surface. Stateless.
 */
public final class MomentOfInertia {

    private MomentOfInertia() {
    }

    /**
     * The moment of inertia outside mass coordinate {@code innerMass}, g cm^2; the whole star's for 0.
     *
     * @param mass m at each point, g, increasing, the last the total mass
     * @param radius r at each point, cm
     * @param innerMass where the integral starts, g, from 0 to the total mass
     */
    public static double outside(double[] mass, double[] radius, double innerMass) {
        if (mass.length != radius.length || mass.length == 0) {
            throw new IllegalArgumentException("need as many radii as masses, at least one: " + mass.length
                    + " masses, " + radius.length + " radii");
        }
        if (!(innerMass >= 0.0 && innerMass <= mass[mass.length - 1])) {
            throw new IllegalArgumentException("the inner mass must lie between 0 and the total mass "
                    + mass[mass.length - 1] + " g: " + innerMass);
        }
        double sum = 0.0;
        double previousMass = 0.0;
        double previousSquare = 0.0;
        for (int k = 0; k < mass.length; k++) {
            double square = radius[k] * radius[k];
            if (mass[k] > innerMass) {
                double lower = Math.max(previousMass, innerMass);
                // r^2 at the lower end: the interval's start, or interpolated where the integral starts inside it
                double weight = mass[k] > previousMass ? (lower - previousMass) / (mass[k] - previousMass) : 0.0;
                double lowerSquare = previousSquare + weight * (square - previousSquare);
                sum += 0.5 * (lowerSquare + square) * (mass[k] - lower);
            }
            previousMass = mass[k];
            previousSquare = square;
        }
        return 2.0 / 3.0 * sum;
    }
}
