/** Mixing-length convection, stability criteria and the description of a model's convective zones. */
package org.convgrid.engine.convection;
