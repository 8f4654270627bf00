package org.convgrid.plotting.label;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.Locale;
import java.util.function.DoubleFunction;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.overshoot.MassRampedStepOvershoot;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.output.CsvNumbers;
import org.convgrid.output.Span;
import org.convgrid.output.transitions.Slice;

/** How charts and the report spell a slice: titles for people, file name stems for the maps directory. */
public final class SliceLabels {

    private static final MathContext FOUR_DIGITS = new MathContext(4);
    /** The solar-mass symbol of chart text. */
    private static final String SOLAR_MASS = "M\u2609";
    /** Longer lists are shown as a range in titles. */
    private static final int LISTED_VALUES = 4;

    private SliceLabels() {
    }

    /** A number with at most four significant digits and no trailing zeros ({@code 0.014}, {@code 4.57}). */
    public static String number(double value) {
        if (!Double.isFinite(value)) {
            return "?";
        }
        return new BigDecimal(value).round(FOUR_DIGITS).stripTrailingZeros().toPlainString();
    }

    /**
     * A transition mass rounded to the accuracy its bracket gives: as many decimals as the first significant digit
     * of the bracket's width (0.3640625 in a bracket 0.0016 wide is {@code 0.364}; in a bracket 0.1 wide,
     * {@code 0.4}). Without a bracket, {@link #number(double)}. Rounded half up from the mass as transitions.csv
     * writes it ({@link CsvNumbers#format}), so a mid-bisection mass such as 0.6375 reads {@code 0.638} here as in
     * the README: rounded from its binary value, half-even, it read 0.637 (and 0.2875 read 0.287).
     */
    public static String massWithin(double massMsun, Span bracket) {
        if (bracket == null || !Double.isFinite(massMsun) || !(bracket.hi() > bracket.lo())) {
            return number(massMsun);
        }
        return rounded(massMsun, decimals(bracket.hi() - bracket.lo()), RoundingMode.HALF_UP);
    }

    /**
     * A transition mass rounded to the accuracy that is stated for it: the tolerance of a refined value (when it is
     * wider than the bracket it reached), else the bracket's width ({@link #massWithin}): 0.3640625 refined to
     * 0.002 is {@code 0.364}.
     */
    public static String massToAccuracy(double massMsun, Span bracket, double toleranceMsun) {
        double width = bracket == null ? Double.NaN : bracket.hi() - bracket.lo();
        if (Double.isFinite(toleranceMsun) && toleranceMsun > 0 && Double.isFinite(massMsun)
                && !(width >= toleranceMsun)) {
            return massWithin(massMsun, new Span(0.0, toleranceMsun));
        }
        return massWithin(massMsun, bracket);
    }

    /**
     * A transition's bracket as the report shows it beside its mass: a grid bracket's ends exactly (grid masses,
     * {@link #number}), a refined one's rounded outward (low end down, high end up) at the decimals its mass is
     * given to ({@link #massToAccuracy}), so the bracket shown always holds the mass shown: 0.328125-0.3296875 refined
     * to 0.002 reads {@code 0.328\u20130.330} beside 0.328, 1.210937-1.2125 {@code 1.210\u20131.213} beside 1.213.
     *
     * @param toleranceMsun the refinement's tolerance; NaN for a bracket read off the grid
     */
    public static String bracketToAccuracy(Span bracket, double toleranceMsun) {
        double width = bracket.hi() - bracket.lo();
        if (!(Double.isFinite(toleranceMsun) && toleranceMsun > 0) || !(width > 0)) {
            return number(bracket.lo()) + "\u2013" + number(bracket.hi());
        }
        // the accuracy massToAccuracy gives the mass: the tolerance, or the bracket's width where wider
        int decimals = decimals(width >= toleranceMsun ? width : toleranceMsun);
        return rounded(bracket.lo(), decimals, RoundingMode.FLOOR) + "\u2013"
                + rounded(bracket.hi(), decimals, RoundingMode.CEILING);
    }

    /** As many decimals as the first significant digit of {@code accuracy} (a mass's bracket width or tolerance). */
    private static int decimals(double accuracy) {
        return (int) Math.max(0, Math.min(6, Math.ceil(-Math.log10(accuracy) - 1e-9)));
    }

    /** A mass rounded at {@code decimals} from the text transitions.csv writes for it (not from its binary value). */
    private static String rounded(double massMsun, int decimals, RoundingMode mode) {
        return new BigDecimal(CsvNumbers.format(massMsun)).setScale(decimals, mode).toPlainString();
    }

