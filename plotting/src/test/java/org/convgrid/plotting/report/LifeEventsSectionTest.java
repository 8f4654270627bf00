package org.convgrid.plotting.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.convgrid.output.RunLayout;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.events.LifeEventRow;
import org.convgrid.plotting.TestRuns;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The report's life-events tables. The fixture, report/life_events.csv, is eight rows of a convgrid run of a young
 * cluster grid (1-200 Myr, Z = 0.008 and 0.02; the 1 Msun rows renumbered m003 to match the synthetic catalogue's
 * ids): the numbers only travel from the file to the page here, no physics is under test.
 */
class LifeEventsSectionTest {

    private static Path run(Path dir, boolean withLifeEvents) throws Exception {
        List<CatalogueRow> rows = TestRuns.rows(new double[] {0.1, 0.2, 0.3, 1.0}, new double[] {0.008, 0.02},
                new double[] {0.001, 0.2});
        TestRuns.write(dir, rows);
        if (withLifeEvents) {
            try (InputStream in = LifeEventsSectionTest.class.getResourceAsStream("/report/life_events.csv")) {
                Files.copy(in, dir.resolve(RunLayout.LIFE_EVENTS));
            }
        }
        return dir;
    }

    private static String section(String html) {
        int start = html.indexOf("<h2 id=\"" + LifeEventsSection.ID + "\">");
        assertThat(start).as("the life-events section").isNotNegative();
        return html.substring(start, html.indexOf("<h2", start + 1));
    }

    @Test
    void oneTablePerZWithARowPerStarInMassOrder(@TempDir Path dir) throws Exception {
        String html = Files.readString(ReportPage.write(run(dir, true)));
        assertThat(html).contains("<a href=\"#life-events\">Life events</a>");
        String section = section(html);
        assertThat(section).contains("<h3>Z = 0.008, \u03b1 = 1.8, Schwarzschild, no overshoot</h3>",
                "<h3>Z = 0.02, \u03b1 = 1.8, Schwarzschild, no overshoot</h3>", Html.escape(LifeEventsSection.CAPTION),
                Html.escape(LifeEventsSection.LEGEND), "<code>li_halved_myr</code>", "<code>track_end_myr</code>");
        // eight stars, two tables
        assertThat(section.split("<tr><td", -1)).hasSize(8 + 1);
        assertThat(section.split("<table>", -1)).hasSize(2 + 1);
        // 1 Msun at Z = 0.02: radiative core 1.732385, ZAMS 39.18085, convective core 29.44502-155.6584, lithium
        // halved 6.180123 Myr, to four significant digits; never fully convective again, no 1 % lithium (the fixture
        // predates that column, and the star keeps its lithium anyway), not exhausted by 200 Myr
        assertThat(section).contains("<tr><td class=\"num\">1</td><td class=\"num\">1.732</td><td class=\"num\">"
                + "\u2014</td><td class=\"num\">39.18</td><td class=\"num\">29.45</td><td class=\"num\">155.7</td>"
                + "<td class=\"num\">6.18</td><td class=\"num\">\u2014</td><td class=\"num\">\u2014</td>"
                + "<td class=\"num\">200</td>"
                + "<td>p0-z01-m003</td></tr>");
        // no star of the fixture has its core join its envelope: the rare event's column is left out
        assertThat(section).doesNotContain("core_envelope_merge_myr");
        // the 0.3 Msun star at Z = 0.008 is fully convective again at 182.8686 Myr
        assertThat(section).contains("<td class=\"num\">27.47</td><td class=\"num\">182.9</td>");
        // mass order within a table: 0.1 before 0.2 before 0.3 before 1
        assertThat(section.indexOf("p0-z00-m000")).isLessThan(section.indexOf("p0-z00-m001"));
        assertThat(section.indexOf("p0-z00-m002")).isLessThan(section.indexOf("p0-z00-m003"));
    }

