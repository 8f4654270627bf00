package org.convgrid.plotting.seismic;

import java.util.List;

/**
 * One star's period spacing along its track, the steps in age order, only those drawn.
 *
 * @param massMsun the star's mass, solar masses
 * @param points the drawn steps, at least two
 */
public record SpacingLine(double massMsun, List<SpacingPoint> points) {

    public SpacingLine {
        points = List.copyOf(points);
    }
}
