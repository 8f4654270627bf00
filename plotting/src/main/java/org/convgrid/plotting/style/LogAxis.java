package org.convgrid.plotting.style;

import java.awt.Color;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleFunction;
import org.convgrid.plotting.label.SliceLabels;

/**
 * A logarithmic axis labelled at chosen values. XChart labels every tick at 1..9 x 10^n, which collide on a
 * narrow plot, and its label callback does not work on log axes; so XChart's labels are made transparent (they
 * keep their space and tick marks) and an overlay writes our labels at the same height, leaving out any label
 * that would run into the one before it.
 */
public final class LogAxis {

    private static final String[] ROUND_MANTISSAS = {"1", "2", "3", "5"};
    private static final String[] EVERY_MANTISSA = {"1", "2", "3", "4", "5", "6", "7", "8", "9"};
    /**
     * Tenths up to 2, fifths up to 3 (a 1.2-2.4 Msun grid's 2.2 and 2.4 had no label: the next after 2 was 3), then
     * the integers.
     */
    private static final String[] FINE_MANTISSAS = {"1", "1.1", "1.2", "1.3", "1.4", "1.5", "1.6", "1.7", "1.8", "1.9",
        "2", "2.2", "2.4", "2.6", "2.8", "3", "4", "5", "6", "7", "8", "9"};
    /** An axis spanning less than this factor gets the fine labels. */
    private static final double NARROW_RANGE = 3.0;
    /** The largest share of a log axis, at either end, left without a label before finer labels are added there. */
    private static final double BARE_END_SHARE = 0.25;
    /** The most round values {@link #sparseRoundValues} labels an axis with before it keeps the powers of ten only. */
    private static final int MOST_ROUND_LABELS = 9;
    /** Fewer round values than this inside an axis, and every mantissa is offered as a label. */
    private static final int FEWEST_LABELS = 3;
    private static final Color TRANSPARENT = new Color(0, 0, 0, 0);

    private LogAxis() {
    }

    /** Makes the x axis logarithmic over [min, max], labelled at {@code labelled} (values outside are dropped). */
    public static void applyX(StyledChart chart, double min, double max, List<Double> labelled) {
        applyX(chart, min, max, labelled, SliceLabels::number);
    }

    /** As {@link #applyX(StyledChart, double, double, List)}, each label written by {@code label}. */
    public static void applyX(StyledChart chart, double min, double max, List<Double> labelled,
                              DoubleFunction<String> label) {
        chart.getStyler().setXAxisLogarithmic(true);
        chart.getStyler().setXAxisLogarithmicDecadeOnly(false);
        chart.getStyler().setXAxisMin(min).setXAxisMax(max);
        chart.getStyler().setXAxisTickLabelsColor(TRANSPARENT);
        List<Double> inside = labelled.stream().filter(v -> v >= min && v <= max).toList();
        chart.addOverlay((g, c) -> paintLabels(g, c, inside, label));
    }

    /**
     * Makes the x axis linear over [min, max], labelled at {@code labelled} only, the same way: for values that
     * include zero (Z = 0), which no logarithmic axis can show.
     */
    public static void applyLinearX(StyledChart chart, double min, double max, List<Double> labelled) {
        applyLinearX(chart, min, max, labelled, SliceLabels::number);
    }

    /** {@link #applyLinearX(StyledChart, double, double, List)} with each label's text given by {@code label}. */
    public static void applyLinearX(StyledChart chart, double min, double max, List<Double> labelled,
                                    DoubleFunction<String> label) {
        chart.getStyler().setXAxisLogarithmic(false);
        chart.getStyler().setXAxisMin(min).setXAxisMax(max);
        chart.getStyler().setXAxisTickLabelsColor(TRANSPARENT);
        List<Double> inside = labelled.stream().filter(v -> v >= min && v <= max).toList();
        chart.addOverlay((g, c) -> paintLabels(g, c, inside, label));
    }

