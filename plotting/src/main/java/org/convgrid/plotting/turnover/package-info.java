/** The convective turnover times (local and global) against stellar mass, one line per age, for Rossby-number users. */
package org.convgrid.plotting.turnover;
