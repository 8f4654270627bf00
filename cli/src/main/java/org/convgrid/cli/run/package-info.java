/** The console side of grid runs: progress lines, durations and the summary {@code check} prints. */
package org.convgrid.cli.run;
