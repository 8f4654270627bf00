package org.convgrid.grids.yaml;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.convgrid.grids.GridProblemKind;
import org.snakeyaml.engine.v2.nodes.MappingNode;
import org.snakeyaml.engine.v2.nodes.Node;
import org.snakeyaml.engine.v2.nodes.NodeTuple;
import org.snakeyaml.engine.v2.nodes.ScalarNode;

/**
 * The entries of one YAML mapping, checked against the keys allowed there: unknown, duplicate and non-text keys are
 * reported; the first occurrence of a duplicated key is the one kept.
 */
final class MappingFields {

    /**
     * Keys earlier versions accepted, with what replaces them: a grid file that still uses one is an error that
     * names the replacement (the README's "Grid file" section lists the current keys).
     */
    static final Map<String, String> RENAMED = Map.of(
            "opacity_factor", "opacity_scale",
            "overshoot_scheme", "overshoot: {profile: uniform|uniform-ramped|decaying, length_hp: L}");

    private final Map<String, NodeTuple> entries = new LinkedHashMap<>();

    MappingFields(MappingNode map, String section, List<String> allowed, NodeReader reader) {
        for (NodeTuple tuple : map.getValue()) {
            Node keyNode = tuple.getKeyNode();
            if (!(keyNode instanceof ScalarNode scalar)) {
                reader.problem(keyNode, GridProblemKind.UNKNOWN_KEY, "keys in " + section + " must be plain names");
                continue;
            }
            String key = scalar.getValue();
            if (!allowed.contains(key) && RENAMED.containsKey(key)) {
                reader.problem(keyNode, GridProblemKind.RENAMED_KEY,
                        "'" + key + "' in " + section + " was renamed: write " + RENAMED.get(key));
            } else if (!allowed.contains(key)) {
                reader.problem(keyNode, GridProblemKind.UNKNOWN_KEY,
                        "unknown key '" + key + "' in " + section + "; allowed: "
                        + String.join(", ", allowed));
            } else if (entries.containsKey(key)) {
                int firstLine = entries.get(key).getKeyNode().getStartMark().map(m -> m.getLine() + 1).orElse(0);
                reader.problem(keyNode, GridProblemKind.DUPLICATE,
                        "duplicate key '" + key + "' in " + section + " (first given on line "
                        + firstLine + ")");
            } else {
                entries.put(key, tuple);
            }
        }
    }

    boolean has(String key) {
        return entries.containsKey(key);
    }

    /** The value node, or null when the key is absent. */
    Node value(String key) {
        NodeTuple tuple = entries.get(key);
        return tuple == null ? null : tuple.getValueNode();
    }

    /** The key node (for problems about the key itself), or null when absent. */
    Node key(String key) {
        NodeTuple tuple = entries.get(key);
        return tuple == null ? null : tuple.getKeyNode();
    }
}
