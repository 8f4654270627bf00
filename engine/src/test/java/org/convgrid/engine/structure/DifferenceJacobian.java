package org.convgrid.engine.structure;

/**
 * Test helper: one column of a difference system's Jacobian by central differences of its residuals (common
 * practice for checking a Newton Jacobian), and the scale of a Jacobian row to judge an entry's error against.
 * Shared by the tests that check analytic Jacobian entries against the real microphysics.
 */
public final class DifferenceJacobian {

    private final DifferenceSystem system;
    private final double[] y;
    private final BandMatrix analytic;
    private final double[] up;
    private final double[] down;

    private DifferenceJacobian(DifferenceSystem system, double[] y) {
        this.system = system;
        this.y = y.clone();
        int size = y.length;
        this.analytic = new BandMatrix(size, system.lowerBandwidth(), system.upperBandwidth());
        system.evaluate(this.y, new double[size], analytic);
        this.up = new double[size];
        this.down = new double[size];
    }

    /** The analytic Jacobian of {@code system} at {@code y}, ready for column checks. */
    public static DifferenceJacobian at(DifferenceSystem system, double[] y) {
        return new DifferenceJacobian(system, y);
    }

    /** The analytic Jacobian the system returned at the state. */
    public BandMatrix analytic() {
        return analytic;
    }

    /**
     * Central differences of every residual in unknown {@code col}, step {@code h}; returns the full residual-sized
     * array of which only the band rows of the column ({@link #firstRow}, {@link #lastRow}) are meaningful.
     */
    public double[] column(int col, double h) {
        double[] shifted = y.clone();
        shifted[col] = y[col] + h;
        system.evaluate(shifted, up, null);
        shifted[col] = y[col] - h;
        system.evaluate(shifted, down, null);
        double[] fd = new double[y.length];
        for (int row = firstRow(col); row <= lastRow(col); row++) {
            fd[row] = (up[row] - down[row]) / (2.0 * h);
        }
        return fd;
    }

    /** The first row in which column {@code col} can hold a non-zero entry. */
    public int firstRow(int col) {
        return Math.max(0, col - system.upperBandwidth());
    }

    /** The last row in which column {@code col} can hold a non-zero entry. */
    public int lastRow(int col) {
        return Math.min(y.length - 1, col + system.lowerBandwidth());
    }

    /** The largest magnitude of an analytic entry in {@code row}. */
    public double rowScale(int row) {
        double largest = 0.0;
        int first = Math.max(0, row - system.lowerBandwidth());
        int last = Math.min(y.length - 1, row + system.upperBandwidth());
        for (int c = first; c <= last; c++) {
            largest = Math.max(largest, Math.abs(analytic.get(row, c)));
        }
        return largest;
    }
}
