package org.convgrid.plotting.report;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.output.AtomicFiles;
import org.convgrid.output.RunLayout;
import org.convgrid.output.Span;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.manifest.RunManifest;
import org.convgrid.output.manifest.UnfinishedRun;
import org.convgrid.output.transitions.RefinedModelIds;
import org.convgrid.output.transitions.Slice;
import org.convgrid.output.transitions.TransitionEstimate;
import org.convgrid.output.transitions.TransitionFinder;
import org.convgrid.output.transitions.TransitionMethod;
import org.convgrid.output.transitions.TransitionRow;
import org.convgrid.plotting.DrawnMaps;
import org.convgrid.plotting.GridChoices;
import org.convgrid.plotting.MapEntry;
import org.convgrid.plotting.RunData;
import org.convgrid.plotting.RunMaps;
import org.convgrid.plotting.label.MetallicityNames;
import org.convgrid.plotting.label.SliceLabels;

/**
 * Writes {@code RUN_DIR/report.html}: one static page that opens offline (images by relative link into maps/,
 * inline CSS, no script): run summary from the manifest, counts by status, the maps present in maps/, the
 * transition table, the life events ({@link LifeEventsSection}), and every model without a usable result with its
 * reason. Maps not yet drawn are listed as
 * missing rather than linked.
 */
public final class ReportPage {

    private ReportPage() {
    }

    /** Writes the report of a run directory; returns its path. */
    public static Path write(Path runDir) throws IOException {
        return write(runDir, List.of());
    }

    /** Writes the report of a run directory, naming the charts that could not be drawn; returns its path. */
    public static Path write(Path runDir, List<DrawnMaps.ChartFailure> chartFailures) throws IOException {
        return write(RunData.read(runDir), runDir, chartFailures);
    }

    /**
     * Writes the report of a run directory from its files already read ({@link RunData#read}), naming the charts
     * that could not be drawn; returns its path.
     */
    public static Path write(RunData run, Path runDir, List<DrawnMaps.ChartFailure> chartFailures)
            throws IOException {
        Path target = new RunLayout(runDir).report();
        AtomicFiles.writeString(target, html(run, runDir, chartFailures));
        return target;
    }

    /** The page's HTML. */
    static String html(RunData run, Path runDir) {
        return html(run, runDir, List.of());
    }

    /** The page's HTML, naming the charts that could not be drawn. */
    static String html(RunData run, Path runDir, List<DrawnMaps.ChartFailure> chartFailures) {
        StringBuilder b = new StringBuilder(16_384);
        RunManifest m = run.manifest();
        String title = GridChoices.of(m).title();
        List<MapEntry> plan = RunMaps.plan(run);
        LifeEventsSection.Table lifeEvents = LifeEventsSection.read(runDir);
        b.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n<title>")
                .append(Html.escape(title)).append("</title>\n<style>\n").append(ReportStyle.CSS)
                .append("</style>\n</head>\n<body>\n<h1>").append(Html.escape(title)).append("</h1>\n");
        unfinished(b, run, runDir);
        unrefined(b, run, runDir);
        contents(b, plan, lifeEvents.shown());
        b.append("<h2 id=\"run\">Run</h2>\n");
        summary(b, run);
        counts(b, run);
        chartFailures(b, chartFailures);
        maps(b, plan, runDir, chartFailures, RunMaps.zonesAgainstAgeSelection(run).describe());
        transitions(b, run);
        LifeEventsSection.append(b, lifeEvents, run.catalogue(), run.metallicityNames());
        failures(b, run);
        if (!run.hasTracks()) {
            b.append("<h2>").append(Html.escape(MapEntry.ZONES_AGE))
                    .append("</h2>\n<p>No evolution tracks in this run.</p>\n");
        } else if (run.trackedModels().size() < run.tracks().size()) {
            int strays = run.tracks().size() - run.trackedModels().size();
            b.append("<p class=\"missing\">").append(strays).append(strays == 1 ? " track file in " : " track files in ")
                    .append(RunLayout.TRACKS).append(strays == 1
                            ? "/ matches no catalogue model (by id and mass) and is not charted.</p>\n"
                            : "/ match no catalogue model (by id and mass) and are not charted.</p>\n");
        }
        b.append("</body>\n</html>\n");
        return b.toString();
    }

