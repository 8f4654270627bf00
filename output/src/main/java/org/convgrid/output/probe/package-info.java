/** The columns of {@code convgrid probe}: the microphysics at one point. */
package org.convgrid.output.probe;
