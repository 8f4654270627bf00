package org.convgrid.engine.zams;

import org.convgrid.engine.batch.ModelOutcome;
import org.convgrid.engine.batch.ModelRequest;
import org.convgrid.engine.batch.ModelStatus;
import org.convgrid.engine.structure.SolveReport;

/**
 * The outcome of one zero-age request: a model, or the report of the relaxation that failed.
 *
 * @param model the converged model, null on failure
 * @param failure why it failed, null on success
 * @param iterations Newton iterations spent on this request, including intermediate masses walked through
 */
public record ZamsResult(ZamsModel model, SolveReport failure, int iterations) {

    public boolean converged() {
        return model != null;
    }

    /** The catalogue outcome of this result for {@code request} (status OK or NOT_CONVERGED with the report). */
    public ModelOutcome outcome(ModelRequest request) {
        if (model != null) {
            return new ModelOutcome(request, ModelStatus.OK, "", model.model().global(), model.model().convection(),
                    iterations);
        }
        return new ModelOutcome(request, ModelStatus.NOT_CONVERGED, failure.toString(), null, null, iterations);
    }

    static ZamsResult success(ZamsModel model, int iterations) {
        return new ZamsResult(model, null, iterations);
    }

    static ZamsResult failed(SolveReport report, int iterations) {
        return new ZamsResult(null, report, iterations);
    }
}
