package org.convgrid.plotting.zones;

import org.convgrid.output.catalogue.CatalogueZone;

/** What a shaded rectangle of a zone map stands for, as zones.csv names the zone (or by where it lies); declaration order is legend order. */
public enum ZoneKind {
    /** The zone spans the whole star (centre to surface). */
    WHOLE_STAR("fully convective star"),
    /** The zone reaches the surface. */
    ENVELOPE("convective envelope"),
    /** The zone starts at the centre. */
    CORE("convective core"),
    /**
     * A convective shell: detached from centre and surface, or, as zones.csv counts them, a central zone below the
     * run's core threshold or a surface zone too thin to be an envelope.
     */
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

    /** The kind zones.csv gives a zone (its {@code zone_kind}), so that every map names a zone as the files do. */
    public static ZoneKind of(CatalogueZone.ZoneKind listed) {
        return switch (listed) {
            case WHOLE_STAR -> WHOLE_STAR;
            case ENVELOPE -> ENVELOPE;
            case CORE -> CORE;
            case SHELL -> SHELL;
        };
    }

    /**
     * The kind of a convective interval [lo, hi] in m/M, by where it lies: for track steps, whose zone files do not
     * name the kind.
     */
    public static ZoneKind of(double lo, double hi) {
        boolean centre = lo <= EDGE_TOLERANCE;
        boolean surface = hi >= 1.0 - EDGE_TOLERANCE;
        if (centre && surface) {
            return WHOLE_STAR;
        }
        return centre ? CORE : surface ? ENVELOPE : SHELL;
    }
}
