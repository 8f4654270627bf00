package org.convgrid.engine.evolution;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.MassMesh;

/**
 * Instantaneous mixing of convective zones: every maximal run of convective mesh points gets the mass-weighted
 * mean composition of its cells ({@link PointCells}), so each species' total mass in the zone is unchanged.
 * Convective turnover (days to months) is far shorter than main-sequence time steps, which is why the
 * homogenisation is taken as instantaneous (common practice; Kippenhahn, Weigert &amp; Weiss
 * 2012, ch. 30). Stateless.
 */
public final class ConvectiveMixing {

    private ConvectiveMixing() {
    }

    /**
     * @param mesh the mesh the compositions live on
     * @param composition per mesh point
     * @param convective per mesh point, whether it is convective
     * @return the mixed compositions (radiative points unchanged)
     */
    public static Composition[] mix(MassMesh mesh, Composition[] composition, boolean[] convective) {
        int n = mesh.size();
        if (composition.length != n || convective.length != n) {
            throw new IllegalArgumentException("compositions and flags must have the mesh size " + n);
        }
        double[] w = PointCells.masses(mesh);
        Composition[] out = composition.clone();
        int k = 0;
        while (k < n) {
            int end = runEnd(convective, k);
            if (end > k) {
                Composition mean = mean(w, composition, k, end);
                for (int j = k; j <= end; j++) {
                    out[j] = mean;
                }
            }
            k = end + 1;
        }
        return out;
    }

    /**
     * The last point of the run of mixed points that starts at {@code k}: {@code k} itself when the point is not
     * mixed or stands alone.
     */
    static int runEnd(boolean[] mixed, int k) {
        int end = k;
        while (mixed[k] && end + 1 < mixed.length && mixed[end + 1]) {
            end++;
        }
        return end;
    }

    /** Mass-weighted mean composition of points lo..hi (inclusive). */
    static Composition mean(double[] w, Composition[] composition, int lo, int hi) {
        double[] sum = new double[MassFractions.ALL];
        double mass = 0.0;
        for (int j = lo; j <= hi; j++) {
            MassFractions.addWeighted(sum, w[j], composition[j]);
            mass += w[j];
        }
        for (int i = 0; i < sum.length; i++) {
            sum[i] /= mass;
        }
        return MassFractions.composition(sum);
    }
}
