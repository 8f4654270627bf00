package org.convgrid.engine.physics.atmosphere;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;

/**
 * Evenly spaced nodes in log10 of a quantity.
 *
 * @param min lowest log10 value
 * @param max highest log10 value, above min
 * @param points number of nodes, at least 4
 */
public record TableAxis(double min, double max, int points) {

    public TableAxis {
        if (!(max > min) || points < 4) {
            throw new ConvgridException(ErrorKind.OUT_OF_RANGE, String.format(
                    "table axis needs max > min and >= 4 points, got [%s, %s] with %d", min, max, points),
                    "points", points, 4, Integer.MAX_VALUE);
        }
    }

    /** Spacing in log10. */
    public double step() {
        return (max - min) / (points - 1);
    }

    /** The i-th node, log10. */
    public double node(int i) {
        return i == points - 1 ? max : min + i * step();
    }
}
