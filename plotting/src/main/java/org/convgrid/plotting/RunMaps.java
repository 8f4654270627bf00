package org.convgrid.plotting;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.function.BiFunction;
import java.util.stream.Collectors;
import org.convgrid.engine.request.AgeOrigin;
import org.convgrid.output.RunLayout;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.transitions.RefinedModelIds;
import org.convgrid.output.transitions.Slice;
import org.convgrid.output.transitions.TransitionRow;
import org.convgrid.plotting.hr.HrDiagram;
import org.convgrid.plotting.hr.HrDiagramData;
import org.convgrid.plotting.hr.HrDiagramRenderer;
import org.convgrid.plotting.hr.HrPoint;
import org.convgrid.plotting.kippenhahn.Kippenhahn;
import org.convgrid.plotting.kippenhahn.KippenhahnRenderer;
import org.convgrid.plotting.kippenhahn.ZoneCoordinate;
import org.convgrid.plotting.label.AgeGroups;
import org.convgrid.plotting.label.MetallicityNames;
import org.convgrid.plotting.label.PhysicsKey;
import org.convgrid.plotting.label.SliceLabels;
import org.convgrid.plotting.seismic.PeriodSpacingAgainstAge;
import org.convgrid.plotting.seismic.PeriodSpacingAgainstAgeRenderer;
import org.convgrid.plotting.seismic.PeriodSpacingData;
import org.convgrid.plotting.style.ChartFiles;
import org.convgrid.plotting.style.StyledChart;
import org.convgrid.plotting.tracks.AgeChartSelection;
import org.convgrid.plotting.tracks.TrackOrigin;
import org.convgrid.plotting.tracks.TrackedModel;
import org.convgrid.plotting.trend.TransitionAgeTrend;
import org.convgrid.plotting.trend.TransitionAgeTrendData;
import org.convgrid.plotting.trend.TransitionAgeTrendRenderer;
import org.convgrid.plotting.trend.TransitionTrend;
import org.convgrid.plotting.trend.TransitionTrendData;
import org.convgrid.plotting.trend.TransitionTrendRenderer;
import org.convgrid.plotting.envelope.EnvelopeMassAgainstTeff;
import org.convgrid.plotting.envelope.EnvelopeMassData;
import org.convgrid.plotting.envelope.EnvelopeMassRenderer;
import org.convgrid.plotting.turnover.TurnoverAgainstMass;
import org.convgrid.plotting.turnover.TurnoverAgainstMassRenderer;
import org.convgrid.plotting.turnover.TurnoverData;
import org.convgrid.plotting.turnover.TurnoverPoint;
import org.convgrid.plotting.zones.ZoneMap;
import org.convgrid.plotting.zones.ZoneMapRenderer;

/**
 * Draws every chart of a run into {@code RUN_DIR/maps/}: per slice a zone map in m/M
 * ({@code zones-mass_<slice>.png}) and in r/R ({@code zones-radius_<slice>.png}); per physics combination an HR
 * diagram ({@code hr_<physics>.png}) and, when the run has transitions, the transition masses against Z
 * ({@code transitions-vs-z_<physics>.png}); when the run has several ages, the transition masses against age
 * ({@code transitions-vs-age_<physics>.png}); per Z and physics, when at least two models have a turnover time, the
 * convective turnover times against mass ({@code turnover-vs-mass_z<Z>_<physics>.png}) and, when at least two have
 * a convective envelope, its mass against Teff ({@code envelope-mass-vs-teff_z<Z>_<physics>.png}); for a bounded
 * selection of the evolution tracks in tracks/ ({@link AgeChartSelection}), their convective zones against age
 * ({@code zones-age_m<mass>_z<Z>_<physics>.png}); per Z and physics, when some track has a g-mode cavity, the dipole
 * period spacing of up to {@link PeriodSpacingAgainstAge#MAX_LINES} of them against age
 * ({@code period-spacing-vs-age_z<Z>_<physics>.png}). With tracks, the HR diagrams also show the tracks and the
 * isochrones at the grid's ages. A grid of {@code ms_fraction} ages, whose stars each have their own ages in Gyr, is
 * grouped by fraction ({@link AgeGroups}): a zone map per Z, fraction and physics
 * ({@code zones-mass_z<Z>_msf<fraction>_<physics>.png}), HR lines of equal fraction, and no transition charts.
 */
