package org.convgrid.grids.yaml;

import java.util.ArrayList;
import java.util.List;
import org.convgrid.grids.GridProblemKind;
import org.convgrid.grids.HeliumLaw;
import org.convgrid.grids.IronToMetals;
import org.convgrid.grids.MetallicityPoint;
import org.convgrid.grids.words.MessageNumbers;
import org.snakeyaml.engine.v2.nodes.MappingNode;
import org.snakeyaml.engine.v2.nodes.Node;

/**
 * The {@code metallicity:} section: {@code z} (a value or a strictly increasing list), or instead {@code fe_h_dex}
 * (spectroscopic [Fe/H], turned into Z for a solar-scaled mixture by {@link IronToMetals}, against
 * {@code solar_z_over_x}, by default 0.0245), and the helium of each, either by the law
 * {@code helium: {primordial, enrichment}} or as an explicit {@code y} list of the same length. Every composition
 * must leave hydrogen: Y + Z &lt; 1.
 */
final class MetallicityReader {

    private static final String IRON = "fe_h_dex";
    private static final String SOLAR_RATIO = "solar_z_over_x";
    private static final List<String> KEYS = List.of("z", IRON, SOLAR_RATIO, "y", "helium");
    private static final Range IRON_RANGE = Range.closed(IronToMetals.MIN_IRON_DEX, IronToMetals.MAX_IRON_DEX);
    private static final Range SOLAR_RATIO_RANGE = Range.closed(IronToMetals.MIN_SOLAR_RATIO,
            IronToMetals.MAX_SOLAR_RATIO);
    private static final List<String> HELIUM_KEYS = List.of("primordial", "enrichment");
    private static final Range Z_RANGE = new Range(0.0, true, MetallicityPoint.MAX_Z, false);
    private static final Range Y_RANGE = new Range(0.0, true, 1.0, false);
    private static final Range ENRICHMENT_RANGE = new Range(0.0, true, Double.POSITIVE_INFINITY, false);

    private MetallicityReader() {
    }

    /** The compositions, or null when the section has problems (they are recorded). */
    static List<MetallicityPoint> read(Node node, NodeReader reader) {
        MappingNode map = reader.mapping(node, "metallicity",
                "; a list of Z goes under z, beside its helium: metallicity: {z: [0.014, 0.02], helium: {primordial: "
                        + "0.2471, enrichment: 1.5}} (or y: [...], one Y per Z)");
        if (map == null) {
            return null;
        }
        MappingFields fields = new MappingFields(map, "metallicity", KEYS, reader);
        boolean byIron = fields.has(IRON);
        String axis = byIron ? IRON : "z";
        List<Double> values = null;
        if (fields.has("z") && byIron) {
            reader.problem(map, GridProblemKind.CONFLICT,
                    "metallicity takes 'z' or 'fe_h_dex' ([Fe/H], turned into Z), not both");
        } else if (byIron) {
            values = AxisValues.increasing(fields.value(IRON), IRON, "fe_h_dex values", IRON_RANGE, reader);
        } else if (fields.has("z")) {
            values = AxisValues.increasingNamed(fields.value("z"), "z", "Z values", Z_RANGE, reader);
        } else {
            reader.problem(map, GridProblemKind.MISSING_KEY,
                    "metallicity needs 'z', the list of initial metal mass fractions (or 'fe_h_dex', [Fe/H] in dex)");
        }
        IronToMetals iron = IronToMetals.GN93;
        if (fields.has(SOLAR_RATIO)) {
            Double ratio = byIron ? ranged(fields.value(SOLAR_RATIO), SOLAR_RATIO, SOLAR_RATIO_RANGE, reader) : null;
            if (!byIron) {
                reader.problem(fields.value(SOLAR_RATIO), GridProblemKind.CONFLICT,
                        "solar_z_over_x is the Sun's Z/X that fe_h_dex is measured against; with z it means nothing");
            }
            iron = ratio == null ? null : new IronToMetals(ratio);
        }
        if (fields.has("y") == fields.has("helium")) {
            reader.problem(map, GridProblemKind.CONFLICT,
                    "metallicity needs exactly one of 'helium' (primordial, enrichment) and 'y' (a list)");
            return null;
        }
        List<Node> axisNodes = values == null ? null : reader.items(fields.value(axis), axis);
        if (fields.has("helium")) {
            HeliumLaw law = helium(fields.value("helium"), reader);
            if (values == null || law == null || iron == null) {
                return null;
            }
            List<Double> zs = byIron ? ironToMetals(values, iron, law, null, axisNodes, reader) : values;
            // only the converted list can hold a null (a Z out of range, recorded)
            return byIron && zs.contains(null) ? null
                    : byLaw(zs, byIron ? values : null, iron, law, axisNodes, reader);
        }
        List<Double> ys = AxisValues.any(fields.value("y"), "y", Y_RANGE, reader);
        if (values == null || ys == null || iron == null) {
            return null;
        }
        if (ys.size() != values.size()) {
            reader.problem(fields.value("y"), GridProblemKind.CONFLICT,
                    "y has " + ys.size() + " values but " + axis + " has " + values.size());
            return null;
        }
        List<Node> yNodes = reader.items(fields.value("y"), "y");
        List<Double> zs = byIron ? ironToMetals(values, iron, null, ys, axisNodes, reader) : values;
        List<MetallicityPoint> points = new ArrayList<>();
        for (int i = 0; i < values.size(); i++) {
            // a Z outside its range is already recorded; every other composition is still checked, all at once
            points.add(zs.get(i) == null ? null : point(zs.get(i), ys.get(i), byIron ? values.get(i) : Double.NaN,
                    iron, null, yNodes.get(i), "y = " + NodeReader.written(yNodes.get(i)), reader));
        }
        if (points.contains(null)) {
            return null;
        }
        // with its own Y each, a higher [Fe/H] can give a lower Z; the axis must still increase in Z, as a z list must
        for (int i = 1; byIron && i < points.size(); i++) {
            if (!(points.get(i).z() > points.get(i - 1).z())) {
                reader.problem(axisNodes.get(i), GridProblemKind.OUT_OF_RANGE, "fe_h_dex = "
                        + MessageNumbers.format(values.get(i)) + " with y = " + MessageNumbers.format(ys.get(i))
                        + " gives Z = " + MessageNumbers.format(points.get(i).z()) + ", not above the Z of the value"
                        + " before it (" + MessageNumbers.format(points.get(i - 1).z()) + "): the compositions must"
                        + " increase in Z");
                return null;
            }
        }
        return points;
    }

