package org.convgrid.survey;

import org.convgrid.engine.physics.StandardPhysics;
import org.convgrid.engine.physics.opacity.OpalGn93Opacity;

/**
 * Reads the tables the production solver reads at first use (the shipped OPAL and low-temperature opacity tables,
 * the equation of state's set-up) on a daemon thread of their own. A grid run's first chunks all need them: without
 * this, the first worker reads them inside its first chunk while the others wait for it (~0.15 s of CPU, measured
 * on a 2-core machine), and the grid file is read and the run directory prepared on the main thread meanwhile with
 * the second core idle. The tables are read once whoever asks first, so nothing computed depends on this thread.
 */
final class ShippedTablesReadAhead {

    private ShippedTablesReadAhead() {
    }

    /** Starts the reading and returns at once. */
    static void start() {
        Thread reader = new Thread(ShippedTablesReadAhead::read, "convgrid-table-read-ahead");
        reader.setDaemon(true);
        reader.start();
    }

    private static void read() {
        try {
            StandardPhysics.equationOfState();
            OpalGn93Opacity.shipped();
        } catch (RuntimeException | LinkageError e) {
            // the solver meets the same failure when it reads the tables itself, and reports it with its model
        }
    }
}
