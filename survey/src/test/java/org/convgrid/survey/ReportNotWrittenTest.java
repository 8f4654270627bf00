package org.convgrid.survey;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/**
 * The failure of a command whose report.html could not be written is worded by one function, for {@code run},
 * {@code merge} and {@code plot} alike (it had been assembled in two places), with the wording they gave.
 */
class ReportNotWrittenTest {

    @Test
    void givesTheReasonThatTheTablesAreCompleteAndWhatRedraws() {
        Path run = Path.of("runs", "demo");
        AccessDeniedException denied = new AccessDeniedException("runs/demo/report.html");

        IOException failure = MapsAndReport.reportNotWritten(denied, run);

        assertThat(failure).hasMessage("runs/demo/report.html: permission denied; the tables (catalogue.ecsv, "
                + "zones.csv, transitions.csv) are complete: make room, then 'convgrid plot runs/demo' draws the "
                + "charts and the report again").hasCause(denied);
    }
}
