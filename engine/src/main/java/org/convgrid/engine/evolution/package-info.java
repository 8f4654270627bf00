/** Main-sequence evolution in age: composition steps, convective mixing, mass remapping and the time stepper. */
package org.convgrid.engine.evolution;
