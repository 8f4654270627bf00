package org.convgrid.engine.evolution;

import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.structure.StellarProfile;

/**
 * The nuclear luminosity L_nuc = integral of eps_nuc dm of a model, each point's eps times the mass of its cell
 * ({@link PointCells}), and the zero-age main-sequence criterion built on it. Stateless.
 */
public final class NuclearLuminosity {

    /**
     * A star has reached the zero-age main sequence when L_nuc is at least this fraction of its surface luminosity
     * (common practice: evolution codes define the ZAMS where nuclear burning supplies ~99 % or all of L).
     */
    public static final double ZERO_AGE_FRACTION = 0.99;

    private NuclearLuminosity() {
    }

    /** L_nuc, erg s^-1. */
    public static double of(StellarModel model) {
        StellarProfile p = model.profile();
        double[] w = PointCells.masses(model.state().mesh());
        double sum = 0.0;
        for (int k = 0; k < w.length; k++) {
            sum += w[k] * p.eps(k);
        }
        return sum;
    }

    /** L_nuc / L at the surface. */
    public static double fraction(StellarModel model) {
        return of(model) / model.global().luminosity();
    }

    /** Whether the model burns enough to count as on the main sequence ({@link #ZERO_AGE_FRACTION}). */
    public static boolean onMainSequence(StellarModel model) {
        return fraction(model) >= ZERO_AGE_FRACTION;
    }
}
