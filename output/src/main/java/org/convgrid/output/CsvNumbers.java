package org.convgrid.output;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.regex.Pattern;

/**
 * The number format of every CSV file convgrid writes: locale-independent, deterministic (the same double always
 * gives the same text), {@value #SIGNIFICANT_DIGITS} significant digits rounded half-even, plain form for
 * 1e-4 &lt;= |x| &lt; 1e7 and {@code 1.234e-05} form outside; trailing zeros dropped, but a real always keeps a
 * decimal point ({@code 0.0}, {@code 2.0}, {@code 1.0e+07}) so that readers type the column as real whatever the
 * values; NaN written as the empty cell ("not applicable"). The {@code lo-hi} spans use a fixed-point form instead, because an exponent's minus sign would
 * be ambiguous there. {@link #formatRoundTrip} writes the same layout with as many digits as the double needs to read
 * back unchanged, for files whose numbers are differenced (profiles).
 */
public final class CsvNumbers {

    /** Significant digits written; about single precision, far above the models' own accuracy. */
    public static final int SIGNIFICANT_DIGITS = 7;
    /** Significant digits that read back any double (IEEE 754 binary64 needs 17 at most). */
    public static final int ROUND_TRIP_MAX_DIGITS = 17;
    /** Decimal places of the fixed-point form used in spans (mass fractions and masses). */
    public static final int SPAN_DECIMALS = 6;

    private static final MathContext ROUNDING = new MathContext(SIGNIFICANT_DIGITS, RoundingMode.HALF_EVEN);
    private static final int PLAIN_MIN_EXPONENT = -4;
    private static final int PLAIN_MAX_EXPONENT = 6;
    /**
     * What {@link #parse} accepts besides the empty cell and the infinities; compiled once, since a run reads every
     * cell of its catalogue back (String.matches would compile it again for each cell).
     */
    private static final Pattern NUMBER = Pattern.compile("[-+]?[0-9.]+([eE][-+]?[0-9]+)?");

    private CsvNumbers() {
    }

    /** The cell text of a value. */
    public static String format(double value) {
        if (Double.isNaN(value)) {
            return "";
        }
        if (Double.isInfinite(value)) {
            return value > 0 ? "inf" : "-inf";
        }
        if (value == 0.0) {
            return "0.0";
        }
        return layout(new BigDecimal(value).round(ROUNDING));
    }

    /**
     * The cell text of a value with the fewest significant digits that parse back to the very same double (at most
     * {@value #ROUND_TRIP_MAX_DIGITS}), in the layout of {@link #format}. Among the decimals of that length the one
     * nearest the value is taken (the other neighbour only where the nearest does not read back, as can happen at a
     * power of two), so the text depends on the value alone, not on the JDK's {@code Double.toString}, which in Java
     * 17 sometimes writes a digit more than needed. Negative zero is written {@code 0.0}, as by {@link #format}.
     */
    public static String formatRoundTrip(double value) {
        if (Double.isNaN(value) || Double.isInfinite(value) || value == 0.0) {
            return format(value);
        }
        BigDecimal exact = new BigDecimal(value);
        BigDecimal shortest = readingBack(exact, value, ROUND_TRIP_MAX_DIGITS);
        // a length that reads back implies every longer one does (its decimals include the shorter ones), so the
        // search down stops at the first length with none
        for (int digits = ROUND_TRIP_MAX_DIGITS - 1; digits >= 1; digits--) {
            BigDecimal shorter = readingBack(exact, value, digits);
            if (shorter == null) {
                break;
            }
            shortest = shorter;
        }
        return layout(shortest);
    }

    /**
     * The decimal of {@code digits} significant digits next to {@code exact} that parses back to {@code value}:
     * the nearest one, else the neighbour on the other side; null when neither does.
     */
    private static BigDecimal readingBack(BigDecimal exact, double value, int digits) {
        BigDecimal nearest = exact.round(new MathContext(digits, RoundingMode.HALF_EVEN));
        if (nearest.doubleValue() == value) {
            return nearest;
        }
        BigDecimal other = exact.round(new MathContext(digits,
                nearest.compareTo(exact) > 0 ? RoundingMode.FLOOR : RoundingMode.CEILING));
        return other.doubleValue() == value ? other : null;
    }

    /** Plain form for exponents {@value #PLAIN_MIN_EXPONENT} to {@value #PLAIN_MAX_EXPONENT}, else mantissa e+XX. */
    private static String layout(BigDecimal decimal) {
        BigDecimal rounded = decimal.stripTrailingZeros();
        int exponent = rounded.precision() - rounded.scale() - 1;
        if (exponent >= PLAIN_MIN_EXPONENT && exponent <= PLAIN_MAX_EXPONENT) {
            return withPoint(rounded.toPlainString());
        }
        String mantissa = withPoint(rounded.movePointLeft(exponent).toPlainString());
        int magnitude = Math.abs(exponent);
        return mantissa + "e" + (exponent < 0 ? "-" : "+") + (magnitude < 10 ? "0" : "") + magnitude;
    }

    private static String withPoint(String digits) {
        return digits.indexOf('.') >= 0 ? digits : digits + ".0";
    }

    /** Fixed-point text with at most {@value #SPAN_DECIMALS} decimals, for values inside {@code lo-hi} spans. */
    public static String formatFixed(double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("span ends must be finite, got " + value);
        }
        BigDecimal fixed = new BigDecimal(value).setScale(SPAN_DECIMALS, RoundingMode.HALF_EVEN).stripTrailingZeros();
        return fixed.signum() == 0 ? "0" : fixed.toPlainString();
    }

    /**
     * Reads a cell written by {@link #format}: empty is NaN.
     *
     * @throws NumberFormatException when the text is not a number
     */
    public static double parse(String text) {
        String t = text.strip();
        return switch (t) {
            case "" -> Double.NaN;
            case "inf" -> Double.POSITIVE_INFINITY;
            case "-inf" -> Double.NEGATIVE_INFINITY;
            default -> {
                if (!NUMBER.matcher(t).matches()) {
                    throw new NumberFormatException("not a number: '" + text + "'");
                }
                yield Double.parseDouble(t);
            }
        };
    }
}
