package org.convgrid.plotting.hr;

import java.awt.FontMetrics;
import java.util.DoubleSummaryStatistics;
import java.util.List;
import java.util.Locale;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.plotting.label.SliceLabels;
import org.convgrid.plotting.style.ChartStyle;
import org.convgrid.plotting.style.StyledChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Turns {@link HrDiagramData} into a chart: log Teff on a reversed x axis (hot stars left), log L/Lsun up; evolution
 * tracks (grey) and isochrones (black) under the models when the run has tracks. XChart
 * cannot reverse an axis, so the x values are -log Teff and the tick labels drop the sign.
 */
public final class HrDiagramRenderer {

    /** Margin added around the data range, in dex. */
    private static final double PAD_DEX = 0.04;
    /** Pixel spacing hint for the luminosity ticks (XChart's default gives 0.2 dex steps, too dense). */
    private static final int Y_TICK_SPACING = 90;

    /** Track lines: grey, thinner than the isochrones. */
    private static final java.awt.Color TRACK_GREY = new java.awt.Color(110, 110, 110);
    private static final float TRACK_WIDTH = 2.0f;

    private HrDiagramRenderer() {
    }

    /** The chart of an HR diagram. */
    public static StyledChart render(HrDiagramData data) {
        StyledChart chart = ChartStyle.newChart("HR diagram, Z = " + SliceLabels.values(data.metallicities()) + ", "
                        + SliceLabels.ages(data.ages()), data.physics().describe(),
                "log10(Teff / K)   (hotter to the left)", "log10(L / L\u2609)");
        ChartStyle.legendRight(chart);
        chart.getStyler().setxAxisTickLabelsFormattingFunction(v -> String.format(Locale.ROOT, "%.1f", -v + 0.0));
        chart.getStyler().setYAxisDecimalPattern("0.0");
        chart.getStyler().setYAxisTickMarkSpacingHint(Y_TICK_SPACING);
        if (!data.points().isEmpty()) {
            DoubleSummaryStatistics teff = data.points().stream().mapToDouble(HrPoint::logTeff).summaryStatistics();
            DoubleSummaryStatistics lum = data.points().stream().mapToDouble(HrPoint::logL).summaryStatistics();
            data.tracks().forEach(t -> {
                t.logTeff().forEach(teff::accept);
                t.logL().forEach(lum::accept);
            });
            chart.getStyler().setXAxisMin(-teff.getMax() - PAD_DEX);
            chart.getStyler().setXAxisMax(-teff.getMin() + PAD_DEX);
            chart.getStyler().setYAxisMin(lum.getMin() - 2 * PAD_DEX);
            chart.getStyler().setYAxisMax(lum.getMax() + 2 * PAD_DEX);
        }
        addTracks(chart, data);
        int index = 0;
        // With isochrones, the youngest one is the zero-age line: drawn once, as an isochrone.
        List<HrDiagramData.ZeroAgeLine> zeroAge = data.isochrones().isEmpty() ? data.zeroAgeLines() : List.of();
        for (HrDiagramData.ZeroAgeLine line : zeroAge) {
            XYSeries s = chart.addSeries((line.ageGyr() == 0 ? "zero age" : SliceLabels.age(line.ageGyr()))
                            + ", Z = " + SliceLabels.number(line.zInit()),
                    line.points().stream().mapToDouble(p -> -p.logTeff()).toArray(),
                    line.points().stream().mapToDouble(HrPoint::logL).toArray());
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
            s.setMarker(SeriesMarkers.NONE);
            s.setLineColor(ChartStyle.BLACK);
            s.setLineStyle(ChartStyle.dashed(index++, 2.0f));
        }
        for (StructureClass c : StructureClass.values()) {
            List<HrPoint> members = data.points().stream().filter(p -> p.structureClass() == c).toList();
            if (members.isEmpty()) {
                continue;
            }
            XYSeries s = chart.addSeries(ChartStyle.classLabel(c),
                    members.stream().mapToDouble(p -> -p.logTeff()).toArray(),
                    members.stream().mapToDouble(HrPoint::logL).toArray());
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            s.setMarker(ChartStyle.classMarker(c));
            s.setMarkerColor(ChartStyle.classColor(c));
        }
        addIsochrones(chart, data);
        List<HrPoint> labels = data.massLabels();
        chart.addOverlay((g, c) -> {
            g.setFont(ChartStyle.ANNOTATION_FONT);
            g.setColor(ChartStyle.BLACK);
            FontMetrics fm = g.getFontMetrics();
            for (HrPoint p : labels) {
                String text = SliceLabels.number(p.massMsun()) + " M\u2609";
                double x = c.getScreenXFromChart(-p.logTeff());
                double y = c.getScreenYFromChart(p.logL());
                // Left of and below the point: the hot, faint side of the zero-age line holds no models.
                g.drawString(text, (float) (x - fm.stringWidth(text) - 14), (float) (y + fm.getAscent() + 4));
            }
        });
        return chart;
    }

    /** Tracks in grey (they are context for the coloured models), one dash pattern per Z, one legend entry per Z. */
    private static void addTracks(StyledChart chart, HrDiagramData data) {
        int n = 0;
        for (HrDiagramData.TrackLine t : data.tracks()) {
            int zIndex = data.metallicities().indexOf(t.zInit());
            boolean first = data.tracks().stream().filter(o -> o.zInit() == t.zInit()).findFirst().get() == t;
            XYSeries s = chart.addSeries(first ? "tracks, Z = " + SliceLabels.number(t.zInit()) : "track " + n++,
                    t.logTeff().stream().mapToDouble(v -> -v).toArray(),
                    t.logL().stream().mapToDouble(Double::doubleValue).toArray());
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
            s.setMarker(SeriesMarkers.NONE);
            s.setLineColor(TRACK_GREY);
            s.setLineStyle(ChartStyle.dashed(Math.max(zIndex, 0), TRACK_WIDTH));
            s.setShowInLegend(first);
        }
    }

    /** Isochrones in black, one dash pattern per age, one legend entry per age. */
    private static void addIsochrones(StyledChart chart, HrDiagramData data) {
        int n = 0;
        for (HrDiagramData.ZeroAgeLine line : data.isochrones()) {
            boolean first = data.isochrones().stream().filter(o -> o.ageGyr() == line.ageGyr()).findFirst()
                    .get() == line;
            XYSeries s = chart.addSeries(first ? "isochrone, " + SliceLabels.age(line.ageGyr()) : "isochrone " + n++,
                    line.points().stream().mapToDouble(p -> -p.logTeff()).toArray(),
                    line.points().stream().mapToDouble(HrPoint::logL).toArray());
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
            s.setMarker(SeriesMarkers.NONE);
            s.setLineColor(ChartStyle.BLACK);
            s.setLineStyle(ChartStyle.dashed(data.ages().indexOf(line.ageGyr()), 2.0f));
            s.setShowInLegend(first);
        }
    }
}