public final class RunMaps {

    // the first word of every chart file's name, before its first '_': spelled once for drawing and for
    // recognising charts (run --force removes the charts of an earlier run, and only those)
    private static final String ZONES_MASS_FILES = "zones-mass";
    private static final String ZONES_RADIUS_FILES = "zones-radius";
    private static final String HR_FILES = "hr";
    private static final String TRENDS_FILES = "transitions-vs-z";
    private static final String TRENDS_AGE_FILES = "transitions-vs-age";
    private static final String ZONES_AGE_FILES = "zones-age";
    private static final String ZONES_AGE_DEPTH_FILES = "zones-age-depth";
    private static final String TURNOVER_FILES = "turnover-vs-mass";
    private static final String ENVELOPE_FILES = "envelope-mass-vs-teff";
    private static final String PERIOD_SPACING_FILES = "period-spacing-vs-age";
    private static final Set<String> CHART_FILE_KINDS = Set.of(ZONES_MASS_FILES, ZONES_RADIUS_FILES, HR_FILES,
            TRENDS_FILES, TRENDS_AGE_FILES, TURNOVER_FILES, ENVELOPE_FILES, ZONES_AGE_FILES, ZONES_AGE_DEPTH_FILES,
            PERIOD_SPACING_FILES);
    /** Fewer models with a turnover time than this and a metallicity gets no turnover chart: one point is no trend. */
    static final int LINE_CHART_MIN_MODELS = 2;

    private RunMaps() {
    }

    /**
     * Whether a file in maps/ is a chart convgrid draws (any run's, any grid's): one of its chart names, as PNG or
     * as one of the vector formats. A file of the user's there is not.
     */
    public static boolean isChartFile(Path file) {
        String name = file.getFileName().toString();
        int kindEnd = name.indexOf('_');
        int dot = name.lastIndexOf('.');
        if (kindEnd <= 0 || dot < kindEnd) {
            return false;
        }
        String extension = name.substring(dot + 1);
        boolean chartFormat = extension.equals("png") || Arrays.stream(ChartFiles.VectorFormat.values())
                .anyMatch(f -> f.extension().equals(extension));
        return chartFormat && CHART_FILE_KINDS.contains(name.substring(0, kindEnd));
    }

    /** Draws every PNG of the run; returns the files written and the charts that failed, in report order. */
    public static DrawnMaps drawAll(Path runDir) throws IOException {
        return drawAll(runDir, Set.of());
    }

    /**
     * Draws every PNG of the run and, for each chart, one file per requested vector format. Charts are independent,
     * so they are drawn in parallel (common fork-join pool); each file is written atomically and the lists come
     * back in report order whatever the thread count. A chart that throws is named in the result's failures (its
     * files are not written) and the others are still drawn: one bad chart must not hide a run's outputs.
     */
    public static DrawnMaps drawAll(Path runDir, Set<ChartFiles.VectorFormat> vectorFormats) throws IOException {
        return drawAll(RunData.read(runDir), runDir, vectorFormats);
    }

    /**
     * As {@link #drawAll(Path, Set)} from the run directory's files already read ({@link RunData#read}), so a caller
     * that also writes the report reads the catalogue, zones and tracks once.
     */
    public static DrawnMaps drawAll(RunData run, Path runDir, Set<ChartFiles.VectorFormat> vectorFormats) {
        Path maps = new RunLayout(runDir).maps();
        DrawnMaps drawn = draw(plan(run), maps, vectorFormats);
        removeUnitlessAgeNames(run, maps, drawn.written());
        return drawn;
    }

