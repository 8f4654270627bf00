/** The dipole g-mode period spacing of the run's tracks against age. */
package org.convgrid.plotting.seismic;
