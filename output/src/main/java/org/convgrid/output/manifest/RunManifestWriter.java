package org.convgrid.output.manifest;

import java.io.IOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.convgrid.engine.convection.ConvectiveZoneFinder;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.request.PhysicsOptions;
import org.snakeyaml.engine.v2.api.Dump;
import org.snakeyaml.engine.v2.api.DumpSettings;
import org.snakeyaml.engine.v2.common.FlowStyle;

/**
 * Writes a {@link RunManifest} as YAML (block style; the grid file's text as a multi-line string). Keys, in order:
 * {@code tool_version}, {@code tool_commit}, {@code grid} ({@code file}, {@code sha256}, {@code models_sha256}, {@code text}),
 * {@code physics} (list of {@code mixing_length}, {@code overshoot}, {@code criterion}, {@code opacity_scale},
 * {@code atmosphere}, {@code overshoot_profile}, and {@code opacity_table} when a user table is named),
 * {@code core_threshold_mass_frac}, {@code metallicity} ({@code axis}: {@code fe_h_dex} when the grid gave [Fe/H],
 * else {@code z}; {@code solar_z_over_x}: the Sun the tables' {@code fe_h_dex} is measured against),
 * {@code age_origin} ({@code birth} or {@code zams}: where the run's ages count from), {@code started}, {@code finished} (ISO-8601 UTC instants), {@code threads}, {@code shard}, {@code models}
 * ({@code total}, one count per status label and, while the run is unfinished, {@code expected}: how many models it
 * is to hold), {@code median_seconds_per_model} (left out when no model was timed: never {@code .nan}).
 */
public final class RunManifestWriter {

    private RunManifestWriter() {
    }

    /** Writes the manifest. */
    public static void write(RunManifest manifest, Appendable out) throws IOException {
        out.append(toYaml(manifest));
    }

    /** The manifest as YAML text. */
    public static String toYaml(RunManifest m) {
        Map<String, Object> grid = new LinkedHashMap<>();
        grid.put("file", m.gridFile());
        if (!m.gridLocation().isEmpty()) {
            grid.put("location", m.gridLocation());
        }
        grid.put("sha256", m.gridFileSha256());
        grid.put("models_sha256", m.gridModelsSha256());
        grid.put("text", m.gridText());
        List<Map<String, Object>> physics = new ArrayList<>();
        for (PhysicsOptions p : m.physics()) {
            Map<String, Object> options = new LinkedHashMap<>();
            options.put("mixing_length", p.mixingLength());
            options.put("overshoot", p.overshoot());
            options.put("criterion", p.criterion().name().toLowerCase(Locale.ROOT));
            options.put("opacity_scale", p.opacityScale());
            options.put("atmosphere", p.atmosphere().label());
            options.put("overshoot_profile", p.overshootScheme().label());
            if (p.usesOpacityTable()) {
                options.put("opacity_table", p.opacityTable());
            }
            physics.add(options);
        }
        Map<String, Object> models = new LinkedHashMap<>();
        models.put("total", m.total());
        for (ModelStatus status : ModelStatus.values()) {
            models.put(status.label(), m.counts().get(status));
        }
        if (m.isUnfinished() && m.expectedModels() != RunManifest.EXPECTED_UNKNOWN) {
            // beside total, so that a reader sees an unfinished run and how far it got
            models.put("expected", m.expectedModels());
        }
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("tool_version", m.toolVersion());
        root.put("tool_commit", m.toolCommit());
        root.put("grid", grid);
        root.put("physics", physics);
        // the one threshold behind structure_class, the core columns and the transitions
        root.put("core_threshold_mass_frac", ConvectiveZoneFinder.DEFAULT_MIN_CORE_MASS_FRACTION);
        // so that plot and readers can recompute fe_h_dex, and know whether the user spoke in [Fe/H]
        Map<String, Object> metallicity = new LinkedHashMap<>();
        metallicity.put(RunManifestReader.METALLICITY_AXIS, m.ironAbundance().givenByGrid()
                ? RunManifestReader.AXIS_FE_H : RunManifestReader.AXIS_Z);
        metallicity.put(RunManifestReader.SOLAR_Z_OVER_X, m.ironAbundance().solarZOverX());
        root.put(RunManifestReader.METALLICITY, metallicity);
        root.put("age_origin", m.ageOrigin().label());
        root.put("started", m.started().toString());
        root.put("finished", m.finished() == null ? null : m.finished().toString());
        root.put("threads", m.threads());
        root.put("shard", m.shard());
        root.put("models", models);
        if (Double.isFinite(m.medianSecondsPerModel())) {
            // a median of nothing is no number: YAML's .nan would only puzzle a reader (and many YAML readers)
            root.put("median_seconds_per_model", m.medianSecondsPerModel());
        }
        DumpSettings settings = DumpSettings.builder().setDefaultFlowStyle(FlowStyle.BLOCK).setWidth(120).build();
        return new Dump(settings).dumpToString(root);
    }
}
