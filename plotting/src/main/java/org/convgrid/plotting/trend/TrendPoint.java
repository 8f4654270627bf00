package org.convgrid.plotting.trend;

import org.convgrid.output.Span;

/**
 * One transition mass at one metallicity, as transitions.csv gives it.
 *
 * @param zInit initial metal mass fraction
 * @param massMsun the transition mass, solar masses
 * @param bracket the grid masses around it, solar masses
 */
public record TrendPoint(double zInit, double massMsun, Span bracket) {
}
