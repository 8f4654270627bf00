package org.convgrid.engine.evolution;

import org.convgrid.engine.structure.MassMesh;

/**
 * The mass cell that each mesh point's composition stands for: the point's half of each neighbouring interval
 * (the innermost cell also holds the mass m_0 below the first point, the outermost reaches m = M). The cells
 * tile the star, so sums over them are the total mass of a species. Cell boundaries are kept both as m and as
 * M - m so that the tiny outer cells keep their precision.
 */
final class PointCells {

    private PointCells() {
    }

    /** Cell masses, g; they sum to M to rounding. */
    static double[] masses(MassMesh mesh) {
        int n = mesh.size();
        double[] w = new double[n];
        w[0] = mesh.mass(0);
        for (int k = 0; k < n - 1; k++) {
            double half = 0.5 * mesh.intervalMass(k);
            w[k] += half;
            w[k + 1] += half;
        }
        return w;
    }

    /** Interior mass of the n + 1 cell boundaries, g (0 first, M last). */
    static double[] innerBoundaries(MassMesh mesh) {
        int n = mesh.size();
        double[] b = new double[n + 1];
        for (int k = 1; k < n; k++) {
            b[k] = 0.5 * (mesh.mass(k - 1) + mesh.mass(k));
        }
        b[n] = mesh.totalMass();
        return b;
    }

    /** Exterior mass M - m of the n + 1 cell boundaries, g (M first, 0 last). */
    static double[] outerBoundaries(MassMesh mesh) {
        int n = mesh.size();
        double[] b = new double[n + 1];
        b[0] = mesh.totalMass();
        for (int k = 1; k < n; k++) {
            b[k] = 0.5 * (mesh.exteriorMass(k - 1) + mesh.exteriorMass(k));
        }
        return b;
    }
}
