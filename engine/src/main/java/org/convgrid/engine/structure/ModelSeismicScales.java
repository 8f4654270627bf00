package org.convgrid.engine.structure;

import java.util.List;
import org.convgrid.engine.convection.ConvectiveZone;
import org.convgrid.engine.convection.ConvectiveZoneFinder;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.request.SeismicScales;

/**
 * The {@link SeismicScales} of a solved model: its buoyancy travel time ({@link BuoyancyTravelTime}), its acoustic
 * radius, and the acoustic depths ({@link AcousticTravelTime}) of the two sharp features of the outer sound speed that
 * glitch fits of solar-like oscillators locate: the base of the surface convection zone and helium's second
 * ionisation ({@link HeliumIonisationDip}). Every catalogue row, track row, {@code star} report and profile header
 * takes them from here, so the four never disagree. Stateless.
 */
public final class ModelSeismicScales {

    private ModelSeismicScales() {
    }

    /**
     * The scales of a model. The acoustic ones are NaN when the model's radii or sound speeds do not allow the
     * integral (radii not all above 0 and increasing, a sound speed not above 0; no solved model of ours has been
     * seen so): every step of an evolution asks for them, and a track or catalogue row must not be lost to a number
     * it reports.
     */
    public static SeismicScales of(StellarModel model) {
        double pi0 = BuoyancyTravelTime.of(model);
        double[] radius = model.profile().radii();
        double[] soundSpeed = AcousticTravelTime.soundSpeeds(model);
        if (!AcousticTravelTime.integrable(radius, soundSpeed)) {
            return new SeismicScales(pi0, Double.NaN, Double.NaN, Double.NaN);
        }
        double acousticRadius = AcousticTravelTime.acousticRadius(radius, soundSpeed);
        double dip = HeliumIonisationDip.radiusOf(model);
        return new SeismicScales(pi0, acousticRadius, surfaceZoneBaseDepth(model, radius, soundSpeed),
                Double.isNaN(dip) ? Double.NaN : AcousticTravelTime.depthAt(radius, soundSpeed, dip));
    }

    /**
     * The depth of the base of the zone that reaches the surface, however thin; NaN when the surface is radiative,
     * and when the star is one zone from the centre: it has no base, so no glitch (its envelope columns say 0, the
     * centre, but a depth equal to the acoustic radius would read in a table or chart as a feature of the star).
     */
    private static double surfaceZoneBaseDepth(StellarModel model, double[] radius, double[] soundSpeed) {
        if (model.convection().structureClass() == StructureClass.FULLY_CONVECTIVE) {
            return Double.NaN;
        }
        List<ConvectiveZone> zones = model.convection().zones();
        if (zones.isEmpty()) {
            return Double.NaN;
        }
        ConvectiveZone outermost = zones.get(zones.size() - 1);
        double fraction = outermost.innerRadiusFraction();
        if (!ConvectiveZoneFinder.reachesSurface(outermost.outerMassFraction(),
                ConvectiveZoneFinder.DEFAULT_SURFACE_SKIN_MASS_FRACTION) || Double.isNaN(fraction)) {
            // a radiative surface; or no base to measure from (Math.min and max below would pass NaN through)
            return Double.NaN;
        }
        double surface = radius[radius.length - 1];
        return AcousticTravelTime.depthAt(radius, soundSpeed, Math.min(1.0, Math.max(0.0, fraction)) * surface);
    }
}