    /**
     * A range of transition masses, each end rounded to the stated tolerance ({@link #massToAccuracy}), joined by an
     * en dash: {@code 0.316\u20130.736}; one mass, {@code 0.287}, when both ends come out alike (a window of small
     * cores found at a single refinement mass must not read as a range).
     */
    public static String massRange(Span masses, double toleranceMsun) {
        String lo = massToAccuracy(masses.lo(), null, toleranceMsun);
        String hi = massToAccuracy(masses.hi(), null, toleranceMsun);
        return lo.equals(hi) ? lo : lo + "\u2013" + hi;
    }

    /**
     * An age for people: {@code ZAMS} for zero, {@code 150 Myr} below 1 Gyr (young clusters and star-forming
     * regions are spoken of in Myr), else {@code 4.57 Gyr}.
     */
    public static String age(double ageGyr) {
        if (ageGyr == 0.0) {
            return "ZAMS";
        }
        return ageGyr > 0.0 && ageGyr < 1.0 ? number(ageGyr * 1000.0) + " Myr" : number(ageGyr) + " Gyr";
    }

    /**
     * A main-sequence fraction for a title, where an age would stand: {@code main-sequence fraction 0.25} (an
     * {@code ms_fraction} grid's models of one fraction are each at their own age).
     */
    public static String msFraction(double fraction) {
        return "main-sequence fraction " + number(fraction);
    }

    /** The physics options in words: {@code α = 1.8, Schwarzschild, no overshoot}. */
    public static String physics(double mixingLength, double overshootHp, OvershootScheme overshootProfile,
                                 StabilityCriterion criterion, double opacityFactor) {
        StringBuilder b = new StringBuilder("\u03b1 = ").append(number(mixingLength));
        b.append(", ").append(criterion == null ? "criterion ?" : criterionName(criterion));
        b.append(", ").append(overshoot(overshootHp, overshootProfile));
        if (Double.isFinite(opacityFactor) && opacityFactor != 1.0) {
            b.append(", \u03ba \u00d7 ").append(number(opacityFactor));
        }
        return b.toString();
    }

    /**
     * The overshoot in words, saying what the length means under its profile (a bare "overshoot 0.2 Hp" would
     * mislead for both others): {@code overshoot 0.2 Hp}, {@code overshoot 0.2 Hp from 2 M☉, none up to 1.2 M☉
     * (uniform-ramped)}, {@code overshoot f = 0.016 (decaying)}; {@code no overshoot} for a zero length under any
     * profile. An unknown profile (a table written before it was recorded) reads as the length in Hp.
     */
    public static String overshoot(double overshootHp, OvershootScheme overshootProfile) {
        return overshoot(overshootHp, overshootProfile, SliceLabels::number, SOLAR_MASS);
    }

    /**
     * {@link #overshoot(double, OvershootScheme)} with the numbers written by {@code number} and the solar mass
     * spelled {@code solarMass}: the one wording, for the charts and for the terminal ({@code check}, {@code star},
     * which write "Msun").
     */
    public static String overshoot(double overshootHp, OvershootScheme overshootProfile,
                                   DoubleFunction<String> number, String solarMass) {
        if (overshootHp == 0.0) {
            return "no overshoot";
        }
        String length = number.apply(overshootHp);
        if (overshootProfile == null) {
            return "overshoot " + length + " Hp";
        }
        return switch (overshootProfile) {
            case STEP -> "overshoot " + length + " Hp";
            case MASS_RAMPED_STEP -> "overshoot " + length + " Hp from "
                    + number.apply(MassRampedStepOvershoot.RAMP_FULL_MSUN) + " " + solarMass + ", none up to "
                    + number.apply(MassRampedStepOvershoot.RAMP_START_MSUN) + " " + solarMass + " ("
                    + overshootProfile.label() + ")";
            case EXPONENTIAL -> "overshoot f = " + length + " (" + overshootProfile.label() + ")";
        };
    }

    /** The physics of a slice in words. */
    public static String physics(Slice s) {
        return physics(s.mixingLength(), s.overshootHp(), s.overshootProfile(), s.criterion(), s.opacityScale());
    }

    /** A whole slice in words: {@code Z = 0.014, ZAMS, α = 1.8, Schwarzschild, no overshoot}. */
    public static String describe(Slice s) {
        return "Z = " + number(s.zInit()) + ", " + age(s.ageGyr()) + ", " + physics(s);
    }

    /** A list of values for a title: all of them when few, else the range and the count. */
    public static String values(java.util.List<Double> values) {
        if (values.isEmpty()) {
            return "none";
        }
        if (values.size() <= LISTED_VALUES) {
            return values.stream().map(SliceLabels::number).collect(java.util.stream.Collectors.joining(", "));
        }
        return number(values.get(0)) + " to " + number(values.get(values.size() - 1)) + " (" + values.size()
                + " values)";
    }

