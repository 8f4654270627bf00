package org.convgrid.engine.zams;

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

    static ZamsResult success(ZamsModel model, int iterations) {
        return new ZamsResult(model, null, iterations);
    }

    static ZamsResult failed(SolveReport report, int iterations) {
        return new ZamsResult(null, report, iterations);
    }
}
