package org.convgrid.output.transitions;

import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.output.catalogue.CatalogueRow;

/**
 * The models that share everything but mass: one metallicity, one age, one physics combination.
 *
 * @param zInit initial metal mass fraction
 * @param ageGyr age since the ZAMS, Gyr
 * @param mixingLength alpha, pressure scale heights
 * @param overshootHp step overshoot, pressure scale heights
 * @param criterion stability criterion, null when unknown
 * @param opacityScale opacity multiplier
 */
public record Slice(double zInit, double ageGyr, double mixingLength, double overshootHp,
                    StabilityCriterion criterion, double opacityScale) {

    /** The slice a catalogue row belongs to. */
    public static Slice of(CatalogueRow row) {
        return new Slice(row.zInit(), row.ageGyr(), row.mixingLength(), row.overshootHp(), row.criterion(),
                row.opacityScale());
    }
}