    /**
     * Ages for a title, e.g. {@code ages ZAMS, 1, 4.57 Gyr}, or each with its own unit when some lie below 1 Gyr
     * ({@code ages 20 Myr, 150 Myr, 1 Gyr}; see {@link #age}); the range and the count when there are many
     * ({@code ages 1 Myr to 2 Gyr (12 values)}).
     */
    public static String ages(java.util.List<Double> ages) {
        if (ages.size() == 1) {
            return age(ages.get(0));
        }
        if (ages.stream().allMatch(a -> a == 0.0 || a >= 1.0)) {
            return "ages " + values(ages) + " Gyr";
        }
        if (ages.size() > LISTED_VALUES) {
            return "ages " + age(ages.get(0)) + " to " + age(ages.get(ages.size() - 1)) + " (" + ages.size()
                    + " values)";
        }
        return "ages " + ages.stream().map(SliceLabels::age).collect(java.util.stream.Collectors.joining(", "));
    }

    /**
     * A file name stem for a slice, e.g. {@code z0.014_age4.57gyr_a1.8_ov0_schwarzschild} or
     * {@code z0.02_age20myr_a1.8_ov0_schwarzschild}; ASCII only. The age carries its unit, as the titles do
     * ({@link #ageStem}).
     */
    public static String fileStem(Slice s) {
        return "z" + number(s.zInit()) + "_" + ageStem(s.ageGyr()) + "_" + physicsStem(s.mixingLength(),
                s.overshootHp(), s.overshootProfile(), s.criterion(), s.opacityScale());
    }

    /**
     * The age part of a file name, with its unit as {@link #age} words it for people: {@code age20myr} below 1 Gyr,
     * {@code age4.57gyr} from 1 Gyr, {@code zams} for the zero-age model. Files named before the unit was added
     * ({@code age0.02}, read as Gyr) are {@link #unitlessFileStem}.
     */
    public static String ageStem(double ageGyr) {
        if (ageGyr == 0.0) {
            return "zams";
        }
        return ageGyr > 0.0 && ageGyr < 1.0 ? "age" + number(ageGyr * 1000.0) + "myr" : "age" + number(ageGyr) + "gyr";
    }

    /**
     * The stem a slice's files had before ages carried their unit ({@code z0.02_age0.02_a1.8_ov0_schwarzschild}, the
     * age in Gyr without saying so): what a redraw removes, so that an earlier run's charts are not left beside their
     * renamed successors.
     */
    public static String unitlessFileStem(Slice s) {
        return "z" + number(s.zInit()) + "_age" + number(s.ageGyr()) + "_" + physicsStem(s.mixingLength(),
                s.overshootHp(), s.overshootProfile(), s.criterion(), s.opacityScale());
    }

    /**
     * A file name stem for the models of one Z, physics and main-sequence fraction (an {@code ms_fraction} grid's
     * map, each star at its own age), e.g. {@code z0.02_msf0.25_a1.8_ov0_schwarzschild}: the age part of
     * {@link #fileStem(Slice)} becomes {@code msf} and the fraction, so the two kinds never share a name.
     */
    public static String fractionFileStem(double zInit, double msFraction, PhysicsKey physics) {
        return "z" + number(zInit) + "_msf" + number(msFraction) + "_" + physics.fileStem();
    }

    /**
     * A file name stem for a physics combination, e.g. {@code a1.8_ov0_schwarzschild}; the overshoot part names a
     * profile other than the uniform one after the length ({@code ov0.2-uniform-ramped}, {@code ov0.016-decaying}),
     * so that files of such a run do not read as uniform ones.
     */
    public static String physicsStem(double mixingLength, double overshootHp, OvershootScheme overshootProfile,
                                     StabilityCriterion criterion, double opacityFactor) {
        boolean named = overshootHp != 0.0 && overshootProfile != null && overshootProfile != OvershootScheme.STEP;
        String stem = "a" + number(mixingLength) + "_ov" + number(overshootHp)
                + (named ? "-" + overshootProfile.label() : "") + "_"
                + (criterion == null ? "unknown" : criterion.name().toLowerCase(Locale.ROOT));
        return Double.isFinite(opacityFactor) && opacityFactor != 1.0 ? stem + "_kappa" + number(opacityFactor) : stem;
    }

    private static String criterionName(StabilityCriterion c) {
        return switch (c) {
            case SCHWARZSCHILD -> "Schwarzschild";
            case LEDOUX -> "Ledoux";
        };
    }
}
