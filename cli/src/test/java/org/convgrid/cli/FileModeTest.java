package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assumptions.assumeThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermission;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Stream;
import org.convgrid.plotting.style.ChartFiles;
import org.convgrid.survey.MapsAndReport;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Everything a run writes (tables, tracks, manifest, maps, report, and the lock) gets the permissions the user's
 * umask gives a new file or directory, like any other program's output, so collaborators read what the user lets
 * them read. The umask is the test process's: the files are compared with a file and a directory made the plain way.
 */
class FileModeTest {

    @TempDir
    Path work;

    @Test
    void everyFileAndDirectoryOfARunHasTheModeTheUmaskGives() throws Exception {
        assumeThat(work.getFileSystem().supportedFileAttributeViews()).as("a POSIX file system").contains("posix");
        Set<PosixFilePermission> fileMode = Files.getPosixFilePermissions(Files.createFile(work.resolve("plain")));
        Set<PosixFilePermission> dirMode = Files.getPosixFilePermissions(
                Files.createDirectory(work.resolve("plain-dir")));
        CommandContext context = new CommandContext(ShardTracksTest.FAKE_WITH_TRACKS,
                List.of(new MapsAndReport(EnumSet.noneOf(ChartFiles.VectorFormat.class), warning -> { })), Map.of(),
                work, false);
        CliHarness cli = new CliHarness(context);
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        assertThat(cli.execute("run", "--no-refine", grid.toString(), "--out", "run", "--quiet").code()).isZero();
        // plot rewrites the maps and the report, with vector copies
        CliHarness.Execution plot = cli.execute("plot", "run", "--vector", "svg");
        assertThat(plot.code()).isZero();
        // charts counted once, their files apart (it said "wrote 2N charts" for N charts in two formats)
        long pngs;
        try (Stream<Path> maps = Files.list(work.resolve("run/maps"))) {
            pngs = maps.filter(p -> p.toString().endsWith(".png")).count();
        }
        assertThat(plot.out()).contains("wrote " + pngs + " charts (PNG and SVG, " + 2 * pngs + " files) to ");

        Path run = work.resolve("run");
        try (Stream<Path> all = Files.walk(run)) {
            List<Path> paths = all.toList();
            assertThat(paths).extracting(p -> run.relativize(p).toString())
                    .contains("catalogue.ecsv", "zones.csv", "transitions.csv", "manifest.yaml", "report.html",
                            "tracks", "maps");
            assertThat(paths).anyMatch(p -> p.toString().endsWith(".png"))
                    .anyMatch(p -> p.toString().endsWith(".svg"))
                    .anyMatch(p -> p.getParent().endsWith("tracks"));
            for (Path p : paths) {
                assertThat(Files.getPosixFilePermissions(p)).as(run.relativize(p).toString())
                        .isEqualTo(Files.isDirectory(p) ? dirMode : fileMode);
            }
        }
    }
}
