package org.convgrid.plotting.report;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.ToDoubleFunction;
import org.convgrid.output.OutputFormatException;
import org.convgrid.output.RunLayout;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.events.LifeEventColumns;
import org.convgrid.output.events.LifeEventReader;
import org.convgrid.output.events.LifeEventRow;
import org.convgrid.output.track.Track;
import org.convgrid.plotting.label.MetallicityNames;
import org.convgrid.plotting.label.PhysicsKey;
import org.convgrid.plotting.label.SliceLabels;

/**
 * The report's "Life events" section: {@code life_events.csv} as tables, one per physics and Z, one row per star in
 * mass order, the ages a cluster is dated by (when the radiative core appears, the ZAMS, lithium halved, ...). The
 * report had none of them, though a run from birth writes them. Nothing when the run has no life events (a grid of
 * zero ages from the zero-age main sequence writes none); a table that cannot be read is named with its reason, and
 * the rest of the report is written all the same.
 */
final class LifeEventsSection {

    /** The section's anchor. */
    static final String ID = "life-events";
    static final String HEADING = "Life events";
    /** An event that did not happen on the computed track. */
    static final String NONE = "\u2014";
    /**
     * Ages are shown to four significant digits ({@link SliceLabels#number}): each is an evolution step's age or
     * interpolated between two, uncertain by ~1.5-3 % from the step size before the ZAMS (README), so more digits
     * would claim more than the steps give.
     */
    static final String CAPTION = "Ages in Myr since birth, from " + RunLayout.LIFE_EVENTS + ", to four significant "
            + "digits. The radiative core's return to full convection and a core's merge with the envelope are the "
            + "first evolution step that shows them, the other events are interpolated between two steps (but a "
            + "convective core gone only in a track's last step, or grown out of a zone that filled the star, is "
            + "dated at that step); all move with the step size: by ~1.5 % (ZAMS) to ~3 % (radiative core, lithium "
            + "halved) between the default steps and a quarter of them before the ZAMS, and by up to a fraction of "
            + "a step, which reaches ~1 Gyr in old low-mass stars, after it (README).";
    static final String LEGEND = NONE + " : the event did not happen on the computed track, that is by the age in "
            + "the last column (a star of a grid that stops at 100 Myr may still reach it later).";
    /** Marks an end dated at the track's last step. */
    static final String AT_TRACK_END = "\u2020";
    static final String AT_TRACK_END_LEGEND = AT_TRACK_END + " : an end seen only in the track's last step, so "
            + "provisional: the core or the radiative core may come back beyond the computed track (README).";

    /**
     * One column of the table: its words, the file's column name and the age it shows; {@code onlyWhenSeen}: shown
     * only in a table where some star has the event (a rare one, which would otherwise add an empty column to
     * almost every run's report).
     */
    private record Column(String words, String name, ToDoubleFunction<LifeEventRow> myr, boolean onlyWhenSeen,
                          boolean anEnd) {

        Column(String words, String name, ToDoubleFunction<LifeEventRow> myr) {
            this(words, name, myr, false, false);
        }

        /** The column's cell for {@code row}: an end on the track's last step marked {@link #AT_TRACK_END}. */
        String cell(LifeEventRow row) {
            double at = myr.applyAsDouble(row);
            return age(at) + (anEnd && atTrackEnd(at, row) ? " " + AT_TRACK_END : "");
        }

        boolean shownFor(List<LifeEventRow> rows) {
            return !onlyWhenSeen || rows.stream().anyMatch(r -> Double.isFinite(myr.applyAsDouble(r)));
        }
    }

    private static final List<Column> COLUMNS = List.of(
            new Column("radiative core appears", LifeEventColumns.RADIATIVE_CORE, LifeEventRow::radiativeCoreMyr),
            new Column("fully convective again", LifeEventColumns.RADIATIVE_CORE_END,
                    LifeEventRow::radiativeCoreEndMyr, false, true),
            new Column("ZAMS", LifeEventColumns.ZAMS, LifeEventRow::zamsMyr),
            new Column("convective core appears", LifeEventColumns.CONV_CORE_ONSET, LifeEventRow::convCoreOnsetMyr),
            new Column("convective core ends", LifeEventColumns.CONV_CORE_END, LifeEventRow::convCoreEndMyr, false,
                    true),
            new Column("core joins envelope", LifeEventColumns.CORE_ENVELOPE_MERGE,
                    LifeEventRow::coreEnvelopeMergeMyr, true, false),
            new Column("surface Li halved", LifeEventColumns.LI_HALVED, LifeEventRow::liHalvedMyr),
            new Column("surface Li at 1 %", LifeEventColumns.LI_ONE_PERCENT, LifeEventRow::liOnePercentMyr),
            new Column("central H exhausted", LifeEventColumns.CENTRAL_H_EXHAUSTED,
                    LifeEventRow::centralHExhaustedMyr));

