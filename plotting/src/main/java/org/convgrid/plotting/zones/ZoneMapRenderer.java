package org.convgrid.plotting.zones;

import java.awt.Color;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import org.convgrid.plotting.label.MetallicityNames;
import org.convgrid.plotting.label.SliceLabels;
import org.convgrid.plotting.style.ChartNotes;
import org.convgrid.plotting.style.ChartStyle;
import org.convgrid.plotting.style.MassAxis;
import org.convgrid.plotting.style.StyledChart;
import org.convgrid.plotting.style.VisiblePatches;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Turns {@link ZoneMapData} into an XChart chart in {@link ChartStyle}. A zone kind too small to be seen anywhere on
 * the map ({@link VisiblePatches}: a central zone below the core threshold holds under a thousandth of the mass, and
 * in r/R, where it is taller, it sits in the 1-2 pixel wide columns of the refinement's models) stays out of the
 * legend and is named in a note instead, so the legend never lists a colour the reader cannot find.
 */
public final class ZoneMapRenderer {

    private ZoneMapRenderer() {
    }

    /** The chart of a zone map, its metallicity named by Z. */
    public static StyledChart render(ZoneMapData data) {
        return render(data, MetallicityNames.Z_ONLY);
    }

    /** The chart of a zone map, its metallicity named as {@code names} name it. */
    public static StyledChart render(ZoneMapData data, MetallicityNames names) {
        StyledChart chart = ChartStyle.newChart("Convective zones, " + names.of(data.slice().zInit()) + ", "
                        + data.age(),
                SliceLabels.physics(data.slice()),
                MassAxis.TITLE, data.axis().title());
        ChartStyle.legendRight(chart);
        MassAxis.apply(chart, data.massMin(), data.massMax());
        ChartStyle.unitYAxis(chart);
        chart.getStyler().setPlotGridLinesVisible(false);
        Set<ZoneKind> seen = EnumSet.noneOf(ZoneKind.class);
        data.rects().forEach(r -> seen.add(r.kind()));
        Set<ZoneKind> visible = visibleKinds(data);
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

    /** The zone kinds of the map that make at least one patch big enough to be seen ({@link VisiblePatches}). */
    static Set<ZoneKind> visibleKinds(ZoneMapData data) {
        Set<ZoneKind> visible = EnumSet.noneOf(ZoneKind.class);
        for (ZoneKind kind : ZoneKind.values()) {
            List<VisiblePatches.Patch> patches = data.rects().stream().filter(r -> r.kind() == kind)
                    .map(r -> new VisiblePatches.Patch(
                            VisiblePatches.logShare(r.left(), data.massMin(), data.massMax()),
                            VisiblePatches.logShare(r.right(), data.massMin(), data.massMax()), r.lo(), r.hi()))
                    .toList();
            if (VisiblePatches.anyVisible(patches, VisiblePatches.BORDER_PX)) {
                visible.add(kind);
            }
        }
        return visible;
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
