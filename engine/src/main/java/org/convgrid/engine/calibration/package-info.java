/** Solar calibration: the mixing length and initial helium that give a 1 Msun model the Sun's radius and luminosity at its age. */
package org.convgrid.engine.calibration;