    /**
     * A note above everything else when the run did not finish: its maps and tables cover the models present only,
     * and a reader must not take them for the grid's.
     */
    private static void unfinished(StringBuilder b, RunData run, Path runDir) {
        if (run.manifest() == null) {
            return;
        }
        UnfinishedRun.of(run.manifest(), run.catalogue().size()).ifPresent(u -> b
                .append("<p class=\"unfinished\">This run is unfinished: ").append(u.describe()).append(" in ")
                .append(RunLayout.CATALOGUE).append(". The maps and tables below cover those models only. Continue it "
                        + "with <code>").append(Html.escape("convgrid run " + run.manifest().gridFile() + " --out "
                        + runDir.toAbsolutePath().normalize() + " --resume")).append("</code>.</p>\n"));
    }

    /**
     * A note above everything else when a finished, whole run's grid asks for refined transition masses and
     * transitions.csv still holds the grid's brackets (--no-refine, a refinement cut short by kill -9 or a time limit,
     * or a merged run not yet refined): its transition masses are only as fine as the mass step. The manifest alone
     * said "finished".
     */
    private static void unrefined(StringBuilder b, RunData run, Path runDir) {
        RunManifest m = run.manifest();
        if (m == null || m.isUnfinished() || m.shard() != null) {
            return;
        }
        GridChoices grid = GridChoices.of(m);
        if (!grid.refinesTransitions()) {
            return;
        }
        // a refinement narrows every bracket wider than its tolerance (method refined); one already narrower, as
        // with a mass step below the tolerance, stays a grid bracket, and the note would never go away
        double width = grid.refineToleranceMsun();
        boolean coarse = run.transitions().stream().anyMatch(t -> t.method() == TransitionMethod.GRID
                && (wider(t.fullyConvective(), width) || wider(t.convCoreOnset(), width)
                || wider(t.turnoff(), width) || wider(t.lithiumDepletion().boundary(), width)));
        if (!coarse) {
            return;
        }
        b.append("<p class=\"unrefined\">The transition masses are not refined: the grid asks for refinement, but ")
                .append(RunLayout.TRANSITIONS).append(" holds the brackets of the grid's own masses, only as fine as "
                        + "its mass step (the run skipped the refinement with --no-refine or was stopped during it, "
                        + "or this merged run has not been refined yet). Refine them with <code>")
                .append(Html.escape("convgrid transitions " + runDir.toAbsolutePath().normalize() + " --refine"))
                .append("</code>.</p>\n");
    }

    private static boolean wider(TransitionEstimate estimate, double width) {
        return estimate.found() && estimate.bracket() != null
                && estimate.bracket().hi() - estimate.bracket().lo() >= width;
    }

    private static void summary(StringBuilder b, RunData run) {
        b.append("<table class=\"facts\">\n");
        RunManifest m = run.manifest();
        if (m == null) {
            row(b, "manifest", RunLayout.MANIFEST + " not found");
        } else {
            row(b, "grid file", m.gridFile());
            row(b, "convgrid version", m.toolVersion());
            row(b, "built from commit", m.toolCommit());
            row(b, "started", m.started().toString());
            row(b, "finished", m.finished() == null ? "not finished" : m.finished().toString());
            row(b, "threads", Integer.toString(m.threads()));
            if (m.shard() != null) {
                row(b, "shard", m.shard());
            }
            row(b, "median time per model", Double.isNaN(m.medianSecondsPerModel()) ? "n/a"
                    : SliceLabels.number(m.medianSecondsPerModel()) + " s");
            m.physics().forEach(p -> row(b, "physics", SliceLabels.physics(p.mixingLength(), p.overshoot(),
                    p.overshootScheme(), p.criterion(), p.opacityScale())));
            if (m.ironAbundance().givenByGrid()) {
                // the Sun the grid's [Fe/H] (and the tables' fe_h_dex) is measured against
                row(b, "[Fe/H]", "log10 of (Z/X) over the solar Z/X "
                        + SliceLabels.number(m.ironAbundance().solarZOverX()) + " (solar-scaled mixture)");
            }
        }
        // the run's summary line counts the grid's models and the refinement's apart: so does the report
        long refinement = run.catalogue().stream().filter(r -> RefinedModelIds.isRefined(r.modelId())).count();
        row(b, "grid models", Long.toString(run.catalogue().size() - refinement));
        row(b, "refinement models", refinement + " (added by bisection to narrow the transition masses; "
                + run.catalogue().size() + " catalogue rows in all)");
        row(b, "transitions", run.transitionsFromFile() ? "from " + RunLayout.TRANSITIONS
                : RunLayout.TRANSITIONS + " not found: read off the catalogue");
        b.append("</table>\n");
        if (m != null) {
            b.append("<details><summary>grid file as read</summary>\n<pre>").append(Html.escape(m.gridText()))
                    .append("</pre></details>\n");
        }
    }

