package org.convgrid.plotting;

import java.io.IOException;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.output.Span;
import org.convgrid.output.RunLayout;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.catalogue.CatalogueWriter;
import org.convgrid.output.catalogue.CatalogueZone;
import org.convgrid.output.catalogue.CatalogueZone.ZoneKind;
import org.convgrid.output.catalogue.ZoneTable;
import org.convgrid.output.manifest.RunManifest;
import org.convgrid.output.manifest.RunManifestWriter;
import org.convgrid.output.transitions.TransitionFinder;
import org.convgrid.output.transitions.TransitionWriter;
import org.convgrid.plotting.label.SliceLabels;

/**
 * Realistic-looking synthetic catalogues for chart tests: fully convective below about 0.35 Msun, envelope only up
 * to about 1.1, core and envelope up to about 1.5, core only above. The numbers are rough textbook scalings
 * (mass-luminosity L ~ M^4 near the Sun, ~0.23 M^2.3 for M dwarfs; R ~ M^0.8; main-sequence lifetime
 * 10 Gyr M^-2.5), from memory, only meant to look plausible: nothing here is physics under test.
 */
public final class TestRuns {

    public static final String GRID_TEXT = "title: Synthetic survey\nmass:\n  from: 0.1\n  to: 2.0\n  step: 0.05\n"
            + "metallicity:\n  z: [0.004, 0.014, 0.02]\nage:\n  gyr: [0, 1.0, 4.57]\n  origin: zams\n";

    private TestRuns() {
    }

    /** Masses from {@code from} to {@code to} in {@code count} linear steps. */
    public static double[] masses(double from, double to, int count) {
        double[] m = new double[count];
        for (int i = 0; i < count; i++) {
            m[i] = Math.round((from + (to - from) * i / (count - 1)) * 1e6) / 1e6;
        }
        return m;
    }

    /** Rows in grid order (Z, then age, then mass), default physics; two models fail, old massive ones end. */
    public static List<CatalogueRow> rows(double[] masses, double[] zs, double[] ages) {
        List<CatalogueRow> rows = new ArrayList<>();
        for (int iz = 0; iz < zs.length; iz++) {
            for (int ia = 0; ia < ages.length; ia++) {
                for (int im = 0; im < masses.length; im++) {
                    String id = String.format("p0-z%02d-m%03d-a%02d", iz, im, ia);
                    rows.add(row(id, masses[im], zs[iz], ages[ia], im == masses.length / 3 && ia == 1 && iz == 0));
                }
            }
        }
        return rows;
    }

