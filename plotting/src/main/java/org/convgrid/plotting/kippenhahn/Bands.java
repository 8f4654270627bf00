package org.convgrid.plotting.kippenhahn;

import java.util.ArrayList;
import java.util.List;

/**
 * Joins the rectangles of consecutive steps into bands, so a zone that lives for many steps is drawn as one
 * staircase polygon instead of hundreds of abutting rectangles (no hairline seams between them, small vector
 * files, one legend entry). A rectangle continues a band when it starts where the band's last rectangle ends, the
 * two share some height, neither has another such partner and, when asked, both are the same kind of zone;
 * otherwise (a zone splits, merges, appears or changes kind) a new band starts.
 */
final class Bands {

    private Bands() {
    }

    /**
     * The bands of {@code rects} (in step order), each in step order.
     *
     * @param sameKind whether a band must keep one {@link AgeRect#kind} (convective zones are coloured by kind;
     *     the burning region is one band whether it sits at the centre or has become a shell)
     */
    static List<List<AgeRect>> join(List<AgeRect> rects, boolean sameKind) {
        List<List<AgeRect>> bands = new ArrayList<>();
        List<List<AgeRect>> open = new ArrayList<>();
        int s = 0;
        while (s < rects.size()) {
            int e = s;
            while (e < rects.size() && rects.get(e).step() == rects.get(s).step()) {
                e++;
            }
            List<AgeRect> step = rects.subList(s, e);
            List<List<AgeRect>> next = new ArrayList<>();
            for (AgeRect r : step) {
                List<AgeRect> band = partner(r, step, open, sameKind);
                if (band == null) {
                    band = new ArrayList<>();
                    bands.add(band);
                }
                band.add(r);
                next.add(band);
            }
            open = next;
            s = e;
        }
        return bands;
    }

    private static List<AgeRect> partner(AgeRect r, List<AgeRect> step, List<List<AgeRect>> open,
                                         boolean sameKind) {
        List<List<AgeRect>> candidates = open.stream().filter(b -> continues(b.get(b.size() - 1), r)).toList();
        if (candidates.size() != 1) {
            return null;
        }
        AgeRect last = candidates.get(0).get(candidates.get(0).size() - 1);
        boolean shared = step.stream().filter(o -> continues(last, o)).count() > 1;
        return shared || sameKind && last.kind() != r.kind() ? null : candidates.get(0);
    }

    private static boolean continues(AgeRect earlier, AgeRect later) {
        return earlier.right() == later.left() && earlier.overlaps(later);
    }

    /** The outline of a band: along the lower ends forwards in age, back along the upper ends, closed. */
    static double[][] outline(List<AgeRect> band) {
        int n = band.size();
        double[] x = new double[4 * n + 1];
        double[] y = new double[4 * n + 1];
        for (int k = 0; k < n; k++) {
            AgeRect r = band.get(k);
            x[2 * k] = r.left();
            y[2 * k] = r.lo();
            x[2 * k + 1] = r.right();
            y[2 * k + 1] = r.lo();
            AgeRect back = band.get(n - 1 - k);
            x[2 * n + 2 * k] = back.right();
            y[2 * n + 2 * k] = back.hi();
            x[2 * n + 2 * k + 1] = back.left();
            y[2 * n + 2 * k + 1] = back.hi();
        }
        x[4 * n] = x[0];
        y[4 * n] = y[0];
        return new double[][] {x, y};
    }
}
