package org.convgrid.output;

/**
 * One column as an ECSV header describes it.
 *
 * @param name the column name, as in the CSV header row
 * @param unit an astropy unit string; empty for dimensionless or text columns
 * @param datatype the ECSV datatype ({@code float64}, {@code int64}, {@code string})
 * @param description one line saying what the column holds
 */
public record EcsvColumn(String name, String unit, String datatype, String description) {
}
