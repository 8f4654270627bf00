package org.convgrid.grids;

/**
 * Initial helium from metallicity by a linear enrichment law, Y = primordial + enrichment * Z
 * (the usual Delta Y / Delta Z galactic chemical-evolution relation; the grid file supplies both numbers).
 *
 * @param primordial helium mass fraction at Z = 0
 * @param enrichment Delta Y / Delta Z
 */
public record HeliumLaw(double primordial, double enrichment) {

    /**
     * The law convgrid uses when none is given: primordial Y = 0.2471 (standard big-bang nucleosynthesis with the
     * Planck Collaboration 2020 baryon density, A&amp;A 641, A6; from memory) and Delta Y / Delta Z = 1.5, a common
     * choice within the observed range of about 1 to 3 (common practice, no single source).
     */
    public static final HeliumLaw DEFAULT = new HeliumLaw(0.2471, 1.5);

    /** Y for the given Z. */
    public double helium(double z) {
        return primordial + enrichment * z;
    }
}
