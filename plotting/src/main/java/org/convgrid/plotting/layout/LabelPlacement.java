package org.convgrid.plotting.layout;

import java.awt.geom.Line2D;
import java.awt.geom.Point2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;

/**
 * Where short labels go beside their points on a chart, in screen pixels. Each label, in the order given, tries
 * places on rings around its point, nearest ring first (right, left, above, below, then the diagonals and the
 * directions between), and takes the first whose box lies inside the plot and covers no obstacle: markers, lines,
 * shaded boxes and the labels and leader lines placed before it. A label that ends up farther from its point than
 * {@link #LEADER_BEYOND_PX} gets a leader line back to it, and such a place is only taken when its leader crosses no
 * other marker, box or label (when every free place needs a leader across one, the nearest free place is taken all
 * the same: a line over a marker reads better than text over it). A label with no free place within {@link #MAX_REACH_PX} takes the place inside the plot that
 * covers the fewest obstacles (it is never dropped: the value matters more than a touch). A pure function of boxes
 * and segments: no drawing.
 */
public final class LabelPlacement {

    /** Distance from a point to the nearest edge of its label on the first ring, pixels. */
    public static final double GAP_PX = 10.0;
    /** Distance between rings, pixels. */
    static final double RING_STEP_PX = 7.0;
    /** The farthest a label moves from its point, pixels. */
    public static final double MAX_REACH_PX = 170.0;
    /** A label farther than this from its point (nearest edge) is joined to it by a leader line, pixels. */
    public static final double LEADER_BEYOND_PX = 20.0;
    /** Where a leader stops short of its point, in marker radii. */
    static final double LEADER_STOP_SHARE = 1.5;
    /** Directions tried on each ring, degrees counter-clockwise from "right of the point", in order of preference. */
    private static final double[] DIRECTIONS = {0, 180, 90, 270, 45, 315, 135, 225, 22.5, 337.5, 157.5, 202.5, 67.5,
        292.5, 112.5, 247.5};
    /** A direction within this cosine (or sine) of an axis aligns the label's middle with the point. */
    private static final double ALIGN_SHARE = 0.3;

    /**
     * A label to place.
     *
     * @param x the point's screen x
     * @param y the point's screen y
     * @param width the text's width, pixels
     * @param height the text's height, pixels
     * @param markerRadius how far from the point its marker reaches: where a leader line stops, pixels
     * @param nearestPx the nearest a label's edge may come to its point, pixels: {@link #GAP_PX} for a label that
     *     may sit beside its point without a leader, {@link #WITH_LEADER_PX} for one that always needs a leader
     */
    public record Wanted(double x, double y, double width, double height, double markerRadius, double nearestPx) {

        /** A label that may sit beside its point, {@link #GAP_PX} away, without a leader. */
        public Wanted(double x, double y, double width, double height, double markerRadius) {
            this(x, y, width, height, markerRadius, GAP_PX);
        }
    }

    /**
     * The nearest ring of a label that always gets a leader: a ring past {@link #LEADER_BEYOND_PX}, so the leader is
     * long enough to see. For a label that names one of several markers close together (a mass label of an HR
     * diagram has a model of each metallicity near it), without a leader the reader cannot tell which one it names.
     */
    public static final double WITH_LEADER_PX = LEADER_BEYOND_PX + RING_STEP_PX;

    /**
     * A placed label.
     *
     * @param box where its text goes
     * @param leader the line from the label to its point's marker, or null when the label sits beside it
     * @param free whether it covers nothing (false only for a label that found no free place within reach)
     */
    public record Placed(Rectangle2D box, Line2D leader, boolean free) {
    }

    private LabelPlacement() {
    }

