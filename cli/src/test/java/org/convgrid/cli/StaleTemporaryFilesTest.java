package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Temporary files that a signal left mid-write ({@code .<name>.<random>.tmp}) are removed by the next run or plot
 * that holds the directory's lock, of the kinds each writes; a user's hidden file of the same shape stays. They
 * had survived a finished {@code --resume} and later plots, only {@code --force} removing them.
 */
class StaleTemporaryFilesTest {

    @TempDir
    Path work;

    private CliHarness.Execution run(String... args) {
        return CliHarness.in(work, FakeChunkSolver.fast()).execute(args);
    }

    @Test
    void resumeAndPlotRemoveTheTemporariesOfTheirOwnFilesOnly() throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        assertThat(run("run", "--no-refine", grid.toString(), "--out", "r", "--quiet").code()).isZero();
        Path dir = work.resolve("r");
        Path chart = dir.resolve("maps/.zones-mass_z0.02_zams_a1.8_ov0_schwarzschild.png.k3x9.convgrid.tmp");
        Path report = dir.resolve(".report.html.1a2b.convgrid.tmp");
        Path userChart = dir.resolve("maps/.my-picture.png.2.tmp");
        Path userNotes = dir.resolve(".notes.txt.7.tmp");
        Files.createDirectories(dir.resolve("tracks"));
        Files.createDirectories(dir.resolve("maps"));
        Path track = dir.resolve("tracks/.p0-z00-m005.csv.0zz.convgrid.tmp");
        Path zones = dir.resolve(".zones.csv.abc.convgrid.tmp");
        Path userTrack = dir.resolve("tracks/.my-track.csv.5.tmp");
        // a user's copies named like ours but for the marker (".catalogue.ecsv.backup.tmp" had been taken
        // for a temporary of the catalogue)
        Path userBackup = dir.resolve(".catalogue.ecsv.backup.tmp");
        Path userOldChart = dir.resolve("maps/.hr_a1.8_ov0_schwarzschild.png.old.tmp");
        for (Path p : new Path[] {chart, report, userChart, userNotes, track, zones, userTrack, userBackup,
            userOldChart}) {
            Files.writeString(p, "half written");
        }

        CliHarness.Execution plot = run("plot", "r");
        assertThat(plot.code()).as(plot.err()).isZero();
        assertThat(plot.err()).contains("removed 2 temporary files that interrupted writes had left in " + dir);
        assertThat(chart).doesNotExist();
        assertThat(report).doesNotExist();
        // plot writes no tracks or tables: theirs wait for the run
        assertThat(track).exists();
        assertThat(zones).exists();

        CliHarness.Execution resumed = run("run", "--no-refine", grid.toString(), "--out", "r", "--resume",
                "--quiet");
        assertThat(resumed.code()).as(resumed.err()).isZero();
        assertThat(resumed.err()).contains("removed 2 temporary files that interrupted writes had left in " + dir);
        assertThat(track).doesNotExist();
        assertThat(zones).doesNotExist();
        assertThat(userChart).exists();
        assertThat(userNotes).exists();
        assertThat(userTrack).exists();
        assertThat(userBackup).exists();
        assertThat(userOldChart).exists();
    }
}
