package org.convgrid.output;

/**
 * The m/M up to which a central convective zone is mixed, as the catalogue and the track files write it
 * ({@code core_mixed_mass_frac}): the overshoot's mixed edge, never below the zone's own top, the zone's top when the
 * overshoot mixes no further; clamped into [0, 1] against round-off.
 */
public final class MixedCoreEdge {

    private MixedCoreEdge() {
    }

    /**
     * @param mixedTop m/M of the overshoot's mixed edge, NaN when it mixes no further than the zone
     * @param zoneTop m/M of the zone's own top
     */
    public static double of(double mixedTop, double zoneTop) {
        double edge = Double.isNaN(mixedTop) ? zoneTop : Math.max(mixedTop, zoneTop);
        return Math.min(1.0, Math.max(0.0, edge));
    }
}
