package org.convgrid.plotting.trend;

import java.util.List;
import org.convgrid.plotting.label.SliceLabels;
import org.convgrid.plotting.style.ChartStyle;
import org.convgrid.plotting.style.LogAxis;
import org.convgrid.plotting.style.StyledChart;
import org.convgrid.plotting.zones.TransitionMarker;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Turns {@link TransitionTrendData} into a chart: Z on a log axis labelled at the run's metallicities, transition
 * mass up; each point with its bracket drawn as a vertical bar (asymmetric: the reported mass is one end of its
 * bracket, so XChart's symmetric error bars would misplace it). Series of different ages are nudged sideways by
 * a few thousandths of a dex so that their bars do not hide each other; the data keep the true Z.
 */
public final class TransitionTrendRenderer {

    /** Sideways nudge between ages, dex of Z. */
    private static final double DODGE_DEX = 0.016;
    /** Room either side of the Z range, as a factor. */
    private static final double Z_PAD = 1.25;

    private TransitionTrendRenderer() {
    }

    /** The chart of a transition trend. */
    public static StyledChart render(TransitionTrendData data) {
        List<Double> ages = data.series().stream().map(TransitionTrendData.Series::ageGyr).distinct().sorted()
                .toList();
        StyledChart chart = ChartStyle.newChart("Transition masses, Z = "
                + SliceLabels.values(data.metallicities()) + ", " + SliceLabels.ages(ages),
                data.physics().describe(), "initial metal mass fraction Z",
                "transition mass M / M\u2609");
        ChartStyle.legendRight(chart);
        double zMin = data.metallicities().isEmpty() ? 0.001 : data.metallicities().get(0) / Z_PAD;
        double zMax = data.metallicities().isEmpty() ? 0.1
                : data.metallicities().get(data.metallicities().size() - 1) * Z_PAD;
        double top = data.series().stream().flatMap(s -> s.points().stream())
                .mapToDouble(p -> p.bracket() == null ? p.massMsun() : p.bracket().hi()).max().orElse(1.0);
        chart.getStyler().setYAxisMin(0.0).setYAxisMax(Math.ceil(top * 1.15 * 10) / 10);
        chart.getStyler().setYAxisDecimalPattern("0.0#");
        LogAxis.applyX(chart, zMin, zMax, data.metallicities());
        int bar = 0;
        for (TransitionTrendData.Series s : data.series()) {
            if (s.points().isEmpty()) {
                continue;
            }
            int ageIndex = ages.indexOf(s.ageGyr());
            double shift = Math.pow(10, DODGE_DEX * (ageIndex - (ages.size() - 1) / 2.0));
            boolean fc = s.kind() == TransitionMarker.Kind.FULLY_CONVECTIVE_LIMIT;
            for (TrendPoint p : s.points()) {
                if (p.bracket() == null) {
                    continue;
                }
                XYSeries b = chart.addSeries("bracket " + bar++, new double[] {p.zInit() * shift, p.zInit() * shift},
                        new double[] {p.bracket().lo(), p.bracket().hi()});
                b.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
                b.setMarker(SeriesMarkers.NONE);
                b.setLineColor(ChartStyle.seriesColor(ageIndex));
                b.setLineStyle(new java.awt.BasicStroke(ChartStyle.LINE_WIDTH * 2));
                b.setShowInLegend(false);
            }
            XYSeries line = chart.addSeries((fc ? "fully convective, " : "lasting core onset, ")
                            + SliceLabels.age(s.ageGyr()),
                    s.points().stream().mapToDouble(p -> p.zInit() * shift).toArray(),
                    s.points().stream().mapToDouble(TrendPoint::massMsun).toArray());
            line.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
            line.setLineColor(ChartStyle.seriesColor(ageIndex));
            line.setLineStyle(ChartStyle.dashed(fc ? 0 : 1, ChartStyle.LINE_WIDTH));
            line.setMarker(fc ? SeriesMarkers.CIRCLE : SeriesMarkers.DIAMOND);
            line.setMarkerColor(ChartStyle.seriesColor(ageIndex));
        }
        return chart;
    }
}
