package org.convgrid.plotting.trend;

import java.awt.Color;
import java.util.List;
import org.convgrid.engine.request.AgeOrigin;
import org.convgrid.output.transitions.TransitionMethod;
import org.convgrid.plotting.label.MetallicityNames;
import org.convgrid.plotting.label.SliceLabels;
import org.convgrid.plotting.style.AgeAxisTitle;
import org.convgrid.plotting.style.AgeUnit;
import org.convgrid.plotting.style.ChartNotes;
import org.convgrid.plotting.style.ChartStyle;
import org.convgrid.plotting.style.LogAxis;
import org.convgrid.plotting.style.StyledChart;
import org.convgrid.plotting.zones.TransitionMarker;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.Marker;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Turns {@link TransitionAgeTrendData} into a chart: age along x (logarithmic when the ages are all above zero and
 * span a decade or more, as ages from birth do), transition mass up, colour per Z; solid lines with circles for the
 * fully convective limit (before the zero-age main sequence also the mass above which a radiative core has
 * appeared), dashed with diamonds for the mass above which every star has a convective core at its age, dotted with downward
 * triangles for the main-sequence turn-off, dash-dotted with upward triangles for the lithium depletion boundary; each
 * bracket
 * a shaded box; refined and grid values are separate series, never joined (grid markers paler); each transient window
 * of small cores a faint dashed box with a square at its middle. With few metallicities every marker carries its
 * mass, rounded to the stated accuracy (the refinement's tolerance, else the bracket), clear of every marker, line
 * and box. Series are nudged sideways per Z so markers of equal ages stay apart, and a note under the legend says so. Ages all below 1 Gyr are in Myr.
 */
public final class TransitionAgeTrendRenderer {

    /** Sideways nudge between metallicities, as a share of the age range (linear axis). */
    private static final double DODGE_SHARE = 0.02;
    /** Sideways nudge between metallicities, dex (logarithmic axis). */
    private static final double DODGE_DEX = 0.05;
    /**
     * The note printed under the legend when several metallicities are drawn a little apart ({@link Placement}), so
     * that a reader does not take a marker's place for its age.
     */
    static final String NUDGE_NOTE = "Each Z is drawn slightly apart at its age (lowest Z left) so that markers do "
            + "not hide each other.";
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

    /** The chart of a transition-against-age trend, ages counted from {@code origin}, metallicities named by Z. */
    public static StyledChart render(TransitionAgeTrendData data, AgeOrigin origin) {
        return render(data, origin, MetallicityNames.Z_ONLY);
    }

    /**
     * The chart of a transition-against-age trend, ages counted from {@code origin}, metallicities named as
     * {@code names} name them.
     */
    public static StyledChart render(TransitionAgeTrendData data, AgeOrigin origin, MetallicityNames names) {
        boolean log = data.logAges();
        AgeUnit unit = AgeUnit.of(data.ages());
        MethodNote method = methodNote(data);
        StyledChart chart = ChartStyle.newChart("Transition masses against age, "
                        + names.values(data.metallicities()), method.subtitle(data.physics().describe()),
                AgeAxisTitle.of(origin, unit) + (log ? " (logarithmic)" : ""), "transition mass M / M\u2609");
        ChartStyle.legendRight(chart);
        List<String> notes = new java.util.ArrayList<>(data.caveats());
        if (data.metallicities().size() > 1) {
            notes.add(NUDGE_NOTE);
        }
        ChartNotes.addRightOfPlot(chart, notes);
        List<Double> ages = data.ages().stream().map(unit::fromGyr).toList();
        double first = ages.isEmpty() ? 0.0 : ages.get(0);
        double last = ages.isEmpty() ? 1.0 : ages.get(ages.size() - 1);
        double range = Math.max(last - first, 1e-3);
        if (log) {
            LogAxis.applyX(chart, first / AGE_PAD_FACTOR, last * AGE_PAD_FACTOR, ages);
        } else {
            chart.getStyler().setXAxisMin(first - AGE_PAD_SHARE * range).setXAxisMax(last + AGE_PAD_SHARE * range);
            chart.getStyler().setXAxisDecimalPattern(range < 5 ? "0.0#" : "0");
        }
        double top = data.series().stream().flatMap(s -> s.points().stream())
                .mapToDouble(p -> p.bracket() == null ? p.massMsun() : p.bracket().hi()).max().orElse(1.0);
        top = Math.max(top, data.windows().stream().mapToDouble(w -> w.masses().hi()).max().orElse(0.0));
        TransitionMassAxis.apply(chart, top);
        int nZ = data.metallicities().size();
        Placement at = new Placement(unit, nZ, log, range);
        for (TransitionAgeTrendData.Series s : data.series()) {
            int zIndex = data.metallicities().indexOf(s.zInit());
            boolean refined = s.method() == TransitionMethod.REFINED;
            Color color = ChartStyle.seriesColor(zIndex);
            BracketBands.add(chart, s.points().stream()
                    .map(p -> new BracketBands.At(at.x(p.ageGyr(), zIndex), p.bracket())).toList(), color);
            XYSeries line = chart.addSeries(s.kind().label() + ", " + names.of(s.zInit())
                            + method.legendSuffix(s.method()),
                    s.points().stream().mapToDouble(p -> at.x(p.ageGyr(), zIndex)).toArray(),
                    s.points().stream().mapToDouble(AgePoint::massMsun).toArray());
            line.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
            line.setLineColor(color);
            // each transition its own dash and marker, each Z its own colour
            line.setLineStyle(ChartStyle.dashed(dash(s.kind()), ChartStyle.LINE_WIDTH));
            line.setMarker(marker(s.kind()));
            line.setMarkerColor(refined ? color : ChartStyle.tint(color, GRID_MARKER_TINT));
        }
        for (double z : data.metallicities()) {
            List<TransientWindow> windows = data.windows().stream().filter(w -> w.zInit() == z).toList();
            if (windows.isEmpty()) {
                continue;
            }
            int zIndex = data.metallicities().indexOf(z);
            Color color = ChartStyle.seriesColor(zIndex);
            TrendDrawing.windows(chart, windows.stream()
                    .map(w -> new TrendDrawing.Window(at.x(w.ageGyr(), zIndex), w.masses())).toList(), color);
            XYSeries middles = chart.addSeries("small transient cores, " + names.of(z),
                    windows.stream().mapToDouble(w -> at.x(w.ageGyr(), zIndex)).toArray(),
                    windows.stream().mapToDouble(w -> 0.5 * (w.masses().lo() + w.masses().hi())).toArray());
            middles.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            middles.setMarker(SeriesMarkers.SQUARE);
            middles.setMarkerColor(ChartStyle.tint(color, WINDOW_MARKER_TINT));
        }
        TrendLegend.hideDrawnSeries(chart);
        TrendLegend.add(chart, data.series().stream().map(TransitionAgeTrendData.Series::kind).distinct().sorted()
                        .toList(), TrendLegend.methodsOf(method, data.series().stream()
                        .map(s -> java.util.Map.entry(s.kind(), s.method())).toList()),
                data.series().stream().allMatch(s -> s.method() == TransitionMethod.GRID), !data.windows().isEmpty(),
                data.metallicities().stream().map(names::of).toList(), GRID_MARKER_TINT);
        TrendDrawing.labels(chart, valueLabels(data, at), windows(data, at));
        return chart;
    }

    /** The dash pattern of a transition's line (ChartStyle's order: solid, then dashes). */
    static int dash(TransitionMarker.Kind kind) {
        return switch (kind) {
            case FULLY_CONVECTIVE_LIMIT -> 0;
            case CONV_CORE_ONSET -> 1;
            case MAIN_SEQUENCE_TURNOFF -> 2;
            case LITHIUM_DEPLETION_BOUNDARY -> 3;
        };
    }

    /**
     * The marker of a transition: a circle, a diamond, a downward triangle for the turn-off and an upward one for the
     * lithium depletion boundary.
     */
    static Marker marker(TransitionMarker.Kind kind) {
        return switch (kind) {
            case FULLY_CONVECTIVE_LIMIT -> SeriesMarkers.CIRCLE;
            case CONV_CORE_ONSET -> SeriesMarkers.DIAMOND;
            case MAIN_SEQUENCE_TURNOFF -> SeriesMarkers.TRIANGLE_DOWN;
            case LITHIUM_DEPLETION_BOUNDARY -> SeriesMarkers.TRIANGLE_UP;
        };
    }

    /** How the chart says how the masses were found: once in the subtitle when every series agrees. */
    static MethodNote methodNote(TransitionAgeTrendData data) {
        return MethodNote.of(data.series().stream().map(TransitionAgeTrendData.Series::method).toList(),
                data.series().stream().flatMap(s -> s.points().stream()).map(AgePoint::toleranceMsun).toList());
    }

    /** Where {@code data} is drawn along x: for tests that check the labels of a rendered chart. */
    static Placement placement(TransitionAgeTrendData data) {
        List<Double> ages = data.ages().stream().map(AgeUnit.of(data.ages())::fromGyr).toList();
        double range = ages.isEmpty() ? 1e-3 : Math.max(ages.get(ages.size() - 1) - ages.get(0), 1e-3);
        return new Placement(AgeUnit.of(data.ages()), data.metallicities().size(), data.logAges(), range);
    }

    /** Every marker's value label (none with more metallicities than can be labelled). */
    static List<TrendDrawing.Label> valueLabels(TransitionAgeTrendData data, Placement at) {
        if (data.metallicities().size() > TrendDrawing.MAX_LABELLED_FAMILIES) {
            return List.of();
        }
        return data.series().stream().flatMap(s -> {
            int zIndex = data.metallicities().indexOf(s.zInit());
            return s.points().stream().map(p -> new TrendDrawing.Label(at.x(p.ageGyr(), zIndex), p.massMsun(),
                    p.bracket(), SliceLabels.massToAccuracy(p.massMsun(), p.bracket(), p.toleranceMsun()),
                    ChartStyle.seriesColor(zIndex)));
        }).toList();
    }

    /** Every transient window, where it is drawn. */
    static List<TrendDrawing.Window> windows(TransitionAgeTrendData data, Placement at) {
        return data.windows().stream().map(w -> new TrendDrawing.Window(
                at.x(w.ageGyr(), data.metallicities().indexOf(w.zInit())), w.masses())).toList();
    }

    /**
     * Where an age is drawn: in the axis unit, nudged sideways per Z (by a share of the range or, on a log axis, by
     * a few hundredths of a dex) so that markers of equal ages stay apart.
     */
    record Placement(AgeUnit unit, int metallicities, boolean log, double range) {
        double x(double ageGyr, int zIndex) {
            double offset = zIndex - (metallicities - 1) / 2.0;
            double age = unit.fromGyr(ageGyr);
            return log ? age * Math.pow(10, DODGE_DEX * offset) : age + DODGE_SHARE * range * offset;
        }
    }
}