    /**
     * Makes the y axis logarithmic over [min, max], labelled at {@code labelled} (values outside are dropped) the same
     * way: right-aligned left of the axis, bottom up, a label that would touch the one below it left out.
     */
    public static void applyY(StyledChart chart, double min, double max, List<Double> labelled) {
        applyY(chart, min, max, labelled, SliceLabels::number);
    }

    /** As {@link #applyY(StyledChart, double, double, List)}, each label written by {@code label}. */
    public static void applyY(StyledChart chart, double min, double max, List<Double> labelled,
                              DoubleFunction<String> label) {
        chart.getStyler().setYAxisLogarithmic(true);
        chart.getStyler().setYAxisLogarithmicDecadeOnly(false);
        chart.getStyler().setYAxisMin(min).setYAxisMax(max);
        chart.getStyler().setYAxisTickLabelsColor(TRANSPARENT);
        List<Double> inside = labelled.stream().filter(v -> v >= min && v <= max).sorted().toList();
        chart.addOverlay((g, c) -> paintYLabels(g, c, inside, label));
    }

    /**
     * {@link #roundValues}, or the powers of ten alone when those would be more than {@link #MOST_ROUND_LABELS}: over
     * many decades (an F star's 1e-6 Msun envelope beside a K dwarf's 0.1) 1, 2, 3 and 5 x 10^n crowd.
     */
    public static List<Double> sparseRoundValues(double min, double max) {
        List<Double> round = roundValues(min, max);
        return round.size() <= MOST_ROUND_LABELS ? round : valuesWith(new String[] {"1"}, min, max);
    }

    /**
     * How the labels {@code labelled} of one axis are written so that they stay short and alike: when one of them lies
     * below 0.001, every one below 1 as mantissa and exponent ({@code 5e-6}: 0.000005 is hard to count and ran off the
     * chart beside the axis title; {@code 1e-3} beside it, not 0.001), otherwise as {@link SliceLabels#number}.
     */
    public static DoubleFunction<String> compactLabels(List<Double> labelled) {
        boolean tiny = labelled.stream().anyMatch(v -> v > 0 && v < 1e-3);
        return v -> tiny && v < 1 ? exponentForm(v) : SliceLabels.number(v);
    }

    /** {@code value} as mantissa and exponent, {@code 5e-6}; as {@link SliceLabels#number} when not above zero. */
    public static String exponentForm(double value) {
        if (value <= 0 || !Double.isFinite(value)) {
            return SliceLabels.number(value);
        }
        int exponent = (int) Math.floor(Math.log10(value));
        double mantissa = value / Math.pow(10, exponent);
        if (mantissa >= 9.9995) {
            // 1e-5 computed as 9.9999e-6
            exponent++;
            mantissa /= 10;
        }
        return SliceLabels.number(Math.round(mantissa * 1000) / 1000.0) + "e" + exponent;
    }

    /** The round values 1, 2, 3 and 5 x 10^n in [min, max]. */
    public static List<Double> roundValues(double min, double max) {
        return valuesWith(ROUND_MANTISSAS, min, max);
    }

    /**
     * Labels for an axis over [min, max]: {@link #roundValues}; on a range narrower than a factor
     * {@link #NARROW_RANGE}, also 1.1..1.9 x 10^n and every 1..9 x 10^n, so that a 1.0-1.4 Msun axis is labelled above
     * 1 too; and every 1..9 x 10^n whenever fewer than {@link #FEWEST_LABELS} round values fall inside, with 1.1..1.9 x
     * 10^n as well when even those are fewer (1.05-3.5 Msun, an asteroseismology grid of 1.1-3 Msun, held only 2 and
     * 3). A range of 0.7-1.3 Msun had the one label "1";
     * labels that would touch are left out when painted.
     */
    public static List<Double> labelValues(double min, double max) {
        if (max / min < NARROW_RANGE) {
            return valuesWith(FINE_MANTISSAS, min, max);
        }
        List<Double> round = roundValues(min, max);
        if (round.size() >= FEWEST_LABELS) {
            return withEndsLabelled(round, min, max);
        }
        List<Double> every = valuesWith(EVERY_MANTISSA, min, max);
        return every.size() >= FEWEST_LABELS ? withEndsLabelled(every, min, max)
                : valuesWith(FINE_MANTISSAS, min, max);
    }