    /**
     * Removes the zone maps an earlier version drew for this run's age slices under names without the age's unit
     * ({@code zones-mass_z0.02_age0.02_...}, now {@code ..._age20myr_...}), in every format: redrawn under the new
     * names, they would otherwise stay beside them as a second, stale copy of each chart. Only those exact names of
     * this run's own slices go, never a file this drawing wrote; a file that cannot be removed is left.
     */
    private static void removeUnitlessAgeNames(RunData run, Path maps, List<Path> written) {
        if (run.ageGroups().byFraction()) {
            return;
        }
        Set<String> stems = new LinkedHashSet<>();
        for (CatalogueRow row : run.catalogue()) {
            String stem = SliceLabels.unitlessFileStem(Slice.of(row));
            stems.add(ZONES_MASS_FILES + "_" + stem);
            stems.add(ZONES_RADIUS_FILES + "_" + stem);
        }
        List<String> extensions = new ArrayList<>(List.of("png"));
        for (ChartFiles.VectorFormat f : ChartFiles.VectorFormat.values()) {
            extensions.add(f.extension());
        }
        for (String stem : stems) {
            for (String extension : extensions) {
                Path former = maps.resolve(stem + "." + extension);
                if (!written.contains(former)) {
                    try {
                        Files.deleteIfExists(former);
                    } catch (IOException e) {
                        // a stale chart that cannot be removed is only clutter: the report links the new one
                    }
                }
            }
        }
    }

    /** Draws the given charts into {@code maps}; a chart that throws is named in the failures. */
    static DrawnMaps draw(List<MapEntry> entries, Path maps, Set<ChartFiles.VectorFormat> vectorFormats) {
        return draw(entries, maps, vectorFormats, ChartFiles::writePng);
    }

    /** Writes one chart's PNG; the file system's own writer outside tests of a write that fails. */
    @FunctionalInterface
    interface PngWriter {
        void write(StyledChart chart, Path target) throws IOException;
    }

    /** As {@link #draw(List, Path, Set)}, each PNG written by {@code png}. */
    static DrawnMaps draw(List<MapEntry> entries, Path maps, Set<ChartFiles.VectorFormat> vectorFormats,
                          PngWriter png) {
        List<Drawn> drawn = entries.parallelStream().map(entry -> draw(entry, maps, vectorFormats, png)).toList();
        List<Path> written = new ArrayList<>();
        List<DrawnMaps.ChartFailure> failures = new ArrayList<>();
        for (Drawn d : drawn) {
            written.addAll(d.files());
            if (d.failure() != null) {
                failures.add(d.failure());
            }
        }
        return new DrawnMaps(written, failures);
    }

    private record Drawn(List<Path> files, DrawnMaps.ChartFailure failure) {
    }

    private static Drawn draw(MapEntry entry, Path maps, Set<ChartFiles.VectorFormat> vectorFormats,
                              PngWriter pngWriter) {
        List<Path> written = new ArrayList<>(1 + vectorFormats.size());
        List<ChartFiles.VectorFormat> formats = vectorFormats.stream().sorted().toList();
        Path png = maps.resolve(entry.fileName());
        List<Path> files = new ArrayList<>(List.of(png));
        formats.forEach(format -> files.add(maps.resolve(entry.stem() + "." + format.extension())));
        StyledChart chart;
        try {
            chart = entry.chart().get();
        } catch (RuntimeException e) {
            // a chart library error or nothing to show: report it by chart and carry on with the others. A file an
            // earlier drawing left under its name shows data the tables no longer hold: it goes too
            return new Drawn(written, new DrawnMaps.ChartFailure(entry.fileName(), reason(e), false,
                    removeOlder(files)));
        }
        try {
            pngWriter.write(chart, png);
            written.add(png);
            for (int i = 0; i < formats.size(); i++) {
                ChartFiles.writeVector(chart, files.get(1 + i), formats.get(i));
                written.add(files.get(1 + i));
            }
            return new Drawn(written, null);
        } catch (IOException e) {
            // a full disk or a file size limit: the chart is fine, the disk is not; the caller fails the command.
            // The files an earlier drawing left under the names not written go, so that maps/ never holds a chart of
            // older data beside tables of new data while the report lists it as failed
            List<Path> notWritten = files.stream().filter(f -> !written.contains(f)).toList();
            return new Drawn(written, new DrawnMaps.ChartFailure(entry.fileName(), reason(e), true,
                    removeOlder(notWritten)));
        } catch (RuntimeException e) {
            return new Drawn(written, new DrawnMaps.ChartFailure(entry.fileName(), reason(e)));
        }
    }

