package org.convgrid.grids.yaml;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.convgrid.engine.physics.atmosphere.AtmosphereChoice;
import org.convgrid.grids.GridProblemKind;
import org.convgrid.grids.GridProblem;
import org.snakeyaml.engine.v2.api.LoadSettings;
import org.snakeyaml.engine.v2.api.lowlevel.Compose;
import org.snakeyaml.engine.v2.exceptions.MarkedYamlEngineException;
import org.snakeyaml.engine.v2.exceptions.YamlEngineException;
import org.snakeyaml.engine.v2.nodes.MappingNode;
import org.snakeyaml.engine.v2.nodes.Node;

/**
 * A physics preset named by {@code physics: {preset: FILE}} (FILE relative to the grid file's folder), as written
 * by {@link PresetWriter} for {@code convgrid calibrate-sun}. A preset sets the mixing length and, when it names
 * one, the atmosphere the mixing length was calibrated with: its {@code y_init}, {@code z_init} and the rest are a
 * record of the calibration, and the grid's metallicity section still sets every model's Y and Z.
 * Problems inside the preset are reported at the grid file's {@code preset} value, followed by the preset's own
 * file:line:column.
 */
final class PresetReader {

    private static final Range POSITIVE = Range.open(0.0, Double.POSITIVE_INFINITY);

    private PresetReader() {
    }

    /** Largest preset file read, bytes (a preset is a few lines). */
    public static final long MAX_FILE_BYTES = 64L * 1024;

    /** The preset, or null when it has problems (recorded at {@code node}). */
    static PhysicsPreset read(Node node, NodeReader reader) {
        String name = reader.text(node, "preset");
        if (name == null) {
            return null;
        }
        Path file;
        try {
            Path folder = reader.folder();
            file = (folder == null ? Path.of(name) : folder.resolve(name)).normalize();
        } catch (java.nio.file.InvalidPathException e) {
            reader.problem(node, GridProblemKind.UNREADABLE_FILE, "preset: not a valid file name");
            return null;
        }
        FileText loaded = FileText.of(file);
        if (loaded.text() == null) {
            reader.problem(node, GridProblemKind.UNREADABLE_FILE, "preset: " + loaded.problem());
            return null;
        }
        String text = loaded.text();
        NodeReader inner = new NodeReader(file.toString());
        PhysicsPreset preset = parse(text, inner);
        for (GridProblem p : inner.problems()) {
            reader.problem(node, p.kind(), "preset " + p);
        }
        return inner.problems().isEmpty() ? preset : null;
    }

    /**
     * A preset file's text, or why it cannot be read ({@code cannot read FILE: no such file}); the one reading of a
     * preset file that a grid's {@code preset:} and {@code star --preset} share.
     *
     * @param text the file's text, null when it cannot be read
     * @param problem why not, null when it can
     */
    record FileText(String text, String problem) {

        static FileText of(Path file) {
            Optional<String> unreadable = org.convgrid.grids.InputFileCheck.problem(file, MAX_FILE_BYTES);
            if (unreadable.isPresent()) {
                return new FileText(null, "cannot read " + file + ": " + unreadable.get());
            }
            try {
                return new FileText(Files.readString(file), null);
            } catch (IOException e) {
                return new FileText(null, "cannot read " + file
                        + (e instanceof java.nio.charset.CharacterCodingException ? ": it is not UTF-8 text" : ""));
            }
        }
    }

    /** The preset in {@code text}, or null when it has problems (recorded in {@code inner}). */
    static PhysicsPreset parse(String text, NodeReader inner) {
        Optional<Node> root;
        try {
            LoadSettings settings = LoadSettings.builder().setLabel(inner.file()).setMaxAliasesForCollections(0)
                    .build();
            Optional<org.snakeyaml.engine.v2.exceptions.Mark> tooDeep = GridFileReader.tooDeep(settings, text);
            if (tooDeep.isPresent()) {
                inner.problem(tooDeep, GridProblemKind.SYNTAX, "lists and mappings are nested more than "
                        + GridFileReader.MAX_NESTING_DEPTH + " levels deep here");
                return null;
            }
            root = new Compose(settings).composeString(text);
        } catch (MarkedYamlEngineException e) {
            inner.problem(e.getProblemMark().or(e::getContextMark), GridProblemKind.SYNTAX,
                    "YAML syntax: " + e.getProblem());
            return null;
        } catch (YamlEngineException e) {
            inner.problem(Optional.empty(), GridProblemKind.SYNTAX, "YAML syntax: " + e.getMessage());
            return null;
        }
        if (root.isEmpty()) {
            inner.problem(Optional.empty(), GridProblemKind.MISSING_KEY,
                    "the preset is empty; it needs at least 'mixing_length'");
            return null;
        }
        MappingNode map = inner.documentMapping(root.get(), "the preset");
        if (map == null) {
            return null;
        }
        MappingFields fields = new MappingFields(map, "the preset", PresetKeys.ALL, inner);
        for (String key : PresetKeys.RECORD_NUMBERS) {
            if (fields.has(key)) {
                inner.number(fields.value(key), key);
            }
        }
        if (!fields.has(PresetKeys.MIXING_LENGTH)) {
            inner.problem(map, GridProblemKind.MISSING_KEY, "the preset needs '" + PresetKeys.MIXING_LENGTH + "'");
            return null;
        }
        List<Double> alpha = AxisValues.distinct(fields.value(PresetKeys.MIXING_LENGTH), PresetKeys.MIXING_LENGTH,
                POSITIVE, inner);
        if (alpha != null && alpha.size() != 1) {
            inner.problem(fields.value(PresetKeys.MIXING_LENGTH), GridProblemKind.WRONG_TYPE,
                    PresetKeys.MIXING_LENGTH + " in a preset must be one value");
            return null;
        }
        AtmosphereChoice atmosphere = null;
        if (fields.has(PresetKeys.ATMOSPHERE)) {
            atmosphere = PhysicsReader.atmosphere(fields.value(PresetKeys.ATMOSPHERE), inner);
            if (atmosphere == null) {
                return null;
            }
        }
        return alpha == null ? null : new PhysicsPreset(alpha.get(0), atmosphere);
    }
}
