/** Charts of a run directory: pure chart-data builders, their XChart renderers, and {@link org.convgrid.plotting.RunMaps}. */
package org.convgrid.plotting;
