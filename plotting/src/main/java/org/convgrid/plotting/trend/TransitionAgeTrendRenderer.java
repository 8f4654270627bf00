package org.convgrid.plotting.trend;

import java.awt.Color;
import java.util.List;
import org.convgrid.engine.request.AgeOrigin;
import org.convgrid.output.transitions.TransitionMethod;
import org.convgrid.plotting.label.SliceLabels;
import org.convgrid.plotting.style.AgeAxisTitle;
import org.convgrid.plotting.style.ChartStyle;
import org.convgrid.plotting.style.LogAxis;
import org.convgrid.plotting.style.StyledChart;
import org.convgrid.plotting.zones.TransitionMarker;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Turns {@link TransitionAgeTrendData} into a chart: age along x (logarithmic when the ages are all above zero and
 * span a decade or more, as ages from birth do), transition mass up, colour per Z; solid lines with circles for the
 * fully convective limit (before the zero-age main sequence also the mass above which a radiative core has
 * appeared), dashed with diamonds for the mass above which every star has a convective core at its age; each bracket
 * a shaded box; refined and grid values are separate series, never joined (grid markers paler); each transient window
 * of small cores a faint dashed box with a square at its middle. With few metallicities every marker carries its
 * mass, rounded to the stated accuracy (the refinement's tolerance, else the bracket). Series are nudged sideways per
 * Z so markers of equal ages stay apart.
 */
public final class TransitionAgeTrendRenderer {

    /** Sideways nudge between metallicities, as a share of the age range (linear axis). */
    private static final double DODGE_SHARE = 0.02;
    /** Sideways nudge between metallicities, dex (logarithmic axis). */
    private static final double DODGE_DEX = 0.05;
    /** Grid (unrefined) markers are paler than refined ones, so the two read apart. */
    private static final double GRID_MARKER_TINT = 0.5;
    /** Room either side of the age range, as a share of it (linear axis). */
    private static final double AGE_PAD_SHARE = 0.04;
    /** Room either side of the age range, as a factor (logarithmic axis). */
    private static final double AGE_PAD_FACTOR = 1.6;
    /** Transient windows' middle markers are lighter than the series colour. */
    private static final double WINDOW_MARKER_TINT = 0.35;

    private TransitionAgeTrendRenderer() {
    }

    /** The chart of a transition-against-age trend of a run whose ages count from the zero-age main sequence. */
    public static StyledChart render(TransitionAgeTrendData data) {
        return render(data, AgeOrigin.ZAMS);
    }

    /** The chart of a transition-against-age trend, ages counted from {@code origin}. */
    public static StyledChart render(TransitionAgeTrendData data, AgeOrigin origin) {
        boolean log = data.logAges();
        StyledChart chart = ChartStyle.newChart("Transition masses against age, Z = "
                        + SliceLabels.values(data.metallicities()), data.physics().describe(),
                AgeAxisTitle.of(origin) + (log ? " (logarithmic)" : ""), "transition mass M / M\u2609");
        ChartStyle.legendRight(chart);
        double first = data.ages().isEmpty() ? 0.0 : data.ages().get(0);
        double last = data.ages().isEmpty() ? 1.0 : data.ages().get(data.ages().size() - 1);
        double range = Math.max(last - first, 1e-3);
        if (log) {
            LogAxis.applyX(chart, first / AGE_PAD_FACTOR, last * AGE_PAD_FACTOR, data.ages());
        } else {
            chart.getStyler().setXAxisMin(first - AGE_PAD_SHARE * range).setXAxisMax(last + AGE_PAD_SHARE * range);
            chart.getStyler().setXAxisDecimalPattern(range < 5 ? "0.0#" : "0");
        }
        double top = data.series().stream().flatMap(s -> s.points().stream())
                .mapToDouble(p -> p.bracket() == null ? p.massMsun() : p.bracket().hi()).max().orElse(1.0);
        top = Math.max(top, data.windows().stream().mapToDouble(w -> w.masses().hi()).max().orElse(0.0));
        chart.getStyler().setYAxisMin(0.0).setYAxisMax(Math.ceil(top * 1.15 * 10) / 10);
        chart.getStyler().setYAxisDecimalPattern("0.0#");
        int nZ = data.metallicities().size();
        boolean labelled = nZ <= TrendDrawing.MAX_LABELLED_FAMILIES;
        List<TrendDrawing.Label> labels = new java.util.ArrayList<>();
        for (TransitionAgeTrendData.Series s : data.series()) {
            int zIndex = data.metallicities().indexOf(s.zInit());
            double offset = zIndex - (nZ - 1) / 2.0;
            boolean fc = s.kind() == TransitionMarker.Kind.FULLY_CONVECTIVE_LIMIT;
            boolean refined = s.method() == TransitionMethod.REFINED;
            Color color = ChartStyle.seriesColor(zIndex);
            BracketBands.add(chart, s.points().stream()
                    .map(p -> new BracketBands.At(x(p.ageGyr(), offset, log, range), p.bracket())).toList(), color);
            XYSeries line = chart.addSeries((fc ? "fully convective limit, Z = " : "core in every star above, Z = ")
                            + SliceLabels.number(s.zInit()) + (refined ? ", refined" : ", grid"),
                    s.points().stream().mapToDouble(p -> x(p.ageGyr(), offset, log, range)).toArray(),
                    s.points().stream().mapToDouble(AgePoint::massMsun).toArray());
            line.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
            line.setLineColor(color);
            line.setLineStyle(ChartStyle.dashed(fc ? 0 : 1, ChartStyle.LINE_WIDTH));
            line.setMarker(fc ? SeriesMarkers.CIRCLE : SeriesMarkers.DIAMOND);
            line.setMarkerColor(refined ? color : ChartStyle.tint(color, GRID_MARKER_TINT));
            if (labelled) {
                s.points().forEach(p -> labels.add(new TrendDrawing.Label(x(p.ageGyr(), offset, log, range),
                        p.massMsun(), SliceLabels.massToAccuracy(p.massMsun(), p.bracket(), p.toleranceMsun()),
                        color)));
            }
        }
        for (double z : data.metallicities()) {
            List<TransientWindow> windows = data.windows().stream().filter(w -> w.zInit() == z).toList();
            if (windows.isEmpty()) {
                continue;
            }
            int zIndex = data.metallicities().indexOf(z);
            double offset = zIndex - (nZ - 1) / 2.0;
            Color color = ChartStyle.seriesColor(zIndex);
            TrendDrawing.windows(chart, windows.stream()
                    .map(w -> new TrendDrawing.Window(x(w.ageGyr(), offset, log, range), w.masses())).toList(), color);
            XYSeries middles = chart.addSeries("small transient cores, Z = " + SliceLabels.number(z),
                    windows.stream().mapToDouble(w -> x(w.ageGyr(), offset, log, range)).toArray(),
                    windows.stream().mapToDouble(w -> 0.5 * (w.masses().lo() + w.masses().hi())).toArray());
            middles.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            middles.setMarker(SeriesMarkers.SQUARE);
            middles.setMarkerColor(ChartStyle.tint(color, WINDOW_MARKER_TINT));
        }
        TrendDrawing.labels(chart, labels, data.windows().stream().map(w -> new TrendDrawing.Window(
                x(w.ageGyr(), data.metallicities().indexOf(w.zInit()) - (nZ - 1) / 2.0, log, range), w.masses()))
                .toList());
        return chart;
    }

    /** Where an age is drawn: nudged sideways per Z, by a share of the range or, on a log axis, by a few dex. */
    private static double x(double ageGyr, double offset, boolean log, double range) {
        return log ? ageGyr * Math.pow(10, DODGE_DEX * offset) : ageGyr + DODGE_SHARE * range * offset;
    }
}
