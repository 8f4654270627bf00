package org.convgrid.engine.physics.opacity;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;

/**
 * The shipped OPAL GN93 tables (Iglesias &amp; Rogers 1996, ApJ 464, 943; GN93hz file dated 10/03/95) as the
 * engine interpolates them: every published node reproduced, no jump between nodes. Runs over whatever
 * compositions the shipped file holds and names them in its messages.
 */
class OpalGn93TablesTest {

    static final TabulatedOpacity TABLE = OpalGn93Opacity.readShippedTable();
    /** Issue requirement for the nodes, dex; the published values carry three decimals (0.0005 dex). */
    static final double NODE_TOLERANCE = 0.005;
    /** Largest change between neighbouring samples of a walk, dex (issue requirement: no jump above this). */
    static final double JUMP_LIMIT = 0.02;
    /** Metal fractions the issue names; each must be a node of the full set (Iglesias &amp; Rogers 1996). */
    static final double[] REQUIRED_Z = {1e-4, 0.001, 0.004, 0.01, 0.02, 0.04};

    @Test
    void everyPublishedNodeIsReproducedAtEveryShippedComposition() {
        // Iglesias & Rogers 1996, GN93hz: each shipped table's value at each of its nodes
        double[] out = new double[3];
        List<String> report = new ArrayList<>();
        double worst = 0.0;
        int nodes = 0;
        List<String> isolated = new ArrayList<>();
        for (int k = 0; k < TABLE.tableCount(); k++) {
            double compositionWorst = 0.0;
            int unanswered = 0;
            for (int i = 0; i < TABLE.logTemperatures().length; i++) {
                for (int j = 0; j < TABLE.logR().length; j++) {
                    double published = TABLE.logKappa(k, i, j);
                    if (Double.isNaN(published)) {
                        continue;
                    }
                    int status = TABLE.interpolate(TABLE.logTemperatures()[i], TABLE.logR()[j], TABLE.hydrogen(k),
                            TABLE.metals(k), out);
                    if (status != TabulatedOpacity.ANSWERED) {
                        // a node no cell with four tabulated corners reaches (the published blanks are not a
                        // staircase everywhere): it must border a blank, and is named in the report
                        assertThat(bordersBlank(k, i, j)).as("table %d node %d %d", k, i, j).isTrue();
                        unanswered++;
                        isolated.add(String.format(Locale.ROOT, "X=%.4f Z=%.4g log T %.2f log R %.1f",
                                TABLE.hydrogen(k), TABLE.metals(k), TABLE.logTemperatures()[i], TABLE.logR()[j]));
                        continue;
                    }
                    nodes++;
                    compositionWorst = Math.max(compositionWorst, Math.abs(out[0] - published));
                }
            }
            worst = Math.max(worst, compositionWorst);
            report.add(String.format(Locale.ROOT, "X=%.4f Z=%.4g worst %.2e dex, %d isolated nodes",
                    TABLE.hydrogen(k), TABLE.metals(k), compositionWorst, unanswered));
        }
        assertThat(worst).as("shipped compositions: %s", report).isLessThanOrEqualTo(NODE_TOLERANCE);
        assertThat(nodes).isGreaterThan(1000);
        assertThat(isolated.size()).as("isolated nodes: %s", isolated).isLessThanOrEqualTo(nodes / 1000);
    }

    private static boolean bordersBlank(int k, int i, int j) {
        int nT = TABLE.logTemperatures().length;
        int nR = TABLE.logR().length;
        for (int di = -1; di <= 1; di++) {
            for (int dj = -1; dj <= 1; dj++) {
                int a = i + di;
                int b = j + dj;
                if (a >= 0 && a < nT && b >= 0 && b < nR && Double.isNaN(TABLE.logKappa(k, a, b))) {
                    return true;
                }
            }
        }
        return false;
    }

    @Test
    void theIssuesCompositionsAreShippedOnceTheFullFileIs() {
        assumeTrue(TABLE.tableCount() == OpalFileConverter.FULL_FILE_TABLES, "interim set: "
                + TABLE.tableCount() + " tables");
        // Iglesias & Rogers 1996: the GN93hz Z nodes include every Z the issue names, with >= 8 X each
        for (double z : REQUIRED_Z) {
            int count = 0;
            for (int k = 0; k < TABLE.tableCount(); k++) {
                count += TABLE.metals(k) == z ? 1 : 0;
            }
            assertThat(count).as("tables at Z = %s", z).isGreaterThanOrEqualTo(8);
        }
    }

    @Test
    void theShippedTablesEqualThePublishedWindowsKeptInTheRepository() throws IOException {
        // Iglesias & Rogers 1996, GN93hz tables 47 (X = 0.35) and 73 (X = 0.70) at Z = 0.02: the independent
        // copies of those windows agree with the shipped tables at every node they hold
        String[][] windows = {{"opal-gn93-x035-z002.txt", "0.35"}, {"opal-gn93-x070-z002.txt", "0.70"}};
        double[] out = new double[3];
        for (String[] w : windows) {
            List<OpalTableNodes.Node> nodes = OpalTableNodes.in(w[0], 0.0, 10.0, -10.0, 10.0);
            double x = Double.parseDouble(w[1]);
            for (OpalTableNodes.Node n : nodes) {
                assertThat(TABLE.interpolate(n.logT(), n.logR(), x, 0.02, out)).isEqualTo(TabulatedOpacity.ANSWERED);
                assertThat(Math.abs(out[0] - n.logKappa())).as("%s log T %s log R %s", w[0], n.logT(), n.logR())
                        .isLessThanOrEqualTo(1e-9);
            }
        }
    }

