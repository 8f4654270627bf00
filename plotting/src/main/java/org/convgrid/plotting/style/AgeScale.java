package org.convgrid.plotting.style;

import java.util.ArrayList;
import java.util.List;
import org.convgrid.engine.request.AgeOrigin;
import org.convgrid.plotting.label.SliceLabels;

/**
 * The age axis of a chart of one or more tracks against age (zones, period spacing). A track from the zero-age main sequence is drawn on a linear axis in Gyr.
 * A track from birth spans many decades (contraction times of 1e3 yr at its start, Gyr on the main sequence), so it
 * is drawn on a logarithmic axis in Myr, from its first step after birth; birth itself (age 0) is held at that left
 * edge. Tick labels carry their own unit (yr, kyr, Myr, Gyr), so each reads without arithmetic.
 *
 * @param logarithmic whether the axis is logarithmic in Myr (else linear in Gyr)
 * @param min left end, in the axis unit
 * @param max right end, in the axis unit
 */
public record AgeScale(boolean logarithmic, double min, double max) {

    /** A track from birth whose ages span at least this factor is drawn on a logarithmic axis. */
    public static final double DECADES_FOR_LOG = 100.0;
    private static final double MYR_PER_GYR = 1000.0;

    /** The scale for ages in Gyr from {@code first} to {@code last}; {@code firstAfterBirth}: the first positive age. */
    public static AgeScale of(boolean fromBirth, double first, double firstAfterBirth, double last) {
        return of(fromBirth, first, firstAfterBirth, last, DECADES_FOR_LOG);
    }

    /**
     * As {@link #of(boolean, double, double, double)}, logarithmic from a span of {@code spanForLog} (a factor) on.
     */
    public static AgeScale of(boolean fromBirth, double first, double firstAfterBirth, double last,
                              double spanForLog) {
        if (fromBirth && firstAfterBirth > 0 && last / firstAfterBirth >= spanForLog) {
            return new AgeScale(true, firstAfterBirth * MYR_PER_GYR, last * MYR_PER_GYR);
        }
        return new AgeScale(false, first, last > first ? last : first + 1.0);
    }

    /** Where an age (Gyr) lies on the axis; ages left of the axis (birth, on a log axis) are held at its left end. */
    public double x(double ageGyr) {
        return logarithmic ? Math.max(ageGyr * MYR_PER_GYR, min) : ageGyr;
    }

    /** Where an age (Gyr) lies along the axis, as a share of its length (0 at the left end, 1 at the right). */
    public double share(double ageGyr) {
        return logarithmic ? VisiblePatches.logShare(x(ageGyr), min, max)
                : VisiblePatches.linearShare(x(ageGyr), min, max);
    }

    /** The ticks of a logarithmic axis: every decade of Myr between its ends. */
    public List<Double> decades() {
        List<Double> ticks = new ArrayList<>();
        for (int d = (int) Math.ceil(Math.log10(min) - 1e-9); d <= (int) Math.floor(Math.log10(max) + 1e-9); d++) {
            ticks.add(Math.pow(10, d));
        }
        return ticks;
    }

    /** A tick label of a logarithmic axis, in the unit that keeps its number short: 10 kyr, 1 Myr, 1 Gyr. */
    public static String label(double myr) {
        if (myr >= MYR_PER_GYR) {
            return SliceLabels.number(myr / MYR_PER_GYR) + " Gyr";
        }
        if (myr >= 1.0) {
            return SliceLabels.number(myr) + " Myr";
        }
        if (myr >= 1e-3) {
            return SliceLabels.number(myr * 1e3) + " kyr";
        }
        return SliceLabels.number(myr * 1e6) + " yr";
    }

    /** The axis title. */
    public String title(boolean fromBirth) {
        if (logarithmic) {
            return "age since birth (logarithmic)";
        }
        return AgeAxisTitle.of(fromBirth ? AgeOrigin.BIRTH : AgeOrigin.ZAMS);
    }
}
