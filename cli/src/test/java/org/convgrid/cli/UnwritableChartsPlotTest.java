package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * `plot` whose charts cannot be written (a regular file where maps/ goes stands in for a full disk) exits 1 with the
 * reason and the way to redraw, instead of one warning per chart and exit 0.
 */
class UnwritableChartsPlotTest {

    @Test
    void plotFailsWithOneMessageWhenItsChartsCannotBeWritten(@TempDir Path dir) throws Exception {
        CliHarness harness = CliHarness.in(dir, FakeChunkSolver.fast());
        Path grid = CliHarness.writeGrid(dir, "grid.yaml", CliHarness.GRID);
        assertThat(harness.execute("run", grid.toString(), "--out", "run", "--no-refine", "--quiet").code()).isZero();
        Files.writeString(dir.resolve("run/maps"), "not a folder");

        CliHarness.Execution plot = harness.execute("plot", "run");
        assertThat(plot.code()).as(plot.err()).isEqualTo(1);
        assertThat(plot.err()).contains("charts could not be written", "are complete", "convgrid plot ")
                .doesNotContain("warning:", "internal error");
        assertThat(plot.err().lines().count()).isEqualTo(1);
    }
}
