package org.convgrid.engine.evolution;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.MassMesh;

/**
 * Conservative remapping of per-point compositions from one mass mesh to another of the same total mass: the
 * composition is taken as constant over each point's cell ({@link PointCells}) and every new cell gets the
 * mass-weighted mean over its overlaps with the old cells (first-order conservative remap, common
 * practice). Each species' total mass is conserved to rounding. Overlaps in the outer half of
 * the star are measured in M - m, so the thin surface cells lose no precision. Stateless.
 */
public final class MassRemap {

    private MassRemap() {
    }

    /**
     * @param from the old mesh
     * @param composition per old mesh point
     * @param to the new mesh (same total mass)
     * @return a composition per new mesh point
     */
    public static Composition[] remap(MassMesh from, Composition[] composition, MassMesh to) {
        if (composition.length != from.size()) {
            throw new IllegalArgumentException("need one composition per old mesh point");
        }
        if (Math.abs(from.totalMass() / to.totalMass() - 1.0) > 1.0e-12) {
            throw new IllegalArgumentException("meshes of different total mass: " + from.totalMass() + " and "
                    + to.totalMass());
        }
        double half = 0.5 * to.totalMass();
        double[] oldIn = PointCells.innerBoundaries(from);
        double[] oldOut = PointCells.outerBoundaries(from);
        double[] newIn = PointCells.innerBoundaries(to);
        double[] newOut = PointCells.outerBoundaries(to);
        double[][] old = new double[from.size()][];
        for (int i = 0; i < old.length; i++) {
            old[i] = MassFractions.of(composition[i]);
        }
        Composition[] out = new Composition[to.size()];
        int i = 0;
        for (int j = 0; j < to.size(); j++) {
            double[] sum = new double[MassFractions.ALL];
            double mass = 0.0;
            // skip old cells wholly below the new cell
            while (i < old.length - 1 && oldIn[i + 1] <= newIn[j] && oldOut[i + 1] >= newOut[j]) {
                i++;
            }
            for (int k = i; k < old.length; k++) {
                double overlap;
                double lo = Math.max(oldIn[k], newIn[j]);
                if (lo < half) {
                    overlap = Math.min(oldIn[k + 1], newIn[j + 1]) - lo;
                } else {
                    overlap = Math.min(oldOut[k], newOut[j]) - Math.max(oldOut[k + 1], newOut[j + 1]);
                }
                if (overlap > 0.0) {
                    for (int s = 0; s < sum.length; s++) {
                        sum[s] += overlap * old[k][s];
                    }
                    mass += overlap;
                }
                if (oldIn[k + 1] >= newIn[j + 1] && oldOut[k + 1] <= newOut[j + 1]) {
                    break;
                }
            }
            for (int s = 0; s < sum.length; s++) {
                sum[s] /= mass;
            }
            out[j] = MassFractions.composition(sum);
        }
        return out;
    }
}
