/** Model grids: the immutable {@link org.convgrid.grids.GridSpec} and its expansion into engine model requests. */
package org.convgrid.grids;
