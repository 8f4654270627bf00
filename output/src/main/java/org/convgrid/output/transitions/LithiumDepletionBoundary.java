package org.convgrid.output.transitions;

import java.util.List;
import java.util.function.Predicate;
import org.convgrid.output.Span;
import org.convgrid.output.catalogue.CatalogueRow;

/**
 * The lithium depletion boundary of one slice: among its usable models that follow lithium (status ok, a surface
 * lithium value; a run from the zero-age main sequence has none), in increasing mass, the lowest crossing from a
 * model that keeps more than {@link #DEPLETED_LI_REL} of its birth lithium to one that keeps that or less, reported
 * at its lower end: the highest mass that still keeps its lithium below the depleted ones. In a young cluster the
 * stars below it still show lithium, those above have burnt it on their way to the main sequence, and the boundary
 * moves down in mass as the cluster ages, which is what makes it an age (Basri, Marcy &amp; Graham 1996, ApJ 458,
 * 600; Bildsten et al. 1997, ApJ 482, 442; from memory, pages not checked). Higher masses keep lithium again (their
 * envelope base never gets hot enough to burn it all): that second crossing is not the boundary, and a slice whose
 * lowest mass has already burnt its lithium has none among its masses (its notes say so). Failed and unconverged
 * models inside the bracket are skipped and widen it, as for the other transitions.
 */
final class LithiumDepletionBoundary {

    /**
     * Surface lithium over its birth value at or below which a star counts as depleted: 1 %, 99 % burnt, the level
     * the life events' {@code li_one_percent_myr} marks and the usual model definition of the boundary (Bildsten et
     * al. 1997, from memory).
     */
    static final double DEPLETED_LI_REL = 0.01;

    private static final Predicate<CatalogueRow> KEEPS_LITHIUM = LithiumDepletionBoundary::keepsLithium;

    /** The words of the note of a slice whose lowest mass has burnt its lithium, by which a chart finds it. */
    static final String BELOW_GRID_WORDS = "the lithium depletion boundary lies below it";

    private LithiumDepletionBoundary() {
    }

    /** Whether a model keeps more than {@link #DEPLETED_LI_REL} of its birth lithium. */
    static boolean keepsLithium(CatalogueRow row) {
        return row.surfaceLiRel() > DEPLETED_LI_REL;
    }

    /**
     * Whether a model can say whether it keeps its lithium: status ok with a surface lithium value ({@link
     * #keepsLithium} is false for a model without one, so read it among these models only).
     */
    static boolean followsLithium(CatalogueRow row) {
        return row.isOk() && !Double.isNaN(row.surfaceLiRel());
    }

    /**
     * The boundary of a slice, the lowest of its crossings into depletion (a model keeping its lithium below a
     * depleted one); not found when there is none, and when the slice's lowest mass has burnt its lithium.
     *
     * @param byMass every model of the slice in increasing mass
     */
    static LithiumDepletion of(List<CatalogueRow> byMass) {
        List<CatalogueRow> searched = byMass.stream().filter(LithiumDepletionBoundary::followsLithium).toList();
        if (!searched.isEmpty() && !keepsLithium(searched.get(0))) {
            // burnt already at the lowest mass: no star keeps its lithium below the depleted ones, whatever a heavier
            // star near 1 % does (0.7 Msun hovers there for ~100 Myr); the boundary lies below the grid
            return LithiumDepletion.NONE;
        }
        // only the crossings into depletion: the band's upper edge, where heavier stars keep their lithium again, is
        // another transition, not a second boundary to note or refine
        List<Span> crossings = StateCrossings.of(searched, KEEPS_LITHIUM).stream()
                .filter(c -> searched.stream().anyMatch(r -> r.massMsun() == c.lo() && keepsLithium(r))).toList();
        TransitionEstimate boundary = StateCrossings.estimate(byMass, crossings, crossings.isEmpty() ? -1 : 0, true);
        double luminosity = boundary.found() ? searched.stream().filter(r -> r.massMsun() == boundary.massMsun())
                .findFirst().orElseThrow().luminosityLsun() : Double.NaN;
        return new LithiumDepletion(boundary, luminosity);
    }

    /**
     * The notes of a boundary: nothing when lithium is not followed or every model keeps it; the lowest mass when it
     * has burnt its lithium already (the boundary lies below the slice's masses), and the models the bracket was
     * widened past.
     */
    static void describe(LithiumDepletion depletion, List<CatalogueRow> byMass, List<String> notes) {
        TransitionEstimate boundary = depletion.boundary();
        List<CatalogueRow> searched = byMass.stream().filter(LithiumDepletionBoundary::followsLithium).toList();
        if (searched.isEmpty()) {
            return;
        }
        if (!boundary.found() && !keepsLithium(searched.get(0))) {
            notes.add("lithium below " + Math.round(100.0 * DEPLETED_LI_REL) + " % of its birth value already at the "
                    + "lowest usable mass (" + MassRangeText.of(new Span(searched.get(0).massMsun(),
                    searched.get(0).massMsun())) + " Msun): " + BELOW_GRID_WORDS);
        }
        if (boundary.skippedInBracket() > 0) {
            notes.add("lithium depletion bracket widened past " + SkippedModelsText.of(byMass, boundary.bracket()));
        }
    }
}