    private static void counts(StringBuilder b, RunData run) {
        Map<ModelStatus, Long> counts = new EnumMap<>(ModelStatus.class);
        for (ModelStatus s : ModelStatus.values()) {
            counts.put(s, 0L);
        }
        run.catalogue().forEach(r -> counts.merge(r.status(), 1L, Long::sum));
        b.append("<h2>Models by status</h2>\n<table>\n<tr><th>status</th><th>in catalogue</th>");
        if (run.manifest() != null) {
            b.append("<th>in manifest</th>");
        }
        b.append("</tr>\n");
        for (ModelStatus s : ModelStatus.values()) {
            b.append("<tr><td>").append(s.label()).append("</td><td class=\"num\">").append(counts.get(s));
            if (run.manifest() != null) {
                b.append("</td><td class=\"num\">").append(run.manifest().counts().get(s));
            }
            b.append("</td></tr>\n");
        }
        b.append("</table>\n");
    }

    /** A contents list: the fixed sections, and per chart section its groups (one metallicity, one mass, ...). */
    private static void contents(StringBuilder b, List<MapEntry> plan, boolean lifeEvents) {
        b.append("<nav><h2>Contents</h2>\n<ul>\n<li><a href=\"#run\">Run</a></li>\n");
        String section = null;
        String group = null;
        for (MapEntry e : plan) {
            if (!e.section().equals(section)) {
                if (section != null) {
                    b.append(group == null ? "" : "</ul>").append("</li>\n");
                }
                section = e.section();
                group = null;
                b.append("<li><a href=\"#").append(anchor(section, "")).append("\">").append(Html.escape(section))
                        .append("</a>");
            }
            if (!e.group().isEmpty() && !e.group().equals(group)) {
                b.append(group == null ? "<ul class=\"groups\">" : "").append("<li><a href=\"#")
                        .append(anchor(section, e.group())).append("\">").append(Html.escape(e.group()))
                        .append("</a></li>");
                group = e.group();
            }
        }
        if (section != null) {
            b.append(group == null ? "" : "</ul>").append("</li>\n");
        }
        b.append("<li><a href=\"#transitions\">Transition masses</a></li>\n");
        if (lifeEvents) {
            b.append("<li><a href=\"#").append(LifeEventsSection.ID).append("\">").append(LifeEventsSection.HEADING)
                    .append("</a></li>\n");
        }
        b.append("<li><a href=\"#failures\">Models without a usable result</a></li>\n</ul></nav>\n");
    }

    private static String anchor(String section, String group) {
        String text = (section + (group.isEmpty() ? "" : "-" + group)).toLowerCase(java.util.Locale.ROOT);
        return text.replaceAll("[^a-z0-9.]+", "-");
    }

    private static void chartFailures(StringBuilder b, List<DrawnMaps.ChartFailure> chartFailures) {
        if (chartFailures.isEmpty()) {
            return;
        }
        b.append("<p class=\"missing\">").append(chartFailures.size())
                .append(chartFailures.size() == 1 ? " chart" : " charts")
                .append(" could not be drawn; the tables below are complete:</p>\n<ul>\n");
        chartFailures.forEach(f -> b.append("<li>").append(Html.escape(f.describe())).append("</li>\n"));
        b.append("</ul>\n");
    }

