package org.convgrid.output.transitions;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Predicate;
import org.convgrid.output.Span;
import org.convgrid.output.catalogue.CatalogueRow;

/**
 * Where a yes/no property of the models (fully convective, with a convective core, on the main sequence) changes
 * between neighbouring masses of a slice, and the transition estimate read off one such change: the one reading every
 * transition of transitions.csv shares ({@link TransitionFinder}, {@link MainSequenceTurnoff}). Stateless.
 */
final class StateCrossings {

    private StateCrossings() {
    }

    /** Every change of {@code state} between neighbouring usable models, in increasing mass. */
    static List<Span> of(List<CatalogueRow> usable, Predicate<CatalogueRow> state) {
        List<Span> crossings = new ArrayList<>();
        for (int i = 0; i + 1 < usable.size(); i++) {
            if (state.test(usable.get(i)) != state.test(usable.get(i + 1))) {
                crossings.add(new Span(usable.get(i).massMsun(), usable.get(i + 1).massMsun()));
            }
        }
        return crossings;
    }

    /**
     * Index of the crossing that leaves {@code state} (the highest one when {@code highest}), -1 when none: a
     * crossing leaves the state when its lower model is in it.
     */
    static int leaving(List<Span> crossings, List<CatalogueRow> usable, Predicate<CatalogueRow> state,
                       boolean highest) {
        int chosen = -1;
        for (int i = 0; i < crossings.size(); i++) {
            double lo = crossings.get(i).lo();
            boolean leaves = usable.stream().anyMatch(r -> r.massMsun() == lo && state.test(r));
            if (leaves && (highest || chosen < 0)) {
                chosen = i;
            }
        }
        return chosen;
    }

    /**
     * The estimate at crossing {@code index} (none when negative): reported at its lower end ({@code atLowEnd}, the
     * last mass still in the state) or its upper end (the first mass past it).
     */
    static TransitionEstimate estimate(List<CatalogueRow> all, List<Span> crossings, int index,
                                       boolean atLowEnd) {
        if (index < 0) {
            return new TransitionEstimate(Double.NaN, null, crossings, 0);
        }
        Span c = crossings.get(index);
        int skipped = (int) all.stream().filter(r -> r.massMsun() > c.lo() && r.massMsun() < c.hi()).count();
        return new TransitionEstimate(atLowEnd ? c.lo() : c.hi(), c, crossings, skipped);
    }

    /** "once", "twice", "3 times": how often a state changes with mass, for the notes. */
    static String timesInWords(int times) {
        return times == 1 ? "once" : times == 2 ? "twice" : times + " times";
    }
}
