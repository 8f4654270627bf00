package org.convgrid.engine.zams;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.StellarModel;

/**
 * A converged zero-age main-sequence model.
 *
 * @param model the structure, profile and global properties
 * @param initialComposition the homogeneous composition asked for (before 3He and CN equilibrium)
 * @param iterations Newton iterations spent on this model (every relaxation, remesh and composition pass)
 * @param coldStart whether it started from the polytropic guess rather than from a neighbour
 */
public record ZamsModel(StellarModel model, Composition initialComposition, int iterations, boolean coldStart) {
}
