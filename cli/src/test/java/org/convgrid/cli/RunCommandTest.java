package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.concurrent.atomic.AtomicReference;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.survey.FinishedRun;
import org.convgrid.output.catalogue.CatalogueReader;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.catalogue.CatalogueWriter;
import org.convgrid.output.manifest.RunManifest;
import org.convgrid.output.manifest.RunManifestReader;
import org.convgrid.output.transitions.TransitionReader;
import org.convgrid.survey.FinishedRun;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RunCommandTest {

    @TempDir
    Path work;

    private Path grid() throws Exception {
        return CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
    }

    private CliHarness.Execution run(String... args) {
        return CliHarness.in(work, FakeChunkSolver.fast()).execute(args);
    }

    @Test
    void catalogueIsByteIdenticalWhateverTheThreadCount() throws Exception {
        Path grid = grid();
        for (String threads : List.of("1", "2", "4")) {
            assertThat(run("run", "--no-refine", grid.toString(), "--out", "t" + threads, "--threads", threads, "--quiet").code())
                    .isEqualTo(0);
        }
        byte[] one = Files.readAllBytes(work.resolve("t1/catalogue.ecsv"));
        assertThat(Files.readAllBytes(work.resolve("t2/catalogue.ecsv"))).isEqualTo(one);
        assertThat(Files.readAllBytes(work.resolve("t4/catalogue.ecsv"))).isEqualTo(one);
        assertThat(CliHarness.tableLines(work.resolve("t1/catalogue.ecsv"))).hasSize(1 + (int) CliHarness.GRID_MODELS);
    }

    @Test
    void writesTheRunDirectoryInTheGridsOutputDirByDefault() throws Exception {
        CliHarness.Execution done = run("run", "--no-refine", grid().toString(), "--threads", "2");
        assertThat(done.code()).isEqualTo(0);
        Path dir = work.resolve("runs/test-survey");
        assertThat(done.out()).contains(dir + ": 156 models in catalogue.ecsv (156 ok, 0 not_converged, "
                + "0 past_main_sequence, 0 failed)");
        assertThat(done.err()).contains("computing 156 models").contains("156 of 156 saved (100%), 156 computed");
        List<CatalogueRow> rows = CatalogueReader.read(dir.resolve("catalogue.ecsv"));
        assertThat(rows.get(0).modelId()).isEqualTo("p0-z00-m000-a00");
        assertThat(rows.get(155).modelId()).isEqualTo("p0-z01-m038-a01");
        RunManifest manifest = RunManifestReader.read(Files.readString(dir.resolve("manifest.yaml")));
        assertThat(manifest.total()).isEqualTo(156);
        assertThat(manifest.counts().get(ModelStatus.OK)).isEqualTo(156);
        assertThat(manifest.finished()).isNotNull().isAfterOrEqualTo(manifest.started());
        assertThat(manifest.threads()).isEqualTo(2);
        assertThat(manifest.shard()).isNull();
        assertThat(manifest.gridText()).isEqualTo(CliHarness.GRID);
        assertThat(manifest.medianSecondsPerModel()).isFinite().isNotNegative();
        // the fake solver is fully convective up to 0.35 Msun and has a core from 1.25 Msun
        var transitions = TransitionReader.read(new StringReader(Files.readString(dir.resolve("transitions.csv"))));
        assertThat(transitions).hasSize(4);
        assertThat(transitions.get(0).fullyConvective().massMsun()).isEqualTo(0.35);
        assertThat(transitions.get(0).convCoreOnset().massMsun()).isEqualTo(1.25);
    }

    @Test
    void catalogueRoundTripsThroughItsReader() throws Exception {
        assertThat(run("run", "--no-refine", grid().toString(), "--out", "rt", "--quiet").code()).isEqualTo(0);
        String text = Files.readString(work.resolve("rt/catalogue.ecsv"));
        List<CatalogueRow> rows = CatalogueReader.read(new StringReader(text));
        StringBuilder again = new StringBuilder();
        CatalogueWriter.startingWithHeader(again).writeAll(rows);
        assertThat(again.toString()).isEqualTo(text);
    }

    @Test
    void someFailedModelsGiveExitCodeThreeAndStayInTheCatalogue() throws Exception {
        FakeChunkSolver failing = new FakeChunkSolver(Set.of("p0-z00-m002-a00", "p0-z01-m020-a01"), 0);
        CliHarness.Execution done = CliHarness.in(work, failing).execute("run", "--no-refine", grid().toString(), "--out", "f",
                "--quiet");
        assertThat(done.code()).isEqualTo(3);
        assertThat(done.out()).contains("154 ok, 0 not_converged, 0 past_main_sequence, 2 failed");
        List<CatalogueRow> rows = CatalogueReader.read(work.resolve("f/catalogue.ecsv"));
        assertThat(rows).hasSize(156);
        CatalogueRow failed = rows.get(4);
        assertThat(failed.modelId()).isEqualTo("p0-z00-m002-a00");
        assertThat(failed.status()).isEqualTo(ModelStatus.FAILED);
        // the solver's two-line reason is kept on one line, so every row is one line of the file
        assertThat(failed.statusDetail()).isEqualTo("fake solver gave up at shell 12");
        assertThat(CliHarness.tableLines(work.resolve("f/catalogue.ecsv"))).hasSize(157);
    }

    @Test
    void aGridOfMoreThanOneHundredThousandModelsNeedsYes() throws Exception {
        Path big = CliHarness.writeGrid(work, "big.yaml", """
                mass: {from: 0.1, to: 2.0, count: 1001}
                metallicity: {z: [0.001, 0.002, 0.004, 0.008, 0.01, 0.014, 0.02, 0.025, 0.03, 0.04], y: [0.25, 0.25,
                  0.25, 0.26, 0.26, 0.27, 0.28, 0.28, 0.29, 0.30]}
                age: {gyr: [0, 1, 2, 3, 4, 5, 6, 7, 8, 9], origin: zams}
                """);
        CliHarness.Execution refused = run("run", "--no-refine", big.toString(), "--out", "big");
        assertThat(refused.code()).isEqualTo(2);
        assertThat(refused.err()).contains("100100 models, more than 100000").contains("--yes");
        assertThat(Files.exists(work.resolve("big"))).isFalse();
    }

    @Test
    void anUnwritableOutputFolderFailsCleanlyAndLeavesNothing() throws Exception {
        Path grid = grid();
        Path file = Files.writeString(work.resolve("plain-file"), "not a directory");
        CliHarness.Execution failed = run("run", "--no-refine", grid.toString(), "--out", "plain-file/deeper/run", "--quiet");
        // an output directory that cannot be made is the user's choice to correct: exit 2, before any work
        assertThat(failed.code()).isEqualTo(2);
        assertThat(failed.err().strip().lines()).hasSize(1);
        assertThat(failed.err()).startsWith("convgrid: --out " + file.resolve("deeper/run") + " cannot be created")
                .contains(file + " is not a directory");
        assertThat(Files.readString(file)).isEqualTo("not a directory");
        try (var listing = Files.list(work)) {
            assertThat(listing.map(p -> p.getFileName().toString())).containsExactlyInAnyOrder("survey.yaml",
                    "plain-file");
        }
    }

    @Test
    void aRunDirectoryWithACatalogueIsNotOverwrittenWithoutForce() throws Exception {
        Path grid = grid();
        assertThat(run("run", "--no-refine", grid.toString(), "--out", "d", "--quiet").code()).isEqualTo(0);
        byte[] before = Files.readAllBytes(work.resolve("d/catalogue.ecsv"));
        CliHarness.Execution again = run("run", "--no-refine", grid.toString(), "--out", "d", "--quiet");
        assertThat(again.code()).isEqualTo(2);
        // a finished run is named as such; not refined yet, a resume may still refine it
        assertThat(again.err()).contains("already holds a finished run (").contains("--force")
                .contains("a new --out").contains("--resume refines its transitions");
        assertThat(Files.readAllBytes(work.resolve("d/catalogue.ecsv"))).isEqualTo(before);
        assertThat(run("run", "--no-refine", grid.toString(), "--out", "d", "--quiet", "--force").code()).isEqualTo(0);
        assertThat(Files.readAllBytes(work.resolve("d/catalogue.ecsv"))).isEqualTo(before);
        assertThat(run("run", "--no-refine", grid.toString(), "--out", "d", "--resume", "--force").code()).isEqualTo(2);
    }

    @Test
    void badThreadCountAndShardAreUsageErrors() throws Exception {
        Path grid = grid();
        assertThat(run("run", "--no-refine", grid.toString(), "--threads", "0").code()).isEqualTo(2);
        CliHarness.Execution shard = run("run", "--no-refine", grid.toString(), "--shard", "4/3");
        assertThat(shard.code()).isEqualTo(2);
        assertThat(shard.err()).contains("--shard must be K/N");
        assertThat(run("run", "--no-refine", grid.toString(), "--threads", "two").code()).isEqualTo(2);
        assertThat(Files.exists(work.resolve("runs"))).isFalse();
    }

    @Test
    void finishersSeeTheCompletedRunDirectory() throws Exception {
        AtomicReference<FinishedRun> seen = new AtomicReference<>();
        CliHarness cli = CliHarness.in(work, FakeChunkSolver.fast());
        cli = cli.with(cli.context().withFinisher(run -> {
            assertThat(Files.exists(run.directory().resolve("manifest.yaml"))).isTrue();
            seen.set(run);
        }));
        assertThat(cli.execute("run", "--no-refine", grid().toString(), "--out", "fin", "--quiet").code()).isEqualTo(0);
        assertThat(seen.get().catalogue()).hasSize(156);
        assertThat(seen.get().transitions()).hasSize(4);
        assertThat(seen.get().manifest().finished()).isNotNull();
    }

    @Test
    void theProductionSolverComputesRealZeroAgeModels() throws Exception {
        Path grid = work.resolve("two-stars.yaml");
        Files.writeString(grid, """
                title: two stars
                mass: {values: [0.9, 1.0]}
                metallicity: {z: [0.0188], y: [0.275]}
                output: {dir: runs/two-stars}
                """);
        CliHarness cli = CliHarness.in(work, FakeChunkSolver.fast());
        cli = cli.with(cli.context().withSolvers(org.convgrid.survey.ProductionSolvers.factory()));
        CliHarness.Execution run = cli.execute("run", "--no-refine", grid.toString(), "--threads", "1", "--quiet");
        assertThat(run.code()).as(run.err()).isZero();
        java.util.List<String> lines = CliHarness.tableLines(work.resolve("runs/two-stars/catalogue.ecsv"));
        assertThat(lines).hasSize(3);
        assertThat(lines.get(1)).contains(",ok,").contains("conv_envelope");
        assertThat(lines.get(2)).contains(",ok,").contains("conv_envelope");
    }
}
