package org.convgrid.plotting.label;

import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.transitions.Slice;

/**
 * One physics combination of a run (everything a slice fixes except Z and age): charts that span metallicities
 * or ages are drawn once per combination.
 *
 * @param mixingLength alpha, pressure scale heights
 * @param overshootHp step overshoot, pressure scale heights
 * @param criterion stability criterion, null when unknown
 * @param opacityFactor opacity multiplier
 */
public record PhysicsKey(double mixingLength, double overshootHp, StabilityCriterion criterion,
                         double opacityFactor) {

    /** The physics of a slice. */
    public static PhysicsKey of(Slice s) {
        return new PhysicsKey(s.mixingLength(), s.overshootHp(), s.criterion(), s.opacityScale());
    }

    /** The physics of a catalogue row. */
    public static PhysicsKey of(CatalogueRow r) {
        return of(Slice.of(r));
    }

    /** In words, for titles. */
    public String describe() {
        return SliceLabels.physics(mixingLength, overshootHp, criterion, opacityFactor);
    }

    /** For file names. */
    public String fileStem() {
        return SliceLabels.physicsStem(mixingLength, overshootHp, criterion, opacityFactor);
    }
}
