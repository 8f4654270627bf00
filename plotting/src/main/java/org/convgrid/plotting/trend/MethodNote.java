package org.convgrid.plotting.trend;

import java.util.List;
import org.convgrid.output.transitions.TransitionMethod;
import org.convgrid.plotting.label.SliceLabels;

/**
 * How a transition chart says how its masses were found: once, after the physics line, when every series was found
 * the same way ("all masses refined to 0.002 Msun"), so the legend does not repeat it on every entry; on every legend
 * entry (", refined", ", grid") when the methods differ and the reader must tell the series apart.
 *
 * @param common the method of every series, or null when they differ (or there are none)
 * @param toleranceMsun the refinement tolerance shared by every refined mass, NaN when none or several
 */
record MethodNote(TransitionMethod common, double toleranceMsun) {

    /** The note for series found by {@code methods}, refined ones to {@code tolerancesMsun} (NaN: read off the grid). */
    static MethodNote of(List<TransitionMethod> methods, List<Double> tolerancesMsun) {
        TransitionMethod common = methods.isEmpty() || methods.stream().distinct().count() > 1 ? null
                : methods.get(0);
        List<Double> tolerances = tolerancesMsun.stream().filter(Double::isFinite).distinct().toList();
        return new MethodNote(common, tolerances.size() == 1 ? tolerances.get(0) : Double.NaN);
    }

    /** What a legend entry of a series found by {@code method} ends with: nothing when all agree. */
    String legendSuffix(TransitionMethod method) {
        return common != null ? "" : method == TransitionMethod.REFINED ? ", refined" : ", grid";
    }

    /** The chart's second title line: the physics, then the method when all agree. */
    String subtitle(String physics) {
        if (common == TransitionMethod.REFINED) {
            return physics + "; all masses refined" + (Double.isFinite(toleranceMsun)
                    ? " to " + SliceLabels.number(toleranceMsun) + " M\u2609" : "");
        }
        return common == TransitionMethod.GRID ? physics + "; all masses read off the grid" : physics;
    }
}
