package org.convgrid.plotting.zones;

/** The vertical coordinate of a zone map. */
public enum ZoneAxis {
    /** Mass coordinate m/M: each zone of zones.csv from {@code mass_frac_inner} to {@code mass_frac_outer}. */
    MASS_FRACTION("m/M (mass coordinate over total mass)", "mass"),
    /** Radius coordinate r/R: each zone of zones.csv from {@code radius_frac_inner} to {@code radius_frac_outer}. */
    RADIUS_FRACTION("r/R (radius over stellar radius)", "radius");

    private final String title;
    private final String stem;

    ZoneAxis(String title, String stem) {
        this.title = title;
        this.stem = stem;
    }

    /** Axis title with its meaning. */
    public String title() {
        return title;
    }

    /** Word used in file names. */
    public String stem() {
        return stem;
    }
}