    /**
     * Removes the regular files of these names (an earlier drawing's; never a folder or a link's target): whether
     * there were none, all went, or one could not be removed.
     */
    private static DrawnMaps.ChartFailure.OlderFile removeOlder(List<Path> files) {
        DrawnMaps.ChartFailure.OlderFile result = DrawnMaps.ChartFailure.OlderFile.NONE;
        for (Path file : files) {
            if (!Files.isRegularFile(file, LinkOption.NOFOLLOW_LINKS)) {
                continue;
            }
            try {
                Files.delete(file);
                if (result == DrawnMaps.ChartFailure.OlderFile.NONE) {
                    result = DrawnMaps.ChartFailure.OlderFile.REMOVED;
                }
            } catch (IOException e) {
                result = DrawnMaps.ChartFailure.OlderFile.KEPT;
            }
        }
        return result;
    }

    private static String reason(Exception e) {
        return e.getMessage() == null || e.getMessage().isBlank() ? e.getClass().getSimpleName() : e.getMessage();
    }

    /** The charts of a run, in report order, without drawing them. */
    public static List<MapEntry> plan(RunData run) {
        Map<Slice, TransitionRow> transitions = new LinkedHashMap<>();
        run.transitions().forEach(t -> transitions.put(t.slice(), t));
        Set<Slice> slices = new LinkedHashSet<>();
        Set<PhysicsKey> physics = new LinkedHashSet<>();
        for (CatalogueRow row : run.catalogue()) {
            slices.add(Slice.of(row));
            physics.add(PhysicsKey.of(row));
        }
        List<CatalogueRow> rows = run.catalogue();
        MetallicityNames names = run.metallicityNames();
        AgeGroups groups = run.ageGroups();
        List<MapEntry> mass = new ArrayList<>();
        List<MapEntry> radius = new ArrayList<>();
        if (groups.byFraction()) {
            zonesAtFractions(run, groups, mass, radius);
        }
        for (Slice s : groups.byFraction() ? Set.<Slice>of() : slices) {
            TransitionRow t = transitions.get(s);
            String stem = SliceLabels.fileStem(s);
            String group = groupOf(s.zInit(), PhysicsKey.of(s), run);
            String slice = names.of(s.zInit()) + ", " + SliceLabels.age(s.ageGyr()) + ", " + SliceLabels.physics(s);
            mass.add(new MapEntry(ZONES_MASS_FILES + "_" + stem + ".png", MapEntry.ZONES_MASS, group,
                    "Convective zones in m/M, " + slice + ".",
                    () -> ZoneMapRenderer.render(ZoneMap.inMass(s, rows, t), names)));
            radius.add(new MapEntry(ZONES_RADIUS_FILES + "_" + stem + ".png", MapEntry.ZONES_RADIUS, group,
                    "Convective zones in r/R, " + slice + ".",
                    () -> ZoneMapRenderer.render(ZoneMap.inRadius(s, rows, t, run.radiusZones()), names)));
        }
        List<MapEntry> entries = new ArrayList<>(mass);
        entries.addAll(radius);
        for (PhysicsKey p : physics) {
            // built here, not when drawn: the caption names the turn-off models its lines end at
            HrDiagramData hr = HrDiagram.build(p, rows, run.trackedModels(), run::timeline, groups);
            entries.add(new MapEntry(HR_FILES + "_" + p.fileStem() + ".png", MapEntry.HR,
                    hrCaption(run, groups) + p.describe() + "." + refinementNote(rows, p, hr),
                    () -> HrDiagramRenderer.render(usable(hr, rows), names)));
        }
        if (groups.byFraction()) {
            // transitions.csv finds its masses across the stars of one age in Gyr, and here every star has its own:
            // each of its rows holds one star, so there is no transition to chart (the report says why), nor a line
            // per age of the envelope chart
            entries.addAll(turnoverAgainstMass(run, physics));
            entries.addAll(zonesAgainstAge(run));
            entries.addAll(periodSpacingAgainstAge(run, physics));
            return entries;
        }
        for (PhysicsKey p : physics) {
            if (run.transitions().stream().anyMatch(t -> PhysicsKey.of(t.slice()).equals(p))) {
                String x = TransitionTrendRenderer.inIron(run.transitions().stream()
                        .filter(t -> PhysicsKey.of(t.slice()).equals(p)).map(t -> t.slice().zInit())
                        .collect(Collectors.toSet()), names) ? "[Fe/H]" : "Z";
                entries.add(new MapEntry(TRENDS_FILES + "_" + p.fileStem() + ".png", MapEntry.TRENDS,
                        "Transition masses against " + x + " (the ages drawn slightly apart at each " + x
                                + ", youngest left): shaded boxes span the two models that bracket each value, "
                                + "dashed boxes the windows of small transient cores (a square alone: a window found "
                                + "at one mass), " + p.describe() + ".",
                        () -> TransitionTrendRenderer.render(found(TransitionTrend.build(p, run.transitions(), names)),
                                names)));
            }
        }
        for (PhysicsKey p : physics) {
            long ages = run.transitions().stream().filter(t -> PhysicsKey.of(t.slice()).equals(p))
                    .mapToDouble(t -> t.slice().ageGyr()).distinct().count();
            if (ages >= 2) {
                entries.add(new MapEntry(TRENDS_AGE_FILES + "_" + p.fileStem() + ".png", MapEntry.TRENDS_AGE,
                        "Transition masses against age, one line per Z and method (each Z drawn slightly apart, lowest left): shaded boxes span the two models "
                                + "that bracket each value, dashed boxes the windows of small transient cores (a "
                                + "square alone: a window found at one mass), " + p.describe() + ". The lines join "
                                + "ages only to guide the eye: where small 3He-driven cores fill the masses below it "
                                + "at some age, \"core in every star above\" drops there and rises again (README, "
                                + "Limits, in detail).",
                        () -> TransitionAgeTrendRenderer.render(
                                found(TransitionAgeTrend.build(p, run.transitions(), names)),
                                run.manifest() == null ? AgeOrigin.ZAMS : run.manifest().ageOrigin(), names)));
            }
        }
        entries.addAll(turnoverAgainstMass(run, physics));
        entries.addAll(envelopeMassAgainstTeff(run, physics));
        entries.addAll(zonesAgainstAge(run));
        entries.addAll(periodSpacingAgainstAge(run, physics));
        return entries;
    }

