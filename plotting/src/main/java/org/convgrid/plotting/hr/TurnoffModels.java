package org.convgrid.plotting.hr;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.convgrid.output.Span;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.transitions.RefinedModelIds;
import org.convgrid.output.transitions.Slice;
import org.convgrid.output.transitions.TransitionEstimate;
import org.convgrid.output.transitions.TransitionFinder;
import org.convgrid.output.transitions.TransitionRow;

/**
 * The main-sequence turn-off of each Z and age (in Gyr) of one physics, read by the rule transitions.csv's
 * {@code turnoff_mass_msun} is read by ({@link TransitionFinder}: the highest model still on the main sequence below
 * one past it) from the same catalogue rows, so that an HR line ends where the table puts the turn-off. A pure
 * function of the rows.
 */
final class TurnoffModels {

    private final Map<Key, Turnoff> turnoffs = new HashMap<>();

    private record Key(double zInit, double ageGyr) {
    }

    /**
     * The turn-off of one slice.
     *
     * @param massMsun the highest mass on the main sequence below one past it
     * @param refined whether a refinement model ends its bracket: the refinement narrowed it to its tolerance
     */
    private record Turnoff(double massMsun, boolean refined) {
    }

    /** How a line ends, and the model it ends at when that is the turn-off model. */
    record End(IsochroneEnd kind, Optional<HrPoint> turnoffModel) {

        static final End ALL_ON_MAIN_SEQUENCE = new End(IsochroneEnd.ALL_ON_MAIN_SEQUENCE, Optional.empty());
        static final End BELOW_TURNOFF = new End(IsochroneEnd.BELOW_TURNOFF, Optional.empty());
    }

    /** @param rows the catalogue rows of one physics, every status (those past the main sequence make the turn-off) */
    TurnoffModels(List<CatalogueRow> rows) {
        for (TransitionRow t : TransitionFinder.withDefaults().find(rows)) {
            TransitionEstimate turnoff = t.turnoff();
            if (!turnoff.found()) {
                continue;
            }
            Slice s = t.slice();
            Span bracket = turnoff.bracket();
            boolean refined = rows.stream().filter(r -> Slice.of(r).equals(s))
                    .anyMatch(r -> RefinedModelIds.isRefined(r.modelId())
                            && (r.massMsun() == bracket.lo() || r.massMsun() == bracket.hi()));
            turnoffs.put(new Key(s.zInit(), s.ageGyr()), new Turnoff(turnoff.massMsun(), refined));
        }
    }

    /**
     * How the line of the grid's usable models {@code gridModels} of Z {@code zInit} and age {@code ageGyr} ends: at
     * the turn-off model when the refinement narrowed the turn-off and that model is usable (one of
     * {@code gridModels} or {@code refinementModels}); below the turn-off when the grid alone brackets it; with every
     * model on the main sequence when none past it lies above the line's highest mass (should a heavier grid model
     * come back on the main sequence above ones past it, the line already reaches past the turn-off).
     */
    End endOf(double zInit, double ageGyr, List<HrPoint> gridModels, List<HrPoint> refinementModels) {
        Turnoff turnoff = turnoffs.get(new Key(zInit, ageGyr));
        if (turnoff == null || gridModels.stream().anyMatch(p -> p.massMsun() > turnoff.massMsun())) {
            return End.ALL_ON_MAIN_SEQUENCE;
        }
        Optional<HrPoint> model = java.util.stream.Stream.concat(gridModels.stream(), refinementModels.stream())
                .filter(p -> p.zInit() == zInit && p.ageGyr() == ageGyr && p.massMsun() == turnoff.massMsun())
                .findFirst();
        // refined, its low end is the turn-off model: a refinement model or, when every new model came back past the
        // main sequence, the grid's own
        return turnoff.refined() && model.isPresent() ? new End(IsochroneEnd.AT_TURNOFF_MODEL, model)
                : End.BELOW_TURNOFF;
    }
}
