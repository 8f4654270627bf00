/**
 * The plain values that flow through the engine: what a grid asks for ({@link ModelRequest} with its {@link Age}
 * and {@link PhysicsOptions}) and what the engine answers ({@link ModelOutcome}, {@link GlobalProperties}).
 */
package org.convgrid.engine.request;
