package org.convgrid.engine.evolution;

import java.util.List;

/**
 * The outcome of evolving one star.
 *
 * @param models one entry per requested age, in the order asked
 * @param steps every accepted step, the zero-age model first
 * @param end why the evolution stopped
 * @param endAge age at the last accepted step, s
 * @param exhaustionAge age at which the central hydrogen fell below the end value, s (interpolated in ln X_c
 *                      between the last two steps); NaN when it was not reached
 * @param detail the failure report when {@code end} is {@link EndReason#FAILED}, empty otherwise
 */
public record EvolutionResult(List<AgedModel> models, List<EvolutionStep> steps, EndReason end, double endAge,
                              double exhaustionAge, String detail) {

    public EvolutionResult {
        models = List.copyOf(models);
        steps = List.copyOf(steps);
    }

    /** Why an evolution stopped. */
    public enum EndReason {
        /** Central hydrogen below the end value: the end of the main sequence. */
        HYDROGEN_EXHAUSTED,
        /** The age limit was reached first. */
        AGE_LIMIT,
        /** Every requested age was answered before either (when asked to stop there). */
        REQUESTS_DONE,
        /** A step failed at the smallest time step allowed, or a budget ran out. */
        FAILED
    }
}
