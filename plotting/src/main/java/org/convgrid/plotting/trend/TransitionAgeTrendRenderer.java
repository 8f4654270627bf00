package org.convgrid.plotting.trend;

import org.convgrid.engine.request.AgeOrigin;
import org.convgrid.output.transitions.TransitionMethod;
import org.convgrid.plotting.label.SliceLabels;
import org.convgrid.plotting.style.AgeAxisTitle;
import org.convgrid.plotting.style.ChartStyle;
import org.convgrid.plotting.style.StyledChart;
import org.convgrid.plotting.zones.TransitionMarker;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Turns {@link TransitionAgeTrendData} into a chart: age along x, transition mass up, colour per Z (as in the
 * other trend chart's ages), solid lines with circles for the fully convective limit, dashed with diamonds for the
 * core onset; each series' brackets as a shaded band; refined and grid values are separate series, never joined
 * (grid markers paler); series nudged sideways per Z so markers of equal ages stay apart.
 */
public final class TransitionAgeTrendRenderer {

    /** Sideways nudge between metallicities, as a share of the age range. */
    private static final double DODGE_SHARE = 0.006;
    /** Grid (unrefined) markers are paler than refined ones, so the two read apart. */
    private static final double GRID_MARKER_TINT = 0.5;
    /** Room either side of the age range, as a share of it. */
    private static final double AGE_PAD_SHARE = 0.04;

    private TransitionAgeTrendRenderer() {
    }

    /** The chart of a transition-against-age trend of a run whose ages count from the zero-age main sequence. */
    public static StyledChart render(TransitionAgeTrendData data) {
        return render(data, AgeOrigin.ZAMS);
    }

    /** The chart of a transition-against-age trend, ages counted from {@code origin}. */
    public static StyledChart render(TransitionAgeTrendData data, AgeOrigin origin) {
        StyledChart chart = ChartStyle.newChart("Transition masses against age, Z = "
                        + SliceLabels.values(data.metallicities()), data.physics().describe(),
                AgeAxisTitle.of(origin), "transition mass M / M\u2609");
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
        for (TransitionAgeTrendData.Series s : data.series()) {
            int zIndex = data.metallicities().indexOf(s.zInit());
            double shift = DODGE_SHARE * range * (zIndex - (data.metallicities().size() - 1) / 2.0);
            boolean fc = s.kind() == TransitionMarker.Kind.FULLY_CONVECTIVE_LIMIT;
            boolean refined = s.method() == TransitionMethod.REFINED;
            BracketBands.add(chart, s.points().stream()
                    .map(p -> new BracketBands.At(p.ageGyr() + shift, p.bracket())).toList(),
                    ChartStyle.seriesColor(zIndex));
            XYSeries line = chart.addSeries((fc ? "fully convective, Z = " : "lasting core onset, Z = ")
                            + SliceLabels.number(s.zInit()) + (refined ? ", refined" : ", grid"),
                    s.points().stream().mapToDouble(p -> p.ageGyr() + shift).toArray(),
                    s.points().stream().mapToDouble(AgePoint::massMsun).toArray());
            line.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
            line.setLineColor(ChartStyle.seriesColor(zIndex));
            line.setLineStyle(ChartStyle.dashed(fc ? 0 : 1, ChartStyle.LINE_WIDTH));
            line.setMarker(fc ? SeriesMarkers.CIRCLE : SeriesMarkers.DIAMOND);
            line.setMarkerColor(refined ? ChartStyle.seriesColor(zIndex)
                    : ChartStyle.tint(ChartStyle.seriesColor(zIndex), GRID_MARKER_TINT));
        }
        return chart;
    }
}