    @Test
    void theCoreEnvelopeMergeColumnIsShownInATableWhereAStarHasIt(@TempDir Path dir) throws Exception {
        Path runDir = run(dir, true);
        Path table = runDir.resolve(RunLayout.LIFE_EVENTS);
        List<String> lines = Files.readAllLines(table);
        List<String> withColumn = new java.util.ArrayList<>();
        withColumn.add(lines.get(0) + ",core_envelope_merge_myr");
        for (String line : lines.subList(1, lines.size())) {
            // a made-up merge for the 0.3 Msun star at Z = 0.02 only (the numbers travel, no physics)
            withColumn.add(line + (line.startsWith("p0-z01-m002,") ? ",2965.3" : ","));
        }
        Files.write(table, withColumn);
        String section = section(Files.readString(ReportPage.write(runDir)));
        String[] tables = section.split("<table>", -1);
        assertThat(tables[1]).as("Z = 0.008: no star merges").doesNotContain("core_envelope_merge_myr");
        assertThat(tables[2]).contains("<code>core_envelope_merge_myr</code>", "<td class=\"num\">2965</td>");
    }

    @Test
    void anEndOnTheTracksLastStepIsMarkedProvisional(@TempDir Path dir) throws Exception {
        Path runDir = run(dir, true);
        Path table = runDir.resolve(RunLayout.LIFE_EVENTS);
        // the 0.3 Msun star at Z = 0.008 made fully convective again in its track's last step, 200 Myr (README: an
        // end on the last model is provisional; such a cell read as an event of its own)
        Files.writeString(table, Files.readString(table).replace(",27.4664,182.8686,", ",27.4664,200.0,"));
        String section = section(Files.readString(ReportPage.write(runDir)));
        String[] tables = section.split("<table>", -1);
        assertThat(tables[1]).contains("<td class=\"num\">27.47</td><td class=\"num\">200 "
                + LifeEventsSection.AT_TRACK_END + "</td>", Html.escape(LifeEventsSection.AT_TRACK_END_LEGEND));
        // the other table has no such end, and no legend for it
        assertThat(tables[2]).doesNotContain(LifeEventsSection.AT_TRACK_END);
    }

    @Test
    void aCoreEndingWithTheMainSequenceIsNotMarked() {
        // a track that ends at the exhaustion: its core's end is the main sequence's own, not provisional
        LifeEventRow row = new LifeEventRow("p0-z00-m009", 2.0, 0.02, 0.2771, 1.8, 0.0, null, 0.5, Double.NaN, 5.0, 3.0,
                880.0, Double.NaN, Double.NaN, Double.NaN, 880.0, 880.0);
        assertThat(LifeEventsSection.atTrackEnd(row.convCoreEndMyr(), row)).isFalse();
    }

    @Test
    void aRunWithoutLifeEventsHasNoSection(@TempDir Path dir) throws Exception {
        String html = Files.readString(ReportPage.write(run(dir, false)));
        assertThat(html).doesNotContain("Life events", "id=\"life-events\"");
    }

    @Test
    void anUnreadableTableIsNamedAndTheReportWrittenAllTheSame(@TempDir Path dir) throws Exception {
        run(dir, false);
        Files.writeString(dir.resolve(RunLayout.LIFE_EVENTS), "track_id,mass_msun\np0-z00-m000,0.1\n");
        String html = Files.readString(ReportPage.write(dir));
        assertThat(section(html)).contains("life_events.csv could not be read", "life-events table needs the columns");
        assertThat(html).contains("Transition masses", "Models without a usable result");
    }

    @Test
    void anEventThatDidNotHappenIsAnEmDash() {
        assertThat(LifeEventsSection.age(Double.NaN)).isEqualTo("\u2014");
        assertThat(LifeEventsSection.age(54.25809)).isEqualTo("54.26");
        assertThat(LifeEventsSection.age(3009.4)).isEqualTo("3009");
    }
}
