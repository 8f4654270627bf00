package org.convgrid.plotting.seismic;

/**
 * One step of a track on the period-spacing chart.
 *
 * @param ageGyr age since the run's origin, Gyr
 * @param spacingS the dipole g-mode period spacing Delta Pi_1, s
 * @param preMainSequence whether the step is still contracting towards the main sequence
 */
public record SpacingPoint(double ageGyr, double spacingS, boolean preMainSequence) {
}
