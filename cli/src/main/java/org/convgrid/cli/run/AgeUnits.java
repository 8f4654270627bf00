package org.convgrid.cli.run;

import java.util.List;
import org.convgrid.plotting.label.SliceLabels;

/**
 * The unit of a line that lists several ages. One unit per line, so that the values can be read against each other:
 * Myr when every age lies where {@link SliceLabels#age} (the rule {@code star}, the charts and the report follow)
 * gives Myr, else Gyr. {@code check} printed a grid's "20, 150, 600 Myr" back as "0.02, 0.15, 0.6 Gyr".
 */
public final class AgeUnits {

    private static final double MYR_PER_GYR = 1000.0;

    private AgeUnits() {
    }

    /** Whether ages, Gyr, are listed in Myr: the oldest (so every one) is given in Myr on its own. */
    public static boolean inMyr(List<Double> agesGyr) {
        double oldest = agesGyr.stream().mapToDouble(Double::doubleValue).max().orElse(0.0);
        return SliceLabels.age(oldest).endsWith(" Myr");
    }

    /** "Myr" or "Gyr", the unit {@link #values} gives the ages in. */
    public static String unit(List<Double> agesGyr) {
        return inMyr(agesGyr) ? "Myr" : "Gyr";
    }

    /** The ages, Gyr, in the line's unit ({@link #unit}). */
    public static List<Double> values(List<Double> agesGyr) {
        return inMyr(agesGyr) ? agesGyr.stream().map(a -> a * MYR_PER_GYR).toList() : agesGyr;
    }
}
