package org.convgrid.engine.structure;

import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.request.SeismicScales;

/**
 * The {@link SeismicScales} of a solved model: its buoyancy travel time ({@link BuoyancyTravelTime}), its acoustic
 * radius and the acoustic depth of its convective envelope's base ({@link AcousticTravelTime}). Every catalogue row,
 * track row, `star` report and profile header takes them from here, so the four never disagree. Stateless.
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
        if (!integrable(radius, soundSpeed)) {
            return new SeismicScales(pi0, Double.NaN, Double.NaN);
        }
        double acousticRadius = AcousticTravelTime.acousticRadius(radius, soundSpeed);
        return new SeismicScales(pi0, acousticRadius, envelopeBaseDepth(model, radius, soundSpeed, acousticRadius));
    }

    /** NaN without a convective envelope; the whole acoustic radius when the envelope reaches the centre. */
    private static double envelopeBaseDepth(StellarModel model, double[] radius, double[] soundSpeed,
                                            double acousticRadius) {
        StructureClass kind = model.convection().structureClass();
        if (kind == StructureClass.FULLY_CONVECTIVE) {
            return acousticRadius;
        }
        if (kind != StructureClass.CONV_ENVELOPE && kind != StructureClass.CONV_CORE_AND_ENVELOPE) {
            return Double.NaN;
        }
        double surface = radius[radius.length - 1];
        double base = Math.min(1.0, Math.max(0.0, model.convection().envelopeBaseRadiusFraction())) * surface;
        return AcousticTravelTime.depthAt(radius, soundSpeed, base);
    }

    private static boolean integrable(double[] radius, double[] soundSpeed) {
        if (!BuoyancyTravelTime.increasingFromAboveZero(radius)) {
            return false;
        }
        for (double c : soundSpeed) {
            if (!(c > 0.0)) {
                return false;
            }
        }
        return true;
    }
}
