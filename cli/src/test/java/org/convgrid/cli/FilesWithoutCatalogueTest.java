package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A directory without catalogue and manifest that holds files a run writes is refused without {@code --force} and
 * cleared with it (before, a user's zones.csv and report.html were overwritten, and an earlier run's
 * life_events.csv stayed beside the new run's files as if it were its own).
 */
class FilesWithoutCatalogueTest {

    @TempDir
    Path work;

    private CliHarness.Execution run(String... args) {
        return CliHarness.in(work, FakeChunkSolver.fast()).execute(args);
    }

    private static void write(Path file, String text) throws Exception {
        Files.createDirectories(file.getParent());
        Files.writeString(file, text);
    }

    @Test
    void aUsersTablesAndReportAreRefusedAndKept() throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        Path d = work.resolve("d");
        write(d.resolve("zones.csv"), "mine");
        write(d.resolve("report.html"), "<p>mine</p>");

        for (String resume : List.of("--quiet", "--resume")) {
            CliHarness.Execution refused = run("run", "--no-refine", grid.toString(), "--out", "d", resume);

            assertThat(refused.code()).isEqualTo(2);
            assertThat(refused.err()).contains(d + " holds files a run writes (zones.csv, report.html) but no "
                    + "catalogue.ecsv or manifest.yaml").contains("choose another --out, or add --force to remove them");
            assertThat(d.resolve("zones.csv")).hasContent("mine");
            assertThat(d.resolve("report.html")).hasContent("<p>mine</p>");
            assertThat(d.resolve("catalogue.ecsv")).doesNotExist();
            assertThat(d.resolve("manifest.yaml")).doesNotExist();
        }
    }

    @Test
    void anEarlierRunsLeftoversAreRefusedThenRemovedByForce() throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        Path d = work.resolve("d");
        List<Path> leftovers = List.of(d.resolve("life_events.csv"), d.resolve("tracks/p0-z00-m000.csv"),
                d.resolve("tracks/p0-z00-m000.zones.csv"), d.resolve("maps/hr_a1.8_ov0_schwarzschild.png"));
        for (Path file : leftovers) {
            write(file, "stale");
        }
        write(d.resolve("notes.md"), "mine");

        CliHarness.Execution refused = run("run", "--no-refine", grid.toString(), "--out", "d", "--quiet");
        assertThat(refused.code()).isEqualTo(2);
        assertThat(refused.err()).contains("(life_events.csv, 2 files in tracks/, 1 file in maps/)");
        for (Path file : leftovers) {
            assertThat(file).hasContent("stale");
        }

        CliHarness.Execution forced = run("run", "--no-refine", grid.toString(), "--out", "d", "--quiet", "--force");
        assertThat(forced.code()).as(forced.err()).isZero();
        assertThat(forced.err()).contains("convgrid: --force removed 4 files of the earlier run in " + d);
        // this grid is counted from the ZAMS: it writes no life events, so the earlier run's must be gone
        assertThat(d.resolve("life_events.csv")).doesNotExist();
        assertThat(d.resolve("tracks/p0-z00-m000.zones.csv")).doesNotExist();
        assertThat(d.resolve("notes.md")).hasContent("mine");
        assertThat(CliHarness.tableLines(d.resolve("catalogue.ecsv"))).hasSize(1 + (int) CliHarness.GRID_MODELS);
    }

    @Test
    void anEmptyDirectoryOrOneWithOnlyTheUsersFilesIsAccepted() throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        Files.createDirectories(work.resolve("empty"));
        assertThat(run("run", "--no-refine", grid.toString(), "--out", "empty", "--quiet").code()).isZero();

        Path d = work.resolve("mine");
        List<Path> users = List.of(d.resolve("notes.md"), d.resolve("tracks/my-track.csv"),
                d.resolve("maps/cluster-photo.jpg"), d.resolve("profiles/my-profile.csv"));
        for (Path file : users) {
            write(file, "mine");
        }
        Files.createDirectories(d.resolve("tracks/empty-folder"));
        CliHarness.Execution accepted = run("run", "--no-refine", grid.toString(), "--out", "mine", "--quiet");
        assertThat(accepted.code()).as(accepted.err()).isZero();
        for (Path file : users) {
            assertThat(file).hasContent("mine");
        }
    }
}