    /**
     * A run's life events as read.
     *
     * @param rows the table's rows, in file order (empty when the run has none)
     * @param unreadable why the table could not be read; null when it could
     */
    record Table(List<LifeEventRow> rows, String unreadable) {
        Table {
            rows = List.copyOf(rows);
        }

        boolean shown() {
            return !rows.isEmpty() || unreadable != null;
        }
    }

    private LifeEventsSection() {
    }

    /** The life events of a run directory: none when it has no life_events.csv, the reason when it is unreadable. */
    static Table read(Path runDir) {
        Path file = new RunLayout(runDir).lifeEvents();
        try {
            return new Table(LifeEventReader.read(file), null);
        } catch (OutputFormatException e) {
            return new Table(List.of(), e.getMessage());
        } catch (IOException | UncheckedIOException e) {
            return new Table(List.of(), file + ": " + e.getMessage());
        }
    }

    /**
     * Appends the section: a table per physics and Z (the physics named as the catalogue's row of the star's track
     * has it, since the file lacks the criterion and opacity scale), one row per star by mass.
     */
    static void append(StringBuilder b, Table table, List<CatalogueRow> catalogue, MetallicityNames names) {
        if (!table.shown()) {
            return;
        }
        b.append("<h2 id=\"").append(ID).append("\">").append(HEADING).append("</h2>\n");
        if (table.unreadable() != null) {
            b.append("<p class=\"missing\">").append(Html.escape(RunLayout.LIFE_EVENTS)).append(" could not be read: ")
                    .append(Html.escape(table.unreadable())).append("</p>\n");
            return;
        }
        b.append("<p>").append(Html.escape(CAPTION)).append("</p>\n<p>").append(Html.escape(LEGEND))
                .append("</p>\n");
        Map<String, PhysicsKey> physicsOfTrack = new LinkedHashMap<>();
        catalogue.forEach(r -> physicsOfTrack.putIfAbsent(Track.trackIdOf(r.modelId()), PhysicsKey.of(r)));
        Map<String, List<LifeEventRow>> groups = new LinkedHashMap<>();
        for (LifeEventRow row : table.rows()) {
            PhysicsKey physics = physicsOfTrack.getOrDefault(row.trackId(), new PhysicsKey(row.mixingLength(),
                    row.overshootHp(), row.overshootProfile(), null, Double.NaN));
            String heading = names.of(row.zInit()) + ", " + physics.describe();
            groups.computeIfAbsent(heading, h -> new java.util.ArrayList<>()).add(row);
        }
        groups.forEach((heading, rows) -> group(b, heading, rows));
    }

    private static void group(StringBuilder b, String heading, List<LifeEventRow> rows) {
        b.append("<h3>").append(Html.escape(heading)).append("</h3>\n<table>\n<tr><th>mass / M\u2609</th>");
        List<Column> columns = COLUMNS.stream().filter(c -> c.shownFor(rows)).toList();
        columns.forEach(c -> b.append("<th>").append(Html.escape(c.words())).append("<br><code>")
                .append(Html.escape(c.name())).append("</code></th>"));
        b.append("<th>track ends<br><code>").append(LifeEventColumns.TRACK_END).append("</code></th><th>track</th>"
                + "</tr>\n");
        for (LifeEventRow row : rows.stream().sorted(Comparator.comparingDouble(LifeEventRow::massMsun)).toList()) {
            b.append("<tr><td class=\"num\">").append(SliceLabels.number(row.massMsun())).append("</td>");
            columns.forEach(c -> b.append("<td class=\"num\">").append(c.cell(row)).append("</td>"));
            b.append("<td class=\"num\">").append(Double.isFinite(row.trackEndMyr())
                    ? SliceLabels.number(row.trackEndMyr()) : "").append("</td><td>")
                    .append(Html.escape(row.trackId())).append("</td></tr>\n");
        }
        b.append("</table>\n");
        boolean marked = rows.stream().anyMatch(r -> columns.stream().anyMatch(c -> c.anEnd()
                && atTrackEnd(c.myr().applyAsDouble(r), r)));
        if (marked) {
            b.append("<p>").append(Html.escape(AT_TRACK_END_LEGEND)).append("</p>\n");
        }
    }

    /**
     * Whether an end falls on the track's last model (README: such an end is provisional). A core whose end is the
     * main sequence's own end (central hydrogen exhausted) is not provisional: the main sequence is over.
     */
    static boolean atTrackEnd(double endMyr, LifeEventRow row) {
        return Double.isFinite(endMyr) && endMyr == row.trackEndMyr() && endMyr != row.centralHExhaustedMyr();
    }

    /** An event's age, Myr, to four significant digits; {@link #NONE} when it did not happen on the track. */
    static String age(double myr) {
        return Double.isFinite(myr) ? SliceLabels.number(myr) : NONE;
    }
}
