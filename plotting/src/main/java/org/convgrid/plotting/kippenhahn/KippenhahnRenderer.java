package org.convgrid.plotting.kippenhahn;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.Shape;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import org.convgrid.plotting.label.MetallicityNames;
import org.convgrid.plotting.label.SliceLabels;
import org.convgrid.plotting.style.AgeScale;
import org.convgrid.plotting.style.ChartNotes;
import org.convgrid.plotting.style.ChartStyle;
import org.convgrid.plotting.style.LogAxis;
import org.convgrid.plotting.style.StyledChart;
import org.convgrid.plotting.style.VisiblePatches;
import org.convgrid.plotting.zones.ZoneKind;
import org.convgrid.plotting.zones.ZoneMapRenderer;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Turns {@link KippenhahnData} into a chart: age along x, m/M up; convective zones filled in the zone-map colours
 * (one staircase polygon per band of consecutive steps, see {@link Bands}); the nuclear-burning region outlined
 * in black and hatched, not filled, so the convective colours under it stay true and it reads in grey print.
 */
public final class KippenhahnRenderer {

    /**
     * The legend's name of the burning region, which the caption repeats word for word (they disagreed: "hydrogen
     * burning (outlined)" against this). Nuclear, not hydrogen: where eps_nuc exceeds 1 % of its maximum is deuterium
     * burning on the early pre-main sequence, hydrogen after it.
     */
    public static final String BURNING_LABEL = "nuclear burning (hatched)";
    /** The trade's abbreviation: the full words would run out of the plot next to a late zero-age main sequence. */
    static final String ZAMS_LABEL = "ZAMS";
    /** Gap between the ZAMS label's foot and the plot's top edge, pixels. */
    static final double ZAMS_LABEL_GAP_PX = 3.0;
    private static final Color TRANSPARENT = new Color(0, 0, 0, 0);
    private static final float BURNING_EDGE_WIDTH = 2.0f;
    /** Hatch: 45-degree lines this many pixels apart, this wide. */
    private static final int HATCH_SPACING = 11;
    private static final BasicStroke HATCH_STROKE = new BasicStroke(1.3f);
    /**
     * What is drawn over a zone at an end of the vertical axis, pixels: the plot's border, and at the centre the
     * burning region's outline (half its width falls inside the region's edge).
     */
    static final double COVERED_AT_ENDS_PX = VisiblePatches.BORDER_PX + BURNING_EDGE_WIDTH;
    /** Room added at either end of the age axis, as a share of its span. */
    private static final double EDGE_ROOM_SHARE = 1e-6;

    private KippenhahnRenderer() {
    }

    /** The chart of one track, in m/M. */
    public static StyledChart render(KippenhahnData data) {
        return render(data, ZoneCoordinate.MASS_FRACTION);
    }

    /** The chart of one track in the given vertical coordinate, its metallicity named by Z. */
    public static StyledChart render(KippenhahnData data, ZoneCoordinate y) {
        return render(data, y, MetallicityNames.Z_ONLY);
    }

