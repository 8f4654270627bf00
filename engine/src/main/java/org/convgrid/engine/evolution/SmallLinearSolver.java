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
     * Factorises {@code a} in place into the form {@link #solveFactorised} uses, with the same pivots and
     * operations as elimination of the whole system, so that one factorisation serves every right-hand side of a chord iteration.
     *
     * @param pivots n entries, receives the row interchanges
     * @return false when the matrix is singular to working precision
     */
    static boolean factorise(double[][] a, int[] pivots) {
        int n = pivots.length;
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
            pivots[col] = pivot;
            double[] swap = a[pivot];
            a[pivot] = a[col];
            a[col] = swap;
            for (int row = col + 1; row < n; row++) {
                double factor = a[row][col] / a[col][col];
                a[row][col] = factor;
                if (factor != 0.0) {
                    for (int k = col + 1; k < n; k++) {
                        a[row][k] -= factor * a[col][k];
                    }
                }
            }
        }
        return true;
    }

    /** Solves a x = b in place ({@code b} becomes x) with {@code a} and {@code pivots} from {@link #factorise}. */
    static void solveFactorised(double[][] a, int[] pivots, double[] b) {
        int n = pivots.length;
        for (int col = 0; col < n; col++) {
            double t = b[pivots[col]];
            b[pivots[col]] = b[col];
            b[col] = t;
            for (int row = col + 1; row < n; row++) {
                double factor = a[row][col];
                if (factor != 0.0) {
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
    }
}
