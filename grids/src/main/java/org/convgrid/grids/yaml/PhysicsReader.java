package org.convgrid.grids.yaml;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.request.OpacityChoice;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.engine.physics.atmosphere.AtmosphereChoice;
import org.convgrid.engine.physics.opacity.OpacityTableReader;
import org.convgrid.grids.GridProblemKind;
import org.convgrid.grids.PhysicsAxes;
import org.snakeyaml.engine.v2.nodes.MappingNode;
import org.snakeyaml.engine.v2.nodes.Node;

/**
 * The {@code physics:} section. Each option is a value or a list of distinct values (a physics axis); an option
 * left out takes the engine default ({@link PhysicsOptions#DEFAULT}). {@code preset: FILE} takes the mixing
 * length from a physics preset ({@link PresetReader}; only the mixing length, not Y or Z) and excludes
 * {@code mixing_length}. {@code overshoot} is either a length in pressure scale heights (or a list of them) for
 * the uniform profile, or a mapping {@code {profile: uniform|decaying|uniform-ramped, length_hp: L}}: uniform
 * mixes to L H_P beyond each boundary, decaying lets the mixing fade with e-folding length L H_P / 2,
 * uniform-ramped mixes like uniform with L ramped with the star's mass from none at 1.2 Msun to L from 2 Msun
 * (README, "Grid file").
 */
final class PhysicsReader {

    private static final List<String> KEYS = List.of("mixing_length", "overshoot", "criterion", "opacity_scale",
            "opacity_table", "atmosphere", "preset");
    private static final List<String> OVERSHOOT_KEYS = List.of("profile", "length_hp");
    private static final Range POSITIVE = Range.open(0.0, Double.POSITIVE_INFINITY);
    private static final Range NON_NEGATIVE = new Range(0.0, true, Double.POSITIVE_INFINITY, false);

    private PhysicsReader() {
    }

    /** The physics axes, or null when the section has problems (they are recorded). */
    static PhysicsAxes read(Node node, NodeReader reader) {
        if (node == null) {
            return PhysicsAxes.DEFAULT;
        }
        MappingNode map = reader.mapping(node, "physics");
        if (map == null) {
            return null;
        }
        MappingFields fields = new MappingFields(map, "physics", KEYS, reader);
        PhysicsOptions d = PhysicsOptions.DEFAULT;
        List<Double> alphas = fields.has("mixing_length")
                ? AxisValues.distinctNamed(fields.value("mixing_length"), "mixing_length", POSITIVE, reader)
                : List.of(d.mixingLength());
        PhysicsPreset preset = null;
        if (fields.has("preset")) {
            preset = PresetReader.read(fields.value("preset"), reader);
            if (fields.has("mixing_length")) {
                reader.problem(fields.key("preset"), GridProblemKind.CONFLICT,
                        "give either preset or mixing_length, not both "
                        + "(a preset sets the mixing length)");
                alphas = null;
            } else {
                alphas = preset == null ? null : List.of(preset.mixingLength());
            }
        }
        Node overshoot = fields.value("overshoot");
        OvershootScheme scheme = OvershootScheme.STEP;
        // messages name the key the user wrote: the plain number is 'overshoot', the mapping's is its 'length_hp'
        String overshootKey = "overshoot";
        if (overshoot instanceof MappingNode overshootMap) {
            overshootKey = "overshoot length_hp";
            MappingFields profile = new MappingFields(overshootMap, "overshoot", OVERSHOOT_KEYS, reader);
            scheme = profile.has("profile") ? overshootProfile(profile.value("profile"), reader)
                    : OvershootScheme.STEP;
            overshoot = profile.value("length_hp");
            if (overshoot == null) {
                reader.problem(overshootMap, GridProblemKind.MISSING_KEY, "overshoot needs length_hp "
                        + "(pressure scale heights)");
                scheme = null;
            }
        }
        List<Double> overshoots = overshoot != null
                ? AxisValues.distinctNamed(overshoot, overshootKey, NON_NEGATIVE, reader)
                : fields.has("overshoot") ? null : List.of(d.overshoot());
        List<StabilityCriterion> criteria = fields.has("criterion")
                ? criteria(fields.value("criterion"), reader)
                : List.of(d.criterion());
        List<Double> factors = fields.has("opacity_scale")
                ? AxisValues.distinctNamed(fields.value("opacity_scale"), "opacity_scale", POSITIVE, reader)
                : List.of(d.opacityScale());
        OpacityChoice table = fields.has("opacity_table") ? opacityTable(fields.value("opacity_table"), reader)
                : OpacityChoice.BUILT_IN;
        AtmosphereChoice atmosphere = fields.has("atmosphere") ? atmosphere(fields.value("atmosphere"), reader)
                : AtmosphereChoice.DEFAULT;
        if (preset != null && preset.atmosphere() != null) {
            // a calibrated mixing length belongs to the atmosphere it was calibrated with
            if (fields.has("atmosphere") && atmosphere != null && atmosphere != preset.atmosphere()) {
                reader.problem(fields.value("atmosphere"), GridProblemKind.CONFLICT,
                        "the preset's mixing length was calibrated with atmosphere "
                        + preset.atmosphere().label() + ", this grid asks for " + atmosphere.label()
                        + ": drop 'atmosphere' or calibrate again with --atmosphere " + atmosphere.label());
                atmosphere = null;
            } else if (!fields.has("atmosphere")) {
                atmosphere = preset.atmosphere();
            }
        }
        if (alphas == null || overshoots == null || criteria == null || factors == null || table == null
                || atmosphere == null || scheme == null) {
            return null;
        }
        return new PhysicsAxes(alphas, overshoots, criteria, factors, table, atmosphere, scheme);
    }

