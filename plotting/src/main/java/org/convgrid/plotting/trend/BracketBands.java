package org.convgrid.plotting.trend;

import java.awt.Color;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.util.List;
import org.convgrid.output.Span;
import org.convgrid.plotting.style.ChartStyle;
import org.convgrid.plotting.style.StyledChart;

/**
 * Draws the brackets of one series of transition masses as a shaded band: between neighbouring points the band
 * joins their brackets, so it shows where the transition lies, not only the reported end; a lone point gets a short
 * shaded box. Translucent, so lines and markers stay visible through it.
 */
final class BracketBands {

    /** Opacity of the band's fill, 0..255. */
    private static final int FILL_ALPHA = 70;
    /** Half width of a lone point's box, pixels. */
    private static final double LONE_HALF_WIDTH_PX = 9.0;

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
            if (shown.size() == 1) {
                At only = shown.get(0);
                double x = c.getScreenXFromChart(only.x());
                double top = c.getScreenYFromChart(only.bracket().hi());
                double bottom = c.getScreenYFromChart(only.bracket().lo());
                g.fill(new Rectangle2D.Double(x - LONE_HALF_WIDTH_PX, Math.min(top, bottom), 2 * LONE_HALF_WIDTH_PX,
                        Math.max(Math.abs(bottom - top), ChartStyle.LINE_WIDTH)));
                return;
            }
            Path2D.Double band = new Path2D.Double();
            for (int i = 0; i < shown.size(); i++) {
                double x = c.getScreenXFromChart(shown.get(i).x());
                double y = c.getScreenYFromChart(shown.get(i).bracket().hi());
                if (i == 0) {
                    band.moveTo(x, y);
                } else {
                    band.lineTo(x, y);
                }
            }
            for (int i = shown.size() - 1; i >= 0; i--) {
                band.lineTo(c.getScreenXFromChart(shown.get(i).x()),
                        c.getScreenYFromChart(shown.get(i).bracket().lo()));
            }
            band.closePath();
            g.fill(band);
        });
    }
}
