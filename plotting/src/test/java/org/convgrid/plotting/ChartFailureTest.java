package org.convgrid.plotting;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.convgrid.plotting.report.ReportPage;
import org.convgrid.plotting.style.ChartFiles;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A chart that cannot be drawn is named, the others are drawn, and the report still comes out. */
class ChartFailureTest {

    @Test
    void metalFreeGridGivesEveryChartAndACompleteReport(@TempDir Path dir) throws Exception {
        TestRuns.write(dir, TestRuns.rows(TestRuns.masses(0.1, 2.0, 20), new double[] {0.0, 0.02},
                new double[] {0, 1}));
        DrawnMaps drawn = RunMaps.drawAll(dir);
        assertThat(drawn.failures()).isEmpty();
        assertThat(drawn.written()).extracting(p -> p.getFileName().toString())
                .contains("transitions-vs-z_a1.8_ov0_schwarzschild.png", "zones-mass_z0_zams_a1.8_ov0_schwarzschild.png");
        String html = Files.readString(ReportPage.write(dir, drawn.failures()));
        assertThat(html).contains("transitions-vs-z_a1.8_ov0_schwarzschild.png").doesNotContain("Could not be drawn",
                "Not drawn yet");
    }

    @Test
    void aFailingChartIsNamedAndTheOthersAreDrawn(@TempDir Path dir) throws Exception {
        TestRuns.write(dir, TestRuns.rows(TestRuns.masses(0.2, 1.6, 8), new double[] {0.014}, new double[] {0}));
        List<MapEntry> plan = new ArrayList<>(RunMaps.plan(RunData.read(dir)));
        MapEntry broken = new MapEntry("broken.png", MapEntry.HR, "A chart whose data the library refuses.", () -> {
            throw new IllegalArgumentException("axis cannot show 0");
        });
        plan.add(0, broken);
        Files.createDirectories(dir.resolve("maps"));
        DrawnMaps drawn = RunMaps.draw(plan, dir.resolve("maps"), Set.of());
        assertThat(drawn.failures()).containsExactly(new DrawnMaps.ChartFailure("broken.png", "axis cannot show 0"));
        assertThat(drawn.failures().get(0).describe()).isEqualTo("chart broken.png not drawn: axis cannot show 0");
        assertThat(drawn.written()).hasSize(plan.size() - 1);
        assertThat(dir.resolve("maps/broken.png")).doesNotExist();
        try (var left = Files.list(dir.resolve("maps"))) {
            assertThat(left.filter(f -> f.getFileName().toString().endsWith(".tmp"))).isEmpty();
        }
        String html = Files.readString(ReportPage.write(dir, drawn.failures()));
        assertThat(html).contains("1 chart could not be drawn", "chart broken.png not drawn: axis cannot show 0",
                "Transition masses");
    }
    @Test
    void aChartNotDrawnTakesTheOlderFileOfItsNameAway(@TempDir Path dir) throws Exception {
        TestRuns.write(dir, TestRuns.rows(TestRuns.masses(0.2, 1.6, 8), new double[] {0.014}, new double[] {0}));
        Path maps = Files.createDirectories(dir.resolve("maps"));
        // an earlier drawing's chart, from data the tables no longer hold (`plot` had kept it beside a report
        // that says "not drawn")
        Files.writeString(maps.resolve("broken.png"), "an older chart");
        Files.writeString(maps.resolve("broken.svg"), "an older chart");
        MapEntry broken = new MapEntry("broken.png", MapEntry.HR, "A chart with nothing to show now.", () -> {
            throw new NothingToDraw("no model is usable");
        });
        DrawnMaps drawn = RunMaps.draw(List.of(broken), maps, Set.of(ChartFiles.VectorFormat.SVG));
        assertThat(drawn.failures()).singleElement().satisfies(f -> {
            assertThat(f.olderFile()).isEqualTo(DrawnMaps.ChartFailure.OlderFile.REMOVED);
            assertThat(f.describe()).isEqualTo("chart broken.png not drawn: nothing to draw: no model is usable; its "
                    + "older file in maps/ was removed, as it showed earlier data");
        });
        assertThat(maps.resolve("broken.png")).doesNotExist();
        assertThat(maps.resolve("broken.svg")).doesNotExist();
    }
}
