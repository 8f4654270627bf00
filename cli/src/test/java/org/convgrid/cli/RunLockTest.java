package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** One process at a time in a run directory: a second one is refused, a killed holder's directory resumes. */
class RunLockTest {

    /** Rows the first child must have written before the second process starts (or before the kill). */
    private static final int ROWS_FIRST = 16;
    private static final long CHILD_TIMEOUT_MILLIS = 60_000;

    @TempDir
    Path work;

    private CliHarness.Execution run(String... args) {
        return CliHarness.in(work, FakeChunkSolver.fast()).execute(args);
    }

    private Process child(String name, String... args) throws Exception {
        return child(name, SlowRunMain.MILLIS_PER_MODEL, args);
    }

    private Process child(String name, long millisPerModel, String... args) throws Exception {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        List<String> command = new ArrayList<>(List.of(java, "-Xmx256m",
                "-Dconvgrid.test.millisPerModel=" + millisPerModel, "-cp",
                System.getProperty("java.class.path"), SlowRunMain.class.getName()));
        command.addAll(List.of(args));
        return new ProcessBuilder(command).redirectOutput(work.resolve(name + ".out").toFile())
                .redirectError(work.resolve(name + ".err").toFile()).start();
    }

    private void waitForRows(Process child, Path catalogue) throws Exception {
        long deadline = System.currentTimeMillis() + CHILD_TIMEOUT_MILLIS;
        int rows = 0;
        while (child.isAlive() && rows < ROWS_FIRST && System.currentTimeMillis() < deadline) {
            Thread.sleep(20);
            rows = Files.exists(catalogue) ? (int) Files.readAllLines(catalogue, StandardCharsets.UTF_8).stream()
                    .filter(l -> !l.startsWith("#")).count() - 1 : 0;
        }
        assertThat(child.isAlive()).as("first child still running; its log: %s", log("first")).isTrue();
    }

    private String log(String name) throws Exception {
        Path err = work.resolve(name + ".err");
        return Files.exists(err) ? Files.readString(err) : "(none)";
    }

    private byte[] lone(Path grid) {
        assertThat(run("run", "--no-refine", grid.toString(), "--out", "lone", "--threads", "2", "--quiet").code())
                .isEqualTo(0);
        try {
            return Files.readAllBytes(work.resolve("lone/catalogue.ecsv"));
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    @Test
    void aSecondProcessIsRefusedAndTheFirstFinishesByteIdenticalToALoneRun() throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        Path dir = work.resolve("shared");
        // slow enough to outlive three refused processes (about 12 s for the 156 models)
        Process first = child("first", 80, "run", "--no-refine", grid.toString(), "--out", dir.toString(),
                "--threads", "1",
                "--quiet");
        waitForRows(first, dir.resolve("catalogue.ecsv"));
        long firstPid = first.pid();
        assertThat(Files.readString(dir.resolve(".convgrid.lock")).strip()).isEqualTo(Long.toString(firstPid));

        for (String[] args : new String[][] {
            {"run", "--no-refine", grid.toString(), "--out", dir.toString(), "--quiet"},
            {"run", "--no-refine", grid.toString(), "--out", dir.toString(), "--resume", "--quiet"},
            {"run", "--no-refine", grid.toString(), "--out", dir.toString(), "--force", "--quiet"}}) {
            Process second = child("second", args);
            assertThat(second.waitFor(30, TimeUnit.SECONDS)).isTrue();
            assertThat(first.isAlive()).as("the first child outlived the second").isTrue();
            assertThat(second.exitValue()).as("second process %s; its log: %s", String.join(" ", args), log("second"))
                    .isEqualTo(2);
            assertThat(log("second")).contains(dir.toString()).contains("in use by process " + firstPid)
                    .doesNotContain("Exception");
        }
        // the same refusal in this (third) process, for merge and refinement too
        CliHarness.Execution merge = run("merge", dir.toString(), "--out", dir.toString());
        assertThat(merge.code()).isEqualTo(2);
        assertThat(merge.err()).contains("in use by process " + firstPid);
        CliHarness.Execution refine = run("transitions", dir.toString(), "--refine");
        assertThat(refine.code()).isEqualTo(2);
        // refused by the lock alone: no advice to resume a run that is still going
        assertThat(refine.err()).contains("in use by process " + firstPid).doesNotContain("--resume");
        // drawing the maps and recomputing the transitions write into the directory too
        CliHarness.Execution plot = run("plot", dir.toString());
        assertThat(plot.code()).isEqualTo(2);
        assertThat(plot.err()).contains("in use by process " + firstPid);
        CliHarness.Execution recompute = run("transitions", dir.toString());
        assertThat(recompute.code()).isEqualTo(2);
        assertThat(recompute.err()).contains("in use by process " + firstPid).doesNotContain("--resume");

        assertThat(first.waitFor(CHILD_TIMEOUT_MILLIS, TimeUnit.MILLISECONDS)).isTrue();
        assertThat(first.exitValue()).as("first child; its log: %s", log("first")).isEqualTo(0);
        assertThat(Files.readAllBytes(dir.resolve("catalogue.ecsv"))).isEqualTo(lone(grid));
        // released on exit: the file is emptied and the next command takes the lock without a note
        assertThat(Files.readString(dir.resolve(".convgrid.lock"))).isEmpty();
        CliHarness.Execution again = run("run", "--no-refine", grid.toString(), "--out", dir.toString(), "--resume");
        assertThat(again.code()).isEqualTo(0);
        assertThat(again.err()).doesNotContain("note:");
    }

    @Test
    void aHolderKilledWithSignal9LeavesAStaleLockThatIsReportedAndResumeSucceeds() throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        Path dir = work.resolve("killed");
        Process first = child("first", "run", "--no-refine", grid.toString(), "--out", dir.toString(), "--threads",
                "1", "--quiet");
        waitForRows(first, dir.resolve("catalogue.ecsv"));
        long pid = first.pid();
        first.destroyForcibly();
        assertThat(first.waitFor(10, TimeUnit.SECONDS)).isTrue();
        assertThat(Files.readString(dir.resolve(".convgrid.lock")).strip()).isEqualTo(Long.toString(pid));

        CliHarness.Execution resumed = run("run", "--no-refine", grid.toString(), "--out", dir.toString(), "--resume");
        assertThat(resumed.code()).as(resumed.err()).isEqualTo(0);
        assertThat(resumed.err()).contains("was last locked by process " + pid + ", which ended without releasing");
        assertThat(Files.readAllBytes(dir.resolve("catalogue.ecsv"))).isEqualTo(lone(grid));
    }

    @Test
    void aLockOnANewDirectoryThatStaysEmptyRemovesWhatItCreated() throws Exception {
        try (org.convgrid.survey.RunLock lock = org.convgrid.survey.RunLock.acquire(work.resolve("new/dir"))) {
            assertThat(lock.file()).exists();
            assertThat(lock.staleHolder()).isEmpty();
        }
        assertThat(work.resolve("new")).doesNotExist();
    }
}
