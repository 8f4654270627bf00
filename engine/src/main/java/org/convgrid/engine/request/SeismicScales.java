package org.convgrid.engine.request;

/**
 * The oscillation time scales of a solved model that need its interior, which a catalogue row carries because the
 * model itself is gone when the row is made. Each is NaN where it has no meaning or was not computed.
 *
 * @param buoyancyTravelTime the g-mode period scale Pi_0, s ({@code structure.BuoyancyTravelTime}); NaN without a
 *     g-mode cavity (fully convective)
 * @param acousticRadius the sound's travel time from the centre to the photosphere, T = integral of dr / c, s
 *     ({@code structure.AcousticTravelTime})
 * @param surfaceZoneBaseAcousticDepth the sound's travel time from the base of the convective zone that reaches the
 *     surface up to the photosphere, s, however little mass the zone holds (the base a glitch fit sees, where the
 *     catalogue's envelope also needs 1e-6 of the mass); NaN when the surface is radiative and when the star is fully
 *     convective (no base, no glitch)
 * @param heliumSecondIonisationAcousticDepth the travel time from the minimum of Gamma1 that helium's second
 *     ionisation makes in the outer layers up to the photosphere, s; NaN when the model shows no such minimum
 */
public record SeismicScales(double buoyancyTravelTime, double acousticRadius, double surfaceZoneBaseAcousticDepth,
                            double heliumSecondIonisationAcousticDepth) {

    /** Nothing known: an outcome made without its model. */
    public static final SeismicScales UNKNOWN = new SeismicScales(Double.NaN, Double.NaN, Double.NaN, Double.NaN);

    /**
     * The asymptotic large frequency separation of high-order p modes, Delta nu = 1 / (2 T), Hz (Tassoul 1980, ApJS
     * 43, 469); NaN when the acoustic radius is not known.
     */
    public double largeSeparation() {
        return 0.5 / acousticRadius;
    }

    /** {@link #largeSeparation()} in microHz, the unit every table and report gives it in. */
    public double largeSeparationMicrohertz() {
        return largeSeparation() * 1e6;
    }
}
