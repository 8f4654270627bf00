/** Piecewise-cubic Hermite interpolation shared by the tabulated microphysics (one implementation, no allocation). */
package org.convgrid.engine.physics.interpolation;
