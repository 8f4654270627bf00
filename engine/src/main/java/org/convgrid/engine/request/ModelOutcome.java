package org.convgrid.engine.request;

import java.util.Objects;
import org.convgrid.engine.convection.ConvectiveStructure;

/**
 * What the engine made of one request: a {@link Solved} model with its properties, or a {@link Failed} one with
 * its status and the reason. Only a solved outcome has properties, so no field is ever null.
 */
public sealed interface ModelOutcome permits ModelOutcome.Solved, ModelOutcome.Failed {

    /** What was asked. */
    ModelRequest request();

    /** How it ended. */
    ModelStatus status();

    /** Short reason when the status is not OK, empty otherwise. */
    String statusDetail();

    /**
     * What {@link #solverIterations()} gives when no model was solved for the request (an age past core-hydrogen
     * exhaustion, a star without a zero-age model to evolve): the catalogue writes an empty cell, "not applicable",
     * where it wrote 0, which read as a model found in no iterations at all.
     */
    int NO_MODEL_SOLVED = -1;

    /**
     * Newton iterations spent on this model, {@link #NO_MODEL_SOLVED} when no model was solved for it or the count
     * was not kept (an evolution that stopped on an error).
     */
    int solverIterations();

    /** The same outcome for another request (the same model under another id or a resolved age). */
    ModelOutcome withRequest(ModelRequest other);

    /**
     * This outcome as a solved model, for callers that know it converged.
     *
     * @throws IllegalStateException when it failed, with its status and reason
     */
    Solved solved();

    /**
     * A converged model, status {@link ModelStatus#OK}.
     *
     * @param global surface and central properties
     * @param convection the convective zones
     * @param stage the phase and surface lithium of the model
     * @param mixedCoreMassFraction m/M up to which the evolution's overshoot mixes the central convective zone
     *     instantaneously; NaN when it mixes no further than the zone (no overshoot, decaying overshoot, no evolution)
     * @param seismic the model's g-mode period scale, acoustic radius and glitch depths, as {@code
     *     structure.ModelSeismicScales} gives them (carried here because the catalogue row is made after the model
     *     itself is gone); {@link SeismicScales#UNKNOWN} when the outcome was made without its model
     */
    record Solved(ModelRequest request, GlobalProperties global, ConvectiveStructure convection,
                  int solverIterations, LifeStage stage, double mixedCoreMassFraction, SeismicScales seismic)
            implements ModelOutcome {

        public Solved {
            Objects.requireNonNull(request, "request");
            Objects.requireNonNull(global, "global");
            Objects.requireNonNull(convection, "convection");
            Objects.requireNonNull(stage, "stage");
            Objects.requireNonNull(seismic, "seismic");
        }

        /** A model whose seismic scales are not known. */
        public Solved(ModelRequest request, GlobalProperties global, ConvectiveStructure convection,
                      int solverIterations, LifeStage stage, double mixedCoreMassFraction) {
            this(request, global, convection, solverIterations, stage, mixedCoreMassFraction, SeismicScales.UNKNOWN);
        }

        /** A model whose central zone is mixed no further than itself. */
        public Solved(ModelRequest request, GlobalProperties global, ConvectiveStructure convection,
                      int solverIterations, LifeStage stage) {
            this(request, global, convection, solverIterations, stage, Double.NaN);
        }

        /** A model built from the zero-age main sequence (on the main sequence, lithium not followed). */
        public Solved(ModelRequest request, GlobalProperties global, ConvectiveStructure convection,
                      int solverIterations) {
            this(request, global, convection, solverIterations, LifeStage.MAIN_SEQUENCE_UNTRACED);
        }

        @Override
        public ModelStatus status() {
            return ModelStatus.OK;
        }

        @Override
        public String statusDetail() {
            return "";
        }

        @Override
        public Solved withRequest(ModelRequest other) {
            return new Solved(other, global, convection, solverIterations, stage, mixedCoreMassFraction, seismic);
        }

        @Override
        public Solved solved() {
            return this;
        }
    }

    /**
     * A request without a model.
     *
     * @param status any status but {@link ModelStatus#OK}
     * @param statusDetail why
     */
    record Failed(ModelRequest request, ModelStatus status, String statusDetail, int solverIterations)
            implements ModelOutcome {

        public Failed {
            Objects.requireNonNull(request, "request");
            Objects.requireNonNull(statusDetail, "statusDetail");
            if (status == null || status == ModelStatus.OK) {
                throw new IllegalArgumentException("a failed outcome needs a failure status, got " + status);
            }
        }

        @Override
        public Failed withRequest(ModelRequest other) {
            return new Failed(other, status, statusDetail, solverIterations);
        }

        @Override
        public Solved solved() {
            throw new IllegalStateException(request.modelId() + " was not solved: " + status.label() + ", "
                    + statusDetail);
        }
    }
}
