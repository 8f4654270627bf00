package org.convgrid.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.function.DoublePredicate;
import java.util.stream.Collectors;
import org.convgrid.grids.words.MessageNumbers;
import org.convgrid.engine.request.Age;
import org.convgrid.engine.request.AgeOrigin;
import org.convgrid.engine.units.Constants;
import org.convgrid.grids.GridSpec;
import org.convgrid.grids.MetallicityPoint;

/**
 * The masses, metallicities, helium fractions and ages convgrid's models are tested in (README, "Good for / not for":
 * every track of 0.1-10 Msun at Z = 1e-4 to 0.04 finishes from birth to core-hydrogen exhaustion; helium from below
 * the primordial value to above the most helium-rich populations known; ages from birth below 0.1 Myr depend on the
 * start model). Outside it the tool still computes, so {@code check}, {@code run} and {@code star}
 * print a warning on stderr, one line per kind, even with {@code --quiet}: never an error, and the exit code stays
 * what the models make it. The range is kept here alone; the README states the same.
 */
final class TestedRange {

    static final double MIN_MASS_MSUN = 0.1;
    static final double MAX_MASS_MSUN = 10.0;
    static final double MIN_Z = 1e-4;
    static final double MAX_Z = 0.04;
    /**
     * Helium mass fractions: from below the primordial value (0.2485 +- 0.0002, the Planck-based value quoted by
     * Aver, Olive, Porter &amp; Skillman 2013, arXiv:1309.0047; Aver, Olive &amp; Skillman 2015, arXiv:1503.08146,
     * measure 0.2449 +- 0.0040) to above the helium-rich populations of globular clusters (Y about 0.38-0.40,
     * Piotto et al. 2007, from memory). Outside lie compositions no known star has; {@code star} had refused them
     * while a grid took them silently, so both now warn alike.
     */
    static final double MIN_Y = 0.2;
    static final double MAX_Y = 0.45;
    /** Younger ages from birth show the start model's details more than the star's. */
    static final double MIN_BIRTH_AGE_MYR = 0.1;

    /** Values listed one by one up to this many; more are given as a count and a span. */
    static final int LISTED_VALUES = 6;

    /** Relative slack at the edges: a mass axis stepped to 10 Msun may end on 10.000000000000002. */
    private static final double EDGE_SLACK = 1e-9;

    private static final double MYR_PER_GYR = 1000.0;

    private TestedRange() {
    }

    /** The warnings for a grid: its masses, its Z (or [Fe/H]), its Y and, when they count from birth, its ages. */
    static List<String> warnings(GridSpec grid) {
        List<Double> birthAgesMyr = grid.ages().origin() == AgeOrigin.BIRTH && !grid.ages().fractions()
                ? grid.ages().values().stream().map(gyr -> gyr * MYR_PER_GYR).toList() : List.of();
        return warnings(grid.massesMsun(), grid.metallicities(), birthAgesMyr);
    }

    /** The warnings for one star given by Z; only an age from birth can be too young. */
    static List<String> warnings(double massMsun, double z, double y, Age age) {
        return warnings(List.of(massMsun), List.of(z), List.of(y), birthAgesMyr(age));
    }

    /** The warnings for one star whose composition {@code point} may have been given as [Fe/H]. */
    static List<String> warnings(double massMsun, MetallicityPoint point, Age age) {
        return warnings(List.of(massMsun), List.of(point), birthAgesMyr(age));
    }

    private static List<Double> birthAgesMyr(Age age) {
        return age instanceof Age.SinceBirth since ? List.of(since.seconds() / Constants.GYR * MYR_PER_GYR)
                : List.of();
    }

    /**
     * The warnings for compositions given as points: in Z, as {@link #warnings(List, List, List, List)} words them,
     * unless every point was given as [Fe/H]; then the metallicity line speaks in [Fe/H] too.
     */
    static List<String> warnings(List<Double> massesMsun, List<MetallicityPoint> points, List<Double> birthAgesMyr) {
        List<Double> zs = points.stream().map(MetallicityPoint::z).toList();
        List<String> lines = warnings(massesMsun, zs, points.stream().map(MetallicityPoint::y).toList(),
                birthAgesMyr);
        if (points.isEmpty() || !points.stream().allMatch(MetallicityPoint::givenAsIron)) {
            return lines;
        }
        List<MetallicityPoint> outside = points.stream().filter(p -> !testedMetals(p.z())).toList();
        if (outside.isEmpty()) {
            return lines;
        }
        String inZ = line(outside.stream().map(MetallicityPoint::z).toList(), "metallicity", "metallicities", "Z = ",
                "", zWhere());
        List<String> out = new ArrayList<>(lines);
        out.set(lines.indexOf(inZ), ironLine(outside));
        return out;
    }

