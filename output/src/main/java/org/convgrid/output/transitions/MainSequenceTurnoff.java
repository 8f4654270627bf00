package org.convgrid.output.transitions;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Predicate;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.output.Span;
import org.convgrid.output.catalogue.CatalogueRow;

/**
 * The main-sequence turn-off of one slice, read off the models' statuses: among the models with status ok or
 * {@code past_main_sequence}, in increasing mass, the highest crossing from ok to past the main sequence, reported
 * at its lower end (the highest mass still on the main sequence at the slice's age). Failed and unconverged models
 * in between are skipped and widen the bracket, as for the other transitions. An ok model needs no structure class
 * here: its status alone says it is on the main sequence.
 */
final class MainSequenceTurnoff {

    private static final Predicate<CatalogueRow> ON_MAIN_SEQUENCE = CatalogueRow::isOk;

    private MainSequenceTurnoff() {
    }

    /**
     * The turn-off of a slice; {@link TransitionEstimate#NONE} (with the crossings, if any) when no model past the
     * main sequence has one on it below.
     *
     * @param byMass every model of the slice in increasing mass
     */
    static TransitionEstimate of(List<CatalogueRow> byMass) {
        List<CatalogueRow> searched = searched(byMass);
        List<Span> crossings = StateCrossings.of(searched, ON_MAIN_SEQUENCE);
        int highest = StateCrossings.leaving(crossings, searched, ON_MAIN_SEQUENCE, true);
        return StateCrossings.estimate(byMass, crossings, highest, true);
    }

    /**
     * The notes of a turn-off: nothing for a clean one or a slice wholly on the main sequence; otherwise why there is
     * none, the models on the main sequence above ones past it (which should not happen: a heavier star lives
     * shorter), and the models the bracket was widened past.
     */
    static void describe(TransitionEstimate turnoff, List<CatalogueRow> byMass, List<String> notes) {
        List<CatalogueRow> searched = searched(byMass);
        boolean anyPast = searched.stream().anyMatch(r -> !r.isOk());
        if (!anyPast) {
            return;
        }
        if (!turnoff.found()) {
            notes.add(searched.stream().noneMatch(CatalogueRow::isOk)
                    ? "no turn-off: no model on the main sequence"
                    : "no turn-off: models on the main sequence only above ones past it");
        }
        List<Span> above = okRunsAboveLowestPast(searched);
        if (!above.isEmpty()) {
            notes.add("main sequence status changes " + StateCrossings.timesInWords(turnoff.crossings().size())
                    + " with mass: " + String.join(", ", above.stream().map(MassRangeText::of).toList())
                    + " Msun on the main sequence above models past it"
                    + (turnoff.found() ? " (the turn-off is read at the highest crossing)" : ""));
        }
        if (turnoff.skippedInBracket() > 0) {
            notes.add("turn-off bracket widened past " + SkippedModelsText.of(byMass, turnoff.bracket()));
        }
    }

    /** The models that tell on the main sequence from past it. */
    private static List<CatalogueRow> searched(List<CatalogueRow> byMass) {
        return byMass.stream().filter(r -> r.isOk() || r.status() == ModelStatus.PAST_MAIN_SEQUENCE).toList();
    }

    /** Each unbroken run of ok models above the lowest model past the main sequence, in mass order. */
    private static List<Span> okRunsAboveLowestPast(List<CatalogueRow> searched) {
        List<Span> runs = new ArrayList<>();
        Span run = null;
        boolean pastSeen = false;
        for (CatalogueRow r : searched) {
            if (!r.isOk()) {
                pastSeen = true;
                if (run != null) {
                    runs.add(run);
                    run = null;
                }
            } else if (pastSeen) {
                run = run == null ? new Span(r.massMsun(), r.massMsun()) : new Span(run.lo(), r.massMsun());
            }
        }
        if (run != null) {
            runs.add(run);
        }
        return runs;
    }
}
