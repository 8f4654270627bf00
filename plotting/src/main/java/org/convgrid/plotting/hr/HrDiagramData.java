package org.convgrid.plotting.hr;

import java.util.List;
import org.convgrid.plotting.PhysicsKey;

/**
 * Everything an HR diagram shows.
 *
 * @param physics the physics of every model shown
 * @param metallicities the Z values shown, increasing
 * @param ages the ages shown, Gyr, increasing
 * @param points every usable model (status ok, with L, Teff and a structure class)
 * @param zeroAgeLines one line per Z through its youngest models (age 0 when the run has it), by mass
 * @param massLabels the points that get a mass label (on one zero-age line)
 */
public record HrDiagramData(PhysicsKey physics, List<Double> metallicities, List<Double> ages, List<HrPoint> points,
                            List<ZeroAgeLine> zeroAgeLines, List<HrPoint> massLabels) {

    public HrDiagramData {
        metallicities = List.copyOf(metallicities);
        ages = List.copyOf(ages);
        points = List.copyOf(points);
        zeroAgeLines = List.copyOf(zeroAgeLines);
        massLabels = List.copyOf(massLabels);
    }

    /**
     * The youngest models of one metallicity, joined in mass order.
     *
     * @param zInit initial metal mass fraction
     * @param ageGyr the age of the line (0 = ZAMS)
     * @param points the models on the line, increasing mass
     */
    public record ZeroAgeLine(double zInit, double ageGyr, List<HrPoint> points) {
        public ZeroAgeLine {
            points = List.copyOf(points);
        }
    }
}
