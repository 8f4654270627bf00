package org.convgrid.cli.run;

import java.util.List;
import org.convgrid.plotting.style.AgeUnit;

/**
 * The unit of a line that lists several ages. One unit per line, so that the values can be read against each other:
 * the charts' rule ({@link AgeUnit#of}: Myr when every age is below 1 Gyr), except that ages all at the zero-age main
 * sequence stay in Gyr. {@code check} printed a grid's "20, 150, 600 Myr" back as "0.02, 0.15, 0.6 Gyr".
 */
public final class AgeUnits {

    private AgeUnits() {
    }

    /** The unit of a list of ages, Gyr. */
    static AgeUnit of(List<Double> agesGyr) {
        boolean someAfterZeroAge = agesGyr.stream().anyMatch(a -> a > 0.0);
        return someAfterZeroAge ? AgeUnit.of(agesGyr) : AgeUnit.GYR;
    }

    /** "Myr" or "Gyr", the unit {@link #values} gives the ages in. */
    public static String unit(List<Double> agesGyr) {
        return of(agesGyr).symbol();
    }

    /** The ages, Gyr, in the line's unit ({@link #unit}). */
    public static List<Double> values(List<Double> agesGyr) {
        AgeUnit unit = of(agesGyr);
        return agesGyr.stream().map(unit::fromGyr).toList();
    }
}
