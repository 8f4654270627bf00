package org.convgrid.grids;

import org.convgrid.engine.calibration.CalibrationSettings;
import org.convgrid.grids.words.MessageNumbers;

/**
 * The initial metal mass fraction Z of a star whose spectroscopic [Fe/H] is given, for a solar-scaled mixture:
 * [M/H] = [Fe/H], so Z/X = (Z/X)_sun 10^[Fe/H], and with X = 1 - Y - Z,
 * Z = (Z/X)(1 - Y) / (1 + Z/X) for a given Y, or, with Y = Y_p + (dY/dZ) Z,
 * Z = (Z/X)(1 - Y_p) / (1 + (Z/X)(1 + dY/dZ)). The usual conversion (common practice, no single published source);
 * it ignores alpha enhancement (for alpha-enhanced populations give Z itself) and takes the reference Z/X as the
 * present solar surface value the opacity tables' mixture has (Grevesse &amp; Noels 1993: 0.0245) unless told
 * otherwise.
 *
 * @param solarMetalsToHydrogen the Sun's Z/X that [Fe/H] = 0 stands for, &gt; 0
 */
public record IronToMetals(double solarMetalsToHydrogen) {

    /** [Fe/H] measured against the present solar surface Z/X of Grevesse &amp; Noels (1993), 0.0245. */
    public static final IronToMetals GN93 = new IronToMetals(CalibrationSettings.GN93_METALS_TO_HYDROGEN);
    /** The [Fe/H] accepted, dex: beyond the most metal-poor and metal-rich stars known. */
    public static final double MIN_IRON_DEX = -5.0;
    public static final double MAX_IRON_DEX = 1.0;
    /** The solar Z/X accepted as the reference. */
    public static final double MIN_SOLAR_RATIO = 0.001;
    public static final double MAX_SOLAR_RATIO = 0.1;

    public IronToMetals {
        if (!(solarMetalsToHydrogen > 0.0 && Double.isFinite(solarMetalsToHydrogen))) {
            throw new IllegalArgumentException("the solar Z/X must be positive, got " + solarMetalsToHydrogen);
        }
    }

    /** Z/X of a star with this [Fe/H]. */
    public double metalsToHydrogen(double ironDex) {
        return solarMetalsToHydrogen * Math.pow(10.0, ironDex);
    }

    /** Z for [Fe/H] when the helium follows {@code law}. */
    public double metals(double ironDex, HeliumLaw law) {
        double ratio = metalsToHydrogen(ironDex);
        return ratio * (1.0 - law.primordial()) / (1.0 + ratio * (1.0 + law.enrichment()));
    }

    /**
     * Why an [Fe/H] was refused whose Z left the accepted range: "gives Z = 0.2151143 (solar Z/X 0.1), outside [0,
     * 0.1)", after the option or key that gave it.
     */
    public String zOutsideRange(double z) {
        return "gives Z = " + MessageNumbers.format(z) + " (solar Z/X " + MessageNumbers.format(solarMetalsToHydrogen)
                + "), outside [0, " + MessageNumbers.format(MetallicityPoint.MAX_Z) + ")";
    }

    /** The [Fe/H] of a composition of metal and helium mass fractions Z and Y: the inverse of the conversions here. */
    public double ironDex(double metals, double helium) {
        return Math.log10(metals / (1.0 - helium - metals) / solarMetalsToHydrogen);
    }

    /** Z for [Fe/H] at the helium mass fraction {@code helium}. */
    public double metals(double ironDex, double helium) {
        double ratio = metalsToHydrogen(ironDex);
        return ratio * (1.0 - helium) / (1.0 + ratio);
    }
}
