package org.convgrid.plotting;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.convgrid.plotting.report.ReportPage;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;

/**
 * Writes the demo run (charts and report) for people to look at, only when asked:
 * environment variable {@code CONVGRID_DEMO_DIR=/tmp/plots-demo} (the forked test JVM inherits it).
 */
class DemoChartsTest {

    @Test
    void writeDemoRun() throws Exception {
        String target = System.getenv("CONVGRID_DEMO_DIR");
        Assumptions.assumeTrue(target != null, "set CONVGRID_DEMO_DIR=DIR to write the demo charts");
        Path dir = TestRuns.write(Path.of(target, "run"), TestRuns.demoRows());
        assertThat(RunMaps.drawAll(dir)).isNotEmpty();
        assertThat(ReportPage.write(dir)).isRegularFile();
    }
}
