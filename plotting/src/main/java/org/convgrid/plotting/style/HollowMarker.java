package org.convgrid.plotting.style;

import java.awt.Color;
import java.awt.Graphics2D;
import org.knowm.xchart.style.markers.Marker;

/**
 * A marker drawn as an outline: the shape in the series colour with a white inside. It sets apart some points of a
 * series (the fully convective models on a turnover-time line) while keeping the series' shape and colour, so the
 * point still reads as a member of its line. Painted over a filled marker of the same shape it covers it whole.
 */
public final class HollowMarker extends Marker {

    /** The white inside as a share of the marker size: leaves an outline of about a quarter of the size each side. */
    private static final double INSIDE_SHARE = 0.5;

    private final Marker shape;

    /** @param shape the filled marker whose outline is drawn */
    public HollowMarker(Marker shape) {
        this.shape = shape;
    }

    @Override
    public void paint(Graphics2D g, double xOffset, double yOffset, int markerSize) {
        Color outline = g.getColor();
        shape.paint(g, xOffset, yOffset, markerSize);
        g.setColor(Color.WHITE);
        shape.paint(g, xOffset, yOffset, Math.max(1, (int) Math.round(markerSize * INSIDE_SHARE)));
        g.setColor(outline);
    }
}
