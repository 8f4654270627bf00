package org.convgrid.plotting.seismic;

import java.util.List;
import org.convgrid.plotting.label.PhysicsKey;

/**
 * What the period-spacing chart of one metallicity and physics draws.
 *
 * @param zInit initial metal mass fraction
 * @param physics the physics combination
 * @param fromBirth whether the tracks start at birth (else at the zero-age main sequence)
 * @param lines one line per drawn star, masses increasing
 * @param capS the top of the drawn range, s: the steps above it, all on the pre-main sequence, are left out
 * @param stepsAboveCap how many steps were left out above {@code capS}
 * @param tracksWithSpacing how many tracks of this metallicity and physics have a period spacing at two steps or more
 *     (more than the lines when the chart draws a selection)
 */
public record PeriodSpacingData(double zInit, PhysicsKey physics, boolean fromBirth, List<SpacingLine> lines,
                                double capS, int stepsAboveCap, int tracksWithSpacing) {

    public PeriodSpacingData {
        lines = List.copyOf(lines);
    }
}
