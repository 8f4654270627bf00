package org.convgrid.plotting.trend;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.FontMetrics;
import java.awt.geom.Rectangle2D;
import java.util.List;
import org.convgrid.output.Span;
import org.convgrid.output.transitions.MassRangeText;
import org.convgrid.plotting.layout.LabelPlacement;
import org.convgrid.plotting.layout.Obstacles;
import org.convgrid.plotting.layout.SeriesObstacles;
import org.convgrid.plotting.style.ChartStyle;
import org.convgrid.plotting.style.StyledChart;

/** What both transition trend charts draw alike: value labels beside the markers and the transient core windows. */
final class TrendDrawing {

    /** Charts with more metallicities (or ages) than this per series family get no value labels: they would pile up. */
    static final int MAX_LABELLED_FAMILIES = 3;
    /** Opacity of a window's fill, 0..255: fainter than a bracket, which it must not be mistaken for. */
    private static final int WINDOW_ALPHA = 35;
    /** Half width of a window box, pixels. */
    private static final double WINDOW_HALF_WIDTH_PX = 7.0;
    /** Leader lines from a moved label to its marker. */
    private static final BasicStroke LEADER = new BasicStroke(1.0f);
    private static final BasicStroke WINDOW_OUTLINE = new BasicStroke(1.5f, BasicStroke.CAP_BUTT,
            BasicStroke.JOIN_MITER, 10f, new float[] {5f, 4f}, 0f);

    /**
     * One value label.
     *
     * @param x position along the x axis, data units
     * @param mass the mass, solar masses (the label's height)
     * @param bracket the bracket drawn around the marker, or null
     * @param text the label
     * @param color the colour of its series
     */
    record Label(double x, double mass, Span bracket, String text, Color color) {
    }

    /**
     * One window drawn at one x.
     *
     * @param x position along the x axis, data units
     * @param masses lowest and highest mass of the window
     */
    record Window(double x, Span masses) {
    }

    private TrendDrawing() {
    }

    /**
     * Writes every label of the chart beside its marker, each where it covers no marker, no line, no bracket, no
     * window and no label already written ({@link LabelPlacement}; labels of several series gather where transitions
     * of neighbouring metallicities or ages meet); a label moved away from its marker is joined to it by a thin line
     * in the label's colour.
     */
    static void labels(StyledChart chart, List<Label> labels, List<Window> windows) {
        chart.addOverlay((g, c) -> {
            g.setFont(ChartStyle.ANNOTATION_FONT);
            FontMetrics fm = g.getFontMetrics();
            List<LabelPlacement.Placed> placed = layout(c, fm, labels, windows);
            g.setStroke(LEADER);
            for (int i = 0; i < labels.size(); i++) {
                LabelPlacement.Placed p = placed.get(i);
                g.setColor(labels.get(i).color().darker());
                if (p.leader() != null) {
                    g.draw(p.leader());
                }
                g.drawString(labels.get(i).text(), (float) p.box().getX(),
                        (float) (p.box().getY() + fm.getAscent()));
            }
        });
    }

    /**
     * Where {@link #labels} writes each label on the painted chart {@code c} (in the order given): the whole layout,
     * for the overlay and for tests that check it.
     */
    static List<LabelPlacement.Placed> layout(StyledChart c, FontMetrics fm, List<Label> labels,
                                              List<Window> windows) {
        return LabelPlacement.place(wanted(c, fm, labels), obstacles(c, labels, windows), plotArea(c));
    }

    /** The labels as {@link LabelPlacement} wants them: point, text size and the marker's reach. */
    static List<LabelPlacement.Wanted> wanted(StyledChart c, FontMetrics fm, List<Label> labels) {
        return labels.stream().map(l -> new LabelPlacement.Wanted(c.getScreenXFromChart(l.x()),
                c.getScreenYFromChart(l.mass()), fm.stringWidth(l.text()), fm.getAscent() + fm.getDescent(),
                ChartStyle.MARKER_SIZE / 2.0)).toList();
    }

    /** Everything drawn in the plot that a label must not cover: the series, every bracket box and window box. */
    static Obstacles obstacles(StyledChart c, List<Label> labels, List<Window> windows) {
        Obstacles obstacles = SeriesObstacles.addTo(new Obstacles(), c);
        labels.stream().filter(l -> l.bracket() != null)
                .forEach(l -> obstacles.addBox(BracketBands.box(c, l.x(), l.bracket())));
        windows.forEach(w -> obstacles.addBox(windowBox(c, w)));
        return obstacles;
    }

    /** The plot area, in screen pixels. */
    static Rectangle2D plotArea(StyledChart c) {
        double left = c.getScreenXFromChart(c.getStyler().getXAxisMin());
        double right = c.getScreenXFromChart(c.getStyler().getXAxisMax());
        double top = c.getScreenYFromChart(c.getStyler().getYAxisMax());
        double bottom = c.getScreenYFromChart(c.getStyler().getYAxisMin());
        return new Rectangle2D.Double(left, top, right - left, bottom - top);
    }

    /** Where a window's box is drawn, in screen pixels. */
    static Rectangle2D windowBox(StyledChart c, Window w) {
        double x = c.getScreenXFromChart(w.x());
        double top = c.getScreenYFromChart(w.masses().hi());
        double bottom = c.getScreenYFromChart(w.masses().lo());
        return new Rectangle2D.Double(x - WINDOW_HALF_WIDTH_PX, Math.min(top, bottom), 2 * WINDOW_HALF_WIDTH_PX,
                Math.max(Math.abs(bottom - top), ChartStyle.LINE_WIDTH));
    }

    /**
     * Draws the windows as faint boxes with a dashed outline: a range of masses with small cores, not a bracket. A
     * window of one mass (a single model, grid or refinement, had a core) gets no box: a flat box would read as a range, and
     * the square at its middle already marks the mass.
     */
    static void windows(StyledChart chart, List<Window> windows, Color color) {
        List<Window> ranges = windows.stream().filter(w -> !MassRangeText.isOneMass(w.masses())).toList();
        if (ranges.isEmpty()) {
            return;
        }
        Color fill = new Color(color.getRed(), color.getGreen(), color.getBlue(), WINDOW_ALPHA);
        chart.addOverlay((g, c) -> {
            for (Window w : ranges) {
                Rectangle2D box = windowBox(c, w);
                g.setColor(fill);
                g.fill(box);
                g.setColor(color);
                g.setStroke(WINDOW_OUTLINE);
                g.draw(box);
            }
        });
    }
}
