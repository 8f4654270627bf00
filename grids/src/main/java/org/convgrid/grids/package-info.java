/** Placeholder package description. */
package org.convgrid.grids;
