package org.convgrid.plotting.turnover;

import java.awt.BasicStroke;
import java.awt.Color;
import java.util.ArrayList;
import java.util.DoubleSummaryStatistics;
import java.util.List;
import org.convgrid.plotting.label.MetallicityNames;
import org.convgrid.plotting.label.SliceLabels;
import org.convgrid.plotting.style.AgeLineWords;
import org.convgrid.plotting.style.ChartNotes;
import org.convgrid.plotting.style.ChartStyle;
import org.convgrid.plotting.style.HollowMarker;
import org.convgrid.plotting.style.LogAxis;
import org.convgrid.plotting.style.MassAxis;
import org.convgrid.plotting.style.StyledChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.Marker;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Turns {@link TurnoverData} into a chart: stellar mass along a logarithmic x axis, turnover time in days up a
 * logarithmic y axis; per age one colour and marker (the palette's order for a family of series,
 * {@link ChartStyle#seriesColor}), the local time solid with markers, the global time dashed in the same colour; fully
 * convective models as hollow markers; each age's fully convective limit a thin dotted vertical line in its colour.
 * The legend names each age once, then what solid, dashed, hollow and dotted mean, in grey.
 */
public final class TurnoverAgainstMassRenderer {

    /** The chart's title, before the metallicity. */
    static final String TITLE = "Convective turnover time against mass, ";
    static final String Y_TITLE = "convective turnover time \u03c4c / days";
    static final String LOCAL_LABEL = "local time (solid)";
    static final String GLOBAL_LABEL = "global time (dashed)";
    static final String LIMIT_LABEL = "fully convective limit (dotted)";
    /** What the two times are and what they are not: the chart shows model quantities, nothing more. */
    static final String DEFINITION_NOTE = "Local: l_m / v_c half a pressure scale height above the envelope base "
            + "(r = R/2 when fully convective); global: \u222b dr / v_c across the envelope. Model values, not "
            + "empirical \u03c4c.";
    /** Room either side of the mass range, as a factor. */
    private static final double MASS_PAD_FACTOR = 1.12;
    /** Room above and below the times, as a factor. */
    private static final double TIME_PAD_FACTOR = 1.35;
    private static final float LIMIT_WIDTH = 2.0f;
    private static final BasicStroke LIMIT_STROKE = new BasicStroke(LIMIT_WIDTH, BasicStroke.CAP_BUTT,
            BasicStroke.JOIN_MITER, 10f, new float[] {3f, 5f}, 0f);
    /** The global time's dash: the palette's second pattern, the one the other charts use for a second line kind. */
    private static final int GLOBAL_DASH = 1;

    private TurnoverAgainstMassRenderer() {
    }

    /** The chart of one metallicity's turnover times, named by Z; {@code data} must hold at least one model. */
    public static StyledChart render(TurnoverData data) {
        return render(data, MetallicityNames.Z_ONLY);
    }

    /** The chart of one metallicity's turnover times, named as {@code names} name it. */
    public static StyledChart render(TurnoverData data, MetallicityNames names) {
        StyledChart chart = ChartStyle.newChart(TITLE + names.of(data.zInit()), data.physics().describe(),
                MassAxis.TITLE, Y_TITLE);
        ChartStyle.legendRight(chart);
        List<TurnoverPoint> all = data.lines().stream().flatMap(l -> l.points().stream()).toList();
        DoubleSummaryStatistics masses = all.stream().mapToDouble(TurnoverPoint::massMsun).summaryStatistics();
        data.limits().forEach(l -> masses.accept(l.massMsun()));
        DoubleSummaryStatistics times = all.stream().mapToDouble(TurnoverPoint::localDays).summaryStatistics();
        all.stream().filter(TurnoverPoint::hasGlobal).forEach(p -> times.accept(p.globalDays()));
        double yMin = times.getMin() / TIME_PAD_FACTOR;
        double yMax = times.getMax() * TIME_PAD_FACTOR;
        // the y axis first: the mass axis's labels are written at its minimum
        LogAxis.applyY(chart, yMin, yMax, LogAxis.roundValues(yMin, yMax));
        MassAxis.apply(chart, masses.getMin() / MASS_PAD_FACTOR, masses.getMax() * MASS_PAD_FACTOR);
        List<String> notes = new ArrayList<>(List.of(DEFINITION_NOTE, AgeLineWords.GRID_ONLY_NOTE));
        if (data.pastMainSequence() > 0) {
            notes.add(AgeLineWords.pastMainSequenceNote(data.pastMainSequence()));
        }
        ChartNotes.addRightOfPlot(chart, notes);

        // Legend first, in its order: each age (a copy of its local line, covered later by the line itself), then
        // the grey key entries, each drawn under a coloured series at the same points so that only the legend shows
        // them. XChart lists series in the order they are added and paints them in that order too.
        for (TurnoverData.AgeLine line : data.lines()) {
            XYSeries s = localLine(chart, SliceLabels.age(line.ageGyr()), line, data);
            s.setShowInLegend(true);
        }
        TurnoverData.AgeLine first = data.lines().get(0);
        XYSeries localKey = line(chart, LOCAL_LABEL, masses(first.points()), locals(first.points()));
        localKey.setLineColor(ChartStyle.KEY_GREY);
        localKey.setLineStyle(ChartStyle.dashed(0, ChartStyle.LINE_WIDTH));
        localKey.setShowInLegend(true);
        data.lines().stream().filter(l -> l.points().stream().anyMatch(TurnoverPoint::hasGlobal)).findFirst()
                .ifPresent(l -> {
                    List<TurnoverPoint> global = l.points().stream().filter(TurnoverPoint::hasGlobal).toList();
                    XYSeries key = line(chart, GLOBAL_LABEL, masses(global), globals(global));
                    key.setLineColor(ChartStyle.KEY_GREY);
                    key.setLineStyle(ChartStyle.dashed(GLOBAL_DASH, ChartStyle.LINE_WIDTH));
                    key.setShowInLegend(true);
                });
        all.stream().filter(TurnoverPoint::fullyConvective).findFirst().ifPresent(p -> {
            XYSeries key = chart.addSeries(AgeLineWords.FULLY_CONVECTIVE_LABEL, new double[] {p.massMsun()},
                    new double[] {p.localDays()});
            key.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            key.setMarker(new HollowMarker(SeriesMarkers.CIRCLE));
            key.setMarkerColor(ChartStyle.KEY_GREY);
        });
        if (!data.limits().isEmpty()) {
            XYSeries key = limitLine(chart, LIMIT_LABEL, data.limits().get(0).massMsun(), yMin, yMax);
            key.setLineColor(ChartStyle.KEY_GREY);
            key.setShowInLegend(true);
        }

        // The drawing, bottom up: limits, global times, local times, fully convective markers.
        int n = 0;
        for (TurnoverData.FullyConvectiveLimit limit : data.limits()) {
            XYSeries s = limitLine(chart, "limit " + n++, limit.massMsun(), yMin, yMax);
            s.setLineColor(colour(data, limit.ageGyr()));
        }
        for (TurnoverData.AgeLine line : data.lines()) {
            List<TurnoverPoint> global = line.points().stream().filter(TurnoverPoint::hasGlobal).toList();
            if (global.isEmpty()) {
                continue;
            }
            XYSeries s = line(chart, "global " + n++, masses(global), globals(global));
            s.setLineColor(colour(data, line.ageGyr()));
            s.setLineStyle(ChartStyle.dashed(GLOBAL_DASH, ChartStyle.LINE_WIDTH));
        }
        for (TurnoverData.AgeLine line : data.lines()) {
            localLine(chart, "local " + n++, line, data);
        }
        for (TurnoverData.AgeLine line : data.lines()) {
            List<TurnoverPoint> hollow = line.points().stream().filter(TurnoverPoint::fullyConvective).toList();
            if (hollow.isEmpty()) {
                continue;
            }
            XYSeries s = chart.addSeries("fully convective " + n++, masses(hollow), locals(hollow));
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            s.setMarker(new HollowMarker(marker(data, line.ageGyr())));
            s.setMarkerColor(colour(data, line.ageGyr()));
            s.setShowInLegend(false);
        }
        return chart;
    }

    /** An age's local times: solid, in its colour, with its marker; out of the legend unless the caller says. */
    private static XYSeries localLine(StyledChart chart, String name, TurnoverData.AgeLine line, TurnoverData data) {
        XYSeries s = line(chart, name, masses(line.points()), locals(line.points()));
        s.setLineColor(colour(data, line.ageGyr()));
        s.setLineStyle(ChartStyle.dashed(0, ChartStyle.LINE_WIDTH));
        s.setMarker(marker(data, line.ageGyr()));
        s.setMarkerColor(colour(data, line.ageGyr()));
        return s;
    }

    /** A line without markers, out of the legend (the caller shows the few that belong there). */
    private static XYSeries line(StyledChart chart, String name, double[] x, double[] y) {
        XYSeries s = chart.addSeries(name, x, y);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
        s.setMarker(SeriesMarkers.NONE);
        s.setShowInLegend(false);
        return s;
    }

    /** A dotted vertical line at {@code massMsun} across the plot. */
    private static XYSeries limitLine(StyledChart chart, String name, double massMsun, double yMin, double yMax) {
        XYSeries s = line(chart, name, new double[] {massMsun, massMsun}, new double[] {yMin, yMax});
        s.setLineStyle(LIMIT_STROKE);
        return s;
    }

    /** An age's colour: its place among all the grid's ages of this physics, so it is the same on every Z's chart. */
    static Color colour(TurnoverData data, double ageGyr) {
        return ChartStyle.seriesColor(data.ages().indexOf(ageGyr));
    }

    private static Marker marker(TurnoverData data, double ageGyr) {
        return ChartStyle.seriesMarker(data.ages().indexOf(ageGyr));
    }

    private static double[] masses(List<TurnoverPoint> points) {
        return points.stream().mapToDouble(TurnoverPoint::massMsun).toArray();
    }

    private static double[] locals(List<TurnoverPoint> points) {
        return points.stream().mapToDouble(TurnoverPoint::localDays).toArray();
    }

    private static double[] globals(List<TurnoverPoint> points) {
        return points.stream().mapToDouble(TurnoverPoint::globalDays).toArray();
    }
}
