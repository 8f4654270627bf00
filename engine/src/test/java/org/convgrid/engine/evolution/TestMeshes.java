package org.convgrid.engine.evolution;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.MassMesh;
import org.convgrid.engine.units.Constants;

/** Synthetic meshes and composition profiles for the mixing and remapping tests. */
final class TestMeshes {

    private TestMeshes() {
    }

    /** n points evenly spaced in ln(m/(M - m)) from u0 to u1, plus the surface point. */
    static MassMesh logit(int n, double u0, double u1) {
        double[] q = new double[n];
        double[] e = new double[n];
        for (int k = 0; k < n - 1; k++) {
            double u = u0 + (u1 - u0) * k / (n - 2);
            q[k] = 1.0 / (1.0 + Math.exp(-u));
            e[k] = 1.0 / (1.0 + Math.exp(u));
        }
        q[n - 1] = 1.0;
        e[n - 1] = 0.0;
        return MassMesh.ofFractions(Constants.M_SUN, q, e);
    }

    /** A burnt core: X rises from 0.2 at the centre to 0.7 at m/M = 0.3, then stays; Z = 0.02. */
    static Composition[] burntCore(MassMesh mesh) {
        Composition[] c = new Composition[mesh.size()];
        for (int k = 0; k < c.length; k++) {
            double q = mesh.fraction(k);
            double x = q < 0.3 ? 0.2 + 0.5 * q / 0.3 + 0.02 * Math.sin(40 * q) : 0.7;
            c[k] = Composition.scaledSolar(Math.min(0.7, x), 0.02);
        }
        return c;
    }

    /** Total mass of every species on the cells of the mesh, g. */
    static double[] totals(MassMesh mesh, Composition[] c) {
        double[] w = PointCells.masses(mesh);
        double[] t = new double[MassFractions.ALL];
        for (int k = 0; k < c.length; k++) {
            double[] x = MassFractions.of(c[k]);
            for (int s = 0; s < t.length; s++) {
                t[s] += w[k] * x[s];
            }
        }
        return t;
    }
}
