/** Placeholder package description. */
package org.convgrid.cli;
