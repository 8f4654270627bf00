package org.convgrid.plotting.trend;

import java.awt.Color;
import java.awt.geom.Rectangle2D;
import java.util.List;
import org.convgrid.output.Span;
import org.convgrid.plotting.style.ChartStyle;
import org.convgrid.plotting.style.StyledChart;

/**
 * Draws the brackets of one series of transition masses as shaded bands, one box per point spanning its whole
 * bracket, so the chart shows where the transition lies and not only the reported end. The boxes are not joined
 * across points: between grid metallicities or ages nothing was measured. Translucent, so lines and markers stay
 * visible through them.
 */
final class BracketBands {

    /** Opacity of the band's fill, 0..255. */
    private static final int FILL_ALPHA = 70;
    /** Half width of a box, pixels. */
    private static final double HALF_WIDTH_PX = 11.0;

    /**
     * One bracket at one x.
     *
     * @param x position along the x axis, data units
     * @param bracket the masses around the transition
     */
    record At(double x, Span bracket) {
    }

    private BracketBands() {
    }

    /** Adds the band of {@code brackets} (x increasing; null brackets are skipped) in the given colour. */
    static void add(StyledChart chart, List<At> brackets, Color color) {
        List<At> shown = brackets.stream().filter(b -> b.bracket() != null).toList();
        if (shown.isEmpty()) {
            return;
        }
        Color fill = new Color(color.getRed(), color.getGreen(), color.getBlue(), FILL_ALPHA);
        chart.addOverlay((g, c) -> {
            g.setColor(fill);
            for (At at : shown) {
                g.fill(box(c, at.x(), at.bracket()));
            }
        });
    }

    /** Where the box of {@code bracket} at {@code x} (data units) is drawn, in screen pixels. */
    static Rectangle2D box(StyledChart c, double x, Span bracket) {
        double sx = c.getScreenXFromChart(x);
        double top = c.getScreenYFromChart(bracket.hi());
        double bottom = c.getScreenYFromChart(bracket.lo());
        return new Rectangle2D.Double(sx - HALF_WIDTH_PX, Math.min(top, bottom), 2 * HALF_WIDTH_PX,
                Math.max(Math.abs(bottom - top), ChartStyle.LINE_WIDTH));
    }
}
