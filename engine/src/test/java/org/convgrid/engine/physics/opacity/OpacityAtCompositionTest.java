package org.convgrid.engine.physics.opacity;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.IntStream;
import org.convgrid.engine.state.Composition;
import org.junit.jupiter.api.Test;

/**
 * {@link Opacity#atComposition} gives the same numbers, bit for bit, as {@link Opacity#rosselandMean} at that
 * composition: inside the tables, in the blend of the two sets, across their edges and beyond them, for compositions
 * inside and outside the tabulated ones, in any order of the calls and from several threads at once (a property of
 * the implementation, no published source needed).
 */
class OpacityAtCompositionTest {

    private static final double[][] COMPOSITIONS = {
        {0.70, 0.02}, {0.7062, 0.0188}, {0.346, 0.0188}, {0.0, 0.02}, {0.55, 0.0065}, {0.70, 0.02 + 3e-10},
        {0.75, 5e-5}, {0.90, 0.01}, {0.60, 0.09}, {0.30, 0.12}, {0.999, 0.0}
    };

    @Test
    void theShippedOpacityAtACompositionIsItsRosselandMeanExactly() {
        for (int n = 0; n < COMPOSITIONS.length; n++) {
            // every point at the first composition, every fifth one at the others (the suite's time)
            sameEverywhere(OpalGn93Opacity.shipped(), Composition.scaledSolar(COMPOSITIONS[n][0],
                    COMPOSITIONS[n][1]), n == 0 ? 1 : 5);
        }
    }

    @Test
    void withoutCoolTablesAndScaledAndAnalyticAlike() {
        Composition c = Composition.scaledSolar(0.70, 0.02);
        sameEverywhere(OpalGn93Opacity.withoutCoolTables(), c, 2);
        sameEverywhere(ScaledOpacity.of(OpalGn93Opacity.shipped(), 1.7), c, 3);
        sameEverywhere(AnalyticCompositeOpacity.standard(), c, 5);
        sameEverywhere(new ElectronConduction(), Composition.scaledSolar(0.346, 0.0188), 5);
    }

    @Test
    void oneBoundOpacitySharedByThreadsGivesTheSameNumbers() {
        Opacity opacity = OpalGn93Opacity.shipped();
        Composition c = Composition.scaledSolar(0.7062, 0.0188);
        OpacityAtComposition at = opacity.atComposition(c);
        List<double[]> points = points();
        IntStream.range(0, 2 * points.size()).parallel().forEach(n -> {
            // each thread walks the points in its own order, so the kept cell changes under the others
            double[] p = points.get((int) ((n * 7919L) % points.size()));
            assertThat(at.rosselandMean(p[0], p[1])).isEqualTo(opacity.rosselandMean(p[0], p[1], c));
        });
    }

    /**
     * Every stride-th point in order and back again (consecutive points share a cell, or do not), and a fresh
     * binding at some of them.
     */
    private static void sameEverywhere(Opacity opacity, Composition c, int stride) {
        List<double[]> all = points();
        List<double[]> points = new ArrayList<>();
        for (int n = 0; n < all.size(); n += stride) {
            points.add(all.get(n));
        }
        OpacityAtComposition walked = opacity.atComposition(c);
        for (int pass = 0; pass < 2; pass++) {
            for (int n = 0; n < points.size(); n++) {
                double[] p = points.get(pass == 0 ? n : points.size() - 1 - n);
                OpacityValue expected = opacity.rosselandMean(p[0], p[1], c);
                assertThat(walked.rosselandMean(p[0], p[1])).as("rho %s T %s X %s Z %s", p[0], p[1], c.x(), c.z())
                        .isEqualTo(expected);
                if (n % 7 == 0) {
                    assertThat(opacity.atComposition(c).rosselandMean(p[0], p[1])).isEqualTo(expected);
                }
            }
        }
    }

    /** {rho, T}: log T 3.1-9.3 and log R -9.5-2.5, on the tables' nodes, between them and beyond the grids. */
    private static List<double[]> points() {
        List<Double> logT = new ArrayList<>();
        List<Double> logR = new ArrayList<>();
        for (TabulatedOpacity t : new TabulatedOpacity[] {OpalGn93Opacity.shipped().table(),
            OpalGn93Opacity.shipped().coolTable()}) {
            double[] nodes = t.logTemperatures();
            for (int i = 0; i < nodes.length; i++) {
                logT.add(nodes[i]);
                if (i + 1 < nodes.length) {
                    logT.add(0.3 * nodes[i] + 0.7 * nodes[i + 1]);
                }
            }
        }
        for (double v = 3.1; v < 3.3; v += 0.013) {
            logT.add(v);
        }
        for (double v = 8.70; v < 9.3; v += 0.037) {
            logT.add(v);
        }
        double[] rNodes = OpalGn93Opacity.shipped().table().logR();
        for (int j = 0; j < rNodes.length; j++) {
            logR.add(rNodes[j]);
            if (j + 1 < rNodes.length) {
                logR.add(0.6 * rNodes[j] + 0.4 * rNodes[j + 1]);
            }
        }
        for (double v = -9.5; v < -8.0; v += 0.21) {
            logR.add(v);
        }
        for (double v = 1.0; v < 2.5; v += 0.17) {
            logR.add(v);
        }
        List<double[]> p = new ArrayList<>();
        for (double lt : logT) {
            for (double lr : logR) {
                p.add(new double[] {Math.pow(10.0, lr + 3.0 * (lt - 6.0)), Math.pow(10.0, lt)});
            }
        }
        return p;
    }
}
