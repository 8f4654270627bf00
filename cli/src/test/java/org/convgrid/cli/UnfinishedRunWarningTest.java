package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.convgrid.output.manifest.RunManifest;
import org.convgrid.output.manifest.RunManifestReader;
import org.convgrid.output.manifest.RunManifestWriter;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code transitions} and {@code plot} on a run that did not finish warn how many of its models are there. */
class UnfinishedRunWarningTest {

    @TempDir
    Path work;

    private CliHarness.Execution run(String... args) {
        return CliHarness.in(work, FakeChunkSolver.fast()).execute(args);
    }

    /** A run cut after its first 40 rows, as an interruption leaves it (manifest unfinished, 156 expected). */
    private Path cutRun() throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        assertThat(run("run", "--no-refine", grid.toString(), "--out", "d", "--quiet").code()).isZero();
        Path dir = work.resolve("d");
        List<String> lines = Files.readAllLines(dir.resolve("catalogue.ecsv"));
        Files.write(dir.resolve("catalogue.ecsv"), lines.subList(0, CliHarness.CATALOGUE_HEADER_LINES + 40));
        RunManifest finished = RunManifestReader.read(Files.readString(dir.resolve("manifest.yaml")));
        Files.writeString(dir.resolve("manifest.yaml"), RunManifestWriter.toYaml(
                finished.unfinished(finished.counts(), finished.medianSecondsPerModel(), CliHarness.GRID_MODELS)));
        return dir;
    }

    @Test
    void transitionsWarnsThatTheRunIsUnfinished() throws Exception {
        Path dir = cutRun();

        CliHarness.Execution done = run("transitions", dir.toString());

        assertThat(done.code()).isZero();
        assertThat(done.err()).contains("convgrid: warning: the run in " + dir + " is unfinished: 40 of 156 models "
                + "in catalogue.ecsv; what follows covers those only (continue it with: convgrid run " + work
                + "/survey.yaml --out " + dir + " --resume)");
    }

    @Test
    void plotWarnsAndTheReportSaysSo() throws Exception {
        Path dir = cutRun();

        CliHarness.Execution done = run("plot", dir.toString());

        assertThat(done.code()).isZero();
        assertThat(done.err()).contains("is unfinished: 40 of 156 models in catalogue.ecsv");
        assertThat(Files.readString(dir.resolve("report.html"))).contains("This run is unfinished: 40 of 156 models");
    }

    @Test
    void plotWarnsWhenTheManifestIsMissing() throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        assertThat(run("run", "--no-refine", grid.toString(), "--out", "d", "--quiet").code()).isZero();
        Files.delete(work.resolve("d/manifest.yaml"));

        CliHarness.Execution done = run("plot", "d");

        assertThat(done.code()).isZero();
        assertThat(done.err()).contains("convgrid: warning: ").contains("has no manifest.yaml: whether its run "
                + "finished is unknown");
    }

    @Test
    void aFinishedRunGetsNoWarning() throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        assertThat(run("run", "--no-refine", grid.toString(), "--out", "d", "--quiet").code()).isZero();

        assertThat(run("transitions", "d").err()).doesNotContain("unfinished");
        assertThat(run("plot", "d").err()).doesNotContain("unfinished");
    }
}