    /**
     * The Z of each [Fe/H], with the helium law's Y ({@code law}) or the listed one ({@code ys}, when {@code law} is
     * null); null at an [Fe/H] whose Z leaves Z's range, the problem recorded at its node.
     */
    private static List<Double> ironToMetals(List<Double> irons, IronToMetals iron, HeliumLaw law, List<Double> ys,
                                             List<Node> nodes, NodeReader reader) {
        List<Double> zs = new ArrayList<>();
        // chart file names carry the Z, at four significant digits, whatever the grid gave
        java.util.Map<String, Double> named = new java.util.HashMap<>();
        for (int i = 0; i < irons.size(); i++) {
            double z = law != null ? iron.metals(irons.get(i), law) : iron.metals(irons.get(i), ys.get(i));
            Double earlier = Z_RANGE.contains(z) ? named.putIfAbsent(AxisValues.chartName(z), irons.get(i)) : null;
            if (!Z_RANGE.contains(z)) {
                reader.problem(nodes.get(i), GridProblemKind.OUT_OF_RANGE,
                        "fe_h_dex = " + MessageNumbers.format(irons.get(i)) + " " + iron.zOutsideRange(z));
                zs.add(null);
            } else if (earlier != null) {
                reader.problem(nodes.get(i), GridProblemKind.DUPLICATE, "fe_h_dex = "
                        + MessageNumbers.format(irons.get(i)) + " gives Z = " + MessageNumbers.format(z) + ", which "
                        + "reads as " + AxisValues.chartName(z) + " in chart names, as the Z of fe_h_dex = "
                        + MessageNumbers.format(earlier) + " does (" + AxisValues.CHART_DIGITS + " significant "
                        + "digits): make the values differ more");
                zs.add(null);
            } else {
                zs.add(z);
            }
        }
        return zs;
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

    /**
     * @param irons the [Fe/H] each Z came from, or null when the file gave Z
     * @param iron the Sun they are measured against (the default one when the file gave Z)
     */
    private static List<MetallicityPoint> byLaw(List<Double> zs, List<Double> irons, IronToMetals iron, HeliumLaw law,
                                                List<Node> zNodes, NodeReader reader) {
        List<MetallicityPoint> points = new ArrayList<>();
        for (int i = 0; i < zs.size(); i++) {
            double y = law.helium(zs.get(i));
            String how = "Y = " + MessageNumbers.format(law.primordial()) + " + "
                    + MessageNumbers.format(law.enrichment()) + " * " + MessageNumbers.format(zs.get(i)) + " = "
                    + MessageNumbers.format(y);
            points.add(point(zs.get(i), y, irons == null ? Double.NaN : irons.get(i), iron, law, zNodes.get(i), how,
                    reader));
        }
        return points.contains(null) ? null : points;
    }

    private static MetallicityPoint point(double z, double y, double ironDex, IronToMetals iron, HeliumLaw law, Node at,
                                          String how, NodeReader reader) {
        if (!(y >= 0.0 && y + z < 1.0)) {
            reader.problem(at, GridProblemKind.OUT_OF_RANGE,
                    how + " with Z = " + MessageNumbers.format(z) + " leaves no hydrogen (need Y >= 0 and Y + Z < 1)");
            return null;
        }
        return new MetallicityPoint(z, y, ironDex, iron, law);
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
