package org.convgrid.grids.yaml;

/** An interval of allowed values; {@link #toString()} writes it in interval notation for messages. */
record Range(double lo, boolean loIncluded, double hi, boolean hiIncluded, String atExcludedLow) {

    Range(double lo, boolean loIncluded, double hi, boolean hiIncluded) {
        this(lo, loIncluded, hi, hiIncluded, "");
    }

    /** The same range, whose message for a value at its excluded lower end ends with {@code note}. */
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

    @Override
    public String toString() {
        return (loIncluded ? "[" : "(") + format(lo) + ", " + format(hi) + (hiIncluded ? "]" : ")");
    }

    private static String format(double v) {
        return Double.isInfinite(v) ? "inf" : v == Math.rint(v) && Math.abs(v) < 1e15
                ? Long.toString((long) v) : Double.toString(v);
    }
}
