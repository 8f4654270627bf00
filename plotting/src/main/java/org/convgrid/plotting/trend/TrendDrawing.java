package org.convgrid.plotting.trend;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.FontMetrics;
import java.awt.geom.Rectangle2D;
import java.util.List;
import org.convgrid.output.Span;
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
     */
    record Label(double x, double mass, String text) {
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

    /** Writes each label right of its marker, in the series colour, unless it would run off the plot. */
    static void labels(StyledChart chart, List<Label> labels, Color color) {
        chart.addOverlay((g, c) -> {
            g.setFont(ChartStyle.ANNOTATION_FONT);
            g.setColor(color.darker());
            FontMetrics fm = g.getFontMetrics();
            double right = c.getScreenXFromChart(c.getStyler().getXAxisMax());
            for (Label l : labels) {
                double x = c.getScreenXFromChart(l.x()) + LABEL_GAP_PX;
                double y = c.getScreenYFromChart(l.mass()) + fm.getAscent() / 2.0 - 2;
                if (x + fm.stringWidth(l.text()) <= right) {
                    g.drawString(l.text(), (float) x, (float) y);
                }
            }
        });
    }

    /** Draws the windows as faint boxes with a dashed outline: a range of masses with small cores, not a bracket. */
    static void windows(StyledChart chart, List<Window> windows, Color color) {
        if (windows.isEmpty()) {
            return;
        }
        Color fill = new Color(color.getRed(), color.getGreen(), color.getBlue(), WINDOW_ALPHA);
        chart.addOverlay((g, c) -> {
            for (Window w : windows) {
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