    /**
     * One period-spacing chart per physics and Z whose tracks give a period spacing at two steps or more (a star with
     * a radiative region); grouped by Z.
     */
    private static List<MapEntry> periodSpacingAgainstAge(RunData run, Set<PhysicsKey> physics) {
        List<MapEntry> entries = new ArrayList<>();
        MetallicityNames names = run.metallicityNames();
        for (PhysicsKey p : physics) {
            List<Double> zs = run.trackedModels().stream().filter(t -> t.origin().physics().equals(p))
                    .map(t -> t.origin().zInit()).distinct().sorted().toList();
            for (double z : zs) {
                PeriodSpacingData data = PeriodSpacingAgainstAge.build(p, z, run.trackedModels(), run::timeline);
                if (data.lines().isEmpty()) {
                    continue;
                }
                entries.add(new MapEntry(PERIOD_SPACING_FILES + "_z" + SliceLabels.number(z) + "_" + p.fileStem()
                        + ".png", MapEntry.PERIOD_SPACING, groupOf(z, p, run),
                        "Dipole g-mode period spacing \u0394\u03a0\u2081 (period_spacing_l1_s of the tracks) against "
                                + "age, one colour per star, dotted before the main sequence, " + names.of(z) + ", "
                                + p.describe() + ". Model values from first-order asymptotics.",
                        () -> PeriodSpacingAgainstAgeRenderer.render(data, names)));
            }
        }
        return entries;
    }