    /**
     * Places every label, in order; each placed label (and its leader) becomes an obstacle for the later ones.
     * {@code obstacles} itself is left as it was.
     *
     * @param wanted the labels, placed in this order
     * @param obstacles what the labels must not cover
     * @param plot the plot area the labels must stay inside
     */
    public static List<Placed> place(List<Wanted> wanted, Obstacles obstacles, Rectangle2D plot) {
        Obstacles busy = obstacles.copy();
        List<Placed> placed = new ArrayList<>(wanted.size());
        for (Wanted w : wanted) {
            List<Rectangle2D> inside = candidates(w).stream().filter(plot::contains).toList();
            Placed chosen = firstFree(inside, w, busy, true);
            if (chosen == null) {
                chosen = firstFree(inside, w, busy, false);
            }
            if (chosen == null) {
                chosen = leastCovering(inside, w, busy);
            }
            if (chosen == null) {
                chosen = new Placed(candidates(w).get(0), null, false);
            }
            busy.addBox(chosen.box());
            if (chosen.leader() != null) {
                busy.addSegment(chosen.leader());
            }
            placed.add(chosen);
        }
        return placed;
    }

    /**
     * The first of {@code boxes} that covers nothing; with {@code cleanLeader}, also only where its leader (if it
     * needs one) crosses no other marker, box or label (when every free place needs a leader across one, the nearest free place is taken all
 * the same: a line over a marker reads better than text over it). Null when there is none.
     */
    private static Placed firstFree(List<Rectangle2D> boxes, Wanted w, Obstacles busy, boolean cleanLeader) {
        for (Rectangle2D box : boxes) {
            Line2D leader = leader(box, w);
            if (cleanLeader && leader != null && busy.boxCrossedBy(leader, w.x(), w.y())) {
                continue;
            }
            if (!busy.hit(box)) {
                return new Placed(box, leader, true);
            }
        }
        return null;
    }

    /** The first of {@code boxes} that covers the fewest obstacles; null when there are no boxes. */
    private static Placed leastCovering(List<Rectangle2D> boxes, Wanted w, Obstacles busy) {
        Rectangle2D best = null;
        int fewest = Integer.MAX_VALUE;
        for (Rectangle2D box : boxes) {
            int hits = busy.hits(box, fewest);
            if (hits < fewest) {
                fewest = hits;
                best = box;
            }
        }
        return best == null ? null : new Placed(best, leader(best, w), false);
    }

    /** The places tried for one label, nearest ring first. */
    static List<Rectangle2D> candidates(Wanted w) {
        List<Rectangle2D> boxes = new ArrayList<>();
        for (double d = w.nearestPx(); d <= MAX_REACH_PX; d += RING_STEP_PX) {
            for (double degrees : DIRECTIONS) {
                double cos = Math.cos(Math.toRadians(degrees));
                double sin = Math.sin(Math.toRadians(degrees));
                double ax = w.x() + d * cos;
                double ay = w.y() - d * sin;
                double left = cos > ALIGN_SHARE ? ax : cos < -ALIGN_SHARE ? ax - w.width() : ax - w.width() / 2;
                double top = sin > ALIGN_SHARE ? ay - w.height() : sin < -ALIGN_SHARE ? ay : ay - w.height() / 2;
                boxes.add(new Rectangle2D.Double(left, top, w.width(), w.height()));
            }
        }
        return boxes;
    }

    /** The leader from {@code box} to its point's marker, or null when the box is near enough to need none. */
    static Line2D leader(Rectangle2D box, Wanted w) {
        Point2D from = nearestEdgePoint(box, w.x(), w.y());
        double length = from.distance(w.x(), w.y());
        if (length <= LEADER_BEYOND_PX) {
            return null;
        }
        // stop just outside the marker (a square marker reaches sqrt 2 times its radius along a diagonal), so the line
        // points at the marker without running into it
        double stop = (length - LEADER_STOP_SHARE * w.markerRadius()) / length;
        return new Line2D.Double(from.getX(), from.getY(), from.getX() + (w.x() - from.getX()) * stop,
                from.getY() + (w.y() - from.getY()) * stop);
    }

    /** The point of {@code box}'s outline nearest to (x, y), where a leader line from the label to its point starts. */
    static Point2D nearestEdgePoint(Rectangle2D box, double x, double y) {
        return new Point2D.Double(Math.max(box.getMinX(), Math.min(x, box.getMaxX())),
                Math.max(box.getMinY(), Math.min(y, box.getMaxY())));
    }
}
