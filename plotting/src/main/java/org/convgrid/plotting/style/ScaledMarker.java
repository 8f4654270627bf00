package org.convgrid.plotting.style;

import java.awt.Graphics2D;
import org.knowm.xchart.style.markers.Marker;

/**
 * A marker painted at a share of the chart's marker size. XChart sets one marker size per chart; a series of
 * secondary points (the HR diagram's refinement models) needs smaller ones so the grid's models read first.
 */
public final class ScaledMarker extends Marker {

    private final Marker shape;
    private final double share;

    /**
     * @param shape the marker to paint
     * @param share its size as a share of the chart's marker size, in (0, 1]
     */
    public ScaledMarker(Marker shape, double share) {
        if (!(share > 0 && share <= 1)) {
            throw new IllegalArgumentException("marker share " + share + " outside (0, 1]");
        }
        this.shape = shape;
        this.share = share;
    }

    @Override
    public void paint(Graphics2D g, double xOffset, double yOffset, int markerSize) {
        shape.paint(g, xOffset, yOffset, Math.max(1, (int) Math.round(markerSize * share)));
    }
}
