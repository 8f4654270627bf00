package org.convgrid.engine.batch;

import org.convgrid.engine.convection.ConvectiveStructure;

/**
 * What the engine made of one request. When the status is not OK, {@code global} and {@code convection} may be
 * null and {@code statusDetail} says why.
 *
 * @param request what was asked
 * @param status how it ended
 * @param statusDetail short reason when the status is not OK, empty otherwise
 * @param global surface and central properties
 * @param convection the convective zones
 * @param solverIterations Newton iterations spent on this model
 */
public record ModelOutcome(ModelRequest request, ModelStatus status, String statusDetail, GlobalProperties global,
                           ConvectiveStructure convection, int solverIterations) {
}
