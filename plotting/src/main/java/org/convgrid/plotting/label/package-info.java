/** The words and file-name stems every chart uses for a slice and a physics combination. */
package org.convgrid.plotting.label;
