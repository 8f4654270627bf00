/** Placeholder package description. */
package org.convgrid.plotting;
