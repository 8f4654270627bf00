package org.convgrid.grids.yaml;

import java.util.ArrayList;
import java.util.List;
import org.convgrid.grids.GridProblemKind;
import org.convgrid.grids.WrittenPrecision;
import org.convgrid.grids.words.MessageNumbers;
import org.snakeyaml.engine.v2.nodes.Node;

/** Lists of numbers (a lone scalar counts as a one-item list), each value checked at its own node. */
final class AxisValues {

    private AxisValues() {
    }

    /**
     * Numbers in range and strictly increasing; null when any has a problem.
     *
     * @param plural {@code what} for several, for "ages from birth in Gyr must increase" (an added "s" gave "Gyrs")
     */
    static List<Double> increasing(Node node, String what, String plural, Range range, NodeReader reader) {
        return numbers(node, what, plural, range, Order.INCREASING, reader, false);
    }

    /**
     * As {@link #increasing}, for an axis whose values name charts and legend entries (Z, ages): two values that
     * read alike at {@link #CHART_DIGITS} significant digits are refused too.
     */
    static List<Double> increasingNamed(Node node, String what, String plural, Range range, NodeReader reader) {
        return numbers(node, what, plural, range, Order.INCREASING, reader, true);
    }

    /** Numbers in range, each different from the others, in the file's order; null when any has a problem. */
    static List<Double> distinct(Node node, String what, Range range, NodeReader reader) {
        return numbers(node, what, what + "s", range, Order.DISTINCT, reader, false);
    }

    /** As {@link #distinct}, for physics values that name charts and legend entries (see {@link #increasingNamed}). */
    static List<Double> distinctNamed(Node node, String what, Range range, NodeReader reader) {
        return numbers(node, what, what + "s", range, Order.DISTINCT, reader, true);
    }

    /** Numbers in range, repeats allowed, in the file's order; null when any has a problem. */
    static List<Double> any(Node node, String what, Range range, NodeReader reader) {
        return numbers(node, what, what + "s", range, Order.ANY, reader, false);
    }

    /**
     * Significant digits of the values in chart file names, titles and legends (the plotting module's labels): two
     * Z or physics values alike at these digits would make charts overwrite each other and the HR diagram fail with
     * the chart library's "series name already used".
     */
    static final int CHART_DIGITS = 4;

    private enum Order { INCREASING, DISTINCT, ANY }

    /**
     * A value as the chart labels write it: {@link #CHART_DIGITS} significant digits, trailing zeros stripped (the
     * plotting module's {@code SliceLabels.number}; keep the two alike).
     */
    static String chartName(double v) {
        return new java.math.BigDecimal(v).round(new java.math.MathContext(CHART_DIGITS)).stripTrailingZeros()
                .toPlainString();
    }

    private static List<Double> numbers(Node node, String what, String plural, Range range, Order order,
                                        NodeReader reader, boolean namesCharts) {
        List<Node> items = reader.items(node, what);
        if (items == null) {
            return null;
        }
        if (items.size() > MassAxisReader.MAX_AXIS_POINTS) {
            reader.problem(node, GridProblemKind.OUT_OF_RANGE, what + " lists " + items.size()
                    + " values, more than the limit of " + MassAxisReader.MAX_AXIS_POINTS + " per axis");
            return null;
        }
        List<Double> values = new ArrayList<>();
        // seen values, as the tables write them, in a hash set: the duplicate check stays linear in the length of
        // the list, and values the catalogue would write alike (0.5 and 0.50000001) count as one
        java.util.Set<Double> seen = new java.util.HashSet<>();
        java.util.Set<String> named = new java.util.HashSet<>();
        boolean ok = true;
        for (Node item : items) {
            Double v = reader.number(item, what);
            if (v == null) {
                ok = false;
            } else if (!range.contains(v)) {
                reader.problem(item, GridProblemKind.OUT_OF_RANGE,
                        range.refusal(what, "", NodeReader.written(item), v));
                ok = false;
            } else if (order != Order.ANY && seen.contains(WrittenPrecision.asWritten(v))) {
                reader.problem(item, GridProblemKind.DUPLICATE, "duplicate " + what + " " + NodeReader.written(item)
                        + (seen.contains(v) ? "" : " (equal to an earlier value to the "
                        + WrittenPrecision.SIGNIFICANT_DIGITS + " significant digits the tables are written with)"));
                ok = false;
            } else if (namesCharts && named.contains(chartName(v))) {
                reader.problem(item, GridProblemKind.DUPLICATE, what + " " + NodeReader.written(item) + " reads as "
                        + chartName(v) + " in chart names and legends, as an earlier value does (they carry "
                        + CHART_DIGITS + " significant digits): make the values differ within their first "
                        + CHART_DIGITS + " digits");
                ok = false;
            } else if (order == Order.INCREASING && !values.isEmpty() && v < values.get(values.size() - 1)) {
                reader.problem(item, GridProblemKind.OUT_OF_RANGE,
                        plural + " must increase: " + MessageNumbers.format(v) + " follows "
                        + MessageNumbers.format(values.get(values.size() - 1)));
                ok = false;
            }
            if (v != null) {
                values.add(v);
                seen.add(v);
                seen.add(WrittenPrecision.asWritten(v));
                named.add(chartName(v));
            }
        }
        return ok ? values : null;
    }
}
