package org.convgrid.engine.physics.opacity;

/**
 * The weights of one composition in a {@link TabulatedOpacity} (its tables and their weights, taken once), and the
 * weighted corner data of the cell last interpolated at it: a structure point keeps its composition through a solve
 * and moves little between Newton iterations, so most look-ups fall in the same cell and need neither the weights
 * nor the sums again. Thread-safe: the kept cell is an immutable object replaced whole, so a thread sees either an
 * earlier cell or a later one, complete (final fields), and any of them gives the same numbers.
 */
final class TableAtComposition {

    private final int status;
    private final int[] tables;
    private final double[] weights;
    /** The cell last summed; a plain field, see the class comment. */
    private Cell kept;

    /**
     * @param status {@link TabulatedOpacity#ANSWERED} or {@link TabulatedOpacity#OUTSIDE_COMPOSITIONS}
     * @param tables indices of the tables with a weight
     * @param weights their weights, in the order of tables
     */
    TableAtComposition(int status, int[] tables, double[] weights) {
        this.status = status;
        this.tables = tables;
        this.weights = weights;
    }

    int status() {
        return status;
    }

    int[] tables() {
        return tables;
    }

    double[] weights() {
        return weights;
    }

    Cell keptCell() {
        return kept;
    }

    void keep(Cell cell) {
        kept = cell;
    }

    /**
     * Cell (i, j) of the tables' (log T, log R) grid and the weighted sum of its corner data (layout of
     * {@link org.convgrid.engine.physics.interpolation.CubicHermite#bicubic}); the array is never written again.
     */
    record Cell(int i, int j, double[] corners) {
    }
}
