package org.convgrid.grids;

/**
 * One point of the metallicity axis: the initial metal and helium mass fractions; hydrogen is 1 - Y - Z.
 *
 * @param z initial metal mass fraction, 0 &lt;= Z &lt; {@link #MAX_Z}
 * @param y initial helium mass fraction, Y &gt;= 0 with Y + Z &lt; 1
 * @param ironDex the [Fe/H] the grid file gave for this point ({@code fe_h_dex}, turned into Z); NaN when it gave Z
 * @param ironReference the Sun [Fe/H] is measured against: the one {@code ironDex} was turned into Z with (the grid's
 *     {@code solar_z_over_x}), {@link IronToMetals#GN93} for a point given by Z; the run's tables give the [Fe/H] of
 *     every point against it
 * @param heliumLaw the law that gave {@code y} (grid key {@code helium}), null when the grid listed Y itself; with
 *     {@code ironReference} it turns any Z into the [Fe/H] of this grid's compositions (the tested range's ends, said
 *     in [Fe/H] to a grid given in [Fe/H])
 */
public record MetallicityPoint(double z, double y, double ironDex, IronToMetals ironReference, HeliumLaw heliumLaw) {

    /** Largest metal mass fraction accepted (exclusive): beyond it no main-sequence opacity source applies. */
    public static final double MAX_Z = 0.1;

    public MetallicityPoint {
        java.util.Objects.requireNonNull(ironReference, "ironReference");
        if (!(z >= 0.0 && z < MAX_Z)) {
            throw new IllegalArgumentException("Z must lie in [0, " + MAX_Z + "), got " + z);
        }
        if (!(y >= 0.0 && y + z < 1.0)) {
            throw new IllegalArgumentException("need Y >= 0 and Y + Z < 1, got Y = " + y + ", Z = " + z);
        }
    }

    /** A point whose Y was listed, not given by a law. */
    public MetallicityPoint(double z, double y, double ironDex, IronToMetals ironReference) {
        this(z, y, ironDex, ironReference, null);
    }

    /** A point given by its Z. */
    public MetallicityPoint(double z, double y) {
        this(z, y, Double.NaN, IronToMetals.GN93);
    }

    /**
     * The [Fe/H] a composition of metal mass fraction {@code otherZ} would have in this point's grid: against its
     * Sun, with the helium its law gives that Z (or this point's own Y when the grid listed Y).
     */
    public double ironDexAt(double otherZ) {
        double otherY = heliumLaw == null ? y : heliumLaw.helium(otherZ);
        return ironReference.ironDex(otherZ, otherY);
    }

    /** Whether the grid file gave this point as [Fe/H]. */
    public boolean givenAsIron() {
        return !Double.isNaN(ironDex);
    }

    /** Initial hydrogen mass fraction X = 1 - Y - Z. */
    public double x() {
        return 1.0 - y - z;
    }
}
