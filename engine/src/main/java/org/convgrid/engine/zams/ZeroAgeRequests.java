package org.convgrid.engine.zams;

import org.convgrid.engine.request.LifeStage;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.ModelSeismicScales;

/**
 * How a grid request becomes a zero-age model and how a zero-age result becomes a catalogue outcome; shared by
 * the grid's chunk solver, the single-star command and the transition refinement.
 */
public final class ZeroAgeRequests {

    /** status_detail of a zero-age-only request (transition refinement) at an age above zero. */
    public static final String NO_EVOLUTION = "only zero-age models are built here (age 0)";

    private ZeroAgeRequests() {
    }

    /** Homogeneous initial composition of a request: X = 1 - Y - Z, metals scaled solar. */
    public static Composition initialComposition(ModelRequest request) {
        return initialComposition(request.initialMetals(), request.initialHelium());
    }

    /** Homogeneous initial composition: X = 1 - Y - Z, metals scaled solar. */
    public static Composition initialComposition(double initialMetals, double initialHelium) {
        return Composition.scaledSolar(1.0 - initialHelium - initialMetals, initialMetals);
    }

    /** The catalogue outcome of one zero-age result. */
    public static ModelOutcome outcome(ModelRequest request, ZamsResult result) {
        if (result.converged()) {
            var model = result.model().model();
            return new ModelOutcome.Solved(request, model.global(), model.convection(), result.iterations(),
                    LifeStage.MAIN_SEQUENCE_UNTRACED, Double.NaN, ModelSeismicScales.of(model));
        }
        return new ModelOutcome.Failed(request, ModelStatus.NOT_CONVERGED, result.failure().toString(),
                result.iterations());
    }
}