    /** The chart of one track in the given vertical coordinate, its metallicity named as {@code names} name it. */
    public static StyledChart render(KippenhahnData data, ZoneCoordinate y, MetallicityNames names) {
        boolean fromBirth = data.timeline().startsAtBirth();
        AgeScale ages = ageScale(data);
        StyledChart chart = ChartStyle.newChart("Convective zones against age, M = "
                        + SliceLabels.number(data.origin().massMsun()) + " M\u2609, "
                        + names.of(data.origin().zInit()), data.origin().physics().describe(),
                ages.title(fromBirth), y.title());
        ChartStyle.legendRight(chart);
        if (ages.logarithmic()) {
            LogAxis.applyX(chart, ages.min(), ages.max(), ages.decades(), AgeScale::label);
        } else {
            double span = data.ageMax() - data.ageMin();
            // XChart labels no tick that sits exactly on an axis end; a hair of room (far below a pixel) lets it
            // label the first and last ages itself, on the same baseline as the others
            double hair = EDGE_ROOM_SHARE * (ages.max() - ages.min());
            chart.getStyler().setXAxisMin(ages.min() - hair).setXAxisMax(ages.max() + hair);
            chart.getStyler().setXAxisDecimalPattern(span < 0.5 ? "0.00" : span < 5 ? "0.0" : "0");
        }
        if (y == ZoneCoordinate.MASS_FRACTION) {
            ChartStyle.unitYAxis(chart);
        } else {
            // as on the linear age axis: a hair of room lets XChart label the ends, 0 (the centre) and the top; the
            // depth charts' axis began at an unlabelled tick, so the centre's 0 had to be guessed
            double hair = EDGE_ROOM_SHARE * (y.max() - y.min());
            chart.getStyler().setYAxisMin(y.min() - hair).setYAxisMax(y.max() + hair);
            chart.getStyler().setYAxisDecimalPattern("0");
        }
        chart.getStyler().setPlotGridLinesVisible(false);
        Set<ZoneKind> inLegend = EnumSet.noneOf(ZoneKind.class);
        // a zone kind too small to see anywhere on these axes is left out of the legend (and named in a note)
        Set<ZoneKind> shown = visibleKinds(data.zones(), ages, y);
        int n = 0;
        List<List<AgeRect>> zoneBands = Bands.join(data.zones(), true);
        for (ZoneKind kind : ZoneKind.values()) {
            for (List<AgeRect> band : zoneBands) {
                if (band.get(0).kind() != kind) {
                    continue;
                }
                boolean first = shown.contains(kind) && inLegend.add(kind);
                Color fill = ZoneMapRenderer.fill(kind);
                XYSeries s = polygon(chart, first ? kind.label() : "zone band " + n++,
                        band.stream().map(y::drawn).toList(), fill, ages, y);
                s.setLineColor(fill);
                s.setLineWidth(1.0f);
                s.setShowInLegend(first);
            }
        }
        List<List<AgeRect>> burning = Bands.join(data.burning(), false);
        for (int i = 0; i < burning.size(); i++) {
            XYSeries s = polygon(chart, i == 0 ? BURNING_LABEL : "burning band " + i, burning.get(i), TRANSPARENT, ages,
                    y);
            s.setLineColor(ChartStyle.BLACK);
            s.setLineWidth(BURNING_EDGE_WIDTH);
            s.setShowInLegend(i == 0);
        }
        chart.addOverlay((g, c) -> burning.forEach(band -> hatch(g, c, band, ages, y)));
        double zams = data.timeline().zeroAgeMainSequenceGyr();
        if (Double.isFinite(zams) && zams > data.ageMin() && zams < data.ageMax()) {
            chart.addOverlay((g, c) -> markZeroAgeMainSequence(g, c, ages.x(zams)));
        }
        ChartNotes.addRightOfPlot(chart, notes(data, ages, y));
        return chart;
    }

    /**
     * The chart's notes: the track's own, then one per zone kind too thin to see on this axis. Such a note points to
     * the depth chart only when a depth chart is drawn for this track (the rule {@link KippenhahnData#hasThinEnvelope}
     * that decides it) and shows that kind: a 0.3 Msun chart sent readers to a depth chart never written,
     * for a core, which the depth axis squeezes further still.
     */
    static List<String> notes(KippenhahnData data, AgeScale ages, ZoneCoordinate y) {
        Set<ZoneKind> seen = EnumSet.noneOf(ZoneKind.class);
        data.zones().forEach(r -> seen.add(r.kind()));
        Set<ZoneKind> shown = visibleKinds(data.zones(), ages, y);
        Set<ZoneKind> onDepthChart = y == ZoneCoordinate.MASS_FRACTION && data.hasThinEnvelope()
                ? visibleKinds(data.zones(), ages, ZoneCoordinate.SURFACE_DEPTH) : EnumSet.noneOf(ZoneKind.class);
        List<String> notes = new java.util.ArrayList<>(data.notes());
        for (ZoneKind kind : seen) {
            if (!shown.contains(kind)) {
                notes.add(tooThinNote(kind, onDepthChart.contains(kind)));
            }
        }
        return notes;
    }

    /** {@link #notes(KippenhahnData, AgeScale, ZoneCoordinate)} on the age axis the chart of {@code data} draws. */
    static List<String> notes(KippenhahnData data, ZoneCoordinate y) {
        return notes(data, ageScale(data), y);
    }

    private static AgeScale ageScale(KippenhahnData data) {
        return AgeScale.of(data.timeline().startsAtBirth(), data.ageMin(), firstAfterBirth(data), data.ageMax());
    }

    /**
     * The zone kinds that make at least one patch big enough to be seen on these axes ({@link VisiblePatches}), each
     * rectangle as drawn (an envelope reaches the top of the depth axis).
     */
    static Set<ZoneKind> visibleKinds(List<AgeRect> zones, AgeScale ages, ZoneCoordinate y) {
        Set<ZoneKind> visible = EnumSet.noneOf(ZoneKind.class);
        for (ZoneKind kind : ZoneKind.values()) {
            List<VisiblePatches.Patch> patches = zones.stream().filter(r -> r.kind() == kind).map(y::drawn)
                    .map(r -> new VisiblePatches.Patch(ages.share(r.left()), ages.share(r.right()), y.share(r.lo()),
                            y.share(r.hi())))
                    .toList();
            if (VisiblePatches.anyVisible(patches, COVERED_AT_ENDS_PX)) {
                visible.add(kind);
            }
        }
        return visible;
    }

