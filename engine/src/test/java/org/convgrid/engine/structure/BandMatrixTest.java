package org.convgrid.engine.structure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealVector;
import org.junit.jupiter.api.Test;

class BandMatrixTest {

    @Test
    void solvesLikeADenseLuDecomposition() {
        // reference: the dense LU with partial pivoting of Commons Math on the same matrix
        int n = 60;
        int kl = 5;
        int ku = 5;
        Random random = new Random(42);
        BandMatrix band = new BandMatrix(n, kl, ku);
        double[][] dense = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = Math.max(0, i - kl); j <= Math.min(n - 1, i + ku); j++) {
                // weak diagonal so that pivoting actually swaps rows
                double v = random.nextGaussian() + (i == j ? 0.1 : 0.0);
                band.add(i, j, v);
                dense[i][j] = v;
            }
        }
        double[] rhs = new double[n];
        for (int i = 0; i < n; i++) {
            rhs[i] = random.nextGaussian();
        }
        RealVector expected = new LUDecomposition(new Array2DRowRealMatrix(dense)).getSolver()
                .solve(new ArrayRealVector(rhs));
        assertThat(band.factor()).isTrue();
        double[] x = rhs.clone();
        band.solve(x);
        for (int i = 0; i < n; i++) {
            assertThat(x[i]).isCloseTo(expected.getEntry(i), within(1e-9 * (1 + Math.abs(expected.getEntry(i)))));
        }
    }

    @Test
    void reportsASingularMatrix() {
        BandMatrix band = new BandMatrix(4, 1, 1);
        band.add(0, 0, 1.0);
        band.add(1, 1, 1.0);
        band.add(3, 3, 1.0);
        assertThat(band.factor()).isFalse();
    }
}
