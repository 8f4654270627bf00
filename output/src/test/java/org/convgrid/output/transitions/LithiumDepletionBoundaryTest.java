package org.convgrid.output.transitions;

import static org.assertj.core.api.Assertions.assertThat;
import static org.convgrid.output.transitions.TransitionFinderTest.failedAt;
import static org.convgrid.output.transitions.TransitionFinderTest.ok;

import java.util.List;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.output.Span;
import org.convgrid.output.catalogue.CatalogueRow;
import org.junit.jupiter.api.Test;

/**
 * Synthetic catalogues: the finder's reading of surface lithium across masses. The shape used (low masses keeping
 * their lithium, a band of depleted stars above them, higher masses keeping it again) is that of published young
 * tracks, e.g. Baraffe et al. 2015 (A&amp;A 577, A42) near 30 Myr: 0.1 Msun at log(Li/Li0) -0.0035, 0.2 and 0.3 Msun
 * at -2.18 and -6.75, 1.0 Msun at -0.51 (the rows shipped in the engine's test resources,
 * reference/premainsequence/baraffe2015-tracks-subset.csv); the values below are invented around it.
 */
class LithiumDepletionBoundaryTest {

    private final TransitionFinder finder = TransitionFinder.withDefaults();

    /** A model keeping {@code liRel} of its lithium, with a luminosity that tells the masses apart (0.1 Lsun per Msun). */
    private static CatalogueRow withLithium(double mass, double liRel) {
        return ok(mass, mass < 0.35 ? StructureClass.FULLY_CONVECTIVE : StructureClass.CONV_ENVELOPE,
                mass < 0.35 ? 1 : 0).toBuilder().surfaceLiRel(liRel).luminosityLsun(0.1 * mass).build();
    }

    @Test
    void theBoundaryIsTheHighestMassKeepingLithiumBelowTheDepletedOnes() {
        // as near 30 Myr: 0.1 keeps it, 0.2 and 0.3 have burnt it, 1.0 keeps a third
        TransitionRow t = finder.find(List.of(withLithium(0.1, 0.992), withLithium(0.2, 6.5e-3),
                withLithium(0.3, 1.8e-7), withLithium(0.7, 3.5e-5), withLithium(1.0, 0.31))).get(0);
        assertThat(t.lithiumDepletion().boundary().massMsun()).isEqualTo(0.1);
        assertThat(t.lithiumDepletion().boundary().bracket()).isEqualTo(new Span(0.1, 0.2));
        // the luminosity is the boundary model's own, 0.1 Msun's
        assertThat(t.lithiumDepletion().luminosityLsun()).isEqualTo(0.1 * 0.1);
        // the band's upper edge (0.7 burnt, 1.0 keeps) is not a crossing into depletion: neither refined nor noted
        assertThat(t.lithiumDepletion().boundary().crossings()).containsExactly(new Span(0.1, 0.2));
        assertThat(t.notes()).doesNotContain("lithium");
    }

    @Test
    void aSecondEntryIntoDepletionIsACrossingAndTheLowestIsTheBoundary() {
        TransitionRow t = finder.find(List.of(withLithium(0.1, 0.9), withLithium(0.2, 1e-3), withLithium(0.3, 0.02),
                withLithium(0.4, 1e-4))).get(0);
        assertThat(t.lithiumDepletion().boundary().bracket()).isEqualTo(new Span(0.1, 0.2));
        assertThat(t.lithiumDepletion().boundary().crossings()).containsExactly(new Span(0.1, 0.2), new Span(0.3, 0.4));
    }

    @Test
    void exactlyOnePercentCountsAsDepleted() {
        TransitionRow t = finder.find(List.of(withLithium(0.2, 0.0100001), withLithium(0.3, 0.01))).get(0);
        assertThat(t.lithiumDepletion().boundary().bracket()).isEqualTo(new Span(0.2, 0.3));
    }

    @Test
    void aSliceBurntAtItsLowestMassHasNoBoundaryAndSaysWhy() {
        TransitionRow t = finder.find(List.of(withLithium(0.2, 0.0), withLithium(0.4, 1e-12),
                withLithium(1.0, 0.28))).get(0);
        assertThat(t.lithiumDepletion().found()).isFalse();
        assertThat(t.lithiumDepletion().boundary().massMsun()).isNaN();
        assertThat(t.lithiumDepletion().luminosityLsun()).isNaN();
        assertThat(t.notes()).contains("lithium below 1 % of its birth value already at the lowest usable mass (0.2 "
                + "Msun): the lithium depletion boundary lies below it");
        // a heavier star hovering near 1 % above a burnt lowest mass is no boundary either (it was taken for one)
        TransitionRow hovering = finder.find(List.of(withLithium(0.5, 1e-5), withLithium(0.6, 1e-3),
                withLithium(0.7, 0.0103), withLithium(0.75, 0.009), withLithium(1.0, 0.3))).get(0);
        assertThat(hovering.lithiumDepletion().found()).isFalse();
        assertThat(hovering.lithiumDepletion().boundary().crossings()).isEmpty();
        assertThat(hovering.notes()).contains("already at the lowest usable mass (0.5 Msun)");
    }

    @Test
    void aSliceKeepingLithiumEverywhereOrNotFollowingItHasNoBoundaryAndNoNote() {
        TransitionRow young = finder.find(List.of(withLithium(0.2, 1.0), withLithium(0.4, 0.9))).get(0);
        assertThat(young.lithiumDepletion().found()).isFalse();
        assertThat(young.notes()).doesNotContain("lithium");
        // from the zero-age main sequence lithium is not followed: no value, no boundary, no note
        TransitionRow zams = finder.find(List.of(ok(0.2, StructureClass.FULLY_CONVECTIVE, 1),
                ok(0.4, StructureClass.CONV_ENVELOPE, 0))).get(0);
        assertThat(zams.lithiumDepletion().found()).isFalse();
        assertThat(zams.notes()).doesNotContain("lithium");
    }

    @Test
    void aFailedModelInsideTheBracketWidensItAndIsNamed() {
        TransitionRow t = finder.find(List.of(withLithium(0.1, 0.98), failedAt(0.15), withLithium(0.2, 1e-3)))
                .get(0);
        assertThat(t.lithiumDepletion().boundary().bracket()).isEqualTo(new Span(0.1, 0.2));
        assertThat(t.lithiumDepletion().boundary().skippedInBracket()).isEqualTo(1);
        assertThat(t.notes()).contains("lithium depletion bracket widened past 1 failed model");
    }
}
