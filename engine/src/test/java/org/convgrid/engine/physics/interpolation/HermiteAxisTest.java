package org.convgrid.engine.physics.interpolation;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The shared cubic Hermite interpolation: nodes reproduced, cubics reproduced (the parabolic slopes of Steffen 1990,
 * A&A 239, 443, eq. 6, are exact for quadratics, so the interpolant is exact for quadratics on any grid), weights
 * equal to the interpolant of the slopes built from the data (Fritsch & Carlson 1980, eq. 2).
 */
class HermiteAxisTest {

    private static final double[] GRID = {0.0, 0.1, 0.25, 0.3, 0.55, 0.9, 1.0};

    @Test
    void nodesAreReproducedExactly() {
        HermiteAxis axis = new HermiteAxis(GRID);
        double[] w = new double[HermiteAxis.STENCIL];
        for (int k = 0; k < GRID.length; k++) {
            int cell = axis.cell(GRID[k]);
            axis.weights(cell, GRID[k], w, 0);
            for (int q = 0; q < axis.stencilSize(); q++) {
                assertThat(w[q]).isEqualTo(axis.stencilStart(cell) + q == k ? 1.0 : 0.0);
            }
        }
    }

    @Test
    void quadraticsAreExactOnAnUnevenGrid() {
        // the three-point parabola slope is exact for a quadratic (Steffen 1990, eq. 6), one-sided ones too
        HermiteAxis axis = new HermiteAxis(GRID);
        double[] f = new double[GRID.length];
        for (int k = 0; k < GRID.length; k++) {
            f[k] = 2.0 - 3.0 * GRID[k] + 5.0 * GRID[k] * GRID[k];
        }
        double[] w = new double[HermiteAxis.STENCIL];
        for (double x = 0.0; x <= 1.0; x += 0.01) {
            int cell = axis.cell(x);
            axis.weights(cell, x, w, 0);
            double p = 0.0;
            for (int q = 0; q < axis.stencilSize(); q++) {
                p += w[q] * f[axis.stencilStart(cell) + q];
            }
            assertThat(p).isCloseTo(2.0 - 3.0 * x + 5.0 * x * x, within(1e-12));
        }
    }

    @Test
    void weightsAgreeWithTheHermiteFormOfTheSameSlopes() {
        // common practice: p = h00 f_i + h10 h m_i + h01 f_i+1 + h11 h m_i+1 with m = CubicHermite.slopes
        Random random = new Random(7L);
        double[] f = random.doubles(GRID.length).toArray();
        double[] m = CubicHermite.slopes(GRID, f);
        HermiteAxis axis = new HermiteAxis(GRID);
        double[] w = new double[HermiteAxis.STENCIL];
        for (double x = 0.0; x <= 1.0; x += 0.013) {
            int i = axis.cell(x);
            axis.weights(i, x, w, 0);
            double p = 0.0;
            for (int q = 0; q < axis.stencilSize(); q++) {
                p += w[q] * f[axis.stencilStart(i) + q];
            }
            double h = GRID[i + 1] - GRID[i];
            double direct = CubicHermite.value((x - GRID[i]) / h, f[i], f[i + 1], h * m[i], h * m[i + 1]);
            assertThat(p).isCloseTo(direct, within(1e-12));
        }
    }

    @Test
    void shortAxesAreConstantOrLinear() {
        double[] w = new double[HermiteAxis.STENCIL];
        HermiteAxis single = new HermiteAxis(new double[] {0.02});
        single.weights(single.cell(0.5), 0.5, w, 0);
        assertThat(w[0]).isEqualTo(1.0);
        HermiteAxis pair = new HermiteAxis(new double[] {0.0, 2.0});
        pair.weights(pair.cell(0.5), 0.5, w, 0);
        assertThat(w[0]).isCloseTo(0.75, within(1e-15));
        assertThat(w[1]).isCloseTo(0.25, within(1e-15));
    }
}