    /**
     * The zone maps of an {@code ms_fraction} grid: one per Z, main-sequence fraction and physics, in catalogue order,
     * its masses along x as on an age slice's map, each star at its own age. Grouped by age in Gyr they held one star
     * each (a grid of 6 masses, 2 Z and 5 fractions drew 60 such maps in m/M and 60 in r/R).
     */
    private static void zonesAtFractions(RunData run, AgeGroups groups, List<MapEntry> mass, List<MapEntry> radius) {
        record FractionSlice(double zInit, double msFraction, PhysicsKey physics) {
        }
        Map<FractionSlice, List<CatalogueRow>> members = new LinkedHashMap<>();
        for (CatalogueRow row : run.catalogue()) {
            double fraction = groups.keyOf(row);
            if (!Double.isNaN(fraction)) {
                members.computeIfAbsent(new FractionSlice(row.zInit(), fraction, PhysicsKey.of(row)),
                        k -> new ArrayList<>()).add(row);
            }
        }
        MetallicityNames names = run.metallicityNames();
        members.forEach((f, rows) -> {
            String stem = SliceLabels.fractionFileStem(f.zInit(), f.msFraction(), f.physics());
            String group = groupOf(f.zInit(), f.physics(), run);
            String slice = names.of(f.zInit()) + ", " + SliceLabels.msFraction(f.msFraction()) + " (each star at its "
                    + "own age), " + f.physics().describe();
            mass.add(new MapEntry(ZONES_MASS_FILES + "_" + stem + ".png", MapEntry.ZONES_MASS, group,
                    "Convective zones in m/M, " + slice + ".",
                    () -> ZoneMapRenderer.render(ZoneMap.inMassAtFraction(f.msFraction(), rows), names)));
            radius.add(new MapEntry(ZONES_RADIUS_FILES + "_" + stem + ".png", MapEntry.ZONES_RADIUS, group,
                    "Convective zones in r/R, " + slice + ".",
                    () -> ZoneMapRenderer.render(ZoneMap.inRadiusAtFraction(f.msFraction(), rows, run.radiusZones()),
                            names)));
        });
    }

    /** The HR diagram's caption up to its physics: what the lines join and how they are labelled. */
    private static String hrCaption(RunData run, AgeGroups groups) {
        if (groups.byFraction()) {
            return "HR diagram of every usable model (colour: Z; shape: structure class)"
                    + (run.hasTracks() ? " with the evolution tracks (grey)" : "") + "; the lines join the models of "
                    + "equal main-sequence fraction (0: the zero-age main sequence; near 1: core-hydrogen exhaustion), "
                    + "each star at its own age, labelled by fraction, ";
        }
        return run.hasTracks() ? "HR diagram of every usable model (colour: Z; shape: structure class) with the "
                + "evolution tracks (grey) and isochrones labelled by age, "
                : "HR diagram of every usable model (colour: Z; shape: structure class), ";
    }

    /**
     * One turnover-time chart per physics and Z that has at least {@link #LINE_CHART_MIN_MODELS} grid models with a
     * turnover time (a Z of hot stars only, without convective envelopes, has none); grouped by Z.
     */
    private static List<MapEntry> turnoverAgainstMass(RunData run, Set<PhysicsKey> physics) {
        MetallicityNames names = run.metallicityNames();
        return perCatalogueMetallicity(run, physics, (p, z) -> {
            TurnoverData data = TurnoverAgainstMass.build(p, z, run.catalogue(), run.transitions());
            return data.modelCount() < LINE_CHART_MIN_MODELS ? null
                    : new MapEntry(TURNOVER_FILES + "_z" + SliceLabels.number(z) + "_" + p.fileStem() + ".png",
                    MapEntry.TURNOVER, groupOf(z, p, run), turnoverCaption(data, names),
                    () -> TurnoverAgainstMassRenderer.render(data, names));
        });
    }

    /**
     * The entries {@code chart} gives (null: none) for each physics and each Z of the catalogue under it, in that
     * order: the per-Z charts drawn from the catalogue's rows.
     */
    private static List<MapEntry> perCatalogueMetallicity(RunData run, Set<PhysicsKey> physics,
                                                          BiFunction<PhysicsKey, Double, MapEntry> chart) {
        List<MapEntry> entries = new ArrayList<>();
        for (PhysicsKey p : physics) {
            List<Double> zs = run.catalogue().stream().filter(r -> PhysicsKey.of(r).equals(p))
                    .map(CatalogueRow::zInit).distinct().sorted().toList();
            for (double z : zs) {
                MapEntry entry = chart.apply(p, z);
                if (entry != null) {
                    entries.add(entry);
                }
            }
        }
        return entries;
    }