    /**
     * @param massesMsun total masses, Msun
     * @param zs initial metal mass fractions
     * @param ys initial helium mass fractions
     * @param birthAgesMyr ages counted from birth, Myr (none for ages from the zero-age main sequence)
     * @return one line per kind of value outside the range, none when all lie inside
     */
    static List<String> warnings(List<Double> massesMsun, List<Double> zs, List<Double> ys,
                                 List<Double> birthAgesMyr) {
        List<String> lines = new ArrayList<>();
        List<Double> masses = outside(massesMsun, m -> m >= MIN_MASS_MSUN * (1 - EDGE_SLACK)
                && m <= MAX_MASS_MSUN * (1 + EDGE_SLACK));
        if (!masses.isEmpty()) {
            lines.add(line(masses, "mass", "masses", "", " Msun", "outside the tested range "
                    + MessageNumbers.format(MIN_MASS_MSUN) + "-" + MessageNumbers.format(MAX_MASS_MSUN) + " Msun"));
        }
        List<Double> metals = outside(zs, TestedRange::testedMetals);
        if (!metals.isEmpty()) {
            lines.add(line(metals, "metallicity", "metallicities", "Z = ", "", zWhere()));
        }
        // a Y axis repeats a value for several Z (a helium law may too): each value named once
        List<Double> helium = outside(ys.stream().distinct().sorted().toList(),
                y -> y >= MIN_Y * (1 - EDGE_SLACK) && y <= MAX_Y * (1 + EDGE_SLACK));
        if (!helium.isEmpty()) {
            lines.add(line(helium, "helium fraction", "helium fractions", "Y = ", "", "outside the tested range Y = "
                    + MessageNumbers.format(MIN_Y) + " to " + MessageNumbers.format(MAX_Y)));
        }
        List<Double> young = outside(birthAgesMyr, a -> a >= MIN_BIRTH_AGE_MYR * (1 - EDGE_SLACK));
        if (!young.isEmpty()) {
            lines.add(line(young, "age", "ages", "", " Myr from birth", "below the tested "
                    + MessageNumbers.format(MIN_BIRTH_AGE_MYR) + " Myr (there they depend on the pre-main-sequence start "
                    + "model)"));
        }
        return lines;
    }

    private static boolean testedMetals(double z) {
        return z >= MIN_Z * (1 - EDGE_SLACK) && z <= MAX_Z * (1 + EDGE_SLACK);
    }

    private static String zWhere() {
        return "outside the tested range Z = " + MessageNumbers.format(MIN_Z) + " to " + MessageNumbers.format(MAX_Z);
    }

