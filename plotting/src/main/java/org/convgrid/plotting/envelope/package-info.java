/**
 * The convective envelope's mass against effective temperature, one line per age: the mass into which accreted
 * material mixes and tides act, for planet-host and pollution studies.
 */
package org.convgrid.plotting.envelope;
