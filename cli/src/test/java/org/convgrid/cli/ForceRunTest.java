package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code run --force}: every file an earlier run wrote goes, the lock file and the user's files stay. */
class ForceRunTest {

    @TempDir
    Path work;

    private CliHarness.Execution run(String... args) {
        return CliHarness.in(work, FakeChunkSolver.fast()).execute(args);
    }

    @Test
    void forceRemovesEveryFileOfTheEarlierRunAndKeepsTheUsersFiles() throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        assertThat(run("run", "--no-refine", grid.toString(), "--out", "d", "--quiet").code()).isZero();
        Path d = work.resolve("d");
        byte[] fresh = Files.readAllBytes(d.resolve("catalogue.ecsv"));
        long firstRunFiles;
        try (var files = Files.walk(d)) {
            firstRunFiles = files.filter(f -> Files.isRegularFile(f) && !f.endsWith(".convgrid.lock")).count();
        }
        // what a bigger earlier grid with tracks, profiles and charts, interrupted mid-write, would have left
        List<Path> stale = List.of(d.resolve("report.html"), d.resolve("life_events.csv"),
                d.resolve(".catalogue.ecsv.3k9z1q.convgrid.tmp"), d.resolve("tracks/p0-z07-m099.csv"),
                d.resolve("tracks/p0-z07-m099.zones.csv"), d.resolve("tracks/.p0-z07-m098.csv.a1b2.convgrid.tmp"),
                d.resolve("tracks/p0-z07-r012.csv"), d.resolve("tracks/p0-z07-r012.zones.csv"),
                d.resolve("profiles/p0-z07-r012-a03.csv"),
                d.resolve("profiles/p0-z07-m099-a00.csv"), d.resolve("maps/zones-age_m5_z0.03_a1.8_ov0_schwarzschild.png"),
                d.resolve("maps/hr_a2_ov0_schwarzschild.svg"), d.resolve("maps/zones-mass_z0.03_age1_a1.8.pdf"));
        List<Path> users = List.of(d.resolve("observing-notes.md"), d.resolve("tracks/README.txt"),
                d.resolve("maps/cluster-photo.png"), d.resolve("maps/my-fit.csv"), d.resolve("tracks/my-track.csv"),
                d.resolve("tracks/my-track.zones.csv"), d.resolve("tracks/p0-z07-m099-fit.csv"),
                d.resolve("profiles/my-profile.csv"), d.resolve("profiles/p0-z07-m099.csv"));
        for (Path file : stale) {
            Files.createDirectories(file.getParent());
            Files.writeString(file, "stale");
        }
        for (Path file : users) {
            Files.createDirectories(file.getParent());
            Files.writeString(file, "mine");
        }

        CliHarness.Execution again = run("run", "--no-refine", grid.toString(), "--out", "d", "--quiet", "--force");

        assertThat(again.code()).as(again.err()).isZero();
        for (Path file : stale) {
            assertThat(file).as("left over from the earlier run").doesNotExist();
        }
        for (Path file : users) {
            assertThat(file).hasContent("mine");
        }
        assertThat(d.resolve(".convgrid.lock")).exists();
        assertThat(d.resolve("profiles")).as("holds the user's files, so kept").isDirectory();
        // every stale file and every file of the first run, counted on stderr though --quiet
        assertThat(again.err()).contains("convgrid: --force removed " + (stale.size() + firstRunFiles)
                + " files of the earlier run in " + d.toAbsolutePath().normalize());
        assertThat(Files.readAllBytes(d.resolve("catalogue.ecsv"))).isEqualTo(fresh);
    }

    @Test
    void forceRemovesAnEmptiedProfilesFolder() throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        Path profile = work.resolve("d/profiles/p0-z07-m099-a00.csv");
        Files.createDirectories(profile.getParent());
        Files.writeString(profile, "stale");

        CliHarness.Execution run = run("run", "--no-refine", grid.toString(), "--out", "d", "--quiet", "--force");

        assertThat(run.code()).as(run.err()).isZero();
        assertThat(work.resolve("d/profiles")).as("emptied, so removed").doesNotExist();
        assertThat(run.err()).contains("convgrid: --force removed 1 file of the earlier run in ");
    }

    @Test
    void forceClearsChartsAndTracksEvenWhenTheCatalogueIsGone() throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        Path track = work.resolve("d/tracks/p0-z07-m099.csv");
        Files.createDirectories(track.getParent());
        Files.writeString(track, "stale");

        assertThat(run("run", "--no-refine", grid.toString(), "--out", "d", "--quiet", "--force").code()).isZero();

        assertThat(track).doesNotExist();
    }

    @Test
    void helpSaysWhatForceRemovesAndKeeps() {
        // picocli wraps lines anywhere, also after a dot: compare without any white space
        String help = run("run", "--help").out().replaceAll("\\s+", "");
        assertThat(help).contains(("catalogue.ecsv, zones.csv, transitions.csv, life_events.csv, manifest.yaml, "
                + "report.html, the track files in tracks/, the profiles in profiles/ (files named by a track or model "
                + "id, such as p0-z00-m000.csv), the charts in maps/ and the temporary files of writes cut short")
                .replaceAll("\\s+", ""))
                .contains("Keepsthelockfile.convgrid.lockandeveryfileconvgriddoesnotwrite");
    }
}
