/** Hydrogen burning by the pp chains and the CNO cycle, with electron screening. */
package org.convgrid.engine.physics.nuclear;
