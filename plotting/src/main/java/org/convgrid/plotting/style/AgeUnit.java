package org.convgrid.plotting.style;

import java.util.List;

/**
 * The unit of an age axis: Myr when every age shown is below 1 Gyr (young clusters are spoken of in Myr, and ticks
 * then read "20, 150, 600" instead of "0.02, 0.15, 0.6"), else Gyr; the same rule as the ages in titles and legends.
 */
public enum AgeUnit {
    GYR("Gyr", 1.0),
    MYR("Myr", 1000.0);

    private final String symbol;
    private final double perGyr;

    AgeUnit(String symbol, double perGyr) {
        this.symbol = symbol;
        this.perGyr = perGyr;
    }

    /** Myr when there are ages and every one is below 1 Gyr, else Gyr. */
    public static AgeUnit of(List<Double> agesGyr) {
        return !agesGyr.isEmpty() && agesGyr.stream().allMatch(a -> a < 1.0) ? MYR : GYR;
    }

    /** {@code ageGyr} in this unit. */
    public double fromGyr(double ageGyr) {
        return ageGyr * perGyr;
    }

    /** {@code Gyr} or {@code Myr}. */
    public String symbol() {
        return symbol;
    }
}
