package org.convgrid.output.manifest;

import java.nio.file.Path;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.convgrid.engine.request.AgeOrigin;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.physics.opacity.OpacityTableReader;
import org.convgrid.engine.request.OpacityChoice;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.engine.physics.atmosphere.AtmosphereChoice;
import org.convgrid.output.IronAbundance;
import org.convgrid.output.OutputFormatException;
import org.snakeyaml.engine.v2.api.Load;
import org.snakeyaml.engine.v2.api.LoadSettings;
import org.snakeyaml.engine.v2.exceptions.YamlEngineException;

/** Reads a manifest written by {@link RunManifestWriter} (for resume and merge checks). */
public final class RunManifestReader {

    /**
     * Longest manifest read, in code points. The manifest quotes the whole grid file (at most 1 MiB, escaped at worst
     * six characters per character), so this is far above anything convgrid writes, while the YAML library's own
     * default (3 MB) is not.
     */
    public static final int MAX_CODE_POINTS = 64 * 1024 * 1024;


    /** The mapping that says how the run's compositions were given and the Sun their [Fe/H] is measured against. */
    static final String METALLICITY = "metallicity";
    /**
     * Under {@link #METALLICITY}: the grid-file key that gave the compositions, {@link #AXIS_Z} or {@link #AXIS_FE_H}.
     */
    static final String METALLICITY_AXIS = "axis";
    static final String AXIS_Z = "z";
    static final String AXIS_FE_H = "fe_h_dex";
    /** Under {@link #METALLICITY}: the solar Z/X that [Fe/H] = 0 stands for. */
    static final String SOLAR_Z_OVER_X = "solar_z_over_x";

    /** The commit recorded for manifests written before convgrid recorded it. */
    static final String UNKNOWN_COMMIT = "unknown";

    private RunManifestReader() {
    }

    /**
     * Parses manifest YAML.
     *
     * @throws OutputFormatException when the text is not a manifest
     */
    public static RunManifest read(String yaml) {
        try {
            Object loaded = new Load(LoadSettings.builder().setCodePointLimit(MAX_CODE_POINTS).build())
                    .loadFromString(yaml);
            if (loaded == null) {
                throw new OutputFormatException("the manifest is empty (the file was cut short or emptied)");
            }
            Map<?, ?> root = map(loaded, "manifest");
            Map<?, ?> grid = map(root.get("grid"), "grid");
            List<PhysicsOptions> physics = new ArrayList<>();
            for (Object item : list(root, "physics")) {
                Map<?, ?> p = map(item, "physics");
                // manifests written before atmosphere, overshoot_profile and opacity_table were recorded come from
                // versions whose defaults were the Eddington relation, step overshoot and the built-in opacity
                AtmosphereChoice atmosphere = p.containsKey("atmosphere")
                        ? AtmosphereChoice.fromLabel((String) p.get("atmosphere")) : AtmosphereChoice.EDDINGTON;
                OvershootScheme scheme = p.containsKey("overshoot_profile")
                        ? OvershootScheme.fromLabel((String) p.get("overshoot_profile")) : OvershootScheme.STEP;
                if (atmosphere == null || scheme == null) {
                    throw new IllegalArgumentException("unknown atmosphere or overshoot_profile in " + p);
                }
                OpacityChoice table = p.containsKey("opacity_table")
                        ? tableAt((String) p.get("opacity_table")) : OpacityChoice.BUILT_IN;
                physics.add(new PhysicsOptions(number(p, "mixing_length"), number(p, "overshoot"),
                        StabilityCriterion.valueOf(((String) required(p, "criterion", "physics")).toUpperCase(Locale.ROOT)),
                        number(p, "opacity_scale"), table, atmosphere, scheme));
            }
            Map<?, ?> models = map(root.get("models"), "models");
            Map<ModelStatus, Long> counts = new EnumMap<>(ModelStatus.class);
            for (ModelStatus status : ModelStatus.values()) {
                counts.put(status, ((Number) required(models, status.label(), "models")).longValue());
            }
            Object finished = root.get("finished");
            // manifests written before the commit was recorded do not know it
            Object commit = root.containsKey("tool_commit") ? root.get("tool_commit") : UNKNOWN_COMMIT;
            // runs written before ages could count from birth counted them from the zero-age main sequence
            AgeOrigin origin = root.containsKey("age_origin")
                    ? AgeOrigin.ofLabel((String) root.get("age_origin")) : AgeOrigin.ZAMS;
            if (origin == null) {
                throw new IllegalArgumentException("age_origin must be birth or zams, got " + root.get("age_origin"));
            }
            return new RunManifest((String) required(root, "tool_version", null), (String) commit,
                    (String) required(grid, "file", "grid"), (String) required(grid, "text", "grid"),
                    (String) required(grid, "sha256", "grid"), (String) required(grid, "models_sha256", "grid"),
                    physics, Instant.parse((String) required(root, "started", null)),
                    finished == null ? null : Instant.parse((String) finished),
                    ((Number) required(root, "threads", null)).intValue(), (String) root.get("shard"), counts,
                    // absent when no model was timed (earlier versions wrote .nan)
                    root.containsKey("median_seconds_per_model") ? number(root, "median_seconds_per_model")
                            : Double.NaN, origin,
                    models.containsKey("expected") ? ((Number) models.get("expected")).longValue()
                            : RunManifest.EXPECTED_UNKNOWN, ironAbundance(root),
                    // absent from manifests written before the grid file's location was recorded
                    grid.containsKey("location") ? (String) grid.get("location") : "");
        } catch (YamlEngineException e) {
            // a file cut short mostly ends inside the quoted grid text or a mapping: the YAML error then names its line
            java.util.regex.Matcher at = java.util.regex.Pattern.compile("line \\d+, column \\d+")
                    .matcher(String.valueOf(e.getMessage()));
            String where = null;
            while (at.find()) {
                where = at.group();
            }
            throw new OutputFormatException("not a readable convgrid manifest: its YAML breaks off"
                    + (where == null ? "" : " at " + where) + " (the file is cut short or damaged)", e);
        } catch (ClassCastException | NullPointerException | DateTimeParseException | IllegalArgumentException e) {
            throw new OutputFormatException("not a convgrid manifest: " + e.getMessage(), e);
        }
    }

