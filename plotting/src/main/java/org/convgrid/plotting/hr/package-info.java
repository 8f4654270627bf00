/** The Hertzsprung-Russell diagram of a run's models, marked by structure class, with zero-age lines per Z. */
package org.convgrid.plotting.hr;