    /**
     * One envelope-mass chart per physics and Z that has at least {@link #LINE_CHART_MIN_MODELS} grid models with a
     * convective envelope; grouped by Z.
     */
    private static List<MapEntry> envelopeMassAgainstTeff(RunData run, Set<PhysicsKey> physics) {
        MetallicityNames names = run.metallicityNames();
        return perCatalogueMetallicity(run, physics, (p, z) -> {
            EnvelopeMassData data = EnvelopeMassAgainstTeff.build(p, z, run.catalogue());
            return data.modelCount() < LINE_CHART_MIN_MODELS ? null
                    : new MapEntry(ENVELOPE_FILES + "_z" + SliceLabels.number(z) + "_" + p.fileStem() + ".png",
                    MapEntry.ENVELOPE_MASS, groupOf(z, p, run),
                    "Mass of the convective envelope against effective temperature, one colour per age, for the "
                            + "grid's models with a convective envelope (hollow: fully convective, the envelope "
                            + "the whole star). " + names.of(z) + ", " + p.describe() + ". env_cz_mass_msun of "
                            + "catalogue.ecsv: the mass into which accreted material mixes.",
                    () -> EnvelopeMassRenderer.render(data, names));
        });
    }

    /** {@link #turnoverCaption(TurnoverData, MetallicityNames)} of a run whose metallicities are named by Z. */
    static String turnoverCaption(TurnoverData data) {
        return turnoverCaption(data, MetallicityNames.Z_ONLY);
    }

    /** The report's caption of a turnover chart, naming only the marks it has (hollow markers, dotted limits). */
    static String turnoverCaption(TurnoverData data, MetallicityNames names) {
        boolean hollow = data.lines().stream().flatMap(l -> l.points().stream())
                .anyMatch(TurnoverPoint::fullyConvective);
        return "Convective turnover times against mass, one colour per age: local (solid with markers"
                + (hollow ? ", hollow where the star is fully convective" : "") + ") and global (dashed), for the "
                + "grid's models with a turnover time" + (data.limits().isEmpty() ? ""
                : "; dotted lines mark each age's fully convective limit") + ". " + names.of(data.zInit())
                + ", " + data.physics().describe() + ". Model values (turnover_time_days, "
                + "turnover_time_global_days), not empirical ones.";
    }

    /** The diagram if it has a model to show; otherwise {@link NothingToDraw}, naming the statuses it had instead. */
    static HrDiagramData usable(HrDiagramData diagram, List<CatalogueRow> rows) {
        if (!diagram.points().isEmpty()) {
            return diagram;
        }
        Map<String, Long> byStatus = new TreeMap<>();
        rows.stream().filter(r -> PhysicsKey.of(r).equals(diagram.physics()))
                .forEach(r -> byStatus.merge(r.status().label(), 1L, Long::sum));
        List<String> counts = byStatus.entrySet().stream().map(e -> e.getValue() + " " + e.getKey()).toList();
        throw new NothingToDraw("no model of " + diagram.physics().describe() + " is usable (status ok with L and "
                + "Teff); the catalogue has " + String.join(", ", counts));
    }

    /**
     * What the HR caption adds when the refinement added models of this physics: how many the chart draws, and that
     * lines and mass labels go through the grid's masses only. Counted from the diagram, not the catalogue: models
     * past the main sequence (the turn-off refinement's high side) or failed are in the catalogue but not drawn.
     */
    private static String refinementNote(List<CatalogueRow> rows, PhysicsKey physics, HrDiagramData hr) {
        List<CatalogueRow> mine = rows.stream().filter(r -> PhysicsKey.of(r).equals(physics)).toList();
        long refined = mine.stream().filter(r -> RefinedModelIds.isRefined(r.modelId())).count();
        long grid = mine.size() - refined;
        List<HrPoint> turnoffModels = hr.turnoffModels();
        // a turn-off model is drawn large and hollow on its line, whether the refinement added it or (when every new
        // model came out past the main sequence) the grid had it
        long refinedEnds = turnoffModels.stream().filter(m -> RefinedModelIds.isRefined(m.modelId())).count();
        long refinedOthers = hr.refinementPoints().size();
        long gridUndrawn = grid - hr.points().size();
        long refinedUndrawn = refined - refinedEnds - refinedOthers;
        String ends = turnoffModels.isEmpty() ? "" : " Hollow markers: the " + (turnoffModels.size() == 1
                ? "turn-off model" : turnoffModels.size() + " turn-off models") + " the isochrones end at, the "
                + "heaviest star still on the main sequence at the age, as the refinement narrowed it.";
        return refined == 0 ? ends : " Large markers, isochrones and mass labels: the " + hr.points().size()
                + " grid models" + notDrawn(gridUndrawn) + "; small pale markers: the " + refinedOthers
                + (refinedEnds == 0 ? "" : " other") + " models the transition refinement added near the transition "
                + "masses" + notDrawn(refinedUndrawn) + "." + ends;
    }

