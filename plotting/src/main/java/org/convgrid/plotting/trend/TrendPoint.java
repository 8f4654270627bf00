package org.convgrid.plotting.trend;

import org.convgrid.output.Span;

/**
 * One transition mass at one metallicity, as transitions.csv gives it.
 *
 * @param zInit initial metal mass fraction
 * @param massMsun the transition mass, solar masses
 * @param bracket the two models around it, solar masses
 * @param toleranceMsun the refinement's tolerance, solar masses; NaN for a value read off the grid
 */
public record TrendPoint(double zInit, double massMsun, Span bracket, double toleranceMsun) {
}
