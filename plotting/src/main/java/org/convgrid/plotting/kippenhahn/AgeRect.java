package org.convgrid.plotting.kippenhahn;

import org.convgrid.plotting.zones.ZoneKind;

/**
 * One shaded rectangle of a zones-against-age chart: one interval in m/M of one evolution step, held from that
 * step's age to the next step's age.
 *
 * @param step index of the step in the track file
 * @param left the step's age, Gyr
 * @param right the next step's age, Gyr
 * @param lo lower end of the interval, m/M
 * @param hi upper end of the interval, m/M
 */
public record AgeRect(int step, double left, double right, double lo, double hi) {

    /** What a convective interval is (core, envelope, whole star, shell), by where it lies. */
    public ZoneKind kind() {
        return ZoneKind.of(lo, hi);
    }

    /** Whether the two rectangles share some height (open overlap: touching ends do not count). */
    boolean overlaps(AgeRect other) {
        return lo < other.hi && other.lo < hi;
    }
}
