package org.convgrid.plotting.kippenhahn;

import org.convgrid.plotting.style.VisiblePatches;
import org.convgrid.plotting.zones.ZoneKind;

/**
 * The vertical coordinate of a zones-against-age chart. In m/M a surface convection zone holding a thousandth of
 * the star's mass is under a pixel thick; the depth below the surface, -log10(1 - m/M), spreads the outer layers
 * over decades (common practice for showing thin envelopes), centre at 0 and surface at the top; its title says
 * which way is out, since "depth" would suggest a value that grows inwards.
 */
public enum ZoneCoordinate {
    /** m/M, centre 0 to surface 1. */
    MASS_FRACTION("m/M (mass coordinate over total mass)", 0.0, 1.0),
    /** -log10(1 - m/M): 0 at the centre, 1 where 90 % of the mass lies below, up to {@link #DEPTH_TOP} at the top. */
    SURFACE_DEPTH("\u2212log10(1 \u2212 m/M), surface at the top", 0.0, ZoneCoordinate.DEPTH_TOP);

    /** Top of the depth axis: layers holding less than 10^-7 of the mass are drawn at the top edge. */
    public static final double DEPTH_TOP = 7.0;

    private final String title;
    private final double min;
    private final double max;

    ZoneCoordinate(String title, double min, double max) {
        this.title = title;
        this.min = min;
        this.max = max;
    }

    /** The axis title. */
    public String title() {
        return title;
    }

    /** Bottom of the axis. */
    public double min() {
        return min;
    }

    /** Top of the axis. */
    public double max() {
        return max;
    }

    /** A zone thinner than this share of the axis everywhere (about two pixels) counts as not drawn. */
    public static final double MIN_VISIBLE_SHARE = 0.003;

    /**
     * Whether an interval [lo, hi] of m/M is thick enough on this axis to be seen: whether a depth chart would show a
     * thin envelope. The legend asks more (width too, and what is drawn over the axis's ends): {@link VisiblePatches}.
     */
    public boolean shows(double lo, double hi) {
        return of(hi) - of(lo) >= MIN_VISIBLE_SHARE * (max - min);
    }

    /**
     * The rectangle as drawn on this axis: on the depth axis a zone that reaches the surface (an envelope or the whole
     * star) is drawn up to the top, the surface. Its top is the outermost mesh point, about 4e-7 of the mass below
     * the surface (m/M = 0.9999996 in the demo's tracks), which this axis would otherwise leave as a white band 0.6
     * decades deep between the envelope and the surface. In m/M the difference is far below a pixel.
     */
    public AgeRect drawn(AgeRect r) {
        boolean surface = r.kind() == ZoneKind.ENVELOPE || r.kind() == ZoneKind.WHOLE_STAR;
        return this == SURFACE_DEPTH && surface ? new AgeRect(r.step(), r.left(), r.right(), r.lo(), 1.0) : r;
    }

    /** Where the mass fraction {@code m} sits on this axis, as a share of its height (0 at the bottom, 1 at top). */
    public double share(double m) {
        return (of(m) - min) / (max - min);
    }

    /** Where the mass fraction {@code m} (m/M in [0, 1]) sits on this axis. */
    public double of(double m) {
        if (this == MASS_FRACTION) {
            return m;
        }
        double outside = 1.0 - Math.min(Math.max(m, 0.0), 1.0);
        return Math.min(-Math.log10(Math.max(outside, Math.pow(10, -DEPTH_TOP))), DEPTH_TOP);
    }
}