    /**
     * The note naming a zone kind too thin to see anywhere on this axis: a sentence, as every chart note is (it began
     * in lower case, "a convective shell too thin to show here", beside the capitalised notes of the same chart).
     */
    static String tooThinNote(ZoneKind kind, boolean depthChartShowsIt) {
        return "Some " + kind.plural() + " are too thin to show here"
                + (depthChartShowsIt ? " (see the depth chart)." : ".");
    }

    private static XYSeries polygon(StyledChart chart, String name, List<AgeRect> band, Color fill,
                                    AgeScale ages, ZoneCoordinate y) {
        double[][] outline = onAxis(Bands.outline(band), ages, y);
        XYSeries s = chart.addSeries(name, outline[0], outline[1]);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.PolygonArea);
        s.setFillColor(fill);
        s.setMarker(SeriesMarkers.NONE);
        return s;
    }

    /** Diagonal lines clipped to the band's outline (drawn as lines, so vector files stay crisp). */
    private static void hatch(Graphics2D g, StyledChart c, List<AgeRect> band, AgeScale ages, ZoneCoordinate axis) {
        double[][] outline = onAxis(Bands.outline(band), ages, axis);
        Path2D.Double path = new Path2D.Double();
        for (int i = 0; i < outline[0].length; i++) {
            double x = c.getScreenXFromChart(outline[0][i]);
            double y = c.getScreenYFromChart(outline[1][i]);
            if (i == 0) {
                path.moveTo(x, y);
            } else {
                path.lineTo(x, y);
            }
        }
        path.closePath();
        Shape oldClip = g.getClip();
        g.clip(path);
        Rectangle2D box = path.getBounds2D();
        g.setColor(ChartStyle.BLACK);
        g.setStroke(HATCH_STROKE);
        // Lines x - y = const, spaced along x, covering the box.
        for (double start = box.getMinX() - box.getHeight(); start < box.getMaxX(); start += HATCH_SPACING) {
            g.draw(new Line2D.Double(start, box.getMaxY(), start + box.getHeight(), box.getMinY()));
        }
        g.setClip(oldClip);
    }

    /** An outline (ages in Gyr, m/M) moved onto the chart's age axis and vertical coordinate. */
    private static double[][] onAxis(double[][] outline, AgeScale ages, ZoneCoordinate y) {
        double[] xs = new double[outline[0].length];
        double[] heights = new double[outline[1].length];
        for (int i = 0; i < heights.length; i++) {
            xs[i] = ages.x(outline[0][i]);
            heights[i] = y.of(outline[1][i]);
        }
        return new double[][] {xs, heights};
    }

    /** The first age after birth (the first positive step age), Gyr; NaN when there is none. */
    private static double firstAfterBirth(KippenhahnData data) {
        return data.zones().stream().mapToDouble(AgeRect::right).filter(a -> a > 0).min().orElse(Double.NaN);
    }

    /**
     * A dashed vertical line at the zero-age main sequence, labelled just above the plot ({@link #zamsLabelBox}):
     * inside it, even on a white box, the label hid data (a 1 Msun, Z = 0.02 chart lost its thin
     * convective envelope at m/M 0.97-1 from ~39 to ~80 Myr under it).
     */
    private static void markZeroAgeMainSequence(Graphics2D g, StyledChart c, double x) {
        double sx = c.getScreenXFromChart(x);
        double top = c.getScreenYFromChart(c.getStyler().getYAxisMax());
        double bottom = c.getScreenYFromChart(c.getStyler().getYAxisMin());
        g.setColor(ChartStyle.BLACK);
        g.setStroke(ChartStyle.REFERENCE_DASHED);
        g.draw(new Line2D.Double(sx, top, sx, bottom));
        g.setFont(ChartStyle.ANNOTATION_FONT);
        java.awt.FontMetrics fm = g.getFontMetrics();
        Rectangle2D box = zamsLabelBox(c, fm, sx);
        g.drawString(ZAMS_LABEL, (float) box.getX(), (float) (box.getY() + fm.getAscent()));
    }

    /**
     * Where the ZAMS label goes, screen pixels: centred over the line at {@code sx}, its foot
     * {@link #ZAMS_LABEL_GAP_PX} above the plot's top edge, in the white margin between the title and the plot where
     * it covers no data; kept within the chart's width when the line lies near an edge.
     */
    static Rectangle2D zamsLabelBox(StyledChart c, java.awt.FontMetrics fm, double sx) {
        double top = c.getScreenYFromChart(c.getStyler().getYAxisMax());
        double width = fm.stringWidth(ZAMS_LABEL);
        double left = Math.max(0, Math.min(sx - width / 2, c.getWidth() - width));
        double height = fm.getAscent() + fm.getDescent();
        return new Rectangle2D.Double(left, top - ZAMS_LABEL_GAP_PX - height, width, height);
    }
}