    public static CatalogueRow row(String id, double m, double z, double age, boolean fail) {
        PhysicsOptions p = PhysicsOptions.DEFAULT;
        double lifetime = 10.0 * Math.pow(m, -2.5);
        if (fail || age > lifetime) {
            ModelStatus status = fail ? ModelStatus.NOT_CONVERGED : ModelStatus.PAST_MAIN_SEQUENCE;
            String why = fail ? "Newton budget of 40 iterations used up, last correction 3.2e-3"
                    : "core hydrogen exhausted at " + SliceLabels.number(lifetime) + " Gyr";
            return CatalogueRow.builder(id, status).massMsun(m).zInit(z).yInit(0.2485 + 1.5 * z)
                    .mixingLength(p.mixingLength()).overshootHp(p.overshoot()).ageGyr(age).statusDetail(why)
                    .solverIterations(40).criterion(StabilityCriterion.SCHWARZSCHILD).opacityScale(1.0)
                    .overshootProfile(OvershootScheme.STEP).build();
        }
        // Z = 0 rows (metal-free grids) get the factor of Z = 1e-4 instead of an infinite one
        double metalFactor = Math.pow(0.014 / Math.max(z, 1e-4), 0.12);
        double ageFactor = 1.0 + 0.4 * age / lifetime;
        double lum = (m < 0.43 ? 0.23 * Math.pow(m, 2.3) : Math.pow(m, 4.0)) * metalFactor * ageFactor;
        double radius = Math.pow(m, m < 1 ? 0.9 : 0.8) * Math.pow(ageFactor, 0.5) * Math.pow(metalFactor, -0.2);
        double teff = 5772.0 * Math.pow(lum / (radius * radius), 0.25);
        double fcLimit = 0.35 + 2.0 * (z - 0.014);
        double coreOnset = 1.1 + 6.0 * (z - 0.014);
        List<CatalogueZone> zones = new ArrayList<>();
        StructureClass cls;
        double core = Double.NaN;
        double envBase = Double.NaN;
        double envRadius = Double.NaN;
        if (m <= fcLimit) {
            cls = StructureClass.FULLY_CONVECTIVE;
            zones.add(new CatalogueZone(ZoneKind.WHOLE_STAR, 0, 1, 0, 1));
            envBase = 0.0;
            envRadius = 0.0;
        } else {
            boolean hasCore = m >= coreOnset;
            boolean hasEnvelope = m < 1.5;
            if (hasCore) {
                core = round(Math.min(0.25, 0.02 + 0.16 * (m - coreOnset)) * (1.0 - 0.3 * age / lifetime));
                zones.add(new CatalogueZone(ZoneKind.CORE, 0, core, 0, core));
            }
            if (hasEnvelope) {
                envBase = round(1.0 - 0.6 * Math.exp(-(m - fcLimit) / 0.17));
                envRadius = round(1.0 - 0.7 * Math.exp(-(m - fcLimit) / 0.45));
                zones.add(new CatalogueZone(ZoneKind.ENVELOPE, envBase, 1, envRadius, 1));
            }
            cls = hasCore && hasEnvelope ? StructureClass.CONV_CORE_AND_ENVELOPE
                    : hasCore ? StructureClass.CONV_CORE : hasEnvelope ? StructureClass.CONV_ENVELOPE
                    : StructureClass.RADIATIVE;
        }
        // the Sun's own log g, so that a track written from these rows gives back its mass (RunData.sameMass)
        double logG = Math.log10(org.convgrid.engine.units.Constants.GM_SUN
                / (org.convgrid.engine.units.Constants.R_SUN * org.convgrid.engine.units.Constants.R_SUN))
                + Math.log10(m / (radius * radius));
        return CatalogueRow.builder(id, ModelStatus.OK).massMsun(m).zInit(z).yInit(0.2485 + 1.5 * z)
                .mixingLength(p.mixingLength()).overshootHp(p.overshoot()).ageGyr(age)
                .phase(CatalogueRow.MAIN_SEQUENCE).luminosityLsun(lum).radiusRsun(radius).teffK(teff).logGCgs(logG)
                .centralTempK(1.5e7 * Math.pow(m, 0.5)).centralDensityCgs(150.0 / m)
                .centralHFrac(0.7 * (1 - 0.5 * age / lifetime)).structureClass(cls)
                .coreCzMassFrac(core).coreCzRadiusFrac(core)
                .envCzBaseMassFrac(envBase).envCzBaseRadiusFrac(envRadius).envCzMassMsun((1.0 - envBase) * m)
                .turnoverTimeDays(envBase < 1 ? 20.0 / m : Double.NaN).zones(zones).solverIterations(7)
                .criterion(StabilityCriterion.SCHWARZSCHILD).opacityScale(1.0)
                .coreMixedMassFrac(core).overshootProfile(OvershootScheme.STEP).build();
    }

    private static double round(double v) {
        return Math.round(v * 1e6) / 1e6;
    }

    /** Writes catalogue.csv, transitions.csv and manifest.yaml for {@code rows} into {@code dir}. */
    public static Path write(Path dir, List<CatalogueRow> rows) throws IOException {
        return write(dir, rows, GRID_TEXT);
    }

    /** As {@link #write(Path, List)}, the manifest keeping {@code gridText} as the run's grid file. */
    public static Path write(Path dir, List<CatalogueRow> rows, String gridText) throws IOException {
        Files.createDirectories(dir);
        StringWriter catalogue = new StringWriter();
        try (CatalogueWriter w = CatalogueWriter.startingWithHeader(catalogue)) {
            w.writeAll(rows);
        }
        Files.writeString(dir.resolve(RunLayout.CATALOGUE), catalogue.toString());
        StringBuilder zoneLines = new StringBuilder(ZoneTable.headerLine());
        rows.forEach(r -> zoneLines.append(ZoneTable.lines(r)));
        Files.writeString(dir.resolve(RunLayout.ZONES), zoneLines);
        StringWriter transitions = new StringWriter();
        TransitionWriter.write(TransitionFinder.withDefaults().find(rows), transitions);
        Files.writeString(dir.resolve("transitions.csv"), transitions.toString());
        Map<ModelStatus, Long> counts = new EnumMap<>(ModelStatus.class);
        rows.forEach(r -> counts.merge(r.status(), 1L, Long::sum));
        RunManifest manifest = new RunManifest("0.1.0", "unknown", "grids/synthetic.yaml", gridText, "ab".repeat(32),
                "cd".repeat(32), List.of(PhysicsOptions.DEFAULT), Instant.parse("2026-03-01T10:00:00Z"),
                Instant.parse("2026-03-01T10:42:10Z"), 2, null, counts, 2.5);
        Files.writeString(dir.resolve("manifest.yaml"), RunManifestWriter.toYaml(manifest));
        return dir;
    }

    /** The demo run: 39 masses 0.1-2.0, three metallicities, three ages. */
    public static List<CatalogueRow> demoRows() {
        return rows(masses(0.1, 2.0, 39), new double[] {0.004, 0.014, 0.02}, new double[] {0.0, 1.0, 4.57});
    }
}