    private static void maps(StringBuilder b, List<MapEntry> plan, Path runDir,
                             List<DrawnMaps.ChartFailure> chartFailures, String zonesAgainstAgeNote) {
        String section = null;
        String group = null;
        for (MapEntry e : plan) {
            if (!e.section().equals(section)) {
                section = e.section();
                group = null;
                b.append("<h2 id=\"").append(anchor(section, "")).append("\">").append(Html.escape(section))
                        .append("</h2>\n");
                if (e.section().equals(MapEntry.ZONES_AGE)) {
                    b.append("<p>").append(Html.escape(zonesAgainstAgeNote)).append("</p>\n");
                }
            }
            if (!e.group().isEmpty() && !e.group().equals(group)) {
                group = e.group();
                b.append("<h3 id=\"").append(anchor(section, group)).append("\">").append(Html.escape(group))
                        .append("</h3>\n");
            }
            String href = RunLayout.MAPS + "/" + e.fileName();
            java.util.Optional<DrawnMaps.ChartFailure> failed = chartFailures.stream()
                    .filter(f -> f.fileName().equals(e.fileName())).findFirst();
            if (failed.isPresent()) {
                b.append("<p class=\"missing\">Could not be drawn: ").append(Html.escape(href)).append(" (")
                        .append(Html.escape(failed.get().reason())).append(").</p>\n");
            } else if (Files.isRegularFile(new RunLayout(runDir).maps().resolve(e.fileName()))) {
                b.append("<figure><a href=\"").append(Html.escape(href)).append("\"><img src=\"")
                        .append(Html.escape(href)).append("\" alt=\"").append(Html.escape(e.caption()))
                        .append("\" width=\"1200\" height=\"800\"></a><figcaption>").append(Html.escape(e.caption()))
                        .append("</figcaption></figure>\n");
            } else {
                b.append("<p class=\"missing\">Not drawn yet: ").append(Html.escape(href))
                        .append(" (run convgrid plot).</p>\n");
            }
        }
    }

    /**
     * Why an {@code ms_fraction} run has no transition masses, no charts of them and no turnover charts, in place of
     * the table: its 60 one-star rows (in one grid) each read "no fully convective model at any usable mass",
     * true and of no use.
     */
    static final String EACH_STAR_ITS_OWN_AGE_NOTE = "This grid gives its ages as fractions of each star's "
            + "main-sequence lifetime, so the stars of one fraction are each at their own age in Gyr. Transition "
            + "masses are found across the masses of one age in Gyr, and here such an age holds a single star (all "
            + "of them only at a zero age counted from the ZAMS): " + RunLayout.TRANSITIONS + " has one row per age "
            + "in Gyr, and a transition mass in none of one star. This table, the charts of the transition masses "
            + "against Z and against age, and the turnover-time charts (one line per age) are left out; the zone maps "
            + "and the HR diagram group the models by main-sequence fraction instead.";

    /** The turn-off's cell in a slice none of whose models is past the main sequence. */
    static final String ALL_ON_THE_MAIN_SEQUENCE = "none: no star past the main sequence";

    /** What the lithium depletion boundary's columns mean, above the table when it has them. */
    static final String LITHIUM_BOUNDARY_CAPTION = "Lithium depletion boundary: the highest mass that keeps over 1 % of "
            + "its birth lithium below the stars that have burnt 99 % of it; its luminosity is that star's, the "
            + "brightest that still shows lithium.";

    /**
     * The lithium depletion boundary's cell in a slice every star of which keeps over 1 % of its lithium. Not "every
     * star keeps its lithium": at 10 Myr a 0.5 Msun star keeping 5 % has burnt most of it, and a grid starting above
     * 0.55 Msun has stars below its masses that have burnt theirs.
     */
    static final String ALL_KEEP_LITHIUM = "none: no star here has burnt 99 % of its lithium";

