package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.convgrid.output.catalogue.CatalogueReader;
import org.convgrid.output.manifest.RunManifest;
import org.convgrid.output.manifest.RunManifestReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledOnOs;
import org.junit.jupiter.api.condition.OS;
import org.junit.jupiter.api.io.TempDir;

/**
 * SIGINT and SIGTERM during {@code run} (a child JVM with a slow fake solver): one line on stderr, an honest
 * manifest, complete rows only, exit code 130 promptly, and a resume that gives the uninterrupted bytes.
 */
@EnabledOnOs({OS.LINUX, OS.MAC})
class InterruptTest {

    /** Rows the child must have written before the signal: two chunks of 8 masses x 2 ages. */
    private static final int ROWS_BEFORE_SIGNAL = 32;
    /** Longest wait for the child to write them, ms. */
    private static final long CHILD_TIMEOUT_MILLIS = 30_000;
    /**
     * Longest the child may take to end after the signal, ms. By hand (demo grid, 2 threads busy) it took 0.26-0.7 s
     * from the signal to the process's end; the bound leaves room for a test machine shared with other builds.
     */
    private static final long EXIT_BOUND_MILLIS = 3_000;

    @TempDir
    Path work;

    @Test
    void ctrlCStopsTheRunBetweenRowsAndSaysHowToContinue() throws Exception {
        interruptAndResume("INT");
    }

    @Test
    void aBatchSystemsTermSignalDoesTheSame() throws Exception {
        interruptAndResume("TERM");
    }

    @Test
    void runHelpNamesTheExitCodeOfAnInterruptedRun() {
        String help = CliHarness.in(work, FakeChunkSolver.fast()).execute("run", "--help").out().replaceAll("\\s+", " ");
        assertThat(help).contains("130 interrupted (Ctrl-C or SIGTERM: the catalogue keeps its complete rows; "
                + "continue with --resume)");
    }

    private void interruptAndResume(String signal) throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        Path dir = work.resolve("cut short");
        Path catalogue = dir.resolve("catalogue.ecsv");
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process child = new ProcessBuilder(java, "-cp", System.getProperty("java.class.path"),
                SlowRunMain.class.getName(), "run", "--no-refine", grid.toString(), "--out", dir.toString(),
                "--threads", "2", "--quiet")
                .redirectOutput(work.resolve("child.out").toFile()).redirectError(work.resolve("child.err").toFile())
                .start();
        long deadline = System.currentTimeMillis() + CHILD_TIMEOUT_MILLIS;
        while (child.isAlive() && rows(catalogue) < ROWS_BEFORE_SIGNAL && System.currentTimeMillis() < deadline) {
            Thread.sleep(20);
        }
        assertThat(child.isAlive()).as("child still running; its stderr: %s", text("child.err")).isTrue();

        long signalled = System.nanoTime();
        assertThat(new ProcessBuilder("kill", "-" + signal, Long.toString(child.pid())).start().waitFor()).isZero();
        assertThat(child.waitFor(10, TimeUnit.SECONDS)).isTrue();
        long millis = (System.nanoTime() - signalled) / 1_000_000;

        assertThat(millis).as("ms from SIG%s to the end", signal).isLessThan(EXIT_BOUND_MILLIS);
        assertThat(child.exitValue()).isEqualTo(130);
        byte[] bytes = Files.readAllBytes(catalogue);
        assertThat(bytes[bytes.length - 1]).as("the catalogue ends with a complete row").isEqualTo((byte) '\n');
        long kept = CatalogueReader.read(catalogue).size();
        assertThat(kept).isBetween((long) ROWS_BEFORE_SIGNAL, CliHarness.GRID_MODELS - 1);
        List<String> err = text("child.err").lines().toList();
        assertThat(err).containsExactly("convgrid: interrupted: " + kept + " of " + CliHarness.GRID_MODELS
                + " models in catalogue.ecsv (models finished out of grid order are not kept); continue with: "
                + "convgrid run " + grid + " --out '" + dir + "' --resume --no-refine");
        String yaml = Files.readString(dir.resolve("manifest.yaml"));
        assertThat(yaml).doesNotContainIgnoringCase("nan");
        RunManifest manifest = RunManifestReader.read(yaml);
        assertThat(manifest.finished()).isNull();
        assertThat(manifest.total()).isEqualTo(kept);
        assertThat(manifest.expectedModels()).isEqualTo(CliHarness.GRID_MODELS);
        assertThat(manifest.medianSecondsPerModel()).isPositive();
        assertThat(Files.readString(dir.resolve(".convgrid.lock"))).as("released").isEmpty();

        CliHarness.Execution resumed = CliHarness.in(work, FakeChunkSolver.fast()).execute("run", "--no-refine",
                grid.toString(), "--out", dir.toString(), "--resume", "--threads", "2");
        assertThat(resumed.code()).isZero();
        assertThat(resumed.err()).contains(kept + " already in the catalogue").doesNotContain("without releasing it");
        CliHarness.Execution whole = CliHarness.in(work, FakeChunkSolver.fast()).execute("run", "--no-refine",
                grid.toString(), "--out", "whole", "--quiet");
        assertThat(whole.code()).isZero();
        assertThat(Files.readAllBytes(catalogue)).isEqualTo(Files.readAllBytes(work.resolve("whole/catalogue.ecsv")));
        assertThat(Files.readAllBytes(dir.resolve("zones.csv")))
                .isEqualTo(Files.readAllBytes(work.resolve("whole/zones.csv")));
    }

    private static int rows(Path catalogue) throws Exception {
        return Files.exists(catalogue) ? (int) Files.readAllLines(catalogue, StandardCharsets.UTF_8).size()
                - CliHarness.CATALOGUE_HEADER_LINES : 0;
    }

    private String text(String name) throws Exception {
        Path file = work.resolve(name);
        return Files.exists(file) ? Files.readString(file) : "(none)";
    }
}
