package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;
import org.convgrid.output.manifest.RunManifestReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A shard's directory is {@code <DIR>-shard-K-of-N} whether DIR is the grid's output.dir or {@code --out}, so one
 * command line serves every task of a job array; {@code --force} never replaces another shard (before,
 * with {@code --out} every task wrote to DIR itself, task 2 was refused and {@code --force} deleted task 1's rows).
 */
class ShardDirectoryTest {

    @TempDir
    Path work;

    private CliHarness.Execution run(String... args) {
        return CliHarness.in(work, FakeChunkSolver.fast()).execute(args);
    }

    /** The harness as task {@code id} of a job array {@code --array=1-count}. */
    private CliHarness.Execution arrayTask(int id, int count, String... args) {
        CliHarness cli = CliHarness.in(work, FakeChunkSolver.fast());
        return cli.with(cli.context().withEnvironment(Map.of("SLURM_ARRAY_TASK_ID", Integer.toString(id),
                "SLURM_ARRAY_TASK_MIN", "1", "SLURM_ARRAY_TASK_COUNT", Integer.toString(count)))).execute(args);
    }

    private Path grid() throws Exception {
        return CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
    }

    /** Every file under a directory (the lock file aside) with its bytes, to see that nothing changed. */
    private static Map<Path, String> contents(Path dir) throws Exception {
        Map<Path, String> files = new TreeMap<>();
        try (Stream<Path> all = Files.walk(dir)) {
            for (Path f : all.filter(Files::isRegularFile).filter(f -> !f.endsWith(".convgrid.lock")).toList()) {
                files.put(dir.relativize(f), Files.readString(f));
            }
        }
        return files;
    }

    @Test
    void everyTaskOfAnArrayGivenOutWritesItsOwnDirectoryAndTheyMerge() throws Exception {
        Path grid = grid();
        assertThat(run("run", grid.toString(), "--out", "single", "--quiet", "--no-refine").code()).isZero();
        for (int task = 1; task <= 2; task++) {
            CliHarness.Execution shard = arrayTask(task, 2, "run", grid.toString(), "--out", "out/x", "--quiet");
            assertThat(shard.code()).as(shard.err()).isZero();
        }
        assertThat(work.resolve("out/x")).doesNotExist();
        assertThat(RunManifestReader.read(Files.readString(work.resolve("out/x-shard-2-of-2/manifest.yaml"))).shard())
                .isEqualTo("2/2");
        Map<Path, String> first = contents(work.resolve("out/x-shard-1-of-2"));

        // the same command line with --resume continues each task's own directory, and --force starts only its own over
        CliHarness.Execution resumed = arrayTask(1, 2, "run", grid.toString(), "--out", "out/x", "--resume");
        assertThat(resumed.code()).as(resumed.err()).isZero();
        assertThat(resumed.out()).contains("0 computed now");
        CliHarness.Execution forced = arrayTask(2, 2, "run", grid.toString(), "--out", "out/x", "--force", "--quiet");
        assertThat(forced.code()).as(forced.err()).isZero();
        assertThat(forced.err()).contains("of the earlier run in " + work.resolve("out/x-shard-2-of-2"));
        assertThat(Files.readString(work.resolve("out/x-shard-1-of-2/catalogue.ecsv")))
                .isEqualTo(first.get(Path.of("catalogue.ecsv")));

        assertThat(run("merge", "out/x-shard-1-of-2", "out/x-shard-2-of-2", "--out", "merged").code()).isZero();
        assertThat(Files.readAllBytes(work.resolve("merged/catalogue.ecsv")))
                .isEqualTo(Files.readAllBytes(work.resolve("single/catalogue.ecsv")));
    }

    @Test
    void anExplicitShardGivenOutWritesTheNamedDirectory() throws Exception {
        Path grid = grid();
        for (int k = 1; k <= 2; k++) {
            CliHarness.Execution shard = run("run", grid.toString(), "--shard", k + "/2", "--out", "x", "--quiet");
            assertThat(shard.code()).as(shard.err()).isZero();
        }
        assertThat(work.resolve("x")).doesNotExist();
        assertThat(work.resolve("x-shard-1-of-2/catalogue.ecsv")).exists();
        assertThat(work.resolve("x-shard-2-of-2/catalogue.ecsv")).exists();
        // a directory already named for the shard is taken as it is (the --out an interrupted shard names)
        CliHarness.Execution again = run("run", grid.toString(), "--shard", "2/2", "--out", "x-shard-2-of-2",
                "--resume");
        assertThat(again.code()).as(again.err()).isZero();
        assertThat(again.out()).contains("0 computed now");
        assertThat(work.resolve("x-shard-2-of-2-shard-2-of-2")).doesNotExist();
        // the whole grid given --out writes to it unchanged
        assertThat(run("run", grid.toString(), "--out", "x", "--quiet", "--no-refine").code()).isZero();
        assertThat(work.resolve("x/catalogue.ecsv")).exists();
    }

    @Test
    void forceRefusesToReplaceAnotherShardOrAnotherGridsShardAndDeletesNothing() throws Exception {
        Path grid = grid();
        assertThat(run("run", grid.toString(), "--shard", "1/2", "--out", "x", "--quiet").code()).isZero();
        Path shard = work.resolve("x-shard-1-of-2");
        Map<Path, String> before = contents(shard);

        CliHarness.Execution whole = run("run", grid.toString(), "--out", "x-shard-1-of-2", "--force", "--quiet");
        assertThat(whole.code()).isEqualTo(2);
        assertThat(whole.err()).contains(shard + " holds shard 1/2, and this run computes the whole grid: --force "
                + "would delete that shard's results, so nothing was removed; choose another --out");
        assertThat(contents(shard)).isEqualTo(before);

        Path other = CliHarness.writeGrid(work, "other.yaml", CliHarness.GRID.replace("to: 2.0", "to: 1.9"));
        CliHarness.Execution otherGrid = run("run", other.toString(), "--shard", "1/2", "--out", "x", "--force",
                "--quiet");
        assertThat(otherGrid.code()).isEqualTo(2);
        assertThat(otherGrid.err()).contains(shard + " holds shard 1/2 of another grid (models_sha256 ");
        assertThat(contents(shard)).isEqualTo(before);

        // without --force or --resume: what the directory holds, not advice that both would refuse
        CliHarness.Execution plain = run("run", grid.toString(), "--out", "x-shard-1-of-2", "--quiet");
        assertThat(plain.code()).isEqualTo(2);
        assertThat(plain.err()).contains(shard + " holds shard 1/2, and this run computes the whole grid: --resume "
                + "cannot continue it").doesNotContain("add --resume");
        assertThat(contents(shard)).isEqualTo(before);

        // the same shard of the same grid is started over, as --force says
        CliHarness.Execution same = run("run", grid.toString(), "--shard", "1/2", "--out", "x", "--force", "--quiet");
        assertThat(same.code()).as(same.err()).isZero();
        assertThat(same.err()).contains("--force removed");
    }

    @Test
    void aShardCannotBeNamedAfterAFileSystemRoot() throws Exception {
        CliHarness.Execution root = run("run", grid().toString(), "--shard", "1/2", "--out", "/");
        assertThat(root.code()).isEqualTo(2);
        assertThat(root.err()).contains("cannot name shard 1/2's directory after '/'");
    }

    @Test
    void helpSaysWhereAShardGivenOutWrites() {
        String help = run("run", "--help").out().replaceAll("\\s+", "");
        assertThat(help).contains("ShardKofNwritesto<DIR>-shard-K-of-N,DIRbeing--outoroutput.dir");
    }

    @Test
    void aShardsOutThatNamesTheCurrentDirectoryOrOneAboveIsRefused() throws Exception {
        // 'cd runs/grid && run --shard 1/2 --out .' would have written beside it, to runs/grid-shard-1-of-2
        Path grid = grid();
        for (String here : new String[] {".", "..", work.toString()}) {
            CliHarness.Execution refused = run("run", grid.toString(), "--shard", "1/2", "--out", here, "--quiet");
            assertThat(refused.code()).as(here).isEqualTo(ExitCodes.USAGE);
            assertThat(refused.err()).contains("names the current directory or one above it");
        }
        try (Stream<Path> left = Files.list(work.getParent())) {
            assertThat(left.filter(p -> p.getFileName().toString().contains("-shard-"))).isEmpty();
        }
        // the whole grid may still be written into the current directory
        assertThat(run("run", "--no-refine", grid.toString(), "--out", ".", "--quiet").code()).isEqualTo(0);
    }
}
