package org.convgrid.grids;

/**
 * One point of the metallicity axis: the initial metal and helium mass fractions; hydrogen is 1 - Y - Z.
 *
 * @param z initial metal mass fraction, 0 &lt;= Z &lt; {@link #MAX_Z}
 * @param y initial helium mass fraction, Y &gt;= 0 with Y + Z &lt; 1
 * @param ironDex the [Fe/H] the grid file gave for this point ({@code fe_h_dex}, turned into Z); NaN when it gave Z
 */
public record MetallicityPoint(double z, double y, double ironDex) {

    /** Largest metal mass fraction accepted (exclusive): beyond it no main-sequence opacity source applies. */
    public static final double MAX_Z = 0.1;

    public MetallicityPoint {
        if (!(z >= 0.0 && z < MAX_Z)) {
            throw new IllegalArgumentException("Z must lie in [0, " + MAX_Z + "), got " + z);
        }
        if (!(y >= 0.0 && y + z < 1.0)) {
            throw new IllegalArgumentException("need Y >= 0 and Y + Z < 1, got Y = " + y + ", Z = " + z);
        }
    }

    /** A point given by its Z. */
    public MetallicityPoint(double z, double y) {
        this(z, y, Double.NaN);
    }

    /** Initial hydrogen mass fraction X = 1 - Y - Z. */
    public double x() {
        return 1.0 - y - z;
    }
}
