/** The convgrid command line: picocli subcommands, console output and exit codes. */
package org.convgrid.cli;
