package org.convgrid.engine.birth;

import java.util.List;

import org.convgrid.engine.evolution.AgedModel;
import org.convgrid.engine.evolution.EvolutionResult;
import org.convgrid.engine.evolution.SurfaceComposition;

/**
 * A star evolved from birth: its start model, the evolution (models at the requested ages, every step, why it
 * ended; ages since birth), every step with its phase and surface lithium, and the ages of its life's events.
 *
 * @param start the pre-main-sequence start model (age 0)
 * @param result the evolution, ages counted from birth
 * @param points one per step of {@code result.steps()}, in the same order
 * @param events when the star's life changed
 */
public record BirthTrack(StartModel start, EvolutionResult result, List<TrackPoint> points, LifeEvents events) {

    public BirthTrack {
        points = List.copyOf(points);
        if (points.size() != result.steps().size()) {
            throw new IllegalArgumentException("one track point per step needed");
        }
    }

    /** The phase at an age since birth, s: main sequence from the zero-age main sequence on. */
    public Phase phaseAt(double age) {
        double zams = events.zeroAgeMainSequence();
        return !Double.isNaN(zams) && age >= zams ? Phase.MAIN_SEQUENCE : Phase.PRE_MAIN_SEQUENCE;
    }

    /** The answers at the requested ages, in the order asked (status, model or reason). */
    public List<AgedModel> models() {
        return result.models();
    }

    /**
     * The surface (convective-envelope) 7Li over its birth value at a requested age's model (NaN when there is no
     * model).
     */
    public double surfaceLithiumAt(AgedModel answer) {
        if (answer.model() == null) {
            return Double.NaN;
        }
        double birth = SurfaceComposition.of(start.model()).li7();
        double surface = SurfaceComposition.of(answer.model()).li7();
        return birth > 0.0 ? surface / birth : Double.NaN;
    }
}
