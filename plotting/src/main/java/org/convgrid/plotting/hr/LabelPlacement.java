package org.convgrid.plotting.hr;

import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;

/**
 * Where short labels go beside their points on a chart, in screen pixels: each label takes the first place around its
 * point (right, above right, below right, left, above left, below left, then the same farther out, line by line) whose
 * box lies inside the plot and covers nothing already taken (other labels, model markers). A label with no free place
 * within reach takes its first place inside the plot. A pure function of boxes: no drawing.
 */
final class LabelPlacement {

    /** Gap between a point and its label, pixels. */
    static final double GAP_PX = 10.0;
    /** How many text lines a label may move away from its point before it gives up on a free place. */
    static final int MAX_LINES_AWAY = 8;

    /**
     * A label to place.
     *
     * @param x the point's screen x
     * @param y the point's screen y
     * @param width the text's width, pixels
     * @param height the text's line height, pixels
     */
    record Wanted(double x, double y, double width, double height) {
    }

    private LabelPlacement() {
    }

    /**
     * The box of every label, in order; each label placed adds its box to {@code taken} (a copy), so later labels
     * avoid it.
     *
     * @param wanted the labels, placed in this order
     * @param taken boxes the labels must not cover
     * @param plot the plot area the labels must stay inside
     */
    static List<Rectangle2D> place(List<Wanted> wanted, List<Rectangle2D> taken, Rectangle2D plot) {
        List<Rectangle2D> busy = new ArrayList<>(taken);
        List<Rectangle2D> placed = new ArrayList<>(wanted.size());
        for (Wanted w : wanted) {
            Rectangle2D chosen = null;
            Rectangle2D firstInside = null;
            for (Rectangle2D box : candidates(w)) {
                if (!plot.contains(box)) {
                    continue;
                }
                if (firstInside == null) {
                    firstInside = box;
                }
                if (busy.stream().noneMatch(box::intersects)) {
                    chosen = box;
                    break;
                }
            }
            if (chosen == null) {
                chosen = firstInside != null ? firstInside : candidates(w).get(0);
            }
            busy.add(chosen);
            placed.add(chosen);
        }
        return placed;
    }

    /** The point of {@code box}'s outline nearest to (x, y), where a leader line from the label to its point starts. */
    static java.awt.geom.Point2D nearestEdgePoint(Rectangle2D box, double x, double y) {
        return new java.awt.geom.Point2D.Double(Math.max(box.getMinX(), Math.min(x, box.getMaxX())),
                Math.max(box.getMinY(), Math.min(y, box.getMaxY())));
    }

    /** The places tried for one label, nearest first. */
    static List<Rectangle2D> candidates(Wanted w) {
        List<Rectangle2D> boxes = new ArrayList<>();
        double right = w.x() + GAP_PX;
        double left = w.x() - GAP_PX - w.width();
        double middle = w.y() - w.height() / 2;
        double above = w.y() - GAP_PX - w.height();
        double below = w.y() + GAP_PX;
        for (int lines = 0; lines <= MAX_LINES_AWAY; lines++) {
            double shift = lines * w.height();
            for (double x : new double[] {right, left}) {
                if (lines == 0) {
                    boxes.add(new Rectangle2D.Double(x, middle, w.width(), w.height()));
                }
                boxes.add(new Rectangle2D.Double(x, above - shift, w.width(), w.height()));
                boxes.add(new Rectangle2D.Double(x, below + shift, w.width(), w.height()));
            }
        }
        return boxes;
    }
}
