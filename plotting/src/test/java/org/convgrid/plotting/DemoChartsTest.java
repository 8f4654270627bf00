package org.convgrid.plotting;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.convgrid.plotting.report.ReportPage;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;

/**
 * Writes the demo runs (charts and report) for people to look at, only when asked:
 * environment variable {@code CONVGRID_DEMO_DIR=/tmp/plots-demo} (the forked test JVM inherits it). {@code run}
 * has no tracks; {@code run-tracks} is a smaller run with evolution tracks.
 */
class DemoChartsTest {

    @Test
    void writeDemoRun() throws Exception {
        String target = System.getenv("CONVGRID_DEMO_DIR");
        Assumptions.assumeTrue(target != null, "set CONVGRID_DEMO_DIR=DIR to write the demo charts");
        Path dir = TestRuns.write(Path.of(target, "run"), TestRuns.demoRows());
        assertThat(RunMaps.drawAll(dir).written()).isNotEmpty();
        assertThat(ReportPage.write(dir)).isRegularFile();
        var rows = TestRuns.rows(TestRuns.masses(0.3, 2.0, 18), new double[] {0.004, 0.014}, new double[] {0, 1, 4.57});
        Path tracked = TestRuns.write(Path.of(target, "run-tracks"), rows);
        TestTracks.write(tracked, rows, 120);
        assertThat(RunMaps.drawAll(tracked).written()).isNotEmpty();
        assertThat(ReportPage.write(tracked)).isRegularFile();
    }
}
