package org.convgrid.plotting.label;

import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.transitions.Slice;

/**
 * One physics combination of a run (everything a slice fixes except Z and age): charts that span metallicities
 * or ages are drawn once per combination.
 *
 * @param mixingLength alpha, pressure scale heights
 * @param overshootHp overshoot length, pressure scale heights (alpha_ov, or f for the decaying profile)
 * @param overshootProfile the profile of that length, null when the tables do not say
 * @param criterion stability criterion, null when unknown
 * @param opacityFactor opacity multiplier
 */
public record PhysicsKey(double mixingLength, double overshootHp, OvershootScheme overshootProfile,
                         StabilityCriterion criterion, double opacityFactor) {

    /** The physics of a slice. */
    public static PhysicsKey of(Slice s) {
        return new PhysicsKey(s.mixingLength(), s.overshootHp(), s.overshootProfile(), s.criterion(),
                s.opacityScale());
    }

    /** The physics of a catalogue row. */
    public static PhysicsKey of(CatalogueRow r) {
        return of(Slice.of(r));
    }

    /** In words, for titles. */
    public String describe() {
        return SliceLabels.physics(mixingLength, overshootHp, overshootProfile, criterion, opacityFactor);
    }

    /** For file names. */
    public String fileStem() {
        return SliceLabels.physicsStem(mixingLength, overshootHp, overshootProfile, criterion, opacityFactor);
    }
}
