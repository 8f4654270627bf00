package org.convgrid.output.transitions;

import org.convgrid.output.CsvNumbers;
import org.convgrid.output.Span;

/**
 * A range of masses in words for the notes of transitions.csv: {@code 0.315625-0.7359375}, or one mass,
 * {@code 0.2875}, when both ends are written alike. A window of small cores found at a single refinement mass has
 * equal ends, and "0.2875-0.2875" would read as a range that is not there. Ends are written as {@link Span} writes
 * them (fixed point), so a note and the table's columns agree.
 */
public final class MassRangeText {

    private MassRangeText() {
    }

    /** The range {@code masses} (solar masses, without the unit) as one mass or as {@code lo-hi}. */
    public static String of(Span masses) {
        String lo = CsvNumbers.formatFixed(masses.lo());
        return isOneMass(masses) ? lo : lo + "-" + CsvNumbers.formatFixed(masses.hi());
    }

    /** Whether the range is written as one mass: its two ends are written alike. */
    public static boolean isOneMass(Span masses) {
        return CsvNumbers.formatFixed(masses.lo()).equals(CsvNumbers.formatFixed(masses.hi()));
    }
}
