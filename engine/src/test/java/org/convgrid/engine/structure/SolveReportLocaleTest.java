package org.convgrid.engine.structure;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.parallel.ResourceLock;
import org.junit.jupiter.api.parallel.Resources;

/**
 * A solve report's text lands in the catalogue's status_detail column, so it must read the same in every session:
 * under a German default locale String.format would write "1,23e-05" (a decimal comma inside a CSV cell).
 */
class SolveReportLocaleTest {

    @Test
    @ResourceLock(Resources.LOCALE)
    void numbersUseADecimalPointWhateverTheDefaultLocale() {
        Locale before = Locale.getDefault();
        try {
            Locale.setDefault(Locale.GERMANY);
            SolveReport report = new SolveReport(StopReason.ITERATION_BUDGET, 40, 1.2345e-5, 17, "ln T", "");
            assertThat(report.toString()).contains("last correction 1.23e-05 in ln T at mesh point 17");
        } finally {
            Locale.setDefault(before);
        }
    }
}
