package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.output.catalogue.CatalogueColumns;
import org.convgrid.output.catalogue.CatalogueReader;
import org.convgrid.output.manifest.RunManifest;
import org.convgrid.output.manifest.RunManifestReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ShardMergeTest {

    @TempDir
    Path work;

    private CliHarness.Execution run(String... args) {
        return CliHarness.in(work, FakeChunkSolver.fast()).execute(args);
    }

    private Path grid() throws Exception {
        return CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
    }

    private void runShards(Path grid, int count) {
        for (int k = 1; k <= count; k++) {
            CliHarness.Execution shard = run("run", grid.toString(), "--shard", k + "/" + count, "--quiet");
            assertThat(shard.code()).isEqualTo(0);
        }
    }

    @Test
    void mergedShardsAreByteIdenticalToASingleRun() throws Exception {
        Path grid = grid();
        // shards leave the refinement to the merged directory, so the single run skips it too
        assertThat(run("run", grid.toString(), "--out", "single", "--quiet", "--no-refine").code()).isEqualTo(0);
        runShards(grid, 3);
        Path shard2 = work.resolve("runs/test-survey-shard-2-of-3");
        RunManifest second = RunManifestReader.read(Files.readString(shard2.resolve("manifest.yaml")));
        assertThat(second.shard()).isEqualTo("2/3");
        long shardRows = CatalogueReader.read(shard2.resolve("catalogue.ecsv")).size();
        assertThat(shardRows).isEqualTo(second.total()).isBetween(1L, CliHarness.GRID_MODELS - 1);

        // one shard as an earlier version wrote it (three columns fewer, a description reworded): merged all the same
        Path earlier = shard2.resolve("catalogue.ecsv");
        Files.writeString(earlier, ResumeTest.earlierLayout(Files.readString(earlier), Integer.MAX_VALUE));
        CliHarness.Execution merged = run("merge", "runs/test-survey-shard-3-of-3", "runs/test-survey-shard-1-of-3",
                "runs/test-survey-shard-2-of-3", "--out", "merged");
        assertThat(merged.code()).isEqualTo(0);
        assertThat(merged.out()).contains("merged 3 shard directories, 156 models (156 ok");
        // the grid refines by default and shards do not: merge says what is left to match a single run
        assertThat(merged.err()).contains("convgrid: the transition masses are not refined yet (shards do not "
                + "refine); to match a single run: convgrid transitions ").contains("merged --refine");
        for (String file : List.of("zones.csv", "transitions.csv")) {
            assertThat(Files.readAllBytes(work.resolve("merged").resolve(file)))
                    .isEqualTo(Files.readAllBytes(work.resolve("single").resolve(file)));
        }
        // the earlier shard's rows could not carry the mixed core's top (empty); their overshoot profile is the
        // grid's and their fe_h_dex is computed from z_init and y_init; every other cell is the single run's
        List<String> mergedRows = Files.readAllLines(work.resolve("merged/catalogue.ecsv"));
        List<String> singleRows = Files.readAllLines(work.resolve("single/catalogue.ecsv"));
        assertThat(mergedRows).hasSameSizeAs(singleRows);
        java.util.Set<String> earlierIds = new java.util.HashSet<>();
        CatalogueReader.read(earlier).forEach(row -> earlierIds.add(row.modelId()));
        int emptied = 0;
        for (int i = 0; i < singleRows.size(); i++) {
            String single = singleRows.get(i);
            if (!mergedRows.get(i).equals(single)) {
                List<String> cells = new java.util.ArrayList<>(List.of(single.split(",", -1)));
                assertThat(cells.get(CatalogueColumns.HEADER.indexOf(CatalogueColumns.OVERSHOOT_PROFILE))).isEqualTo("uniform");
                cells.set(CatalogueColumns.HEADER.indexOf(CatalogueColumns.CORE_MIXED_MASS_FRAC), "");
                assertThat(mergedRows.get(i)).isEqualTo(String.join(",", cells));
                assertThat(earlierIds).contains(single.substring(0, single.indexOf(',')));
                emptied++;
            }
        }
        assertThat(emptied).isPositive();
        RunManifest manifest = RunManifestReader.read(Files.readString(work.resolve("merged/manifest.yaml")));
        assertThat(manifest.shard()).isNull();
        assertThat(manifest.total()).isEqualTo(156);
        assertThat(manifest.gridModelsSha256()).isEqualTo(second.gridModelsSha256());
    }

    @Test
    void aShardThatHoldsNoModelSaysSo() throws Exception {
        // 39 masses x 2 Z: 5 blocks of up to 8 masses per Z, 10 in all, so the 11th of 11 shards holds nothing
        CliHarness.Execution empty = run("run", grid().toString(), "--shard", "11/11", "--quiet");
        assertThat(empty.code()).isEqualTo(0);
        assertThat(empty.err()).contains("convgrid: warning: shard 11/11 holds none of the grid's 156 models: "
                + "shards take blocks of up to 8 consecutive masses per metallicity and physics choice");
        CliHarness.Execution full = run("run", grid().toString(), "--shard", "1/11", "--quiet", "--out", "one");
        assertThat(full.err()).doesNotContain("holds none");
    }

    @Test
    void aMissingShardIsReportedAndNothingIsWritten() throws Exception {
        runShards(grid(), 3);
        CliHarness.Execution merged = run("merge", "runs/test-survey-shard-1-of-3", "runs/test-survey-shard-3-of-3",
                "--out", "merged");
        assertThat(merged.code()).isEqualTo(2);
        // shard 2 of 3 owns chunks 1, 4, 7: the first is masses 8..15 of Z index 0
        assertThat(merged.err()).contains("models missing from every shard: p0-z00-m008-a00, p0-z00-m008-a01");
        assertThat(Files.exists(work.resolve("merged"))).isFalse();
    }

    @Test
    void aDirectoryWithAnEarlierRunsFilesButNoCatalogueIsRefusedAndKept() throws Exception {
        // a merge into a directory whose catalogue and manifest had been deleted: the earlier run's life
        // events, tracks and charts stayed beside the merged catalogue and read as the merge's own
        runShards(grid(), 2);
        Path earlier = Files.createDirectories(work.resolve("earlier"));
        Files.writeString(earlier.resolve("life_events.csv"), "track_id\n");
        CliHarness.Execution merged = run("merge", "runs/test-survey-shard-1-of-2", "runs/test-survey-shard-2-of-2",
                "--out", "earlier");
        assertThat(merged.code()).isEqualTo(2);
        assertThat(merged.err()).contains("holds files a run writes").contains("life_events.csv")
                .contains("merge into a new directory");
        try (var left = Files.list(earlier)) {
            // the command's lock file aside (empty once released)
            assertThat(left).extracting(p -> p.getFileName().toString()).filteredOn(n -> !n.equals(".convgrid.lock"))
                    .containsExactly("life_events.csv");
        }
    }

    @Test
    void theMergedManifestNamesTheBuildThatComputedTheShardsAndMixedBuildsAreSaid() throws Exception {
        runShards(grid(), 2);
        Path first = work.resolve("runs/test-survey-shard-1-of-2/manifest.yaml");
        Path second = work.resolve("runs/test-survey-shard-2-of-2/manifest.yaml");
        for (Path manifest : List.of(first, second)) {
            Files.writeString(manifest, Files.readString(manifest).replaceFirst("tool_commit: .*",
                    "tool_commit: 0123abc"));
        }
        CliHarness.Execution same = run("merge", "runs/test-survey-shard-1-of-2", "runs/test-survey-shard-2-of-2",
                "--out", "same");
        assertThat(same.code()).isZero();
        assertThat(same.err()).doesNotContain("different builds");
        assertThat(RunManifestReader.read(Files.readString(work.resolve("same/manifest.yaml"))).toolCommit())
                .isEqualTo("0123abc");

        Files.writeString(second, Files.readString(second).replace("tool_commit: 0123abc", "tool_commit: 4567def"));
        CliHarness.Execution mixed = run("merge", "runs/test-survey-shard-1-of-2", "runs/test-survey-shard-2-of-2",
                "--out", "mixed");
        assertThat(mixed.code()).isZero();
        assertThat(mixed.err()).contains("the shards were computed by different builds (").contains("0123abc: ")
                .contains("4567def: ").contains("test-survey-shard-2-of-2");
        // then the merging build is recorded, neither shard's
        assertThat(RunManifestReader.read(Files.readString(work.resolve("mixed/manifest.yaml"))).toolCommit())
                .isNotIn("0123abc", "4567def");
    }

    @Test
    void missingModelsNameTheShardThatIsUnfinished() throws Exception {
        runShards(grid(), 2);
        // shard 2 as an interrupted (or still running) task leaves it: some rows, an unfinished manifest
        Path shard = work.resolve("runs/test-survey-shard-2-of-2");
        List<String> lines = Files.readAllLines(shard.resolve("catalogue.ecsv"));
        Files.write(shard.resolve("catalogue.ecsv"), lines.subList(0, CliHarness.CATALOGUE_HEADER_LINES + 16));
        Path manifest = shard.resolve("manifest.yaml");
        Files.writeString(manifest, Files.readString(manifest).replaceFirst("finished: .*", "finished: null"));
        CliHarness.Execution merged = run("merge", "runs/test-survey-shard-1-of-2", "runs/test-survey-shard-2-of-2",
                "--out", "merged");
        assertThat(merged.code()).isEqualTo(2);
        assertThat(merged.err()).contains("missing from every shard: ")
                .contains("unfinished (interrupted, or still running): ").contains("test-survey-shard-2-of-2 (")
                .doesNotContain("test-survey-shard-1-of-2 (");
    }

    @Test
    void aMergeCutShortIsNamedAsSuchWhenMergedAgain() throws Exception {
        // a merge stopped with SIGTERM: its catalogue stayed without a manifest, and merging again was
        // refused as "already holds a run"
        runShards(grid(), 2);
        Path cut = Files.createDirectories(work.resolve("cut"));
        Files.copy(work.resolve("runs/test-survey-shard-1-of-2/catalogue.ecsv"), cut.resolve("catalogue.ecsv"));
        CliHarness.Execution again = run("merge", "runs/test-survey-shard-1-of-2", "runs/test-survey-shard-2-of-2",
                "--out", "cut");
        assertThat(again.code()).isEqualTo(2);
        assertThat(again.err()).contains("holds a catalogue.ecsv but no manifest.yaml: a merge cut short (or a manifest deleted)")
                .contains("remove the directory and merge again");
    }

    @Test
    void aGridWithAPresetNamedByARelativePathMergesFromAnyWorkingDirectory() throws Exception {
        // the grid is named relative to the run's working directory, and its preset relative to the grid's folder;
        // the manifest records where the grid file was, so a merge from another directory (the JVM's own here,
        // which is not the harness's) reads the same preset. With the name as typed alone, the preset was looked
        // for beside the merging directory and the merge refused
        Path folder = Files.createDirectories(work.resolve("grids"));
        Files.writeString(folder.resolve("sun.yaml"), "mixing_length: 2.05\natmosphere: krishna_swamy\n");
        CliHarness.writeGrid(folder, "preset.yaml", CliHarness.GRID.replace("mixing_length: 1.8",
                "preset: sun.yaml"));
        runShards(Path.of("grids/preset.yaml"), 2);
        Path shard1 = work.resolve("runs/test-survey-shard-1-of-2");
        RunManifest manifest = RunManifestReader.read(Files.readString(shard1.resolve("manifest.yaml")));
        assertThat(manifest.gridFile()).isEqualTo("grids/preset.yaml");
        assertThat(manifest.gridLocation()).isEqualTo(folder.resolve("preset.yaml").toString());
        assertThat(manifest.physics().get(0).mixingLength()).isEqualTo(2.05);
        // absolute shard and output paths: the merge itself needs no working directory
        CliHarness.Execution merged = CliHarness.in(Path.of("").toAbsolutePath(), FakeChunkSolver.fast()).execute(
                "merge", shard1.toString(), work.resolve("runs/test-survey-shard-2-of-2").toString(), "--out",
                work.resolve("merged").toString());
        assertThat(merged.code()).as(merged.err()).isEqualTo(0);
        assertThat(RunManifestReader.read(Files.readString(work.resolve("merged/manifest.yaml"))).gridLocation())
                .isEqualTo(manifest.gridLocation());
    }

    @Test
    void aShardGivenTwiceIsReportedAsDuplicateRows() throws Exception {
        runShards(grid(), 2);
        CliHarness.Execution merged = run("merge", "runs/test-survey-shard-1-of-2", "runs/test-survey-shard-2-of-2",
                "runs/test-survey-shard-2-of-2", "--out", "merged");
        assertThat(merged.code()).isEqualTo(2);
        assertThat(merged.err()).contains("models in more than one shard: p0-z00-m008-a00");
        assertThat(Files.exists(work.resolve("merged"))).isFalse();
    }

    @Test
    void shardsOfDifferentGridsAreRefused() throws Exception {
        Path grid = grid();
        Path other = CliHarness.writeGrid(work, "other.yaml", CliHarness.GRID.replace("to: 2.0", "to: 1.9"));
        assertThat(run("run", grid.toString(), "--shard", "1/2", "--out", "a", "--quiet").code()).isEqualTo(0);
        assertThat(run("run", other.toString(), "--shard", "2/2", "--out", "b", "--quiet").code()).isEqualTo(0);
        CliHarness.Execution merged = run("merge", "a-shard-1-of-2", "b-shard-2-of-2", "--out", "merged");
        assertThat(merged.code()).isEqualTo(2);
        assertThat(merged.err()).contains("was run from another grid");
    }

    @Test
    void shardsOfGridFilesThatDifferOutsideTheirModelsAreRefused() throws Exception {
        // the same models, another refinement tolerance: the merged run took the first-named shard's, so the order
        // of the arguments changed the result; comments alone may differ
        Path grid = grid();
        Path commented = CliHarness.writeGrid(work, "commented.yaml", "# resubmitted\n" + CliHarness.GRID);
        Path coarser = CliHarness.writeGrid(work, "coarser.yaml",
                CliHarness.GRID + "transitions: {tolerance_msun: 0.01}\n");
        assertThat(run("run", grid.toString(), "--shard", "1/2", "--out", "a", "--quiet").code()).isEqualTo(0);
        assertThat(run("run", commented.toString(), "--shard", "2/2", "--out", "b", "--quiet").code()).isEqualTo(0);
        assertThat(run("run", coarser.toString(), "--shard", "2/2", "--out", "c", "--quiet").code()).isEqualTo(0);
        assertThat(run("merge", "a-shard-1-of-2", "b-shard-2-of-2", "--out", "ab").code()).isEqualTo(0);
        CliHarness.Execution merged = run("merge", "a-shard-1-of-2", "c-shard-2-of-2", "--out", "ac");
        assertThat(merged.code()).isEqualTo(2);
        assertThat(merged.err()).contains("differs from").contains("outside its models");
        assertThat(work.resolve("ac/catalogue.ecsv")).doesNotExist();
    }

    @Test
    void slurmArrayVariablesChooseTheShard() throws Exception {
        Path grid = grid();
        CliHarness cli = CliHarness.in(work, FakeChunkSolver.fast());
        // --array=1-2: task 2 of a 1-based array is shard 2/2
        CliHarness slurm = cli.with(cli.context().withEnvironment(Map.of("SLURM_ARRAY_TASK_ID", "2",
                "SLURM_ARRAY_TASK_COUNT", "2", "SLURM_ARRAY_TASK_MIN", "1")));
        assertThat(slurm.execute("run", grid.toString(), "--quiet").code()).isEqualTo(0);
        RunManifest manifest = RunManifestReader.read(
                Files.readString(work.resolve("runs/test-survey-shard-2-of-2/manifest.yaml")));
        assertThat(manifest.shard()).isEqualTo("2/2");
        // an explicit --shard wins over Slurm
        assertThat(slurm.execute("run", grid.toString(), "--shard", "1/2", "--quiet").code()).isEqualTo(0);
        assertThat(run("merge", "runs/test-survey-shard-1-of-2", "runs/test-survey-shard-2-of-2", "--out", "m")
                .code()).isEqualTo(0);
        assertThat(CatalogueReader.read(work.resolve("m/catalogue.ecsv"))).hasSize(156);
    }

    @Test
    void mergeOfFailedModelsExitsWithThree() throws Exception {
        Path grid = grid();
        CliHarness failing = CliHarness.in(work, new FakeChunkSolver(java.util.Set.of("p0-z01-m030-a00"), 0));
        // Z index 1 starts at chunk 5; mass 30 is in its 4th chunk, position 8: shard 1 of 2 owns it
        assertThat(failing.execute("run", grid.toString(), "--shard", "1/2", "--quiet").code()).isEqualTo(3);
        assertThat(failing.execute("run", grid.toString(), "--shard", "2/2", "--quiet").code()).isEqualTo(0);
        CliHarness.Execution merged = run("merge", "runs/test-survey-shard-1-of-2", "runs/test-survey-shard-2-of-2",
                "--out", "m");
        assertThat(merged.code()).isEqualTo(3);
        RunManifest manifest = RunManifestReader.read(Files.readString(work.resolve("m/manifest.yaml")));
        assertThat(manifest.counts()).containsEntry(ModelStatus.FAILED, 1L).containsEntry(ModelStatus.OK, 155L);
    }
}
