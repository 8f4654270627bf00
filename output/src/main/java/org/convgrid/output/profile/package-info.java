/** Per-shell profile files ({@code profiles/<model_id>.csv}): the row type, its columns, writer and reader. */
package org.convgrid.output.profile;
