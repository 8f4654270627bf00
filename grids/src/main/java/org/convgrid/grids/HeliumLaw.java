package org.convgrid.grids;

/**
 * Initial helium from metallicity by a linear enrichment law, Y = primordial + enrichment * Z
 * (the usual Delta Y / Delta Z galactic chemical-evolution relation; the grid file supplies both numbers).
 *
 * @param primordial helium mass fraction at Z = 0
 * @param enrichment Delta Y / Delta Z
 */
public record HeliumLaw(double primordial, double enrichment) {

    /** Y for the given Z. */
    public double helium(double z) {
        return primordial + enrichment * z;
    }
}
