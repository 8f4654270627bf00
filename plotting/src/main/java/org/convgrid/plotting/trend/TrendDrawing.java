package org.convgrid.plotting.trend;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.FontMetrics;
import java.awt.geom.Rectangle2D;
import java.util.List;
import org.convgrid.output.Span;
import org.convgrid.output.transitions.MassRangeText;
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
    /** Gap between a marker and its label, pixels. */
    private static final double LABEL_GAP_PX = 12.0;
    private static final BasicStroke WINDOW_OUTLINE = new BasicStroke(1.5f, BasicStroke.CAP_BUTT,
            BasicStroke.JOIN_MITER, 10f, new float[] {5f, 4f}, 0f);

    /**
     * One value label.
     *
     * @param x position along the x axis, data units
     * @param mass the mass, solar masses (the label's height)
     * @param text the label
     * @param color the colour of its series
     */
    record Label(double x, double mass, String text, Color color) {
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
     * Writes every label of the chart beside its marker: right of it, else above-right, below-right or left of it,
     * whichever first overlaps no marker (of a value or of a window's middle) and no label already written (labels of several series gather where transitions of
     * neighbouring metallicities or ages meet); a label with no free place, or that would leave the plot, is left
     * out (the marker and the table still give the value).
     */
    static void labels(StyledChart chart, List<Label> labels, List<Window> windows) {
        chart.addOverlay((g, c) -> {
            g.setFont(ChartStyle.ANNOTATION_FONT);
            FontMetrics fm = g.getFontMetrics();
            double left = c.getScreenXFromChart(c.getStyler().getXAxisMin());
            double right = c.getScreenXFromChart(c.getStyler().getXAxisMax());
            double height = fm.getAscent();
            // the markers themselves (values and window middles) are taken before any label
            List<Rectangle2D> taken = new java.util.ArrayList<>();
            labels.forEach(l -> taken.add(markerBox(c, l.x(), l.mass())));
            windows.forEach(w -> taken.add(markerBox(c, w.x(), 0.5 * (w.masses().lo() + w.masses().hi()))));
            for (Label l : labels) {
                double x = c.getScreenXFromChart(l.x());
                double y = c.getScreenYFromChart(l.mass());
                double width = fm.stringWidth(l.text());
                double[][] places = {{x + LABEL_GAP_PX, y - height / 2}, {x + LABEL_GAP_PX / 2, y - height - LABEL_GAP_PX},
                    {x + LABEL_GAP_PX / 2, y + LABEL_GAP_PX}, {x - LABEL_GAP_PX - width, y - height / 2}};
                for (double[] place : places) {
                    Rectangle2D box = new Rectangle2D.Double(place[0], place[1], width, height);
                    if (box.getMinX() >= left && box.getMaxX() <= right
                            && taken.stream().noneMatch(box::intersects)) {
                        taken.add(box);
                        g.setColor(l.color().darker());
                        g.drawString(l.text(), (float) place[0], (float) (place[1] + height - 2));
                        break;
                    }
                }
            }
        });
    }

    private static Rectangle2D markerBox(StyledChart c, double x, double mass) {
        double half = ChartStyle.MARKER_SIZE / 2.0;
        return new Rectangle2D.Double(c.getScreenXFromChart(x) - half, c.getScreenYFromChart(mass) - half, 2 * half,
                2 * half);
    }

    /**
     * Draws the windows as faint boxes with a dashed outline: a range of masses with small cores, not a bracket. A
     * window of one mass (a single refinement model had a core) gets no box: a flat box would read as a range, and
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
                double x = c.getScreenXFromChart(w.x());
                double top = c.getScreenYFromChart(w.masses().hi());
                double bottom = c.getScreenYFromChart(w.masses().lo());
                Rectangle2D box = new Rectangle2D.Double(x - WINDOW_HALF_WIDTH_PX, Math.min(top, bottom),
                        2 * WINDOW_HALF_WIDTH_PX, Math.max(Math.abs(bottom - top), ChartStyle.LINE_WIDTH));
                g.setColor(fill);
                g.fill(box);
                g.setColor(color);
                g.setStroke(WINDOW_OUTLINE);
                g.draw(box);
            }
        });
    }
}
