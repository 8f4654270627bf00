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
     * A zone that starts at the centre but is too small to count as a core (its top below the run's core threshold):
     * zones.csv lists it as a {@code shell}, but drawn at the centre and called a shell it read as a mistake.
     */
    // two lines: on one, the legend took half the chart's width from the plot
    SMALL_CENTRAL("small central convective zone\n(below the core threshold)",
            "small central convective zones (below the core threshold)"),
    /**
     * A convective shell: detached from centre and surface, or, as zones.csv counts them, a surface zone too thin to
     * be an envelope.
     */
    SHELL("convective shell"),
    /** The asked age lies past core-hydrogen exhaustion at this mass: a known outcome, not a failure. */
    PAST_MAIN_SEQUENCE("past the main sequence"),
    /** No usable model at this mass (failed, not converged): not radiative, unknown. */
    NO_RESULT("no result at this mass");

    /** Ends within this distance of 0 or 1 count as centre or surface (spans are written with 6 decimals). */
    static final double EDGE_TOLERANCE = 1.0e-6;
    /**
     * A zone from the centre that ends within this much of the mass below the surface fills the star but for its
     * atmosphere: the first steps of a 2.4 Msun star from birth have 1.4e-6 of its mass above such a zone (r/R 0.998
     * at its top), which {@link #EDGE_TOLERANCE} drew as a convective core filling the star. No core comes near it.
     */
    static final double WHOLE_STAR_SKIN = 1.0e-5;

    private final String label;
    private final String plural;

    ZoneKind(String label) {
        this(label, label + "s");
    }

    ZoneKind(String label, String plural) {
        this.label = label;
        this.plural = plural;
    }

    /** In words, for legends (broken into two lines where one would crowd the plot). */
    public String label() {
        return label;
    }

    /** In words, for notes about several. */
    public String plural() {
        return plural;
    }

    /**
     * The kind zones.csv gives a zone (its {@code zone_kind}), so that every map names a zone as the files do; a
     * {@code shell} that starts at the centre is the small central zone below the core threshold that zones.csv
     * counts with the shells.
     */
    public static ZoneKind of(CatalogueZone zone) {
        return switch (zone.kind()) {
            case WHOLE_STAR -> WHOLE_STAR;
            case ENVELOPE -> ENVELOPE;
            case CORE -> CORE;
            case SHELL -> zone.massFracInner() <= EDGE_TOLERANCE ? SMALL_CENTRAL : SHELL;
        };
    }

    /**
     * The kind of a convective interval [lo, hi] in m/M, by where it lies: for track steps, whose zone files do not
     * name the kind.
     */
    public static ZoneKind of(double lo, double hi) {
        boolean centre = lo <= EDGE_TOLERANCE;
        boolean surface = hi >= 1.0 - EDGE_TOLERANCE;
        if (centre && hi >= 1.0 - WHOLE_STAR_SKIN) {
            return WHOLE_STAR;
        }
        return centre ? CORE : surface ? ENVELOPE : SHELL;
    }
}
