package org.convgrid.plotting.style;

import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.util.ArrayList;
import java.util.List;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.style.Styler;

/**
 * An XChart chart that paints our overlays (tick labels XChart cannot place, notes) after XChart has painted
 * itself, so the overlays appear in every output that paints the chart (PNG and vector files alike).
 */
public final class StyledChart extends XYChart {

    /** Something drawn over the finished chart, in screen coordinates. */
    @FunctionalInterface
    public interface Overlay {
        /** Paints onto {@code g}; {@code chart} converts data values to screen positions. */
        void paint(Graphics2D g, StyledChart chart);
    }

    private final List<Overlay> overlays = new ArrayList<>();

    StyledChart(int width, int height) {
        super(width, height);
    }

    /** Where XChart drew the plot area (inside the axes), screen pixels; valid once the chart has been painted. */
    public java.awt.geom.Rectangle2D plotBounds() {
        return plot.getBounds();
    }

    /**
     * The lower edge of the legend right of the plot, screen pixels, or NaN when the chart shows no legend there;
     * valid once the chart has been painted. XChart keeps only the legend box's size; it centres a legend placed
     * outside on the right vertically on the plot area (XChart 3.8.8's Legend_: y = plot y + (plot height - legend
     * height) / 2; on the demo's transition chart a 235 px legend beside a 620 px plot from y 101 spans 294-528 px).
     */
    public double rightLegendBottom() {
        if (!getStyler().isLegendVisible() || getStyler().getLegendPosition() != Styler.LegendPosition.OutsideE) {
            return Double.NaN;
        }
        java.awt.geom.Rectangle2D area = plot.getBounds();
        return area.getY() + 0.5 * (area.getHeight() + legend.getBounds().getHeight());
    }

    /** Adds an overlay, painted after the chart and earlier overlays. */
    public void addOverlay(Overlay overlay) {
        overlays.add(overlay);
    }

    @Override
    public void paint(Graphics2D g, int width, int height) {
        super.paint(g, width, height);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        for (Overlay overlay : overlays) {
            overlay.paint(g, this);
        }
    }
}
