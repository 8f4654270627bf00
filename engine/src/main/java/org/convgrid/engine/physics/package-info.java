/** Microphysics of stellar matter behind small interfaces, and the bundle the solver sees. */
package org.convgrid.engine.physics;
