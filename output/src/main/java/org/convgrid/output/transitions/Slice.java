package org.convgrid.output.transitions;

import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.output.catalogue.CatalogueRow;

/**
 * The models that share everything but mass: one metallicity, one age, one physics combination.
 *
 * @param zInit initial metal mass fraction
 * @param ageGyr age since the ZAMS, Gyr
 * @param mixingLength alpha, pressure scale heights
 * @param overshootHp overshoot length, pressure scale heights (alpha_ov, or f for the decaying profile)
 * @param criterion stability criterion, null when unknown
 * @param opacityScale opacity multiplier
 * @param overshootProfile the profile {@code overshootHp} is the length of; null when the table does not say (written
 *     before it did)
 */
public record Slice(double zInit, double ageGyr, double mixingLength, double overshootHp,
                    StabilityCriterion criterion, double opacityScale, OvershootScheme overshootProfile) {

    /** The slice a catalogue row belongs to. */
    public static Slice of(CatalogueRow row) {
        return new Slice(row.zInit(), row.ageGyr(), row.mixingLength(), row.overshootHp(), row.criterion(),
                row.opacityScale(), row.overshootProfile());
    }
}
