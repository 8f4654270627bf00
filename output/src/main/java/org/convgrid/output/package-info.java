/** Placeholder package description. */
package org.convgrid.output;
