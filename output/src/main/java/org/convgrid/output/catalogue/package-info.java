/** The run catalogue ({@code catalogue.ecsv}): one row per model, its columns, writer and tolerant reader. */
package org.convgrid.output.catalogue;
