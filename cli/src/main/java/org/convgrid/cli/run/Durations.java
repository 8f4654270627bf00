package org.convgrid.cli.run;

import java.util.Locale;

/** Short human forms of durations, such as {@code 45 s}, {@code 3 min 12 s}, {@code 2 h 05 min}, {@code 3.5 d}. */
public final class Durations {

    private Durations() {
    }

    /** @param seconds a duration, s */
    public static String describe(double seconds) {
        return describe(seconds, false);
    }

    /**
     * An estimate's duration, as {@link #describe(double)} but at least 1 s when above zero: "about 0 s" for an
     * estimate of 0.45 s read as nothing to do (a measured time keeps its 0 s).
     */
    public static String describeEstimate(double seconds) {
        return describe(seconds, true);
    }

    private static String describe(double seconds, boolean atLeastOneSecond) {
        if (!Double.isFinite(seconds) || seconds < 0) {
            return "unknown time";
        }
        long s = Math.round(seconds);
        if (atLeastOneSecond && s == 0 && seconds > 0) {
            s = 1;
        }
        if (s < 60) {
            return s + " s";
        }
        if (s < 3600) {
            return (s / 60) + " min " + String.format(Locale.ROOT, "%02d", s % 60) + " s";
        }
        if (s < 2 * 86400) {
            return (s / 3600) + " h " + String.format(Locale.ROOT, "%02d", (s % 3600) / 60) + " min";
        }
        return String.format(Locale.ROOT, "%.1f d", seconds / 86400.0);
    }
}
