package org.convgrid.plotting.style;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Whether shaded rectangles can be seen on a chart, judged before it is painted (XChart decides the legend then) from
 * their extents in shares of each axis (0 at the axis's lower end, 1 at its upper end), turned into pixels of the
 * plot of our 1200 x 800 charts ({@link NominalPlot}). A legend entry for a colour the reader cannot find misleads,
 * so a zone kind is listed only when its rectangles make at least one patch {@link #MIN_HEIGHT_PX} tall and
 * {@link #MIN_WIDTH_PX} wide. Rectangles that touch side by side and share some height (a zone held over consecutive
 * evolution steps, the columns of neighbouring models) count as one patch: each may be a sliver, together they show.
 *
 * <p>Measured on the demo: a thin shell under the surface 1.5-2.5 pixels tall across the columns of the 1.4-2 Msun
 * models reads as a pink line, so a line of a pixel and a half counts. The transition refinement adds models 0.002
 * Msun apart, whose columns are 0.5-3 pixels wide: a small central zone 12-28 pixels tall in such a column (Z =
 * 0.014, r/R, 20 and 150 Myr) could not be found beside the 3-pixel transition line, so a patch must also be 3 pixels
 * wide. What lies at an end of the axis loses the pixels drawn over it there: the plot's border (1 pixel), and on a
 * zones-against-age chart also the burning region's 2-pixel outline along the centre; a convective core reaching m/M
 * 0.067 (2.7 pixels on the depth axis, the 1 Msun track, Z = 0.008, 20-30 Myr) showed nowhere.
 */
public final class VisiblePatches {

    /** The least height of a visible patch, pixels (after what is drawn over it at the axis's ends). */
    public static final double MIN_HEIGHT_PX = 1.5;
    /** The least width of a visible patch, pixels. */
    public static final double MIN_WIDTH_PX = 3.0;
    /** What the plot's border covers of a patch at an end of the y axis, pixels. */
    public static final double BORDER_PX = 1.0;

    /**
     * A shaded rectangle in axis shares.
     *
     * @param left lower x end
     * @param right upper x end
     * @param bottom lower y end
     * @param top upper y end
     */
    public record Patch(double left, double right, double bottom, double top) {

        boolean tall(double coveredAtEndsPx) {
            double covered = (bottom <= EDGE ? coveredAtEndsPx : 0.0) + (top >= 1.0 - EDGE ? coveredAtEndsPx : 0.0);
            return (top - bottom) * NominalPlot.HEIGHT_PX - covered >= MIN_HEIGHT_PX;
        }

        /** Whether {@code next} (starting no further left) continues this one side by side. */
        boolean joinedBy(Patch next) {
            return next.left <= right + JOIN_SLACK && next.bottom < top && bottom < next.top;
        }
    }

    /** A patch end this close to the axis's end lies on it. */
    private static final double EDGE = 1e-9;
    /** Rectangles whose ends are this close (a rounding of the axis transform) still touch. */
    private static final double JOIN_SLACK = 1e-9;

    private VisiblePatches() {
    }

    /**
     * Whether some of {@code patches} that are each tall enough join, side by side, into a run as wide as
     * {@link #MIN_WIDTH_PX}; patches too thin to see do not join their neighbours into a visible run.
     *
     * @param coveredAtEndsPx how many pixels of a patch at an end of the y axis are drawn over (at least the
     *     plot's border, {@link #BORDER_PX})
     */
    public static boolean anyVisible(List<Patch> patches, double coveredAtEndsPx) {
        List<Patch> tall = patches.stream().filter(p -> p.tall(coveredAtEndsPx))
                .sorted(Comparator.comparingDouble(Patch::left)).toList();
        // each run: the patches joined so far, as their overall x extent and the last patch (for the height test)
        List<double[]> runs = new ArrayList<>();
        List<Patch> lasts = new ArrayList<>();
        for (Patch p : tall) {
            int joined = -1;
            for (int i = 0; i < runs.size() && joined < 0; i++) {
                if (lasts.get(i).joinedBy(p)) {
                    joined = i;
                }
            }
            if (joined < 0) {
                runs.add(new double[] {p.left(), p.right()});
                lasts.add(p);
            } else {
                runs.get(joined)[1] = Math.max(runs.get(joined)[1], p.right());
                lasts.set(joined, p);
            }
            double[] run = runs.get(joined < 0 ? runs.size() - 1 : joined);
            if ((run[1] - run[0]) * NominalPlot.WIDTH_PX >= MIN_WIDTH_PX) {
                return true;
            }
        }
        return false;
    }

    /** Where {@code value} lies on a logarithmic axis from {@code min} to {@code max}, as a share of it. */
    public static double logShare(double value, double min, double max) {
        return Math.log(value / min) / Math.log(max / min);
    }

    /** Where {@code value} lies on a linear axis from {@code min} to {@code max}, as a share of it. */
    public static double linearShare(double value, double min, double max) {
        return (value - min) / (max - min);
    }
}
