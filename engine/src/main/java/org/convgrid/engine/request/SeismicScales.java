package org.convgrid.engine.request;

/**
 * The oscillation time scales of a solved model that need its interior, which a catalogue row carries because the
 * model itself is gone when the row is made. Each is NaN where it has no meaning or was not computed.
 *
 * @param buoyancyTravelTime the g-mode period scale Pi_0, s ({@code structure.BuoyancyTravelTime}); NaN without a
 *     g-mode cavity (fully convective)
 * @param acousticRadius the sound's travel time from the centre to the photosphere, T = integral of dr / c, s
 *     ({@code structure.AcousticTravelTime})
 * @param envelopeBaseAcousticDepth the sound's travel time from the base of the convective envelope to the
 *     photosphere, s; the acoustic radius when the star is fully convective (its envelope reaches the centre); NaN
 *     without a convective envelope
 */
public record SeismicScales(double buoyancyTravelTime, double acousticRadius, double envelopeBaseAcousticDepth) {

    /** Nothing known: an outcome made without its model. */
    public static final SeismicScales UNKNOWN = new SeismicScales(Double.NaN, Double.NaN, Double.NaN);

    /**
     * The asymptotic large frequency separation of high-order p modes, Delta nu = 1 / (2 T), Hz (Tassoul 1980, ApJS
     * 43, 469); NaN when the acoustic radius is not known.
     */
    public double largeSeparation() {
        return 0.5 / acousticRadius;
    }
}
