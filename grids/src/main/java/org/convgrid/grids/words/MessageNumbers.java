package org.convgrid.grids.words;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * Numbers in messages and warnings for people: {@code 0.02}, {@code 300}, {@code 5e-4}, {@code 2e6}. Messages used
 * Double.toString, which wrote "5.0E-4" and "-1.0" where the user had typed 0.0005 and -1. Not for output files:
 * their numbers keep the fixed format of the catalogue and the CSV files.
 */
public final class MessageNumbers {

    /** Significant digits kept: as many as the catalogue writes, so a value in a message is found in the files. */
    private static final MathContext DIGITS = new MathContext(7, RoundingMode.HALF_EVEN);
    /** Sizes written as plain decimals (ages up to 1e5 Myr read as typed, "20000"); smaller and larger ones with a power of ten ({@code 5e-4}). */
    private static final double PLAIN_MIN = 1e-3;
    private static final double PLAIN_MAX = 1e5;

    private MessageNumbers() {
    }

    /** The text of a value: plain from 1e-3 to 1e5 in size, else mantissa and exponent; no trailing zeros. */
    public static String format(double value) {
        return format(value, DIGITS);
    }

    /**
     * {@link #format(double)} to {@code digits} significant digits, for a value the user did not type but the tool
     * derived (the Z an [Fe/H] gives), where seven digits would only hide the point.
     */
    public static String format(double value, int digits) {
        return format(value, new MathContext(digits, RoundingMode.HALF_EVEN));
    }

    private static String format(double value, MathContext digits) {
        if (Double.isNaN(value)) {
            return "NaN";
        }
        if (Double.isInfinite(value)) {
            return value > 0 ? "inf" : "-inf";
        }
        if (value == 0.0) {
            return "0";
        }
        BigDecimal rounded = new BigDecimal(value).round(digits).stripTrailingZeros();
        double size = Math.abs(rounded.doubleValue());
        if (size >= PLAIN_MIN && size <= PLAIN_MAX) {
            return rounded.toPlainString();
        }
        int exponent = rounded.precision() - rounded.scale() - 1;
        return rounded.movePointLeft(exponent).stripTrailingZeros().toPlainString() + "e" + exponent;
    }
}
