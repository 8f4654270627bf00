package org.convgrid.engine.calibration;

/**
 * Spectroscopic [Fe/H] and the metal mass fraction Z of a solar-scaled mixture, both ways: [M/H] = [Fe/H], so
 * Z/X = (Z/X)_sun 10^[Fe/H] with X = 1 - Y - Z. Hence Z = (Z/X)(1 - Y) / (1 + Z/X) for a given Y, or, when the helium
 * follows Y = Y_p + (dY/dZ) Z, Z = (Z/X)(1 - Y_p) / (1 + (Z/X)(1 + dY/dZ)); and back, [Fe/H] = log10((Z/X) /
 * (Z/X)_sun). The usual conversion (common practice, no single published source); it ignores alpha enhancement. The
 * reference Z/X is usually {@link #GN93}'s, the present solar surface value of the opacity tables' mixture (Grevesse
 * &amp; Noels 1993: 0.0245). Kept here, beside that constant, so that the grid reader (Z from [Fe/H]) and the tables
 * ([Fe/H] from Z) use one relation and cannot drift apart.
 *
 * @param solarMetalsToHydrogen the Sun's Z/X that [Fe/H] = 0 stands for, &gt; 0
 */
public record SolarScaledMetallicity(double solarMetalsToHydrogen) {

    /** [Fe/H] measured against the present solar surface Z/X of Grevesse &amp; Noels (1993), 0.0245. */
    public static final SolarScaledMetallicity GN93 =
            new SolarScaledMetallicity(CalibrationSettings.GN93_METALS_TO_HYDROGEN);

    public SolarScaledMetallicity {
        requireSolarRatio(solarMetalsToHydrogen);
    }

    /**
     * {@code solarMetalsToHydrogen} when it is a usable reference (positive and finite); the one wording of the
     * refusal for every holder of a solar Z/X.
     *
     * @throws IllegalArgumentException otherwise
     */
    public static double requireSolarRatio(double solarMetalsToHydrogen) {
        if (!(solarMetalsToHydrogen > 0.0 && Double.isFinite(solarMetalsToHydrogen))) {
            throw new IllegalArgumentException("the solar Z/X must be positive, got " + solarMetalsToHydrogen);
        }
        return solarMetalsToHydrogen;
    }

    /** Z/X of a star with this [Fe/H]. */
    public double metalsToHydrogen(double ironDex) {
        return solarMetalsToHydrogen * Math.pow(10.0, ironDex);
    }

    /** Z for [Fe/H] at the helium mass fraction {@code helium}. */
    public double metals(double ironDex, double helium) {
        double ratio = metalsToHydrogen(ironDex);
        return ratio * (1.0 - helium) / (1.0 + ratio);
    }

    /** Z for [Fe/H] when the helium is Y = {@code primordialHelium} + {@code heliumToMetals} Z. */
    public double metals(double ironDex, double primordialHelium, double heliumToMetals) {
        double ratio = metalsToHydrogen(ironDex);
        return ratio * (1.0 - primordialHelium) / (1.0 + ratio * (1.0 + heliumToMetals));
    }

    /**
     * The [Fe/H] of a composition of metal and helium mass fractions Z and Y, the inverse of both {@code metals}; not
     * finite when Z = 0 or nothing is left for hydrogen.
     */
    public double ironDex(double metals, double helium) {
        return Math.log10(metals / (1.0 - helium - metals) / solarMetalsToHydrogen);
    }
}
