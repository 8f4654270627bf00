package org.convgrid.survey.refine;

import java.util.List;
import org.convgrid.engine.refine.Refinement;
import org.convgrid.engine.units.Constants;
import org.convgrid.output.CsvNumbers;
import org.convgrid.survey.CatalogueAppender;

/** The words transitions.csv's notes use for a bisection that stopped before its tolerance. */
final class RefinementRemarks {

    private RefinementRemarks() {
    }

    /**
     * Adds a remark for a bisection that did not end narrower than the tolerance; nothing when it did.
     *
     * @param what the transition, e.g. "fully convective"
     */
    static void describe(String what, Refinement r, List<String> notes) {
        String at = CsvNumbers.format(r.stoppedAt() / Constants.M_SUN) + " Msun";
        String width = CsvNumbers.format(r.width() / Constants.M_SUN) + " Msun";
        String detail = r.detail().isEmpty() ? "" : " (" + CatalogueAppender.oneLine(r.detail()) + ")";
        switch (r.stop()) {
            case NARROW_ENOUGH -> { }
            case END_NOT_USABLE -> notes.add(what + " not refined: the bracket end at " + at
                    + " could not be recomputed" + detail);
            case END_DISAGREES -> notes.add(what + " not refined: recomputed, the bracket end at " + at
                    + " falls on the other side");
            case MODEL_NOT_USABLE -> notes.add(what + " refinement stopped at a bracket of " + width
                    + ": the model at " + at + " failed" + detail);
            case RESOLUTION -> notes.add(what + " refinement stopped at a bracket of " + width
                    + ": no mass the catalogue can write lies inside");
            case BUDGET -> notes.add(what + " refinement stopped at a bracket of " + width + ": step budget spent");
            default -> throw new IllegalStateException("unknown stop " + r.stop());
        }
    }
}
