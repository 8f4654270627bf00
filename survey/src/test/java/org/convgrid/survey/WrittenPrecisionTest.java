package org.convgrid.survey;

import static org.assertj.core.api.Assertions.assertThat;

import org.convgrid.grids.WrittenPrecision;
import org.convgrid.output.CsvNumbers;
import org.junit.jupiter.api.Test;

/**
 * The grid reader refuses values the tables would write alike ({@link WrittenPrecision}); it must round as the
 * tables do ({@link CsvNumbers}), which live in a module the grid reader does not see.
 */
class WrittenPrecisionTest {

    @Test
    void theGridReadersPrecisionIsTheTables() {
        assertThat(WrittenPrecision.SIGNIFICANT_DIGITS).isEqualTo(CsvNumbers.SIGNIFICANT_DIGITS);
        for (double v : new double[] {0.50000001, 1.23456749, 1.23456751, 0.0200000000001, 19.99999996, 3.0e-5}) {
            assertThat(CsvNumbers.format(WrittenPrecision.asWritten(v))).as("%s", v).isEqualTo(CsvNumbers.format(v));
        }
    }
}
