package org.convgrid.plotting.layout;

import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * What a label must not cover on one chart, in screen pixels: boxes (markers, shaded bands, other labels) and line
 * segments (data lines, leader lines). Built fresh for each painting; a label's box is widened by {@link #MARGIN_PX}
 * before it is tested, so that text never touches a 3 px line or a marker's rim.
 */
public final class Obstacles {

    /** Clearance kept between a label and anything it must not cover, pixels. */
    public static final double MARGIN_PX = 2.0;

    private final List<Rectangle2D> boxes = new ArrayList<>();
    private final List<Line2D> segments = new ArrayList<>();

    /** A copy, so that placing labels never changes the caller's obstacles. */
    public Obstacles copy() {
        Obstacles c = new Obstacles();
        c.boxes.addAll(boxes);
        c.segments.addAll(segments);
        return c;
    }

    public Obstacles addBox(Rectangle2D box) {
        boxes.add(box);
        return this;
    }

    public Obstacles addSegment(Line2D segment) {
        segments.add(segment);
        return this;
    }

    /** Adds a square of side {@code size} centred on (x, y): a marker. */
    public Obstacles addMarker(double x, double y, double size) {
        return addBox(new Rectangle2D.Double(x - size / 2, y - size / 2, size, size));
    }

    /** Whether {@code box}, widened by the margin, covers any box or crosses any segment. */
    public boolean hit(Rectangle2D box) {
        return hits(box, 1) > 0;
    }

    /** How many obstacles {@code box} (widened by the margin) meets, counting no further than {@code enough}. */
    int hits(Rectangle2D box, int enough) {
        Rectangle2D wide = new Rectangle2D.Double(box.getX() - MARGIN_PX, box.getY() - MARGIN_PX,
                box.getWidth() + 2 * MARGIN_PX, box.getHeight() + 2 * MARGIN_PX);
        int n = 0;
        for (Rectangle2D b : boxes) {
            if (b.intersects(wide) && ++n >= enough) {
                return n;
            }
        }
        for (Line2D s : segments) {
            if (wide.intersectsLine(s) && ++n >= enough) {
                return n;
            }
        }
        return n;
    }

    /**
     * Whether {@code line} crosses a box (a marker, a label, a shaded box) other than those around the point
     * (x, y): a leader line may leave its own marker's box, never run over another marker or label.
     */
    boolean boxCrossedBy(Line2D line, double x, double y) {
        return boxes.stream().anyMatch(b -> !b.contains(x, y) && b.intersectsLine(line));
    }

    public List<Rectangle2D> boxes() {
        return Collections.unmodifiableList(boxes);
    }

    public List<Line2D> segments() {
        return Collections.unmodifiableList(segments);
    }
}