    /**
     * The run's [Fe/H] reference. A manifest written before it was recorded says it through the grid text it quotes
     * (the grid reader validated it then): a {@code metallicity} section given in {@code fe_h_dex}, against its
     * {@code solar_z_over_x} or the default Sun; any other grid gave Z, measured against the default Sun.
     */
    private static IronAbundance ironAbundance(Map<?, ?> root) {
        if (!root.containsKey(METALLICITY)) {
            return ironAbundanceOfGridText(map(root.get("grid"), "grid").get("text"));
        }
        Map<?, ?> metallicity = map(root.get(METALLICITY), METALLICITY);
        Object axis = metallicity.get(METALLICITY_AXIS);
        if (!AXIS_Z.equals(axis) && !AXIS_FE_H.equals(axis)) {
            throw new IllegalArgumentException("metallicity axis must be " + AXIS_Z + " or " + AXIS_FE_H + ", got "
                    + axis);
        }
        return new IronAbundance(number(metallicity, SOLAR_Z_OVER_X), AXIS_FE_H.equals(axis));
    }

    private static IronAbundance ironAbundanceOfGridText(Object text) {
        Object grid;
        try {
            grid = text instanceof String t ? new Load(LoadSettings.builder().build()).loadFromString(t) : null;
        } catch (YamlEngineException e) {
            grid = null;
        }
        if (grid instanceof Map<?, ?> g && g.get(METALLICITY) instanceof Map<?, ?> m && m.containsKey(AXIS_FE_H)) {
            return new IronAbundance(m.get(SOLAR_Z_OVER_X) instanceof Number n ? n.doubleValue()
                    : IronAbundance.DEFAULT.solarZOverX(), true);
        }
        return IronAbundance.DEFAULT;
    }

    private static Map<?, ?> map(Object value, String what) {
        if (value instanceof Map<?, ?> m) {
            return m;
        }
        if (value == null) {
            throw missing(what, null);
        }
        throw new OutputFormatException("manifest: '" + what + "' is not a mapping");
    }

    private static List<?> list(Map<?, ?> map, String key) {
        if (required(map, key, null) instanceof List<?> items) {
            return items;
        }
        throw new OutputFormatException("manifest: '" + key + "' is not a list");
    }

    private static double number(Map<?, ?> map, String key) {
        return ((Number) required(map, key, null)).doubleValue();
    }

    /**
     * The value of {@code key}, or a message naming it when it is absent or empty: a manifest cut short (a full disk,
     * a copy interrupted) lacks its last keys, and the Java null-pointer text was shown instead.
     *
     * @param under the mapping {@code key} belongs to, for the message; null at the top
     */
    private static Object required(Map<?, ?> map, String key, String under) {
        Object value = map.get(key);
        if (value == null) {
            throw missing(key, under);
        }
        return value;
    }

    private static OutputFormatException missing(String key, String under) {
        return new OutputFormatException("not a complete convgrid manifest: its key '"
                + (under == null ? "" : under + ".") + key + "' is missing or empty (the file is cut short or was "
                + "edited)");
    }

    /** The user table a run used, read when a model first needs it (listing or plotting a run does not). */
    private static OpacityChoice tableAt(String path) {
        return OpacityChoice.tableAt(path, () -> OpacityTableReader.read(Path.of(path)));
    }
}
