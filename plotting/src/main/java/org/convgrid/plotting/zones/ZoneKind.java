package org.convgrid.plotting.zones;

/** What a shaded rectangle of a zone map stands for, told apart by where the zone lies; declaration order is legend order. */
public enum ZoneKind {
    /** The zone spans the whole star (centre to surface). */
    WHOLE_STAR("fully convective star"),
    /** The zone reaches the surface. */
    ENVELOPE("convective envelope"),
    /** The zone starts at the centre. */
    CORE("convective core"),
    /** A detached convective shell, touching neither centre nor surface. */
    SHELL("convective shell"),
    /** The asked age lies past core-hydrogen exhaustion at this mass: a known outcome, not a failure. */
    PAST_MAIN_SEQUENCE("past the main sequence"),
    /** No usable model at this mass (failed, not converged): not radiative, unknown. */
    NO_RESULT("no result at this mass");

    /** Ends within this distance of 0 or 1 count as centre or surface (spans are written with 6 decimals). */
    static final double EDGE_TOLERANCE = 1.0e-6;

    private final String label;

    ZoneKind(String label) {
        this.label = label;
    }

    /** In words, for legends. */
    public String label() {
        return label;
    }

    /** The kind of a convective interval [lo, hi] in a fractional coordinate. */
    public static ZoneKind of(double lo, double hi) {
        boolean centre = lo <= EDGE_TOLERANCE;
        boolean surface = hi >= 1.0 - EDGE_TOLERANCE;
        if (centre && surface) {
            return WHOLE_STAR;
        }
        return centre ? CORE : surface ? ENVELOPE : SHELL;
    }
}
