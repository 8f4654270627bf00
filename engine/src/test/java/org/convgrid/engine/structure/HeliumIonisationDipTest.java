package org.convgrid.engine.structure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/**
 * How {@link HeliumIonisationDip} finds the minimum of Gamma1 on made-up outer layers (shapes only, no published
 * values: a hydrogen dip at the cool end, a helium dip inside, Gamma1 back to 5/3 below).
 */
class HeliumIonisationDipTest {

    private static final int POINTS = 400;

    /** Radii of the outer layers, cm, increasing outwards. */
    private static double[] radii() {
        double[] r = new double[POINTS];
        for (int k = 0; k < POINTS; k++) {
            r[k] = 6.0e10 + 1.0e10 * k / (POINTS - 1);
        }
        return r;
    }

    /** Temperature falling from 1e6 K at the innermost point to 5e3 K at the top, as a power of the depth. */
    private static double[] temperatures(double[] r) {
        double[] t = new double[r.length];
        for (int k = 0; k < r.length; k++) {
            double depth = (7.0e10 - r[k]) / 1.0e10 + 1e-3;
            t[k] = 5.0e3 * Math.pow(depth / 1e-3, Math.log(200.0) / Math.log(1001.0));
        }
        return t;
    }

    /** 5/3 minus a Gaussian dip in log T at the helium centre, and a deep hydrogen dip at 1.2e4 K. */
    private static double[] gamma1(double[] t, double heliumCentreK, double heliumDepth) {
        double[] g = new double[t.length];
        for (int k = 0; k < t.length; k++) {
            double lt = Math.log10(t[k]);
            g[k] = 5.0 / 3.0 - heliumDepth * Math.exp(-Math.pow((lt - Math.log10(heliumCentreK)) / 0.12, 2))
                    - 0.45 * Math.exp(-Math.pow((lt - Math.log10(1.2e4)) / 0.35, 2));
        }
        return g;
    }

    @Test
    void findsTheHeliumMinimumNotTheHydrogenWingAtTheCoolEnd() {
        double[] r = radii();
        double[] t = temperatures(r);
        double[] g = gamma1(t, 1.0e5, 0.08);
        double found = HeliumIonisationDip.radiusOf(r, t, g);
        // the grid point of least Gamma1 near 1e5 K, and the vertex within one spacing of it
        int nearest = 0;
        for (int k = 0; k < r.length; k++) {
            if (Math.abs(Math.log(t[k] / 1.0e5)) < Math.abs(Math.log(t[nearest] / 1.0e5))) {
                nearest = k;
            }
        }
        assertThat(found).isCloseTo(r[nearest], within(1.0e10 / (POINTS - 1)));
        // the hydrogen wing at the range's cool end (3e4 K) is lower than the helium minimum, yet is not taken
        int coolEnd = 0;
        for (int k = 0; k < r.length; k++) {
            if (t[k] >= 3.0e4) {
                coolEnd = k;
            }
        }
        assertThat(g[coolEnd]).isLessThan(g[nearest]);
    }

    @Test
    void theVertexOfAParabolaIsFoundBetweenMeshPoints() {
        double[] r = {1.0, 2.0, 3.0, 4.0, 5.0};
        double[] t = {3.0e5, 2.0e5, 1.0e5, 7.0e4, 5.0e4};
        double[] g = new double[5];
        for (int k = 0; k < 5; k++) {
            g[k] = 1.58 + 0.01 * (r[k] - 2.7) * (r[k] - 2.7);
        }
        assertThat(HeliumIonisationDip.radiusOf(r, t, g)).isCloseTo(2.7, within(1e-12));
    }

    @Test
    void aShallowOrMissingDipGivesNone() {
        double[] r = radii();
        double[] t = temperatures(r);
        assertThat(HeliumIonisationDip.radiusOf(r, t, gamma1(t, 1.0e5, 0.002))).isNaN();
        assertThat(HeliumIonisationDip.radiusOf(r, t, gamma1(t, 1.0e5, 0.0))).isNaN();
    }

    @Test
    void gammaOneAboveFiveThirdsGivesNone() {
        double[] r = radii();
        double[] t = temperatures(r);
        double[] g = gamma1(t, 1.0e5, 0.08);
        for (int k = 0; k < g.length; k++) {
            if (t[k] > 4.0e4 && t[k] < 6.0e4) {
                g[k] += 0.3;
            }
        }
        assertThat(HeliumIonisationDip.radiusOf(r, t, g)).isNaN();
    }
}