    /**
     * The metallicity line of compositions given as [Fe/H]: the [Fe/H] asked, the Z it gives, and the tested range's
     * end(s) in Z and in this grid's [Fe/H] (its Sun and helium). A user's fe_h_dex: [-2.5] was told only "Z =
     * 5.832024e-5 lies outside the tested range Z = 1e-4 to 0.04", a Z nobody had typed, and had to work out which
     * [Fe/H] the range begins at.
     */
    private static String ironLine(List<MetallicityPoint> outside) {
        List<MetallicityPoint> below = outside.stream().filter(p -> p.z() < MIN_Z).toList();
        List<MetallicityPoint> above = outside.stream().filter(p -> p.z() >= MIN_Z).toList();
        List<Double> irons = outside.stream().map(MetallicityPoint::ironDex).toList();
        List<Double> zs = outside.stream().map(MetallicityPoint::z).toList();
        String what;
        if (outside.size() == 1) {
            what = "metallicity [Fe/H] = " + MessageNumbers.format(irons.get(0)) + " gives Z = " + derivedZ(zs.get(0));
        } else if (outside.size() <= LISTED_VALUES) {
            what = "metallicities [Fe/H] = " + irons.stream().map(MessageNumbers::format)
                    .collect(Collectors.joining(", ")) + " give Z = "
                    + zs.stream().map(TestedRange::derivedZ).collect(Collectors.joining(", "));
        } else {
            what = outside.size() + " metallicities, [Fe/H] = " + MessageNumbers.format(min(irons)) + " to "
                    + MessageNumbers.format(max(irons)) + ", give Z = " + derivedZ(min(zs)) + " to " + derivedZ(max(zs));
        }
        // the ends in [Fe/H] under the helium of the first point beyond each (the grid's law gives them all the same)
        String lowEnd = below.isEmpty() ? "" : ironAtEdge(below.get(0), MIN_Z, irons);
        String highEnd = above.isEmpty() ? "" : ironAtEdge(above.get(above.size() - 1), MAX_Z, irons);
        String where;
        if (above.isEmpty()) {
            where = "below the tested Z = " + MessageNumbers.format(MIN_Z) + " ([Fe/H] = " + lowEnd + " here)";
        } else if (below.isEmpty()) {
            where = "above the tested Z = " + MessageNumbers.format(MAX_Z) + " ([Fe/H] = " + highEnd + " here)";
        } else {
            where = "outside the tested range Z = " + MessageNumbers.format(MIN_Z) + " to "
                    + MessageNumbers.format(MAX_Z) + " ([Fe/H] = " + lowEnd + " to " + highEnd + " here)";
        }
        return "convgrid: warning: " + what + ", " + where + "; results there are untested";
    }

    /** A Z the tool derived from an [Fe/H]: four significant digits, enough to place it against the range. */
    private static String derivedZ(double z) {
        return MessageNumbers.format(z, 4);
    }

    /**
     * The [Fe/H] of the tested range's end {@code edgeZ} in the grid of {@code point}: signed, to 0.01 dex, as the
     * charts and the report write [Fe/H] ({@code -2.27}, {@code +0.40}), to 0.001 dex when that would read as one
     * of the [Fe/H] asked ({@code asked}): [Fe/H] = +0.4 gives Z = 0.04016, past the end at +0.398, and "above the
     * tested Z = 0.04 ([Fe/H] = +0.40 here)" read as if +0.4 were inside.
     */
    private static String ironAtEdge(MetallicityPoint point, double edgeZ, List<Double> asked) {
        String edge = String.format(java.util.Locale.ROOT, "%+.2f", point.ironDexAt(edgeZ));
        boolean readsAsAsked = asked.stream()
                .anyMatch(dex -> String.format(java.util.Locale.ROOT, "%+.2f", dex).equals(edge));
        return readsAsAsked ? String.format(java.util.Locale.ROOT, "%+.3f", point.ironDexAt(edgeZ)) : edge;
    }

    private static double min(List<Double> values) {
        return values.stream().mapToDouble(Double::doubleValue).min().orElseThrow();
    }

    private static double max(List<Double> values) {
        return values.stream().mapToDouble(Double::doubleValue).max().orElseThrow();
    }

    /** Prints the warnings on the error stream, each as one line. */
    static void print(List<String> warnings, PrintWriter err) {
        for (String warning : warnings) {
            err.println(warning);
        }
        err.flush();
    }

    private static List<Double> outside(List<Double> values, DoublePredicate tested) {
        return values.stream().filter(v -> !tested.test(v)).toList();
    }

    /**
     * "mass 12 Msun lies", "masses 0.05, 12 Msun lie", or for many "12 masses, 10.5 to 16 Msun, lie"; then where
     * they lie.
     */
    private static String line(List<Double> values, String noun, String nouns, String symbol, String unit,
                               String where) {
        String what;
        if (values.size() == 1) {
            what = noun + " " + symbol + MessageNumbers.format(values.get(0)) + unit + " lies";
        } else if (values.size() <= LISTED_VALUES) {
            what = nouns + " " + symbol + values.stream().map(MessageNumbers::format).collect(Collectors.joining(", "))
                    + unit + " lie";
        } else {
            double lo = values.stream().mapToDouble(Double::doubleValue).min().orElseThrow();
            double hi = values.stream().mapToDouble(Double::doubleValue).max().orElseThrow();
            what = values.size() + " " + nouns + ", " + symbol + MessageNumbers.format(lo) + " to " + MessageNumbers.format(hi)
                    + unit + ", lie";
        }
        return "convgrid: warning: " + what + " " + where + "; results there are untested";
    }
}
