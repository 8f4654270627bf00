package org.convgrid.grids;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * The precision the run's tables write numbers with: {@value #SIGNIFICANT_DIGITS} significant digits, rounded
 * half-even (the output module's CsvNumbers, which a test holds equal). Two grid values that agree to it would be
 * written as one value in the catalogue and the transition table, so the grid reader refuses them as duplicates.
 */
public final class WrittenPrecision {

    /** Significant digits of the written tables. */
    public static final int SIGNIFICANT_DIGITS = 7;

    private static final MathContext ROUNDING = new MathContext(SIGNIFICANT_DIGITS, RoundingMode.HALF_EVEN);

    private WrittenPrecision() {
    }

    /** The value as the tables write it (finite values). */
    public static double asWritten(double value) {
        return value == 0.0 ? 0.0 : new BigDecimal(value).round(ROUNDING).doubleValue();
    }
}
