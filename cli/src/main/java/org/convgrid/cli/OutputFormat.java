package org.convgrid.cli;

/** How a command prints its result. */
enum OutputFormat {
    TABLE, CSV
}
