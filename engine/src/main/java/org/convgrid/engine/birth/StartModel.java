package org.convgrid.engine.birth;

import org.convgrid.engine.structure.StellarModel;

/**
 * A converged start model of the pre-main sequence.
 *
 * @param model the relaxed structure (homogeneous birth composition)
 * @param contractionRate x = -dlnR/dt of the homologous contraction it was relaxed with, s^-1
 * @param iterations Newton iterations spent on it, every relaxation included
 */
public record StartModel(StellarModel model, double contractionRate, int iterations) {

    /**
     * The contraction time R/|dR/dt| = 1/x, s: about the Kelvin-Helmholtz time of the start model, the age a
     * star would need to contract from infinite radius to it at its present rate.
     */
    public double contractionTime() {
        return 1.0 / contractionRate;
    }
}
