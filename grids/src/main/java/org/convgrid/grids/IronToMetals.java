package org.convgrid.grids;

import org.convgrid.engine.calibration.CalibrationSettings;
import org.convgrid.engine.calibration.SolarScaledMetallicity;
import org.convgrid.grids.words.MessageNumbers;

/**
 * The initial metal mass fraction Z of a star whose spectroscopic [Fe/H] is given, for a solar-scaled mixture, as the
 * grid reader needs it: the relation itself (both ways, and its source) is engine's {@link SolarScaledMetallicity};
 * here are the ranges a grid file may state and the wording of a refused value. It ignores alpha enhancement (for
 * alpha-enhanced populations give Z itself) and takes the reference Z/X as the present solar surface value the opacity
 * tables' mixture has (Grevesse &amp; Noels 1993: 0.0245) unless told otherwise.
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
        SolarScaledMetallicity.requireSolarRatio(solarMetalsToHydrogen);
    }

    /** Z/X of a star with this [Fe/H]. */
    public double metalsToHydrogen(double ironDex) {
        return relation().metalsToHydrogen(ironDex);
    }

    /** Z for [Fe/H] when the helium follows {@code law}. */
    public double metals(double ironDex, HeliumLaw law) {
        return relation().metals(ironDex, law.primordial(), law.enrichment());
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
        return relation().ironDex(metals, helium);
    }

    /** Z for [Fe/H] at the helium mass fraction {@code helium}. */
    public double metals(double ironDex, double helium) {
        return relation().metals(ironDex, helium);
    }

    private SolarScaledMetallicity relation() {
        return new SolarScaledMetallicity(solarMetalsToHydrogen);
    }
}
