package org.convgrid.engine.batch;

/**
 * One model a grid asks for, cgs units.
 *
 * @param modelId stable key built from the grid indices
 * @param mass total mass, g
 * @param initialMetals initial metal mass fraction Z
 * @param initialHelium initial helium mass fraction Y
 * @param age age since the zero-age main sequence, s (0 for the ZAMS)
 * @param physics the physics options of this model
 */
public record ModelRequest(String modelId, double mass, double initialMetals, double initialHelium, double age,
                           PhysicsOptions physics) {
}
