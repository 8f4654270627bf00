package org.convgrid.engine.structure;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;

/**
 * The mass coordinates of the mesh points, centre (point 0, small positive mass) to surface (last point,
 * m = M). The exterior mass M - m is stored alongside m so that the tiny interval masses of the outer envelope
 * (down to ~1e-14 M) keep full precision.
 */
public final class MassMesh {

    private final double totalMass;
    private final double[] interior;
    private final double[] exterior;

    private MassMesh(double totalMass, double[] interior, double[] exterior) {
        this.totalMass = totalMass;
        this.interior = interior;
        this.exterior = exterior;
    }

    /**
     * Builds a mesh from the interior mass fractions q = m/M and exterior fractions 1 - q (given separately so
     * that both are precise); the last point must be the surface (1 - q = 0).
     *
     * @param totalMass g
     * @throws ConvgridException BAD_DATA when the fractions are not strictly increasing
     */
    public static MassMesh ofFractions(double totalMass, double[] q, double[] oneMinusQ) {
        int n = q.length;
        if (n < 3 || oneMinusQ.length != n || !(q[0] > 0.0) || oneMinusQ[n - 1] != 0.0) {
            throw new ConvgridException(ErrorKind.BAD_DATA, "a mass mesh needs >= 3 points from m > 0 to m = M", n);
        }
        double[] m = new double[n];
        double[] e = new double[n];
        for (int k = 0; k < n; k++) {
            m[k] = q[k] * totalMass;
            e[k] = oneMinusQ[k] * totalMass;
            if (k > 0 && !(q[k] > q[k - 1] || oneMinusQ[k] < oneMinusQ[k - 1])) {
                throw new ConvgridException(ErrorKind.BAD_DATA, "mesh is not increasing at point " + k, k, q[k]);
            }
        }
        return new MassMesh(totalMass, m, e);
    }

    /** The same relative mesh for another total mass (homology scaling keeps m/M). */
    public MassMesh scaledTo(double newTotalMass) {
        double f = newTotalMass / totalMass;
        double[] m = interior.clone();
        double[] e = exterior.clone();
        for (int k = 0; k < m.length; k++) {
            m[k] *= f;
            e[k] *= f;
        }
        return new MassMesh(newTotalMass, m, e);
    }

    public int size() {
        return interior.length;
    }

    /** Total mass, g. */
    public double totalMass() {
        return totalMass;
    }

    /** m at point k, g. */
    public double mass(int k) {
        return interior[k];
    }

    /** M - m at point k, g. */
    public double exteriorMass(int k) {
        return exterior[k];
    }

    /** m/M at point k. */
    public double fraction(int k) {
        return interior[k] / totalMass;
    }

    /** (M - m)/M at point k. */
    public double exteriorFraction(int k) {
        return exterior[k] / totalMass;
    }

    /** Mass of interval (k, k + 1), g, from whichever of m or M - m is the more precise. */
    public double intervalMass(int k) {
        return exterior[k] < 0.5 * totalMass ? exterior[k] - exterior[k + 1] : interior[k + 1] - interior[k];
    }

    /**
     * The mesh coordinate ln(m/(M - m)) of point k, monotonic and well resolved at both ends; +infinity at the
     * surface.
     */
    public double logit(int k) {
        return Math.log(interior[k]) - Math.log(exterior[k]);
    }
}