    /** The clause for models of the catalogue the HR diagram leaves out, empty when it leaves none out. */
    private static String notDrawn(long count) {
        return count == 0 ? "" : " (" + count + " more, past the main sequence or failed, not drawn)";
    }

    /** The trend if some slice has a transition or a transient core window; otherwise {@link NothingToDraw}. */
    static TransitionTrendData found(TransitionTrendData trend) {
        if (trend.series().isEmpty() && trend.windows().isEmpty()) {
            throw new NothingToDraw(NO_TRANSITION);
        }
        return trend;
    }

    /** As {@link #found(TransitionTrendData)} for the trend against age. */
    static TransitionAgeTrendData found(TransitionAgeTrendData trend) {
        if (trend.series().isEmpty() && trend.windows().isEmpty()) {
            throw new NothingToDraw(NO_TRANSITION);
        }
        return trend;
    }

    private static final String NO_TRANSITION = "the models bracket no transition mass in any slice (transitions.csv "
            + "has none found; one written before the main-sequence turn-off was added lacks it: convgrid transitions "
            + "RUN_DIR adds it)";

    /** Which tracks get a zones-against-age chart: a bounded selection (see {@link AgeChartSelection}). */
    public static AgeChartSelection zonesAgainstAgeSelection(RunData run) {
        return AgeChartSelection.of(run.trackedModels(), GridChoices.of(run.manifest()).ageChartMasses());
    }

    /** One zones-against-age chart per selected track, by physics, then Z, then mass; grouped by Z. */
    private static List<MapEntry> zonesAgainstAge(RunData run) {
        List<MapEntry> entries = new ArrayList<>();
        MetallicityNames names = run.metallicityNames();
        for (TrackedModel t : zonesAgainstAgeSelection(run).chosen()) {
            TrackOrigin o = t.origin();
            String what = "M = " + SliceLabels.number(o.massMsun()) + " M\u2609, " + names.of(o.zInit());
            String stem = "_m" + SliceLabels.number(o.massMsun()) + "_z" + SliceLabels.number(o.zInit()) + "_"
                    + o.physics().fileStem() + ".png";
            String group = groupOf(o.zInit(), o.physics(), run);
            entries.add(new MapEntry(ZONES_AGE_FILES + stem, MapEntry.ZONES_AGE, group,
                    "Convective zones (shaded) and " + KippenhahnRenderer.BURNING_LABEL + " against age, " + what + ", "
                            + o.physics().describe() + "; burning is hatched only at ages when it gives at least "
                            + "1 % of the star's luminosity, where the track records that share.",
                    () -> KippenhahnRenderer.render(Kippenhahn.build(o, t.track(), run.timeline(o.trackId())),
                            ZoneCoordinate.MASS_FRACTION, names)));
            if (Kippenhahn.build(o, t.track(), run.timeline(o.trackId())).hasThinEnvelope()) {
                entries.add(new MapEntry(ZONES_AGE_DEPTH_FILES + stem, MapEntry.ZONES_AGE, group,
                        "The same against \u2212log10(1 \u2212 m/M), surface at the top, so the thin convective "
                                + "envelope shows, " + what + ".",
                        () -> KippenhahnRenderer.render(Kippenhahn.build(o, t.track(), run.timeline(o.trackId())),
                                ZoneCoordinate.SURFACE_DEPTH, names)));
            }
        }
        return entries;
    }

    /**
     * The report group of a chart of one metallicity: {@code Z = 0.014} (with its [Fe/H] first when the grid gave
     * [Fe/H]), with the physics when the run has several.
     */
    private static String groupOf(double zInit, PhysicsKey physics, RunData run) {
        long combos = run.catalogue().stream().map(PhysicsKey::of).distinct().count();
        return run.metallicityNames().of(zInit) + (combos > 1 ? ", " + physics.describe() : "");
    }
}
