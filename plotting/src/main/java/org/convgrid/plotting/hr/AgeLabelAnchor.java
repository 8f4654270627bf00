package org.convgrid.plotting.hr;

import java.awt.geom.Dimension2D;
import java.awt.geom.Line2D;
import java.awt.geom.Point2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.convgrid.plotting.layout.LabelPlacement;
import org.convgrid.plotting.layout.Obstacles;

/**
 * Which model of an isochrone its age label names: one where the isochrone stands apart from every isochrone of
 * another age, so the label cannot be read as naming a neighbour. Young isochrones merge at the hot end (at 2-3 Msun
 * the 1-200 Myr ones all lie on the main sequence) and spread out at the cool end, where the low-mass stars are
 * still contracting: a grid's "5 Myr" and "10 Myr", set beside the brightest models, sat where the six isochrones
 * of its grid met. Distances are in pixels of a plot of nominal size, since the labels are chosen before the chart
 * is painted. A pure function: no drawing.
 */
final class AgeLabelAnchor {

    /**
     * The distance from every other age's isochrone, pixels, at which a model counts as standing apart: a little
     * over a label's height, so a label beside it is nearer its own line than any other.
     */
    static final double APART_PX = 30.0;

    /** Distances from the other isochrones that differ by less than this count as the same, pixels. */
    static final double SAME_PX = 1.0;

    private AgeLabelAnchor() {
    }

    /**
     * The model of {@code line} that its age label names: its lowest-mass (coolest) end when the room right of it,
     * where the label goes, is crossed by no isochrone of another age in {@code all} (of any Z: a line of another
     * colour but another age through the label would confuse it as well) and no model of another age lies within a
     * label's height of it, the end where young isochrones part; else
     * its highest-mass end when that lies at least {@link #APART_PX} from every other age's isochrone, the end where
     * older ones part at the turn-off; else the model farthest from them (the lowest mass of those within
     * {@link #SAME_PX} of the farthest, so that isochrones which run side by side all the way are labelled at one
     * spot and the chart keeps only some of those labels, not one at either end). An end has
     * free room beyond it for the label, which the chart keeps ({@link #atLowMassEnd}).
     *
     * @param scale the nominal plot's pixels per dex
     * @param label the label's size, pixels
     */
    static HrPoint of(HrDiagramData.ZeroAgeLine line, List<HrDiagramData.ZeroAgeLine> all, Scale scale,
                      Dimension2D label) {
        List<HrDiagramData.ZeroAgeLine> others = all.stream().filter(o -> o.age() != line.age()).toList();
        Comparator<HrPoint> byMass = Comparator.comparingDouble(HrPoint::massMsun);
        HrPoint lowest = line.points().stream().min(byMass).orElseThrow();
        if (roomRightIsFree(lowest, others, scale, label)
                && nearestModel(lowest, others, scale) >= label.getHeight()) {
            return lowest;
        }
        HrPoint highest = line.points().stream().max(byMass).orElseThrow();
        if (separation(highest, others, scale) >= APART_PX) {
            return highest;
        }
        double farthest = line.points().stream().mapToDouble(p -> separation(p, others, scale)).max().orElseThrow();
        return line.points().stream().sorted(byMass)
                .filter(p -> separation(p, others, scale) >= farthest - SAME_PX).findFirst().orElseThrow();
    }

    /**
     * Pixels per dex of the nominal plot ({@link org.convgrid.plotting.style.NominalPlot}).
     *
     * @param x per dex of log Teff
     * @param y per dex of log L
     */
    record Scale(double x, double y) {

        /** Where a model lies on the nominal plot, screen-like: cooler to the right, brighter up. */
        Point2D at(HrPoint p) {
            return new Point2D.Double(-p.logTeff() * x, -p.logL() * y);
        }
    }

    /**
     * Whether the box right of {@code end} where a label beside it goes ({@link LabelPlacement#GAP_PX} away, as
     * wide and high as the label, with {@link Obstacles#MARGIN_PX} around) is crossed by none of {@code others}. A
     * point-to-line distance would not do: at one grid's 100 Myr cool end the 200 Myr isochrone ran 6 px from the
     * model, below and to its left, and the room right of it was free.
     */
    static boolean roomRightIsFree(HrPoint end, List<HrDiagramData.ZeroAgeLine> others, Scale scale,
                                   Dimension2D label) {
        Point2D at = scale.at(end);
        Rectangle2D room = new Rectangle2D.Double(at.getX() + LabelPlacement.GAP_PX - Obstacles.MARGIN_PX,
                at.getY() - label.getHeight() / 2 - Obstacles.MARGIN_PX, label.getWidth() + 2 * Obstacles.MARGIN_PX,
                label.getHeight() + 2 * Obstacles.MARGIN_PX);
        return others.stream().noneMatch(o -> segments(o, scale).stream().anyMatch(room::intersectsLine));
    }

    /** Whether {@code anchor} is the lowest-mass (coolest) model of {@code line}. */
    static boolean atLowMassEnd(HrPoint anchor, HrDiagramData.ZeroAgeLine line) {
        return line.points().stream().allMatch(p -> p.massMsun() >= anchor.massMsun());
    }

    /** Whether {@code anchor} is the highest-mass (brightest) model of {@code line}. */
    static boolean atHighMassEnd(HrPoint anchor, HrDiagramData.ZeroAgeLine line) {
        return line.points().stream().allMatch(p -> p.massMsun() <= anchor.massMsun());
    }

    /**
     * How far {@code p} lies from the nearest of {@code others}' models, nominal pixels: at the demo's 0.2 Msun end
     * the 150 and 600 Myr models lay 2 px apart, and a label right of them named either.
     */
    static double nearestModel(HrPoint p, List<HrDiagramData.ZeroAgeLine> others, Scale scale) {
        Point2D at = scale.at(p);
        return others.stream().flatMap(o -> o.points().stream()).mapToDouble(o -> scale.at(o).distance(at)).min()
                .orElse(Double.POSITIVE_INFINITY);
    }

    /**
     * How far {@code p} lies from the nearest of {@code others}' lines, nominal pixels; infinite when there are none.
     */
    static double separation(HrPoint p, List<HrDiagramData.ZeroAgeLine> others, Scale scale) {
        Point2D at = scale.at(p);
        return others.stream().flatMap(o -> segments(o, scale).stream()).mapToDouble(s -> s.ptSegDist(at))
                .min().orElse(Double.POSITIVE_INFINITY);
    }

    /** An isochrone's stretches between models on the nominal plot (one of zero length when it has one model). */
    private static List<Line2D> segments(HrDiagramData.ZeroAgeLine line, Scale scale) {
        List<Line2D> segments = new ArrayList<>();
        List<HrPoint> points = line.points();
        if (points.size() == 1) {
            segments.add(new Line2D.Double(scale.at(points.get(0)), scale.at(points.get(0))));
        }
        for (int i = 1; i < points.size(); i++) {
            segments.add(new Line2D.Double(scale.at(points.get(i - 1)), scale.at(points.get(i))));
        }
        return segments;
    }
}
