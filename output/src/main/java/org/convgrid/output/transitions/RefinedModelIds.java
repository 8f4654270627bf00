package org.convgrid.output.transitions;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Model ids of the models {@code convgrid transitions --refine} adds to a catalogue: the grid id of the slice with
 * its mass part {@code m<index>} replaced by {@code r<counter>}, e.g. {@code p0-z01-r007-a00} beside the grid's
 * {@code p0-z01-m023-a00}. Grid ids never hold an {@code r} part, so the two cannot collide; the counter starts at 0
 * in each slice, counts up in the order the rows are appended (a later refinement continues after the highest
 * counter of the slice) and is zero-padded to at least {@link #COUNTER_WIDTH} digits.
 */
public final class RefinedModelIds {

    /** Digits the counter is padded to. */
    public static final int COUNTER_WIDTH = 3;

    private static final Pattern GRID = Pattern.compile("(p\\d+-z\\d+)-m\\d+(-a\\d+)");
    private static final Pattern REFINED = Pattern.compile("(p\\d+-z\\d+)-r(\\d+)(-a\\d+)");

    private RefinedModelIds() {
    }

    /** Whether an id is one of a refinement model. */
    public static boolean isRefined(String modelId) {
        return REFINED.matcher(modelId).matches();
    }

    /**
     * The id of refinement model {@code counter} of the slice of a grid model.
     *
     * @throws IllegalArgumentException when {@code gridModelId} is not a grid id
     */
    public static String of(String gridModelId, int counter) {
        Matcher m = GRID.matcher(gridModelId);
        if (!m.matches()) {
            throw new IllegalArgumentException("'" + gridModelId + "' is not a grid model id (p<i>-z<i>-m<i>-a<i>)");
        }
        if (counter < 0) {
            throw new IllegalArgumentException("the counter must be >= 0, got " + counter);
        }
        String digits = Integer.toString(counter);
        return m.group(1) + "-r" + "0".repeat(Math.max(0, COUNTER_WIDTH - digits.length())) + digits + m.group(2);
    }

    /** The counter of a refinement id, or -1 when the id is not one. */
    public static int counter(String modelId) {
        Matcher m = REFINED.matcher(modelId);
        return m.matches() ? Integer.parseInt(m.group(2)) : -1;
    }
}