    /** The overshoot profile: uniform (default), decaying or uniform-ramped, one value. */
    private static OvershootScheme overshootProfile(Node node, NodeReader reader) {
        String text = reader.text(node, "overshoot profile");
        if (text == null) {
            return null;
        }
        OvershootScheme scheme = OvershootScheme.fromLabel(text);
        if (scheme == null) {
            reader.problem(node, GridProblemKind.UNKNOWN_CHOICE,
                    "overshoot profile must be " + OvershootScheme.labels() + ", got '" + NodeReader.quoted(text)
                            + "'");
        }
        return scheme;
    }

    /** The grey T(tau) relation: eddington or krishna_swamy (default). */
    static AtmosphereChoice atmosphere(Node node, NodeReader reader) {
        String text = reader.text(node, "atmosphere");
        if (text == null) {
            return null;
        }
        AtmosphereChoice choice = AtmosphereChoice.fromLabel(text);
        if (choice == null) {
            reader.problem(node, GridProblemKind.UNKNOWN_CHOICE,
                    "atmosphere must be eddington or krishna_swamy, got '" + NodeReader.quoted(text) + "'");
        }
        return choice;
    }

    /**
     * A user opacity table, resolved against the grid file's folder and read once here so that a bad table is
     * reported with the grid file's line and column, before anything runs; the table read is the one the run uses.
     */
    private static OpacityChoice opacityTable(Node node, NodeReader reader) {
        String text = reader.text(node, "opacity_table");
        if (text == null) {
            return null;
        }
        Path table;
        try {
            Path folder = reader.folder();
            table = folder == null ? Path.of(text) : folder.resolve(text);
        } catch (java.nio.file.InvalidPathException e) {
            reader.problem(node, GridProblemKind.UNREADABLE_FILE, "opacity_table: not a valid file name");
            return null;
        }
        try {
            return OpacityChoice.table(table.normalize().toString(), OpacityTableReader.read(table));
        } catch (ConvgridException e) {
            reader.problem(node, GridProblemKind.UNREADABLE_FILE, "opacity_table: " + e.getMessage());
            return null;
        }
    }

    private static List<StabilityCriterion> criteria(Node node, NodeReader reader) {
        List<Node> items = reader.items(node, "criterion");
        if (items == null) {
            return null;
        }
        List<StabilityCriterion> criteria = new ArrayList<>();
        boolean ok = true;
        for (Node item : items) {
            String text = reader.text(item, "criterion");
            StabilityCriterion criterion = text == null ? null : switch (text) {
                case "schwarzschild" -> StabilityCriterion.SCHWARZSCHILD;
                case "ledoux" -> StabilityCriterion.LEDOUX;
                default -> null;
            };
            if (text != null && criterion == null) {
                reader.problem(item, GridProblemKind.UNKNOWN_CHOICE,
                        "criterion must be schwarzschild or ledoux, got '" + NodeReader.quoted(text) + "'");
            } else if (criterion != null && criteria.contains(criterion)) {
                reader.problem(item, GridProblemKind.DUPLICATE,
                        "duplicate criterion " + criterion.name().toLowerCase(Locale.ROOT));
                criterion = null;
            }
            ok &= criterion != null;
            if (criterion != null) {
                criteria.add(criterion);
            }
        }
        return ok ? criteria : null;
    }
}
