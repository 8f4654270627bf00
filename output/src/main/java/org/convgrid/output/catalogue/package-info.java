/** The run catalogue ({@code catalogue.csv}): one row per model, its columns, writer and tolerant reader. */
package org.convgrid.output.catalogue;
