package org.convgrid.cli.run;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.stream.Collectors;
import org.convgrid.engine.request.AgeOrigin;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.grids.GridFile;
import org.convgrid.grids.GridSpec;
import org.convgrid.grids.words.Counts;
import org.convgrid.grids.words.MessageNumbers;
import org.convgrid.output.IronAbundance;
import org.convgrid.survey.GridIronAbundance;

/** The text {@code convgrid check} prints about a valid grid: its axes, model count and a run-time estimate. */
public final class GridSummary {

    /** Axis values listed one by one up to this many; longer axes are shown as a range. */
    static final int LISTED_VALUES = 8;

    private GridSummary() {
    }

    /**
     * @param file the grid file as read
     * @param estimate the sweep's run time on {@code threads} threads and how it was reached
     * @param refinement what refining the transitions adds after the sweep
     * @param threads threads the estimate assumes
     * @param runDirectory where {@code run} would write
     */
    public static List<String> lines(GridFile file, RunTimeEstimate estimate, RefinementEstimate refinement, int threads,
                                     String runDirectory) {
        GridSpec g = file.spec();
        List<String> lines = new ArrayList<>();
        lines.add("grid:          " + TerminalText.clean(g.title() + " (" + file.name() + ")"));
        lines.add("masses:        " + axis(g.massesMsun(), "Msun"));
        IronAbundance iron = GridIronAbundance.of(g);
        lines.add("metallicities: " + g.metallicities().size() + ": " + g.metallicities().stream()
                .map(p -> (Double.isNaN(p.ironDex()) ? "" : "[Fe/H]=" + MessageNumbers.format(p.ironDex()) + " ")
                        + "Z=" + MessageNumbers.format(p.z()) + " Y=" + MessageNumbers.format(p.y())
                        // what the catalogue's fe_h_dex will read for a Z given as such (Z = 0.014 is not [Fe/H] 0
                        // against the default Sun), so that no run is needed to see it
                        + (Double.isNaN(p.ironDex()) && p.z() > 0.0 ? " ([Fe/H] " + iron.cell(p.z(), p.y()) + ")"
                                : ""))
                .collect(Collectors.joining(", "))
                + (g.givesIron() ? "" : "; [Fe/H] against solar Z/X " + MessageNumbers.format(iron.solarZOverX())));
        boolean birth = g.ages().origin() == AgeOrigin.BIRTH;
        lines.add(g.ages().fractions()
                ? "ages:          " + axis(g.ages().values(), "of each star's main-sequence lifetime")
                        + " (0 = ZAMS, 1 = core-hydrogen exhaustion at X_c = 1e-4"
                        + (birth ? "; evolved from birth, ages reported from birth)" : ")")
                : "ages:          " + axis(AgeUnits.values(g.ages().values()), AgeUnits.unit(g.ages().values()))
                        + (birth ? " since birth (pre-main sequence included)" : " since the ZAMS (0 = ZAMS)"));
        List<PhysicsOptions> physics = g.physics().combinations();
        lines.add("physics:       " + physics.size() + (physics.size() == 1 ? " combination" : " combinations"));
        for (PhysicsOptions p : physics) {
            lines.add("  mixing length " + MessageNumbers.format(p.mixingLength()) + " Hp, "
                    + OvershootWords.describe(p) + ", " + p.criterion().name().toLowerCase(Locale.ROOT)
                    + ", opacity x" + MessageNumbers.format(p.opacityScale())
                    // what a preset or the grid chose, so that check shows it before a run
                    + (p.usesOpacityTable() ? " (table " + p.opacityTable() + ")" : "")
                    + ", " + p.atmosphere().label() + " atmosphere");
        }
        lines.add("models:        " + g.count());
        lines.add("estimate:      about " + Durations.describeEstimate(estimate.seconds()) + " on "
                + Counts.of(threads, "thread") + " for these models, at " + estimate.basis());
        lines.add(refinement.models() == 0 ? "refinement:    " + refinement.basis()
                : "refinement:    about " + Counts.of(refinement.models(), "new model") + " after them to narrow the transition"
                        + " masses, about " + Durations.describeEstimate(refinement.seconds()) + " more ("
                        + refinement.basis() + "; run --no-refine skips them)");
        lines.add("run directory: " + runDirectory);
        return lines;
    }

    private static String axis(List<Double> values, String unit) {
        String head = values.size() + ": ";
        if (values.size() <= LISTED_VALUES) {
            return head + values.stream().map(MessageNumbers::format).collect(Collectors.joining(", ")) + " " + unit;
        }
        return head + "from " + MessageNumbers.format(values.get(0)) + " to "
                + MessageNumbers.format(values.get(values.size() - 1)) + " " + unit;
    }
}
