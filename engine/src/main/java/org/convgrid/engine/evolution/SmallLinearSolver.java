package org.convgrid.engine.evolution;

/**
 * Gaussian elimination with partial pivoting for the tiny dense systems of the network step (6 x 6), written
 * out because it runs for every burning shell at every step (a general library solve would allocate more than
 * it computes). Standard linear algebra; no single source.
 */
final class SmallLinearSolver {

    private SmallLinearSolver() {
    }

    /**
     * Solves a x = b in place: {@code a} is destroyed, {@code b} becomes x.
     *
     * @return false when the matrix is singular to working precision
     */
    static boolean solve(double[][] a, double[] b) {
        int n = b.length;
        for (int col = 0; col < n; col++) {
            int pivot = col;
            for (int row = col + 1; row < n; row++) {
                if (Math.abs(a[row][col]) > Math.abs(a[pivot][col])) {
                    pivot = row;
                }
            }
            if (!(Math.abs(a[pivot][col]) > 0.0)) {
                return false;
            }
            double[] swap = a[pivot];
            a[pivot] = a[col];
            a[col] = swap;
            double t = b[pivot];
            b[pivot] = b[col];
            b[col] = t;
            for (int row = col + 1; row < n; row++) {
                double factor = a[row][col] / a[col][col];
                if (factor != 0.0) {
                    for (int k = col; k < n; k++) {
                        a[row][k] -= factor * a[col][k];
                    }
                    b[row] -= factor * b[col];
                }
            }
        }
        for (int row = n - 1; row >= 0; row--) {
            double sum = b[row];
            for (int k = row + 1; k < n; k++) {
                sum -= a[row][k] * b[k];
            }
            b[row] = sum / a[row][row];
        }
        return true;
    }
}
