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
 * be ambiguous there.
 */
public final class CsvNumbers {

    /** Significant digits written; about single precision, far above the models' own accuracy. */
    public static final int SIGNIFICANT_DIGITS = 7;
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
        BigDecimal rounded = new BigDecimal(value).round(ROUNDING).stripTrailingZeros();
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
