package org.convgrid.plotting;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Charts that cannot be written (a full disk, a file size limit; simulated by a regular file where maps/ goes) are
 * failures of the command, with the operating system's reason and the way to redraw; a chart with nothing to draw
 * stays a warning. Before, `ulimit -f 40` gave 31 warnings "I/O error writing PNG file!" and
 * exit 0.
 */
class UnwrittenChartsTest {

    @TempDir
    Path dir;

    @Test
    void chartsThatCannotBeWrittenAreAFailureThatNamesTheReasonAndHowToRedraw() throws Exception {
        TestRuns.write(dir, TestRuns.rows(TestRuns.masses(0.2, 1.6, 8), new double[] {0.014}, new double[] {0}));
        List<MapEntry> plan = RunMaps.plan(RunData.read(dir));
        Path maps = Files.writeString(dir.resolve("maps"), "a file where the folder goes");
        DrawnMaps drawn = RunMaps.draw(plan, maps, Set.of());
        assertThat(drawn.written()).isEmpty();
        assertThat(drawn.failures()).hasSize(plan.size()).allMatch(DrawnMaps.ChartFailure::notWritten);
        assertThat(drawn.someNotWritten()).isTrue();
        assertThat(UnwrittenCharts.of(drawn, dir)).isNotNull().hasMessageContaining(plan.size() + " of " + plan.size()
                + " charts could not be written").hasMessageContaining("convgrid plot " + dir)
                .hasMessageContaining("catalogue.ecsv").hasMessageNotContaining("I/O error writing PNG file");
    }

    /**
     * A chart drawn again but not written (a full disk, made by a writer that fails as one does) must not leave the
     * file of an earlier drawing in maps/: report.html lists the chart as failed, and the older file showed data
     * the tables no longer hold. It is removed, and the message says so; a chart written keeps its new file.
     */
    @Test
    void theOlderFileOfAChartNotWrittenIsRemovedAndTheMessageSaysSo() throws Exception {
        TestRuns.write(dir, TestRuns.rows(TestRuns.masses(0.2, 1.6, 8), new double[] {0.014}, new double[] {0}));
        List<MapEntry> plan = RunMaps.plan(RunData.read(dir));
        Path maps = dir.resolve("maps");
        assertThat(RunMaps.draw(plan, maps, Set.of()).failures()).isEmpty();
        String failing = plan.get(0).fileName();
        String kept = plan.get(1).fileName();
        assertThat(maps.resolve(failing)).isRegularFile();

        DrawnMaps drawn = RunMaps.draw(plan, maps, Set.of(), (chart, target) -> {
            if (target.getFileName().toString().equals(failing)) {
                throw new java.io.IOException("No space left on device");
            }
            org.convgrid.plotting.style.ChartFiles.writePng(chart, target);
        });

        assertThat(maps.resolve(failing)).doesNotExist();
        assertThat(maps.resolve(kept)).isRegularFile();
        assertThat(drawn.failures()).singleElement().satisfies(f -> assertThat(f.olderFile())
                .isEqualTo(DrawnMaps.ChartFailure.OlderFile.REMOVED));
        assertThat(UnwrittenCharts.of(drawn, dir)).hasMessageContaining("1 of " + plan.size() + " charts could not "
                + "be written").hasMessageContaining("(" + failing + ": No space left on device); the older file of 1 "
                + "of them was removed, as it showed earlier data; the tables");
    }

    /** A chart not written where no earlier drawing left a file: nothing to remove, and nothing said of it. */
    @Test
    void aChartNotWrittenWithoutAnOlderFileSaysNothingOfOne() throws Exception {
        TestRuns.write(dir, TestRuns.rows(TestRuns.masses(0.2, 1.6, 8), new double[] {0.014}, new double[] {0}));
        List<MapEntry> plan = RunMaps.plan(RunData.read(dir));
        DrawnMaps drawn = RunMaps.draw(plan.subList(0, 1), dir.resolve("maps"), Set.of(), (chart, target) -> {
            throw new java.io.IOException("File too large");
        });
        assertThat(drawn.failures()).singleElement().satisfies(f -> assertThat(f.olderFile())
                .isEqualTo(DrawnMaps.ChartFailure.OlderFile.NONE));
        assertThat(UnwrittenCharts.of(drawn, dir)).hasMessageNotContaining("older file");
    }

    @Test
    void aChartWithNothingToDrawIsNoWriteFailure() throws Exception {
        TestRuns.write(dir, TestRuns.rows(TestRuns.masses(0.2, 1.6, 8), new double[] {0.014}, new double[] {0}));
        MapEntry empty = new MapEntry("empty.png", MapEntry.HR, "Nothing.", () -> {
            throw new NothingToDraw("no model of this physics has status ok");
        });
        Files.createDirectories(dir.resolve("maps"));
        DrawnMaps drawn = RunMaps.draw(List.of(empty), dir.resolve("maps"), Set.of());
        assertThat(drawn.failures()).singleElement().satisfies(f -> assertThat(f.notWritten()).isFalse());
        assertThat(UnwrittenCharts.of(drawn, dir)).isNull();
    }
}
