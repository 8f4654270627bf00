/** The run manifest ({@code manifest.yaml}): provenance of a run directory, written and read as YAML. */
package org.convgrid.output.manifest;
