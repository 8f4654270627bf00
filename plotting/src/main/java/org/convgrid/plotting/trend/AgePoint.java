package org.convgrid.plotting.trend;

import org.convgrid.output.Span;

/**
 * One transition mass at one age, as transitions.csv gives it.
 *
 * @param ageGyr age since the run's age origin (birth or the zero-age main sequence), Gyr
 * @param massMsun the transition mass, solar masses
 * @param bracket the two models around it, solar masses (null when the file gives none)
 * @param toleranceMsun the refinement's tolerance, solar masses; NaN for a value read off the grid
 */
public record AgePoint(double ageGyr, double massMsun, Span bracket, double toleranceMsun) {
}
