package org.convgrid.plotting.trend;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.InputStreamReader;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.convgrid.engine.request.AgeOrigin;
import org.convgrid.output.transitions.TransitionMethod;
import org.convgrid.output.transitions.TransitionReader;
import org.convgrid.output.transitions.TransitionRow;
import org.convgrid.plotting.label.PhysicsKey;
import org.convgrid.plotting.style.StyledChart;
import org.junit.jupiter.api.Test;
import org.knowm.xchart.XYSeries;

/**
 * The transition charts' legends: a key of the marks (line, dash, marker) and a key of the colours, not one entry per
 * drawn series (wording and structure only; the demo's transitions.csv as data).
 */
class TrendLegendTest {

    private static List<TransitionRow> demo() throws Exception {
        try (Reader in = new InputStreamReader(TrendLegendTest.class.getResourceAsStream(
                "/demo-cluster/transitions.csv"), StandardCharsets.UTF_8)) {
            return TransitionReader.read(in);
        }
    }

    private static List<String> legend(StyledChart chart) {
        return chart.getSeriesMap().values().stream().filter(XYSeries::isShowInLegend).map(XYSeries::getName)
                .toList();
    }

    @Test
    void theChartAgainstAgeListsEachMarkOnceThenEachMetallicity() throws Exception {
        List<TransitionRow> rows = demo();
        StyledChart chart = TransitionAgeTrendRenderer.render(TransitionAgeTrend.build(
                PhysicsKey.of(rows.get(0).slice()), rows), AgeOrigin.BIRTH);
        // three Z, two transitions and the windows: 6 entries, where one per series gave 9
        assertThat(legend(chart)).containsExactly("fully convective limit", "core in every star above",
                TrendLegend.WINDOWS, "Z = 0.008", "Z = 0.014", "Z = 0.02");
        // the drawn series are still there, out of the legend
        assertThat(chart.getSeriesMap()).containsKey("fully convective limit, Z = 0.008");
        // the keys draw nothing in the plot
        chart.getSeriesMap().values().stream().filter(XYSeries::isShowInLegend)
                .forEach(s -> assertThat(s.getYData()).containsOnly(Double.NaN));
    }

    @Test
    void theChartAgainstMetallicityListsEachMarkOnceThenEachAge() throws Exception {
        List<TransitionRow> rows = demo();
        StyledChart chart = TransitionTrendRenderer.render(TransitionTrend.build(PhysicsKey.of(rows.get(0).slice()),
                rows));
        assertThat(legend(chart)).containsExactly("fully convective limit", "core in every star above",
                TrendLegend.WINDOWS, "20 Myr", "150 Myr", "600 Myr");
    }

    @Test
    void anAgeWithWindowsAloneHasTheColourItsWindowsAreDrawnIn() throws Exception {
        // 600 Myr with its transient windows but neither transition: its colour comes after the ages with one
        List<TransitionRow> rows = demo().stream().map(t -> t.slice().ageGyr() == 0.6 ? new TransitionRow(t.slice(),
                t.yInit(), org.convgrid.output.transitions.TransitionEstimate.NONE,
                org.convgrid.output.transitions.TransitionEstimate.NONE, t.transientCore(), t.method(),
                t.toleranceMsun(), t.notes()) : t).toList();
        TransitionTrendData byZ = TransitionTrend.build(PhysicsKey.of(rows.get(0).slice()), rows);
        StyledChart chart = TransitionTrendRenderer.render(byZ);
        assertThat(legend(chart)).endsWith("20 Myr", "150 Myr", "600 Myr");
        TransitionTrendRenderer.Placement at = TransitionTrendRenderer.placement(byZ);
        assertThat(at.colourIndex(0.6)).isEqualTo(2);
        assertThat(chart.getSeriesMap().get("600 Myr").getLineColor())
                .isEqualTo(org.convgrid.plotting.style.ChartStyle.seriesColor(at.colourIndex(0.6)));
        assertThat(chart.getSeriesMap().get("small transient cores, 600 Myr").getMarkerColor()).isNotNull();
    }

    @Test
    void mixedMethodsGetAKeyEachWithTheGridMarkerPaler() throws Exception {
        List<TransitionRow> rows = demo().stream().map(t -> t.slice().ageGyr() == 0.02 ? new TransitionRow(
                t.slice(), t.yInit(), t.fullyConvective(), t.convCoreOnset(), t.transientCore(), TransitionMethod.GRID,
                Double.NaN, t.notes()) : t).toList();
        StyledChart chart = TransitionAgeTrendRenderer.render(TransitionAgeTrend.build(
                PhysicsKey.of(rows.get(0).slice()), rows), AgeOrigin.BIRTH);
        assertThat(legend(chart)).startsWith("fully convective limit, refined",
                "fully convective limit" + TrendLegend.GRID_SUFFIX, "core in every star above, refined",
                "core in every star above" + TrendLegend.GRID_SUFFIX);
        assertThat(chart.getSeriesMap().get("fully convective limit" + TrendLegend.GRID_SUFFIX).getMarkerColor())
                .isNotEqualTo(TrendLegend.KEY_GREY);
    }

    @Test
    void everyMassReadOffTheGridGivesPaleKeyMarkersAsTheDrawnOnes() throws Exception {
        List<TransitionRow> rows = demo().stream().map(t -> new TransitionRow(t.slice(), t.yInit(),
                t.fullyConvective(), t.convCoreOnset(), t.transientCore(), TransitionMethod.GRID, Double.NaN,
                t.notes())).toList();
        StyledChart chart = TransitionAgeTrendRenderer.render(TransitionAgeTrend.build(
                PhysicsKey.of(rows.get(0).slice()), rows), AgeOrigin.BIRTH);
        assertThat(legend(chart)).startsWith("fully convective limit", "core in every star above");
        // the grid markers' tint (GRID_MARKER_TINT, 0.5) on the key's grey
        assertThat(chart.getSeriesMap().get("fully convective limit").getMarkerColor())
                .isEqualTo(org.convgrid.plotting.style.ChartStyle.tint(TrendLegend.KEY_GREY, 0.5));
    }
}
