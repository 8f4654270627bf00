package org.convgrid.plotting.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.Map;
import org.convgrid.output.Span;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.transitions.TransitionEstimate;
import org.convgrid.output.transitions.TransitionFinder;
import org.convgrid.output.transitions.TransitionMethod;
import org.convgrid.output.transitions.TransitionRow;
import org.convgrid.plotting.RunData;
import org.convgrid.plotting.RunMaps;
import org.convgrid.plotting.TestRuns;
import org.convgrid.plotting.TestTracks;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ReportPageTest {

    static final Pattern IMG_SRC = Pattern.compile("<img src=\"([^\"]+)\"");

    @Test
    void staticOfflinePageWithSummaryMapsTransitionsAndFailures(@TempDir Path dir) throws Exception {
        List<CatalogueRow> rows = TestRuns.rows(TestRuns.masses(0.1, 2.0, 12), new double[] {0.004, 0.014},
                new double[] {0, 4.57});
        TestRuns.write(dir, rows);
        RunMaps.drawAll(dir);
        String html = Files.readString(ReportPage.write(dir));
        assertThat(html).startsWith("<!DOCTYPE html>").contains("<style>", "grids/synthetic.yaml",
                "Models by status", "past_main_sequence", "Transition masses", "No evolution tracks in this run.");
        assertThat(html).doesNotContain("<script", "http://", "https://", "<link");
        // the 4.57 Gyr slices have models past the main sequence above ones on it: the table gives the turn-off (it
        // was missing: "not found" beside a turn-off transitions.csv and the chart had)
        assertThat(html).contains("<th>main-sequence turn-off / M\u2609</th><th>bracket / M\u2609</th>");
        // the zero-age slices have no turn-off because no star of theirs has left the main sequence, which the cell
        // says instead of "not found", as if a search had failed
        assertThat(html.split(ReportPage.ALL_ON_THE_MAIN_SEQUENCE, -1)).hasSize(3);
        Matcher m = IMG_SRC.matcher(html);
        int images = 0;
        while (m.find()) {
            images++;
            assertThat(m.group(1)).startsWith("maps/");
            assertThat(dir.resolve(m.group(1))).isRegularFile();
        }
        // per slice two zone maps; the HR diagram and the transitions against Z and age; per Z the turnover times and
        // the envelope masses
        assertThat(images).isEqualTo(2 * 4 + 3 + 2 + 2);
        assertThat(html).contains("<h2 id=\"convective-turnover-time-against-mass\">Convective turnover time against "
                + "mass</h2>", "maps/turnover-vs-mass_z0.004_a1.8_ov0_schwarzschild.png");
        for (CatalogueRow failed : rows.stream().filter(r -> !r.isOk()).toList()) {
            assertThat(html).contains(failed.modelId(), Html.escape(failed.statusDetail()));
        }
    }

    @Test
    void tracksGetTheirSectionInsteadOfTheNote(@TempDir Path dir) throws Exception {
        List<CatalogueRow> rows = TestRuns.rows(new double[] {1.0, 2.0}, new double[] {0.014}, new double[] {0, 1});
        TestRuns.write(dir, rows);
        TestTracks.write(dir, rows, 30);
        Files.writeString(dir.resolve("tracks/p9-z00-m000.csv"), TestTracks.text(1.0, 0.014, 3));
        RunMaps.drawAll(dir);
        String html = Files.readString(ReportPage.write(dir));
        assertThat(html).contains("<h2 id=\"convective-zones-against-age\">Convective zones against age</h2>", "maps/zones-age_m2_z0.014",
                "1 track file in tracks/ matches no catalogue model").doesNotContain("No evolution tracks");
    }

    @Test
    void mapsNotYetDrawnAreListedNotLinked(@TempDir Path dir) throws Exception {
        TestRuns.write(dir, TestRuns.rows(TestRuns.masses(0.2, 1.4, 5), new double[] {0.014}, new double[] {0}));
        Files.delete(dir.resolve("manifest.yaml"));
        String html = Files.readString(ReportPage.write(dir));
        assertThat(html).doesNotContain("<img").contains("Not drawn yet", "manifest.yaml not found");
    }

    @Test
    void transitionTableNamesTheCoreMassPlainlyAndGivesAOneMassWindowAsOneMass(@TempDir Path dir) throws Exception {
        List<CatalogueRow> rows = TestRuns.rows(TestRuns.masses(0.2, 1.4, 5), new double[] {0.014}, new double[] {0});
        TransitionRow found = TransitionFinder.withDefaults().find(rows).get(0);
        // the demo's Z = 0.008, 150 Myr slice: one refinement model, 0.2875 Msun, is both ends of the window
        TransitionRow oneMassWindow = new TransitionRow(found.slice(), found.yInit(), found.fullyConvective(),
                found.convCoreOnset(), new Span(0.2875, 0.2875), TransitionMethod.REFINED, 0.002, "");
        RunData run = new RunData(rows, List.of(oneMassWindow), true, null, Map.of(), List.of());
        String html = ReportPage.html(run, dir);
        assertThat(html).contains("<th>core in every star above / M\u2609</th>", "<td class=\"num\">0.288</td>")
                .doesNotContain("0.288\u20130.288", "lasting");
    }

    @Test
    void transitionMassesRoundHalfUpAsTheReadmeAndAgesBelowAGyrAreInMyr(@TempDir Path dir) throws Exception {
        // the demo's Z = 0.02, 600 Myr window, 0.31640625-0.6375 (transitions.csv), which the README quotes as
        // 0.317-0.638: rounded half-even from the binary value, the report said 0.637
        List<CatalogueRow> rows = TestRuns.rows(TestRuns.masses(0.2, 1.4, 5), new double[] {0.02},
                new double[] {0.6});
        TransitionRow found = TransitionFinder.withDefaults().find(rows).get(0);
        TransitionRow window = new TransitionRow(found.slice(), found.yInit(), found.fullyConvective(),
                found.convCoreOnset(), new Span(0.31640625, 0.6375), TransitionMethod.REFINED, 0.002, "");
        RunData run = new RunData(rows, List.of(window), true, null, Map.of(), List.of());
        String html = ReportPage.html(run, dir);
        assertThat(html).contains("<td class=\"num\">0.316\u20130.638</td>", "<td class=\"num\">600 Myr</td>",
                "<th>age</th>").doesNotContain("0.637", "age / Gyr", "<td class=\"num\">0.6</td>");
    }

    @Test
    void aBracketIsRoundedAsItsMassIsSoThatItHoldsIt(@TempDir Path dir) throws Exception {
        // the demo's Z = 0.008, 20 Myr limit 0.328125 in 0.328125-0.3296875 read "0.328 | 0.3281-0.3297" (the value
        // below its own bracket), and a core onset of 1.2125 in 1.210937-1.2125 "1.213 | 1.211-1.212"
        List<CatalogueRow> rows = TestRuns.rows(TestRuns.masses(0.2, 1.4, 5), new double[] {0.008},
                new double[] {0.02});
        TransitionRow found = TransitionFinder.withDefaults().find(rows).get(0);
        TransitionRow refined = new TransitionRow(found.slice(), found.yInit(),
                new TransitionEstimate(0.328125, new Span(0.328125, 0.3296875), List.of(new Span(0.328125, 0.3296875)), 0),
                new TransitionEstimate(1.2125, new Span(1.210937, 1.2125), List.of(new Span(1.210937, 1.2125)), 0),
                null, TransitionMethod.REFINED, 0.002, "");
        String html = ReportPage.html(new RunData(rows, List.of(refined), true, null, Map.of(), List.of()), dir);
        assertThat(html).contains("<td class=\"num\">0.328</td><td class=\"num\">0.328\u20130.330</td>",
                "<td class=\"num\">1.213</td><td class=\"num\">1.210\u20131.213</td>")
                .doesNotContain("0.3281", "1.212");
        // a grid bracket keeps its ends, the grid's masses (rounded to its width they read 0.3-0.4 for 0.25-0.35)
        TransitionRow grid = new TransitionRow(found.slice(), found.yInit(),
                new TransitionEstimate(0.25, new Span(0.25, 0.35), List.of(new Span(0.25, 0.35)), 0),
                new TransitionEstimate(2.5, new Span(1.5, 2.5), List.of(new Span(1.5, 2.5)), 0),
                null, TransitionMethod.GRID, Double.NaN, "");
        String gridHtml = ReportPage.html(new RunData(rows, List.of(grid), true, null, Map.of(), List.of()), dir);
        assertThat(gridHtml).contains("<td class=\"num\">0.25\u20130.35</td>", "<td class=\"num\">1.5\u20132.5</td>");
        // a refined bracket whose high end rounds up past the mass's own digit still holds it: 0.33875 in
        // 0.33875-0.34 reads 0.339 beside 0.338-0.340
        assertThat(org.convgrid.plotting.label.SliceLabels.bracketToAccuracy(new Span(0.33875, 0.34), 0.002))
                .isEqualTo("0.338\u20130.340");
    }

    @Test
    void escapesText() {
        assertThat(Html.escape("a<b & \"c\"")).isEqualTo("a&lt;b &amp; &quot;c&quot;");
    }

    @Test
    void aSliceWithAFailedModelIsNotSaidToHaveNoStarPastTheMainSequence(@TempDir Path dir) throws Exception {
        // ages 0, 0.5 and 4.57 Gyr; one model of Z = 0.004 at 0.5 Gyr did not converge (TestRuns): that slice's
        // turn-off cell cannot say no star has left the main sequence, the failed one may have
        TestRuns.write(dir, TestRuns.rows(TestRuns.masses(0.1, 2.0, 12), new double[] {0.004, 0.014},
                new double[] {0, 0.5, 4.57}));
        String html = Files.readString(ReportPage.write(dir));
        // the two zero-age slices and Z = 0.014 at 0.5 Gyr; not Z = 0.004 at 0.5 Gyr
        assertThat(html.split(ReportPage.ALL_ON_THE_MAIN_SEQUENCE, -1)).hasSize(3 + 1);
    }

    @Test
    void aGridWithoutATurnOffHasNoColumnForIt(@TempDir Path dir) throws Exception {
        TestRuns.write(dir, TestRuns.rows(TestRuns.masses(0.1, 2.0, 12), new double[] {0.014}, new double[] {0}));
        String html = Files.readString(ReportPage.write(dir));
        assertThat(html).contains("Transition masses").doesNotContain("main-sequence turn-off");
    }

    @Test
    void theLithiumDepletionBoundaryGetsItsColumnsAndSaysWhyASliceHasNone(@TempDir Path dir) throws Exception {
        // synthetic lithium (the shape of young published tracks, invented values): at 0.02 Gyr the stars below
        // 0.3 Msun keep it, 0.3-1 Msun have burnt it, heavier ones keep it; at 0.15 Gyr every star below 1 Msun has
        // burnt it (the boundary lies below the grid); at 0.005 Gyr every star keeps it
        List<CatalogueRow> rows = TestRuns.rows(TestRuns.masses(0.1, 2.0, 12), new double[] {0.014},
                new double[] {0.005, 0.02, 0.15}).stream().map(r -> r.toBuilder().surfaceLiRel(
                        r.ageGyr() < 0.01 || r.massMsun() >= 1.0 ? 0.6
                                : r.ageGyr() < 0.05 && r.massMsun() < 0.3 ? 0.9 : 1e-4).build()).toList();
        TestRuns.write(dir, rows);
        String html = Files.readString(ReportPage.write(dir));
        assertThat(html).contains("<th>lithium depletion boundary / M\u2609</th><th>bracket / M\u2609</th>"
                + "<th>its luminosity / L\u2609</th>");
        assertThat(html).contains("below 0.1: burnt at the lowest mass");
        assertThat(html).contains(Html.escape(ReportPage.LITHIUM_BOUNDARY_CAPTION));
        // every star of the 0.005 Gyr slice keeps its lithium, which its cell says instead of "not found"
        assertThat(html.split(ReportPage.ALL_KEEP_LITHIUM, -1)).hasSize(2);
        TransitionRow young = TransitionFinder.withDefaults().find(rows).stream()
                .filter(t -> t.slice().ageGyr() == 0.02).findFirst().orElseThrow();
        assertThat(young.lithiumDepletion().found()).isTrue();
        assertThat(html).contains("<td class=\"num\">" + org.convgrid.plotting.label.SliceLabels.number(
                young.lithiumDepletion().luminosityLsun()) + "</td>");
    }

    @Test
    void aGridWithoutLithiumHasNoColumnForIt(@TempDir Path dir) throws Exception {
        TestRuns.write(dir, TestRuns.rows(TestRuns.masses(0.1, 2.0, 12), new double[] {0.014}, new double[] {0}));
        assertThat(Files.readString(ReportPage.write(dir))).doesNotContain("lithium depletion boundary")
                .doesNotContain(Html.escape(ReportPage.LITHIUM_BOUNDARY_CAPTION));
    }
}
