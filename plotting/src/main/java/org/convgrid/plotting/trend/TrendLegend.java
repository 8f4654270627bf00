package org.convgrid.plotting.trend;

import java.awt.Color;
import java.util.List;
import java.util.function.Function;
import org.convgrid.output.transitions.TransitionMethod;
import org.convgrid.plotting.style.ChartStyle;
import org.convgrid.plotting.style.StyledChart;
import org.convgrid.plotting.zones.TransitionMarker;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.Marker;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * The legend of a transition trend chart as two keys instead of one entry per drawn series: first what each line,
 * dash and marker stands for, in a neutral grey, then what each colour stands for (a metallicity, or an age). One
 * entry per series gave a chart of three metallicities twelve entries as wide as "core in every star above, [Fe/H] =
 * +0.30, Z = 0.0328", which took half the chart's width from the plot. The drawn series stay out of the legend; the
 * keys are series without points (NaN), so they draw nothing in the plot.
 */
final class TrendLegend {

    /** The keys' neutral colour: darker than the grid lines, lighter than the text, no series colour. */
    static final Color KEY_GREY = ChartStyle.KEY_GREY;
    /** The label of the transient windows' key. */
    static final String WINDOWS = "small transient cores";
    /** The label suffix of a grid value's key when a chart holds both kinds ({@link MethodNote}). */
    static final String GRID_SUFFIX = ", grid (paler marker)";
    /** Width of a colour's key line, pixels: wider than a series' so the colour reads at a glance. */
    private static final float COLOUR_LINE_WIDTH = 6f;

    private TrendLegend() {
    }

    /**
     * Adds the two keys.
     *
     * @param chart the chart, its drawn series already added and hidden from the legend
     * @param kinds the transitions drawn, in the order their keys are listed
     * @param methodsOf for each transition, the methods its markers are told apart by (refined, then grid, those it
     *                  has, when the chart mixes them), else none: the subtitle then says how every mass was found
     * @param allGrid whether every mass was read off the grid, so that every drawn marker is the paler one
     * @param windows whether transient windows are drawn
     * @param colours what each colour stands for, by colour index
     * @param gridTint how much paler a grid value's marker is ({@link ChartStyle#tint})
     */
    static void add(StyledChart chart, List<TransitionMarker.Kind> kinds,
                    Function<TransitionMarker.Kind, List<TransitionMethod>> methodsOf, boolean allGrid,
                    boolean windows, List<String> colours, double gridTint) {
        Color grid = ChartStyle.tint(KEY_GREY, gridTint);
        for (TransitionMarker.Kind kind : kinds) {
            List<TransitionMethod> methods = methodsOf.apply(kind);
            if (methods.isEmpty()) {
                key(chart, kind.label(), kind, allGrid ? grid : KEY_GREY);
            }
            for (TransitionMethod method : methods) {
                boolean refined = method == TransitionMethod.REFINED;
                key(chart, kind.label() + (refined ? ", refined" : GRID_SUFFIX), kind, refined ? KEY_GREY : grid);
            }
        }
        if (windows) {
            XYSeries s = pointless(chart, WINDOWS);
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            s.setMarker(SeriesMarkers.SQUARE);
            s.setMarkerColor(KEY_GREY);
        }
        for (int i = 0; i < colours.size(); i++) {
            XYSeries s = pointless(chart, colours.get(i));
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
            s.setLineColor(ChartStyle.seriesColor(i));
            s.setLineStyle(ChartStyle.dashed(0, COLOUR_LINE_WIDTH));
            s.setMarker(SeriesMarkers.NONE);
        }
    }

    /**
     * For {@link #add}: the methods each transition's markers are told apart by, from the (transition, method) pairs
     * drawn; none for any transition when {@code note} says every mass was found one way.
     */
    static Function<TransitionMarker.Kind, List<TransitionMethod>> methodsOf(MethodNote note,
            List<java.util.Map.Entry<TransitionMarker.Kind, TransitionMethod>> drawn) {
        if (note.legendSuffix(TransitionMethod.REFINED).isEmpty()) {
            return kind -> List.of();
        }
        return kind -> java.util.stream.Stream.of(TransitionMethod.REFINED, TransitionMethod.GRID)
                .filter(m -> drawn.contains(java.util.Map.entry(kind, m))).toList();
    }

    /** Hides every series added so far from the legend: they are explained by the keys. */
    static void hideDrawnSeries(StyledChart chart) {
        chart.getSeriesMap().values().forEach(s -> s.setShowInLegend(false));
    }

    private static void key(StyledChart chart, String label, TransitionMarker.Kind kind, Color markerColor) {
        XYSeries s = pointless(chart, label);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
        s.setLineColor(KEY_GREY);
        s.setLineStyle(ChartStyle.dashed(TransitionAgeTrendRenderer.dash(kind), ChartStyle.LINE_WIDTH));
        Marker marker = TransitionAgeTrendRenderer.marker(kind);
        s.setMarker(marker);
        s.setMarkerColor(markerColor);
    }

    private static XYSeries pointless(StyledChart chart, String label) {
        return chart.addSeries(label, new double[] {Double.NaN}, new double[] {Double.NaN});
    }
}
