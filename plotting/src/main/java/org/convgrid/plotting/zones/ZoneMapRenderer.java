package org.convgrid.plotting.zones;

import java.awt.Color;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import org.convgrid.plotting.label.SliceLabels;
import org.convgrid.plotting.style.ChartNotes;
import org.convgrid.plotting.style.ChartStyle;
import org.convgrid.plotting.style.MassAxis;
import org.convgrid.plotting.style.StyledChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Turns {@link ZoneMapData} into an XChart chart in {@link ChartStyle}. A zone kind too thin to be seen anywhere on
 * the map (a central shell below the core threshold holds under a thousandth of the mass) stays out of the legend
 * and is named in a note instead, so the legend never lists a colour the reader cannot find.
 */
public final class ZoneMapRenderer {

    /**
     * A zone thinner than this share of the unit axis (about one pixel of the ~620-pixel plot) cannot be seen; one
     * 0.003 thick (the demo's shell above the 1.8 Msun core, Z = 0.02, 600 Myr) shows as a line.
     */
    static final double MIN_VISIBLE_HEIGHT = 0.0015;

    private ZoneMapRenderer() {
    }

    /** The chart of a zone map. */
    public static StyledChart render(ZoneMapData data) {
        StyledChart chart = ChartStyle.newChart("Convective zones, Z = "
                        + SliceLabels.number(data.slice().zInit()) + ", " + SliceLabels.age(data.slice().ageGyr()),
                SliceLabels.physics(data.slice()),
                MassAxis.TITLE, data.axis().title());
        ChartStyle.legendRight(chart);
        MassAxis.apply(chart, data.massMin(), data.massMax());
        ChartStyle.unitYAxis(chart);
        chart.getStyler().setPlotGridLinesVisible(false);
        Set<ZoneKind> seen = EnumSet.noneOf(ZoneKind.class);
        Set<ZoneKind> visible = EnumSet.noneOf(ZoneKind.class);
        for (ZoneRect r : data.rects()) {
            seen.add(r.kind());
            if (r.hi() - r.lo() >= MIN_VISIBLE_HEIGHT) {
                visible.add(r.kind());
            }
        }
        Set<ZoneKind> inLegend = EnumSet.noneOf(ZoneKind.class);
        int i = 0;
        // Kind order fixes the legend order; rectangles never overlap, so drawing order does not matter.
        for (ZoneRect r : data.rects().stream().sorted(java.util.Comparator.comparing(ZoneRect::kind)).toList()) {
            boolean first = visible.contains(r.kind()) && inLegend.add(r.kind());
            String name = first ? r.kind().label() : "zone " + i;
            XYSeries s = chart.addSeries(name, new double[] {r.left(), r.right(), r.right(), r.left(), r.left()},
                    new double[] {r.lo(), r.lo(), r.hi(), r.hi(), r.lo()});
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.PolygonArea);
            Color fill = fill(r.kind());
            s.setFillColor(fill);
            s.setLineColor(fill);
            s.setLineWidth(1.0f);
            s.setMarker(SeriesMarkers.NONE);
            s.setShowInLegend(first);
            i++;
        }
        for (TransitionMarker m : data.markers()) {
            boolean fullyConvective = m.kind() == TransitionMarker.Kind.FULLY_CONVECTIVE_LIMIT;
            String label = m.kind().legendLabel(SliceLabels.massToAccuracy(m.massMsun(), m.bracket(), m.toleranceMsun()) + " M\u2609");
            XYSeries s = chart.addSeries(label, new double[] {m.massMsun(), m.massMsun()}, new double[] {0.0, 1.0});
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
            s.setLineColor(ChartStyle.BLACK);
            s.setLineStyle(fullyConvective ? ChartStyle.REFERENCE_SOLID : ChartStyle.REFERENCE_DASHED);
            s.setMarker(SeriesMarkers.NONE);
        }
        List<String> notes = new ArrayList<>(data.notes());
        seen.stream().filter(k -> !visible.contains(k)).forEach(k -> notes.add(tooThinNote(k)));
        ChartNotes.addRightOfPlot(chart, notes);
        return chart;
    }

    /** The note naming a zone kind that is listed in zones.csv but too thin to see on this map. */
    static String tooThinNote(ZoneKind kind) {
        return "Some " + kind.plural() + ", listed in zones.csv, are too thin to show here.";
    }

    /** Fill colour of a zone kind: the hue of the matching structure class, lightened for large areas. */
    public static Color fill(ZoneKind kind) {
        return switch (kind) {
            case WHOLE_STAR -> ChartStyle.tint(ChartStyle.VERMILLION, 0.35);
            case CORE -> ChartStyle.tint(ChartStyle.BLUISH_GREEN, 0.35);
            // the core's hue, paler: it is a core in all but size
            case SMALL_CENTRAL -> ChartStyle.tint(ChartStyle.BLUISH_GREEN, 0.7);
            case ENVELOPE -> ChartStyle.tint(ChartStyle.BLUE, 0.35);
            case SHELL -> ChartStyle.tint(ChartStyle.REDDISH_PURPLE, 0.2);
            case PAST_MAIN_SEQUENCE -> ChartStyle.PAST_MAIN_SEQUENCE_GREY;
            case NO_RESULT -> ChartStyle.NO_RESULT_GREY;
        };
    }
}
