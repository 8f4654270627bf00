/** The convective-zone map against total mass, in m/M or r/R, one per (Z, age, physics) slice. */
package org.convgrid.plotting.zones;