    private static void transitions(StringBuilder b, RunData run) {
        MetallicityNames names = run.metallicityNames();
        if (run.ageGroups().byFraction()) {
            b.append("<h2 id=\"transitions\">Transition masses</h2>\n<p>").append(Html.escape(EACH_STAR_ITS_OWN_AGE_NOTE))
                    .append("</p>\n");
            return;
        }
        // the turn-off's two columns only when some slice is old enough to have one: a young grid's table would
        // otherwise carry a column of "not found"
        boolean turnoffs = run.transitions().stream().anyMatch(t -> t.turnoff().found());
        // per slice of the catalogue, whether every model of it is ok
        Map<Slice, Boolean> allOk = run.catalogue().stream().collect(java.util.stream.Collectors.toMap(Slice::of,
                r -> r.status() == ModelStatus.OK, Boolean::logicalAnd));
        // the lithium depletion boundary's three columns only when some slice has one (a grid from the ZAMS follows
        // no lithium, an old one has burnt it at every mass it holds)
        boolean lithium = run.transitions().stream().anyMatch(t -> t.lithiumDepletion().found());
        // per slice, whether every model of it is ok and keeps over 1 % of its lithium, and its lowest ok mass with
        // a lithium value
        Map<Slice, Boolean> allKeep = run.catalogue().stream().collect(java.util.stream.Collectors.toMap(Slice::of,
                r -> r.status() == ModelStatus.OK && TransitionFinder.keepsLithium(r), Boolean::logicalAnd));
        Map<Slice, CatalogueRow> lowestWithLithium = run.catalogue().stream().filter(TransitionFinder::followsLithium)
                .collect(java.util.stream.Collectors.toMap(Slice::of, r -> r,
                        (a, c) -> a.massMsun() <= c.massMsun() ? a : c));
        b.append("<h2 id=\"transitions\">Transition masses</h2>\n");
        if (lithium) {
            b.append("<p>").append(Html.escape(LITHIUM_BOUNDARY_CAPTION)).append("</p>\n");
        }
        b.append("<table>\n<tr>" + ironHeading(names)
                + "<th>Z</th><th>age</th><th>physics</th>"
                + "<th>fully convective up to / M\u2609</th><th>bracket / M\u2609</th>"
                + "<th>core in every star above / M\u2609</th><th>bracket / M\u2609</th>"
                + "<th>small transient cores / M\u2609</th>"
                + (turnoffs ? "<th>main-sequence turn-off / M\u2609</th><th>bracket / M\u2609</th>" : "")
                + (lithium ? "<th>lithium depletion boundary / M\u2609</th><th>bracket / M\u2609</th>"
                + "<th>its luminosity / L\u2609</th>" : "")
                + "<th>method</th><th>tolerance / M\u2609</th><th>notes</th></tr>\n");
        for (TransitionRow t : run.transitions()) {
            b.append("<tr>").append(ironCell(names, t.slice().zInit())).append("<td class=\"num\">")
                    .append(SliceLabels.number(t.slice().zInit()))
                    .append("</td><td class=\"num\">").append(SliceLabels.age(t.slice().ageGyr()))
                    .append("</td><td>").append(Html.escape(SliceLabels.physics(t.slice()))).append("</td>");
            estimate(b, t.fullyConvective(), t.toleranceMsun());
            estimate(b, t.convCoreOnset(), t.toleranceMsun());
            Span window = t.transientCore();
            b.append("<td class=\"num\">").append(window == null ? "none"
                    : SliceLabels.massRange(window, t.toleranceMsun())).append("</td>");
            if (turnoffs) {
                // a young slice has no turn-off because none of its stars has left the main sequence yet:
                // "not found" there read as a search that failed. Said only when every model of the slice is ok:
                // a failed one may be the star that had left it
                if (t.turnoff().found() || !allOk.getOrDefault(t.slice(), false)) {
                    estimate(b, t.turnoff(), t.toleranceMsun());
                } else {
                    b.append("<td>").append(ALL_ON_THE_MAIN_SEQUENCE).append("</td><td></td>");
                }
            }
            if (lithium) {
                // A slice too young for any of its stars to have burnt its lithium has no boundary because none
                // has: "not found" there read as a search that failed, so the cell says why, as the turn-off's
                // does, and only when every model of the slice is ok (a failed one may be the star that had burnt
                // it). A slice whose lowest mass has burnt it has its boundary below the grid, as its notes say.
                CatalogueRow lowest = lowestWithLithium.get(t.slice());
                boolean none = !t.lithiumDepletion().found();
                if (none && allKeep.getOrDefault(t.slice(), false)) {
                    b.append("<td>").append(ALL_KEEP_LITHIUM).append("</td><td></td>");
                } else if (none && lowest != null && TransitionFinder.notesLithiumBelowGrid(t.notes())) {
                    b.append("<td>below ").append(SliceLabels.number(lowest.massMsun()))
                            .append(": burnt at the lowest mass</td><td></td>");
                } else {
                    estimate(b, t.lithiumDepletion().boundary(), t.toleranceMsun());
                }
                double luminosity = t.lithiumDepletion().luminosityLsun();
                b.append("<td class=\"num\">").append(Double.isFinite(luminosity)
                        ? SliceLabels.number(luminosity) : "").append("</td>");
            }
            b.append("<td>").append(t.method().label()).append("</td><td class=\"num\">")
                    .append(Double.isFinite(t.toleranceMsun()) ? SliceLabels.number(t.toleranceMsun()) : "")
                    .append("</td><td>").append(Html.escape(t.notes())).append("</td></tr>\n");
        }
        b.append("</table>\n");
    }

