package org.convgrid.plotting.trend;

import java.awt.BasicStroke;
import org.convgrid.plotting.label.SliceLabels;
import org.convgrid.plotting.style.ChartStyle;
import org.convgrid.plotting.style.StyledChart;
import org.convgrid.plotting.zones.TransitionMarker;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Turns {@link TransitionAgeTrendData} into a chart: age along x, transition mass up, colour per Z (as in the
 * other trend chart's ages), solid lines with circles for the fully convective limit, dashed with diamonds for the
 * core onset; each point's bracket as a vertical bar, nudged sideways per Z so bars of equal ages stay apart.
 */
public final class TransitionAgeTrendRenderer {

    /** Sideways nudge between metallicities, as a share of the age range. */
    private static final double DODGE_SHARE = 0.006;
    /** Room either side of the age range, as a share of it. */
    private static final double AGE_PAD_SHARE = 0.04;

    private TransitionAgeTrendRenderer() {
    }

    /** The chart of a transition-against-age trend. */
    public static StyledChart render(TransitionAgeTrendData data) {
        StyledChart chart = ChartStyle.newChart("Transition masses against age, Z = "
                        + SliceLabels.values(data.metallicities()), data.physics().describe(),
                "age since the zero-age main sequence / Gyr", "transition mass M / M\u2609");
        ChartStyle.legendRight(chart);
        double first = data.ages().isEmpty() ? 0.0 : data.ages().get(0);
        double last = data.ages().isEmpty() ? 1.0 : data.ages().get(data.ages().size() - 1);
        double range = Math.max(last - first, 1e-3);
        chart.getStyler().setXAxisMin(first - AGE_PAD_SHARE * range).setXAxisMax(last + AGE_PAD_SHARE * range);
        chart.getStyler().setXAxisDecimalPattern(range < 5 ? "0.0" : "0");
        double top = data.series().stream().flatMap(s -> s.points().stream())
                .mapToDouble(p -> p.bracket() == null ? p.massMsun() : p.bracket().hi()).max().orElse(1.0);
        chart.getStyler().setYAxisMin(0.0).setYAxisMax(Math.ceil(top * 1.15 * 10) / 10);
        chart.getStyler().setYAxisDecimalPattern("0.0#");
        int bar = 0;
        for (TransitionAgeTrendData.Series s : data.series()) {
            if (s.points().isEmpty()) {
                continue;
            }
            int zIndex = data.metallicities().indexOf(s.zInit());
            double shift = DODGE_SHARE * range * (zIndex - (data.metallicities().size() - 1) / 2.0);
            boolean fc = s.kind() == TransitionMarker.Kind.FULLY_CONVECTIVE_LIMIT;
            for (AgePoint p : s.points()) {
                if (p.bracket() == null) {
                    continue;
                }
                XYSeries b = chart.addSeries("bracket " + bar++, new double[] {p.ageGyr() + shift,
                    p.ageGyr() + shift}, new double[] {p.bracket().lo(), p.bracket().hi()});
                b.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
                b.setMarker(SeriesMarkers.NONE);
                b.setLineColor(ChartStyle.seriesColor(zIndex));
                b.setLineStyle(new BasicStroke(ChartStyle.LINE_WIDTH * 2));
                b.setShowInLegend(false);
            }
            XYSeries line = chart.addSeries((fc ? "fully convective, Z = " : "lasting core onset, Z = ")
                            + SliceLabels.number(s.zInit()),
                    s.points().stream().mapToDouble(p -> p.ageGyr() + shift).toArray(),
                    s.points().stream().mapToDouble(AgePoint::massMsun).toArray());
            line.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
            line.setLineColor(ChartStyle.seriesColor(zIndex));
            line.setLineStyle(ChartStyle.dashed(fc ? 0 : 1, ChartStyle.LINE_WIDTH));
            line.setMarker(fc ? SeriesMarkers.CIRCLE : SeriesMarkers.DIAMOND);
            line.setMarkerColor(ChartStyle.seriesColor(zIndex));
        }
        return chart;
    }
}