    /**
     * {@code ticks} with {@link #FINE_MANTISSAS} values added at an end of the range that holds none of them over more
     * than {@link #BARE_END_SHARE} of the range (in log): a 0.5-1.4 Msun axis was labelled 0.5, 0.6, ..., 0.9, 1 and
     * nothing above 1, a third of its width, where its F stars lie.
     */
    private static List<Double> withEndsLabelled(List<Double> ticks, double min, double max) {
        double range = Math.log10(max / min);
        double first = ticks.get(0);
        double last = ticks.get(ticks.size() - 1);
        List<Double> out = new ArrayList<>(ticks);
        if (Math.log10(max / last) > BARE_END_SHARE * range) {
            valuesWith(FINE_MANTISSAS, min, max).stream().filter(v -> v > last).forEach(out::add);
        }
        if (Math.log10(first / min) > BARE_END_SHARE * range) {
            valuesWith(FINE_MANTISSAS, min, max).stream().filter(v -> v < first).forEach(out::add);
        }
        return out.stream().sorted().toList();
    }

    private static List<Double> valuesWith(String[] mantissas, double min, double max) {
        List<Double> ticks = new ArrayList<>();
        for (int decade = (int) Math.floor(Math.log10(min)); decade <= (int) Math.ceil(Math.log10(max)); decade++) {
            for (String m : mantissas) {
                double value = Double.parseDouble(m + "e" + decade);
                if (value >= min && value <= max) {
                    ticks.add(value);
                }
            }
        }
        return ticks;
    }

    private static void paintYLabels(Graphics2D g, StyledChart chart, List<Double> ticks,
                                     DoubleFunction<String> label) {
        g.setFont(ChartStyle.TICK_FONT);
        g.setColor(ChartStyle.TEXT);
        FontMetrics fm = g.getFontMetrics();
        double right = chart.getScreenXFromChart(chart.getStyler().getXAxisMin())
                - chart.getStyler().getAxisTickMarkLength() - chart.getStyler().getAxisTickPadding();
        double lastTop = Double.POSITIVE_INFINITY;
        for (double tick : ticks) {
            String text = label.apply(tick);
            double y = chart.getScreenYFromChart(tick);
            double baseline = y + fm.getAscent() / 2.0 - 2;
            if (baseline > lastTop - fm.getDescent()) {
                continue;
            }
            g.drawString(text, (float) (right - fm.stringWidth(text)), (float) baseline);
            lastTop = baseline - fm.getAscent();
        }
    }

    private static void paintLabels(Graphics2D g, StyledChart chart, List<Double> ticks,
                                    DoubleFunction<String> label) {
        g.setFont(ChartStyle.TICK_FONT);
        g.setColor(ChartStyle.TEXT);
        FontMetrics fm = g.getFontMetrics();
        double axisY = chart.getScreenYFromChart(chart.getStyler().getYAxisMin());
        float baseline = (float) (axisY + chart.getStyler().getAxisTickMarkLength()
                + chart.getStyler().getAxisTickPadding() + fm.getAscent());
        // left to right, a label that would touch the one before it is left out (dense values at the top of a
        // log range would otherwise run together); every value keeps its tick mark
        double lastRight = Double.NEGATIVE_INFINITY;
        double gap = fm.stringWidth(" ");
        for (double tick : ticks.stream().sorted().toList()) {
            String text = label.apply(tick);
            double x = chart.getScreenXFromChart(tick);
            double left = x - fm.stringWidth(text) / 2.0;
            if (left < lastRight + gap) {
                continue;
            }
            g.drawString(text, (float) left, baseline);
            lastRight = left + fm.stringWidth(text);
        }
    }
}
