/** Reads YAML grid files into a {@link org.convgrid.grids.GridSpec}, reporting every problem with file:line:column. */
package org.convgrid.grids.yaml;
