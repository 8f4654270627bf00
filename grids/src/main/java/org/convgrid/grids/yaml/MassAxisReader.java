package org.convgrid.grids.yaml;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import org.convgrid.grids.GridProblemKind;
import org.snakeyaml.engine.v2.nodes.MappingNode;
import org.snakeyaml.engine.v2.nodes.Node;

/**
 * The {@code mass:} section, solar masses. Three forms: {@code from/to/step} (from, from + step, ... up to and
 * including {@code to} when a whole number of steps reaches it; exact decimal arithmetic), {@code from/to/count}
 * with {@code spacing: linear|log} (default linear; both ends included), or {@code values: [...]} (strictly
 * increasing).
 */
final class MassAxisReader {

    /** Upper mass limit, solar masses: about the most massive stars known (common practice, no single source). */
    static final double MAX_MASS_MSUN = 300.0;
    /** Most points one axis may have; larger is almost certainly a typo in step or count. */
    static final int MAX_AXIS_POINTS = 100_000;

    private static final Range MASS_RANGE = Range.aboveZero(MAX_MASS_MSUN);

    private static final List<String> KEYS = List.of("from", "to", "step", "count", "spacing", "values");

    private MassAxisReader() {
    }

    /** The mass values, or null when the section has problems (they are recorded). */
    static List<Double> read(Node node, NodeReader reader) {
        MappingNode map = reader.mapping(node, "mass",
                "; a list of masses goes under values: mass: {values: [0.3, 0.5, 1.0]}");
        if (map == null) {
            return null;
        }
        MappingFields fields = new MappingFields(map, "mass", KEYS, reader);
        if (fields.has("values")) {
            for (String other : List.of("from", "to", "step", "count", "spacing")) {
                if (fields.has(other)) {
                    reader.problem(fields.key(other), GridProblemKind.CONFLICT,
                            "mass: 'values' cannot be combined with '" + other + "'");
                }
            }
            return AxisValues.increasing(fields.value("values"), "mass value", "mass values", MASS_RANGE,
                    reader);
        }
        if (!fields.has("from") || !fields.has("to")) {
            reader.problem(map, GridProblemKind.MISSING_KEY,
                    "mass needs 'from' and 'to' with 'step' or 'count', or a list of 'values'");
            return null;
        }
        BigDecimal from = massEnd(fields.value("from"), "mass from", reader);
        BigDecimal to = massEnd(fields.value("to"), "mass to", reader);
        if (from != null && to != null && from.compareTo(to) > 0) {
            reader.problem(fields.value("from"), GridProblemKind.OUT_OF_RANGE,
                    "mass from (" + NodeReader.written(fields.value("from")) + ") is larger than to ("
                    + NodeReader.written(fields.value("to")) + ")");
            from = null;
        }
        if (fields.has("step") == fields.has("count")) {
            reader.problem(map, GridProblemKind.CONFLICT, "mass needs exactly one of 'step' and 'count'");
            return null;
        }
        if (fields.has("step")) {
            if (fields.has("spacing")) {
                reader.problem(fields.key("spacing"), GridProblemKind.CONFLICT,
                        "mass: 'spacing' goes with 'count', not with 'step'");
            }
            return stepped(from, to, fields.value("step"), reader);
        }
        return counted(from, to, fields, reader);
    }

    private static BigDecimal massEnd(Node node, String what, NodeReader reader) {
        BigDecimal value = reader.decimal(node, what);
        if (value != null && !MASS_RANGE.contains(value.doubleValue())) {
            reader.problem(node, GridProblemKind.OUT_OF_RANGE,
                    MASS_RANGE.refusal(what, " solar masses", NodeReader.written(node), value.doubleValue()));
            return null;
        }
        return value;
    }

    private static List<Double> stepped(BigDecimal from, BigDecimal to, Node stepNode, NodeReader reader) {
        BigDecimal step = reader.decimal(stepNode, "mass step");
        if (step != null && step.signum() <= 0) {
            reader.problem(stepNode, GridProblemKind.OUT_OF_RANGE,
                    "mass step must be above 0 solar masses (got " + NodeReader.written(stepNode) + ")");
            return null;
        }
        if (from == null || to == null || step == null) {
            return null;
        }
        BigDecimal steps = to.subtract(from).divide(step, 0, RoundingMode.FLOOR);
        if (steps.compareTo(BigDecimal.valueOf(MAX_AXIS_POINTS - 1)) >= 0) {
            reader.problem(stepNode, GridProblemKind.OUT_OF_RANGE,
                    "mass step " + NodeReader.written(stepNode) + " gives more than " + MAX_AXIS_POINTS + " masses");
            return null;
        }
        List<Double> values = new ArrayList<>();
        for (int i = 0; i <= steps.intValue(); i++) {
            values.add(from.add(step.multiply(BigDecimal.valueOf(i))).doubleValue());
        }
        return values;
    }

    private static List<Double> counted(BigDecimal from, BigDecimal to, MappingFields fields, NodeReader reader) {
        Node countNode = fields.value("count");
        Integer count = reader.integer(countNode, "mass count");
        if (count != null && (count < 1 || count > MAX_AXIS_POINTS)) {
            reader.problem(countNode, GridProblemKind.OUT_OF_RANGE,
                    "mass count must be from 1 to " + MAX_AXIS_POINTS + " (got " + NodeReader.written(countNode) + ")");
            count = null;
        }
        boolean log = false;
        if (fields.has("spacing")) {
            String spacing = reader.text(fields.value("spacing"), "mass spacing");
            if (spacing != null && !spacing.equals("linear") && !spacing.equals("log")) {
                reader.problem(fields.value("spacing"), GridProblemKind.UNKNOWN_CHOICE,
                        "mass spacing must be linear or log, got '" + spacing + "'");
            }
            log = "log".equals(spacing);
        }
        if (from == null || to == null || count == null) {
            return null;
        }
        if (count == 1 && from.compareTo(to) != 0) {
            reader.problem(countNode, GridProblemKind.MISSING_KEY,
                    "mass count 1 needs from = to, got " + NodeReader.written(fields.value("from")) + " and "
                    + NodeReader.written(fields.value("to")));
            return null;
        }
        double lo = from.doubleValue();
        double hi = to.doubleValue();
        List<Double> values = new ArrayList<>(count);
        for (int i = 0; i < count; i++) {
            double t = count == 1 ? 0.0 : (double) i / (count - 1);
            values.add(log ? lo * Math.pow(hi / lo, t) : lo + (hi - lo) * t);
        }
        values.set(count - 1, hi); // both ends exactly as written
        if (values.size() > 1 && !(values.get(1) > values.get(0))) {
            reader.problem(countNode, GridProblemKind.OUT_OF_RANGE,
                    "mass count " + count + " with from = to repeats the same mass");
            return null;
        }
        return values;
    }
}
