package org.convgrid.plotting.hr;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.plotting.RunMaps;
import org.convgrid.plotting.TestRuns;
import org.convgrid.plotting.label.PhysicsKey;
import org.convgrid.plotting.report.ReportPage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The models the transition refinement adds (ids with {@code -r}, at masses of its own choosing) are kept off the
 * HR diagram's lines and labels, drawn apart, and counted apart in the report.
 */
class HrRefinementModelsTest {

    /** A grid of 0.2-2.0 Msun in 0.2 steps at one Z and age, and three refinement models near 0.35 Msun. */
    private static List<CatalogueRow> rows() {
        List<CatalogueRow> rows = new ArrayList<>(TestRuns.rows(TestRuns.masses(0.2, 2.0, 10),
                new double[] {0.014}, new double[] {0}));
        rows.add(TestRuns.row("p0-z00-r000-a00", 0.3, 0.014, 0, false));
        rows.add(TestRuns.row("p0-z00-r001-a00", 0.35, 0.014, 0, false));
        rows.add(TestRuns.row("p0-z00-r002-a00", 0.375, 0.014, 0, false));
        return rows;
    }

    @Test
    void linesAndLabelsGoThroughTheGridsMassesOnly() {
        List<CatalogueRow> rows = rows();
        HrDiagramData data = HrDiagram.build(PhysicsKey.of(rows.get(0)), rows);
        assertThat(data.points()).hasSize(10).noneMatch(p -> p.modelId().contains("-r"));
        assertThat(data.refinementPoints()).extracting(HrPoint::massMsun).containsExactly(0.3, 0.35, 0.375);
        assertThat(data.zeroAgeLines()).singleElement().satisfies(l -> assertThat(l.points())
                .extracting(HrPoint::massMsun).containsExactly(0.2, 0.4, 0.6, 0.8, 1.0, 1.2, 1.4, 1.6, 1.8, 2.0));
        assertThat(data.massLabels()).noneMatch(p -> p.modelId().contains("-r"));
        assertThat(HrDiagramRenderer.render(data).getSeriesMap()).containsKey(HrDiagramRenderer.REFINEMENT_LABEL);
    }

    @Test
    void aClassThatOnlyARefinementModelHasGetsItsLegendEntry() {
        // grid 0.2-1.4 Msun: fully convective, envelopes, core + envelope; a refinement model at 1.6 Msun has a core
        // and no envelope, a shape the legend did not explain (a radiative turn-off model)
        List<CatalogueRow> rows = new ArrayList<>(TestRuns.rows(TestRuns.masses(0.2, 1.4, 5), new double[] {0.014},
                new double[] {0}));
        String coreOnly = org.convgrid.plotting.style.ChartStyle.classLabel(
                org.convgrid.engine.convection.StructureClass.CONV_CORE);
        assertThat(HrDiagramRenderer.render(HrDiagram.build(PhysicsKey.of(rows.get(0)), rows)).getSeriesMap())
                .doesNotContainKey(coreOnly);
        rows.add(TestRuns.row("p0-z00-r000-a00", 1.6, 0.014, 0, false));
        var series = HrDiagramRenderer.render(HrDiagram.build(PhysicsKey.of(rows.get(0)), rows)).getSeriesMap();
        assertThat(series).containsKey(coreOnly);
        // drawn nowhere: the entry's one point is not a point
        assertThat(series.get(coreOnly).getXData()).containsExactly(Double.NaN);
    }

    @Test
    void aGridWithoutRefinementHasNoSuchLegendEntry() {
        List<CatalogueRow> rows = TestRuns.rows(TestRuns.masses(0.2, 2.0, 10), new double[] {0.014},
                new double[] {0});
        HrDiagramData data = HrDiagram.build(PhysicsKey.of(rows.get(0)), rows);
        assertThat(data.refinementPoints()).isEmpty();
        assertThat(HrDiagramRenderer.render(data).getSeriesMap()).doesNotContainKey(HrDiagramRenderer.REFINEMENT_LABEL);
    }

    @Test
    void theReportCountsGridAndRefinementModelsApart(@TempDir Path dir) throws Exception {
        TestRuns.write(dir, rows());
        String html = Files.readString(ReportPage.write(dir, RunMaps.drawAll(dir).failures()));
        assertThat(html).contains("<th>grid models</th><td>10<", "<th>refinement models</th><td>3 (added by "
                + "bisection to narrow the transition masses; 13 catalogue rows in all)", "the 10 grid models",
                "the 3 models the transition refinement added");
    }
}
