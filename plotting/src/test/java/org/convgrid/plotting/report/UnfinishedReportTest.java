package org.convgrid.plotting.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.manifest.RunManifest;
import org.convgrid.output.manifest.RunManifestReader;
import org.convgrid.output.manifest.RunManifestWriter;
import org.convgrid.plotting.TestRuns;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The report of a run that did not finish says so before anything else, in a box of its own. */
class UnfinishedReportTest {

    @Test
    void anUnfinishedRunsReportSaysHowManyModelsArePresentAndHowToContinue(@TempDir Path dir) throws Exception {
        List<CatalogueRow> rows = TestRuns.rows(TestRuns.masses(0.2, 1.4, 5), new double[] {0.014}, new double[] {0});
        TestRuns.write(dir, rows);
        RunManifest finished = RunManifestReader.read(Files.readString(dir.resolve("manifest.yaml")));
        Files.writeString(dir.resolve("manifest.yaml"),
                RunManifestWriter.toYaml(finished.unfinished(finished.counts(), Double.NaN, 12)));

        String html = Files.readString(ReportPage.write(dir));

        String note = "<p class=\"unfinished\">This run is unfinished: 5 of 12 models in catalogue.ecsv. The maps and "
                + "tables below cover those models only. Continue it with <code>convgrid run grids/synthetic.yaml "
                + "--out " + dir.toAbsolutePath().normalize() + " --resume</code>.</p>";
        assertThat(html).contains(note);
        assertThat(html.indexOf(note)).as("above the contents").isLessThan(html.indexOf("<h2"));
        assertThat(html).contains(".unfinished {");
    }

    @Test
    void aFinishedRunWhoseGridAsksForRefinementButHoldsGridBracketsSaysSo(@TempDir Path dir) throws Exception {
        // TestRuns writes the grid's own brackets (method grid) for a grid that does not say refine: false
        TestRuns.write(dir, TestRuns.rows(TestRuns.masses(0.2, 1.4, 5), new double[] {0.014}, new double[] {0}));

        String html = Files.readString(ReportPage.write(dir));

        assertThat(html).contains("<p class=\"unrefined\">The transition masses are not refined")
                .contains("convgrid transitions " + dir.toAbsolutePath().normalize() + " --refine");
        assertThat(html.indexOf("class=\"unrefined\"")).as("above the contents").isLessThan(html.indexOf("<h2"));
    }

    @Test
    void refinedTransitionsOrAGridThatDoesNotRefineGetNoSuchNote(@TempDir Path dir) throws Exception {
        Path refined = TestRuns.write(dir.resolve("refined"),
                TestRuns.rows(TestRuns.masses(0.2, 1.4, 5), new double[] {0.014}, new double[] {0}));
        Path table = refined.resolve("transitions.csv");
        List<org.convgrid.output.transitions.TransitionRow> rows = org.convgrid.output.transitions.TransitionReader
                .read(new java.io.StringReader(Files.readString(table)));
        java.io.StringWriter out = new java.io.StringWriter();
        org.convgrid.output.transitions.TransitionWriter.write(rows.stream().map(t -> new org.convgrid.output
                .transitions.TransitionRow(t.slice(), t.yInit(), t.fullyConvective(), t.convCoreOnset(),
                t.transientCore(), org.convgrid.output.transitions.TransitionMethod.REFINED, 0.002, t.notes())).toList(),
                out);
        Files.writeString(table, out.toString());
        assertThat(Files.readString(ReportPage.write(refined))).doesNotContain("class=\"unrefined\"");

        Path plain = TestRuns.write(dir.resolve("plain"),
                TestRuns.rows(TestRuns.masses(0.2, 1.4, 5), new double[] {0.014}, new double[] {0}));
        appendToGridText(plain, "transitions: {refine: false}\n");
        assertThat(Files.readString(ReportPage.write(plain))).doesNotContain("class=\"unrefined\"");

        // grid brackets already narrower than the tolerance: a refinement would add nothing, so no note
        Path fine = TestRuns.write(dir.resolve("fine"),
                TestRuns.rows(TestRuns.masses(0.2, 1.4, 5), new double[] {0.014}, new double[] {0}));
        appendToGridText(fine, "transitions: {tolerance_msun: 0.5}\n");
        assertThat(Files.readString(ReportPage.write(fine))).doesNotContain("class=\"unrefined\"");
    }

    @Test
    void aFinishedRunsReportHasNoSuchNote(@TempDir Path dir) throws Exception {
        TestRuns.write(dir, TestRuns.rows(TestRuns.masses(0.2, 1.4, 5), new double[] {0.014}, new double[] {0}));

        assertThat(Files.readString(ReportPage.write(dir))).doesNotContain("class=\"unfinished\"");
    }

    /** Adds {@code yaml} to the grid text the run's manifest records, the rest of the manifest unchanged. */
    private static void appendToGridText(Path run, String yaml) throws Exception {
        Path file = run.resolve("manifest.yaml");
        RunManifest m = RunManifestReader.read(Files.readString(file));
        Files.writeString(file, RunManifestWriter.toYaml(new RunManifest(m.toolVersion(), m.toolCommit(),
                m.gridFile(), m.gridText() + yaml, m.gridFileSha256(), m.gridModelsSha256(), m.physics(),
                m.started(), m.finished(), m.threads(), m.shard(), m.counts(), m.medianSecondsPerModel(),
                m.ageOrigin())));
    }
}
