package org.convgrid.grids.yaml;

import java.util.ArrayList;
import java.util.List;
import org.convgrid.grids.GridProblemKind;
import org.convgrid.grids.HeliumLaw;
import org.convgrid.grids.MetallicityPoint;
import org.convgrid.grids.words.MessageNumbers;
import org.snakeyaml.engine.v2.nodes.MappingNode;
import org.snakeyaml.engine.v2.nodes.Node;

/**
 * The {@code metallicity:} section: {@code z} (a value or a strictly increasing list) and the helium of each Z,
 * either by the law {@code helium: {primordial, enrichment}} or as an explicit {@code y} list of the same length.
 * Every composition must leave hydrogen: Y + Z &lt; 1.
 */
final class MetallicityReader {

    private static final List<String> KEYS = List.of("z", "y", "helium");
    private static final List<String> HELIUM_KEYS = List.of("primordial", "enrichment");
    private static final Range Z_RANGE = new Range(0.0, true, MetallicityPoint.MAX_Z, false);
    private static final Range Y_RANGE = new Range(0.0, true, 1.0, false);
    private static final Range ENRICHMENT_RANGE = new Range(0.0, true, Double.POSITIVE_INFINITY, false);

    private MetallicityReader() {
    }

    /** The compositions, or null when the section has problems (they are recorded). */
    static List<MetallicityPoint> read(Node node, NodeReader reader) {
        MappingNode map = reader.mapping(node, "metallicity");
        if (map == null) {
            return null;
        }
        MappingFields fields = new MappingFields(map, "metallicity", KEYS, reader);
        List<Double> zs = null;
        if (fields.has("z")) {
            zs = AxisValues.increasing(fields.value("z"), "z", "zs", Z_RANGE, reader);
        } else {
            reader.problem(map, GridProblemKind.MISSING_KEY,
                    "metallicity needs 'z', the list of initial metal mass fractions");
        }
        if (fields.has("y") == fields.has("helium")) {
            reader.problem(map, GridProblemKind.CONFLICT,
                    "metallicity needs exactly one of 'helium' (primordial, enrichment) and 'y' (a list)");
            return null;
        }
        if (fields.has("helium")) {
            HeliumLaw law = helium(fields.value("helium"), reader);
            return zs == null || law == null ? null : byLaw(zs, law, reader.items(fields.value("z"), "z"), reader);
        }
        List<Double> ys = AxisValues.any(fields.value("y"), "y", Y_RANGE, reader);
        if (zs == null || ys == null) {
            return null;
        }
        if (ys.size() != zs.size()) {
            reader.problem(fields.value("y"), GridProblemKind.CONFLICT,
                    "y has " + ys.size() + " values but z has " + zs.size());
            return null;
        }
        List<Node> yNodes = reader.items(fields.value("y"), "y");
        List<MetallicityPoint> points = new ArrayList<>();
        for (int i = 0; i < zs.size(); i++) {
            points.add(point(zs.get(i), ys.get(i), yNodes.get(i), "y = " + NodeReader.written(yNodes.get(i)),
                    reader));
        }
        return points.contains(null) ? null : points;
    }

    private static HeliumLaw helium(Node node, NodeReader reader) {
        MappingNode map = reader.mapping(node, "helium");
        if (map == null) {
            return null;
        }
        MappingFields fields = new MappingFields(map, "helium", HELIUM_KEYS, reader);
        if (!fields.has("primordial") || !fields.has("enrichment")) {
            reader.problem(map, GridProblemKind.MISSING_KEY,
                    "helium needs both 'primordial' and 'enrichment' (Y = primordial + enrichment * Z)");
            return null;
        }
        Double primordial = ranged(fields.value("primordial"), "helium primordial", Y_RANGE, reader);
        Double enrichment = ranged(fields.value("enrichment"), "helium enrichment", ENRICHMENT_RANGE, reader);
        return primordial == null || enrichment == null ? null : new HeliumLaw(primordial, enrichment);
    }

    private static List<MetallicityPoint> byLaw(List<Double> zs, HeliumLaw law, List<Node> zNodes,
                                                NodeReader reader) {
        List<MetallicityPoint> points = new ArrayList<>();
        for (int i = 0; i < zs.size(); i++) {
            double y = law.helium(zs.get(i));
            String how = "Y = " + MessageNumbers.format(law.primordial()) + " + "
                    + MessageNumbers.format(law.enrichment()) + " * " + MessageNumbers.format(zs.get(i)) + " = "
                    + MessageNumbers.format(y);
            points.add(point(zs.get(i), y, zNodes.get(i), how, reader));
        }
        return points.contains(null) ? null : points;
    }

    private static MetallicityPoint point(double z, double y, Node at, String how, NodeReader reader) {
        if (!(y >= 0.0 && y + z < 1.0)) {
            reader.problem(at, GridProblemKind.OUT_OF_RANGE,
                    how + " with Z = " + MessageNumbers.format(z) + " leaves no hydrogen (need Y >= 0 and Y + Z < 1)");
            return null;
        }
        return new MetallicityPoint(z, y);
    }

    private static Double ranged(Node node, String what, Range range, NodeReader reader) {
        Double v = reader.number(node, what);
        if (v != null && !range.contains(v)) {
            reader.problem(node, GridProblemKind.OUT_OF_RANGE, range.refusal(what, "", NodeReader.written(node), v));
            return null;
        }
        return v;
    }
}