    @Test
    void noJumpAlongLinesInLogTLogRXAndZ() {
        // Issue requirement (common practice for interpolated tables): along lines through the tables, where the
        // tables answer, no jump above JUMP_LIMIT; a step between samples above it is bisected until only a true
        // discontinuity could remain (steep stretches, ~10 dex per dex in log T near 7000 K, shrink away)
        List<double[]> compositions = walkCompositions();
        double[] logT = TABLE.logTemperatures();
        double[] logR = TABLE.logR();
        Walk walk = new Walk();
        for (double[] c : compositions) {
            for (double r = logR[0]; r <= logR[logR.length - 1]; r += 0.25) {
                double rr = r;
                walk.line(s -> new double[] {s, rr, c[0], c[1]}, logT[0], logT[logT.length - 1], 5e-4);
            }
            for (int i = 0; i < logT.length; i += 3) {
                double t = logT[i] + 0.013;
                walk.line(s -> new double[] {t, s, c[0], c[1]}, logR[0], logR[logR.length - 1], 5e-4);
            }
        }
        double[] zs = TABLE.metallicities();
        for (double t = logT[0] + 0.02; t < logT[logT.length - 1]; t += 0.37) {
            for (double r = logR[0] + 0.1; r < logR[logR.length - 1]; r += 1.3) {
                double tt = t;
                double rr = r;
                for (double z : new double[] {zs[0], zs[zs.length / 2], zs[zs.length - 1]}) {
                    walk.line(s -> new double[] {tt, rr, s * (1.0 - z), z}, 0.0, 1.0, 2e-3);
                }
                if (zs.length > 1) {
                    double lo = Math.log10(zs[0] + TabulatedOpacity.METALS_OFFSET);
                    double hi = Math.log10(zs[zs.length - 1] + TabulatedOpacity.METALS_OFFSET);
                    for (double share : new double[] {0.3, 0.7}) {
                        walk.line(s -> {
                            double z = Math.pow(10.0, s) - TabulatedOpacity.METALS_OFFSET;
                            return new double[] {tt, rr, share * (1.0 - z), z};
                        }, lo, hi, 5e-3);
                    }
                }
            }
        }
        assertThat(walk.pairs).as("sample pairs walked").isGreaterThan(100_000);
        assertThat(walk.worst).as("largest step between neighbours, at %s", walk.where)
                .isLessThanOrEqualTo(JUMP_LIMIT);
    }

    /** The shipped compositions and the midpoints between neighbouring X of each Z. */
    private static List<double[]> walkCompositions() {
        List<double[]> c = new ArrayList<>();
        for (int k = 0; k < TABLE.tableCount(); k++) {
            c.add(new double[] {TABLE.hydrogen(k), TABLE.metals(k)});
            for (int q = 0; q < TABLE.tableCount(); q++) {
                if (TABLE.metals(q) == TABLE.metals(k) && TABLE.hydrogen(q) > TABLE.hydrogen(k)) {
                    c.add(new double[] {0.5 * (TABLE.hydrogen(q) + TABLE.hydrogen(k)), TABLE.metals(k)});
                }
            }
        }
        return c.size() > 40 ? c.subList(0, 40) : c;
    }

    /**
     * Walks lines, remembering the largest step between neighbouring answered samples; a step above the limit is
     * bisected 30 times towards its largest half, so a steep but continuous stretch shrinks to nothing and only a
     * true jump remains.
     */
    private static final class Walk {
        double worst;
        String where = "";
        long pairs;
        private final double[] out = new double[3];

        void line(java.util.function.DoubleFunction<double[]> point, double from, double to, double step) {
            double previous = Double.NaN;
            for (double s = from; s <= to + 1e-12; s += step) {
                double[] p = point.apply(s);
                if (p[2] < 0.0 || p[2] + p[3] > 1.0) {
                    previous = Double.NaN;
                    continue;
                }
                if (TABLE.interpolate(p[0], p[1], p[2], p[3], out) != TabulatedOpacity.ANSWERED) {
                    previous = Double.NaN;
                    continue;
                }
                if (!Double.isNaN(previous)) {
                    pairs++;
                    double value = out[0];
                    double jump = Math.abs(value - previous);
                    if (jump > JUMP_LIMIT) {
                        jump = residualJump(point, s - step, s);
                    }
                    out[0] = value;
                    if (jump > worst) {
                        worst = jump;
                        where = String.format(Locale.ROOT, "log T %.4f log R %.4f X %.4f Z %.5f", p[0], p[1], p[2],
                                p[3]);
                    }
                }
                previous = out[0];
            }
        }

        private double residualJump(java.util.function.DoubleFunction<double[]> point, double a, double b) {
            double fa = at(point.apply(a));
            double fb = at(point.apply(b));
            for (int n = 0; n < 30 && !Double.isNaN(fa) && !Double.isNaN(fb); n++) {
                double m = 0.5 * (a + b);
                double fm = at(point.apply(m));
                if (Double.isNaN(fm)) {
                    return 0.0; // the line leaves the tables in between: no pair to compare
                }
                if (Math.abs(fm - fa) > Math.abs(fb - fm)) {
                    b = m;
                    fb = fm;
                } else {
                    a = m;
                    fa = fm;
                }
            }
            return Double.isNaN(fa) || Double.isNaN(fb) ? 0.0 : Math.abs(fb - fa);
        }

        private double at(double[] p) {
            return TABLE.interpolate(p[0], p[1], p[2], p[3], out) == TabulatedOpacity.ANSWERED ? out[0] : Double.NaN;
        }
    }
}
