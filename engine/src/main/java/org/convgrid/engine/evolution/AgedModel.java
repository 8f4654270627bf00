package org.convgrid.engine.evolution;

import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.structure.StellarModel;

/**
 * The answer for one requested age.
 *
 * @param age the requested age, s
 * @param status {@link ModelStatus#OK} with a model landed exactly on the age;
 *               {@link ModelStatus#PAST_MAIN_SEQUENCE} when the age lies beyond core-hydrogen exhaustion (or
 *               beyond the age limit); {@link ModelStatus#NOT_CONVERGED} when the evolution failed before it
 * @param model the model at that age, null unless OK
 * @param detail short reason when not OK, empty otherwise
 */
public record AgedModel(double age, ModelStatus status, StellarModel model, String detail) {
}
