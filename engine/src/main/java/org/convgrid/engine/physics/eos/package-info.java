/** Equations of state: pressure, energy and thermodynamic derivatives of stellar plasma. */
package org.convgrid.engine.physics.eos;
