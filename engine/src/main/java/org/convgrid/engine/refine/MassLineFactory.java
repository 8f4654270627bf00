package org.convgrid.engine.refine;

import org.convgrid.engine.request.PhysicsOptions;

/** Opens fresh {@link MassLine}s; the seam between the refinement and the structure solver. Thread-safe. */
@FunctionalInterface
public interface MassLineFactory {

    /**
     * A line with no converged model yet.
     *
     * @param physics the physics options of every model of the line
     * @param initialMetals initial metal mass fraction Z
     * @param initialHelium initial helium mass fraction Y (hydrogen is 1 - Y - Z)
     */
    MassLine open(PhysicsOptions physics, double initialMetals, double initialHelium);
}
