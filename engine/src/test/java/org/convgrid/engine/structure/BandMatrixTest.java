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
    void shortRowsGiveTheBitsOfTheFullBandElimination() {
        // rows shaped as a difference system's (2 central rows, 4 rows per interval over two points' unknowns, 2
        // surface rows), so each row stops 2 to 5 columns right of the diagonal, inside a band of 5 + 5; weak
        // diagonals make the pivoting swap rows. Reference: the same Gaussian elimination run over the whole band
        // (the algorithm of LAPACK's dgbtrf/dgbtrs, Golub & Van Loan 2013, sec. 4.3), which leaving out the zeros
        // must not change by a bit; and the dense LU of Commons Math to rounding.
        int points = 15;
        int n = 4 * points;
        int kl = 5;
        int ku = 5;
        Random random = new Random(7);
        BandMatrix band = new BandMatrix(n, kl, ku);
        double[][] dense = new double[n][n];
        for (int row = 0; row < n; row++) {
            int point = row < 2 ? 0 : row >= n - 2 ? points - 1 : (row - 2) / 4;
            int first = 4 * point;
            int last = row < 2 || row >= n - 2 ? first + 3 : first + 7;
            for (int j = first; j <= last; j++) {
                if (random.nextInt(4) == 0) {
                    continue; // a structural zero inside the row
                }
                double v = random.nextGaussian() + (row == j ? 0.05 : 0.0);
                band.add(row, j, v);
                dense[row][j] = v;
            }
            if (dense[row][row] == 0.0) {
                band.add(row, row, 1.0e-3);
                dense[row][row] = 1.0e-3;
            }
        }
        double[] rhs = new double[n];
        for (int i = 0; i < n; i++) {
            rhs[i] = random.nextGaussian();
        }
        double[] reference = fullBandSolution(dense, kl, ku, rhs);
        RealVector expected = new LUDecomposition(new Array2DRowRealMatrix(dense)).getSolver()
                .solve(new ArrayRealVector(rhs));
        assertThat(band.factor()).isTrue();
        double[] x = rhs.clone();
        band.solve(x);
        for (int i = 0; i < n; i++) {
            assertThat(Double.doubleToRawLongBits(x[i])).as("bits of x[%d]", i)
                    .isEqualTo(Double.doubleToRawLongBits(reference[i]));
            assertThat(x[i]).isCloseTo(expected.getEntry(i), within(1e-8 * (1 + Math.abs(expected.getEntry(i)))));
        }
    }

    /**
     * Banded Gaussian elimination with partial pivoting over every column the band can hold (kl + ku right of the
     * diagonal after row swaps), on a dense copy: the operation order of {@link BandMatrix} without its skipping.
     */
    private static double[] fullBandSolution(double[][] matrix, int kl, int ku, double[] b) {
        int n = b.length;
        double[][] a = new double[n][];
        for (int i = 0; i < n; i++) {
            a[i] = matrix[i].clone();
        }
        int[] pivots = new int[n];
        for (int c = 0; c < n; c++) {
            int last = Math.min(n - 1, c + kl);
            int pivot = c;
            for (int i = c + 1; i <= last; i++) {
                if (Math.abs(a[i][c]) > Math.abs(a[pivot][c])) {
                    pivot = i;
                }
            }
            pivots[c] = pivot;
            int right = Math.min(n - 1, c + kl + ku);
            for (int j = c; j <= right; j++) {
                double t = a[c][j];
                a[c][j] = a[pivot][j];
                a[pivot][j] = t;
            }
            for (int i = c + 1; i <= last; i++) {
                double factor = a[i][c] / a[c][c];
                a[i][c] = factor;
                if (factor != 0.0) {
                    for (int j = c + 1; j <= right; j++) {
                        a[i][j] -= factor * a[c][j];
                    }
                }
            }
        }
        double[] x = b.clone();
        for (int c = 0; c < n; c++) {
            double t = x[c];
            x[c] = x[pivots[c]];
            x[pivots[c]] = t;
            if (x[c] != 0.0) {
                for (int i = c + 1; i <= Math.min(n - 1, c + kl); i++) {
                    x[i] -= a[i][c] * x[c];
                }
            }
        }
        for (int i = n - 1; i >= 0; i--) {
            double sum = x[i];
            for (int j = i + 1; j <= Math.min(n - 1, i + kl + ku); j++) {
                sum -= a[i][j] * x[j];
            }
            x[i] = sum / a[i][i];
        }
        return x;
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
