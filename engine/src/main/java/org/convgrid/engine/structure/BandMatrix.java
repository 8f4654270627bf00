package org.convgrid.engine.structure;

import java.util.Arrays;

/**
 * A square banded matrix with an in-place LU factorisation by Gaussian elimination with partial (row) pivoting,
 * the algorithm of LAPACK's dgbtrf/dgbtrs (Golub &amp; Van Loan 2013, Matrix Computations, 4th ed., sec. 4.3).
 * Cost O(n kl (kl + ku)) for the factorisation and O(n (2 kl + ku)) per solve.
 *
 * <p>Row i stores the columns i - kl .. i + kl + ku (the extra kl columns hold the fill-in of row swaps).
 * Not thread-safe: a matrix belongs to one solve.
 */
public final class BandMatrix {

    private final int size;
    private final int lower;
    private final int upper;
    private final int width;
    private final double[] band;
    private final int[] pivots;
    /**
     * Per row, the last column at or right of the diagonal that may hold a non-zero (its upper factor's reach
     * after {@link #factor()}). Why: the rows of a difference system are shorter than the band (an interval row
     * of the structure equations reaches 2 to 5 columns right of the diagonal, the band 10 with pivoting's
     * fill-in), and elimination and back substitution need not run over the zeros; leaving out a zero product
     * changes no bit of a finite result (x - f 0 = x, and a zero stays +0).
     */
    private final int[] reach;
    /** Per column, the last row whose lower factor there is non-zero (the column itself when none is). */
    private final int[] lowest;
    private boolean factored;

    /**
     * @param size number of rows and columns
     * @param lower number of sub-diagonals that may be non-zero
     * @param upper number of super-diagonals that may be non-zero
     */
    public BandMatrix(int size, int lower, int upper) {
        this.size = size;
        this.lower = lower;
        this.upper = upper;
        this.width = 2 * lower + upper + 1;
        this.band = new double[size * width];
        this.pivots = new int[size];
        this.reach = new int[size];
        this.lowest = new int[size];
    }

    public int size() {
        return size;
    }

    /** Sets every element to zero and forgets any factorisation. */
    public void clear() {
        Arrays.fill(band, 0.0);
        factored = false;
    }

    /** Adds {@code value} to element (row, column), which must lie inside the band. */
    public void add(int row, int column, double value) {
        int d = column - row;
        if (d < -lower || d > upper) {
            throw new IndexOutOfBoundsException("element (" + row + ", " + column + ") is outside the band");
        }
        band[row * width + d + lower] += value;
    }

    /** Element (row, column); zero outside the band. Only meaningful before {@link #factor()}. */
    public double get(int row, int column) {
        int d = column - row;
        return d < -lower || d > upper + lower ? 0.0 : band[row * width + d + lower];
    }

    /**
     * Factors the matrix in place into P L U.
     *
     * @return false when a pivot is exactly zero or not finite (the matrix is singular to working precision)
     */
    public boolean factor() {
        for (int i = 0; i < size; i++) {
            int rowBase = i * width - i + lower;
            int j = Math.min(size - 1, i + upper);
            while (j > i && band[rowBase + j] == 0.0) {
                j--;
            }
            reach[i] = j;
        }
        for (int c = 0; c < size; c++) {
            int last = Math.min(size - 1, c + lower);
            int pivot = c;
            double best = Math.abs(band[c * width + lower]);
            for (int i = c + 1; i <= last; i++) {
                double v = Math.abs(band[i * width + c - i + lower]);
                if (v > best) {
                    best = v;
                    pivot = i;
                }
            }
            if (!(best > 0.0) || !Double.isFinite(best)) {
                return false;
            }
            pivots[c] = pivot;
            if (pivot != c) {
                // both rows are zero right of the longer one's reach
                int right = Math.max(reach[c], reach[pivot]);
                for (int j = c; j <= right; j++) {
                    int a = c * width + j - c + lower;
                    int b = pivot * width + j - pivot + lower;
                    double t = band[a];
                    band[a] = band[b];
                    band[b] = t;
                }
                int r = reach[c];
                reach[c] = reach[pivot];
                reach[pivot] = r;
            }
            int right = reach[c];
            int pivotBase = c * width - c + lower;
            double diagonal = band[pivotBase + c];
            int lowestRow = c;
            for (int i = c + 1; i <= last; i++) {
                int rowBase = i * width - i + lower;
                double factor = band[rowBase + c] / diagonal;
                band[rowBase + c] = factor;
                if (factor != 0.0) {
                    lowestRow = i;
                    for (int j = c + 1; j <= right; j++) {
                        band[rowBase + j] -= factor * band[pivotBase + j];
                    }
                    if (right > reach[i]) {
                        reach[i] = right;
                    }
                }
            }
            lowest[c] = lowestRow;
        }
        factored = true;
        return true;
    }

    /** Solves A x = b in place ({@code rhs} becomes x) with the factorisation of {@link #factor()}. */
    public void solve(double[] rhs) {
        if (!factored) {
            throw new IllegalStateException("factor() first");
        }
        for (int c = 0; c < size; c++) {
            int p = pivots[c];
            if (p != c) {
                double t = rhs[c];
                rhs[c] = rhs[p];
                rhs[p] = t;
            }
            double bc = rhs[c];
            if (bc != 0.0) {
                int last = lowest[c];
                for (int i = c + 1; i <= last; i++) {
                    rhs[i] -= band[i * width + c - i + lower] * bc;
                }
            }
        }
        for (int i = size - 1; i >= 0; i--) {
            int rowBase = i * width - i + lower;
            int right = reach[i];
            double sum = rhs[i];
            for (int j = i + 1; j <= right; j++) {
                sum -= band[rowBase + j] * rhs[j];
            }
            rhs[i] = sum / band[rowBase + i];
        }
    }
}