    private static void estimate(StringBuilder b, TransitionEstimate e, double toleranceMsun) {
        b.append("<td class=\"num\">")
                .append(e.found() ? SliceLabels.massToAccuracy(e.massMsun(), e.bracket(), toleranceMsun) : "not found")
                // a refined bracket rounded outward at the mass's decimals, so that it holds the mass as shown
                .append("</td><td class=\"num\">").append(e.found()
                        ? SliceLabels.bracketToAccuracy(e.bracket(), toleranceMsun) : "").append("</td>");
    }

    private static void failures(StringBuilder b, RunData run) {
        List<CatalogueRow> failed = run.catalogue().stream().filter(r -> !r.isOk()).toList();
        b.append("<h2 id=\"failures\">Models without a usable result</h2>\n");
        if (failed.isEmpty()) {
            b.append("<p>None: every model converged.</p>\n");
            return;
        }
        MetallicityNames names = run.metallicityNames();
        b.append("<table>\n<tr><th>model</th><th>mass / M\u2609</th>" + ironHeading(names)
                + "<th>Z</th><th>age</th><th>status</th>"
                + "<th>reason</th></tr>\n");
        for (CatalogueRow r : failed) {
            b.append("<tr><td>").append(Html.escape(r.modelId())).append("</td><td class=\"num\">")
                    .append(SliceLabels.number(r.massMsun())).append("</td>").append(ironCell(names, r.zInit()))
                    .append("<td class=\"num\">").append(SliceLabels.number(r.zInit()))
                    .append("</td><td class=\"num\">")
                    .append(SliceLabels.age(r.ageGyr())).append("</td><td>").append(r.status().label())
                    .append("</td><td>").append(Html.escape(r.statusDetail())).append("</td></tr>\n");
        }
        b.append("</table>\n");
    }

    /** The [Fe/H] column's heading, before Z's, in a run whose grid gave [Fe/H]; nothing otherwise. */
    private static String ironHeading(MetallicityNames names) {
        return names.namesIron() ? "<th>[Fe/H]</th>" : "";
    }

    /** A row's [Fe/H] cell, before its Z, in a run whose grid gave [Fe/H]; nothing otherwise. */
    private static String ironCell(MetallicityNames names, double zInit) {
        return names.namesIron() ? "<td class=\"num\">" + names.ironCell(zInit) + "</td>" : "";
    }

    private static void row(StringBuilder b, String key, String value) {
        b.append("<tr><th>").append(Html.escape(key)).append("</th><td>").append(Html.escape(value))
                .append("</td></tr>\n");
    }
}
