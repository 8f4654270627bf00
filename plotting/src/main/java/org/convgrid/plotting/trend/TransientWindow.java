package org.convgrid.plotting.trend;

import org.convgrid.output.Span;

/**
 * The window of small central cores just above the fully convective limit in one slice.
 *
 * @param zInit initial metal mass fraction
 * @param ageGyr age, Gyr
 * @param masses lowest and highest mass of the window, solar masses
 */
public record TransientWindow(double zInit, double ageGyr, Span masses) {
}
