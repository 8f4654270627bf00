/** Physical constants (CODATA 2018) and nominal solar values (IAU 2015), in cgs units. */
package org.convgrid.engine.units;
