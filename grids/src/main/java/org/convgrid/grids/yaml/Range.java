package org.convgrid.grids.yaml;

import org.convgrid.grids.words.MessageNumbers;

/**
 * An interval of allowed values; {@link #words()} says it for messages ("at least 0", "above 0 and at most 300").
 * Messages gave it in interval notation, "[0, inf)", which readers had to decode.
 */
record Range(double lo, boolean loIncluded, double hi, boolean hiIncluded, String atExcludedLow) {

    Range(double lo, boolean loIncluded, double hi, boolean hiIncluded) {
        this(lo, loIncluded, hi, hiIncluded, "");
    }

    /** The same range, whose message for a value at its excluded lower end ends with ": " and {@code note}. */
    Range noteAtExcludedLow(String note) {
        return new Range(lo, loIncluded, hi, hiIncluded, note);
    }

    static Range open(double lo, double hi) {
        return new Range(lo, false, hi, false);
    }

    static Range closed(double lo, double hi) {
        return new Range(lo, true, hi, true);
    }

    static Range aboveZero(double hi) {
        return new Range(0.0, false, hi, true);
    }

    boolean contains(double v) {
        return (loIncluded ? v >= lo : v > lo) && (hiIncluded ? v <= hi : v < hi);
    }

    /** The range in words, to follow "must be": "from 0 to 1", "at least 0", "above 0 and below 0.1". */
    String words() {
        String low = MessageNumbers.format(lo);
        if (Double.isInfinite(hi)) {
            return (loIncluded ? "at least " : "above ") + low;
        }
        String high = MessageNumbers.format(hi);
        if (loIncluded && hiIncluded) {
            return "from " + low + " to " + high;
        }
        return (loIncluded ? "at least " : "above ") + low + " and " + (hiIncluded ? "at most " : "below ") + high;
    }

    /** The message for a value outside: "overshoot must be at least 0 (got -1)", the value as written. */
    String refusal(String what, String unit, String written, double value) {
        return what + " must be " + words() + unit + " (got " + written + ")"
                + (value == lo && !atExcludedLow.isEmpty() ? ": " + atExcludedLow : "");
    }
}
