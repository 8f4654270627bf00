package org.convgrid.engine.birth;

import org.convgrid.engine.evolution.EvolutionStep;

/**
 * One accepted step of a track from birth with what the pre-main sequence adds to {@link EvolutionStep}.
 *
 * @param step the step's summary (its age counts from birth)
 * @param phase pre-main sequence until the zero-age main sequence is first reached, main sequence after
 * @param nuclearFraction L_nuc / L
 * @param surfaceLithium surface 7Li over its birth value (number or mass ratio: the same); NaN without lithium
 * @param centralDeuterium central deuterium mass fraction
 */
public record TrackPoint(EvolutionStep step, Phase phase, double nuclearFraction, double surfaceLithium,
                         double centralDeuterium) {

    /** Age since birth, s. */
    public double age() {
        return step.age();
    }
}
