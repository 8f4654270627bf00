package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.convgrid.engine.batch.ChunkSolver;
import org.convgrid.engine.batch.ModelSink;
import org.convgrid.engine.batch.StarTrackSink;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.grids.GridSpec;
import org.convgrid.grids.ModelIdFormat;
import org.convgrid.output.catalogue.CatalogueReader;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.survey.ChunkSolverFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A track that cannot be written (a full disk, simulated by a directory standing where the track file goes) stops
 * the sweep before its star's catalogue rows, and a resume gives back every track and the catalogue of a run that
 * never failed; a resume also recomputes the blocks of kept stars whose track files are missing. Before, a
 * full disk left 38 catalogue rows beside the track of one star, and the resume then said "52 ok" with 14 of 26
 * stars' tracks.
 */
class FailingTrackWritesTest {

    @TempDir
    Path dir;

    /** The fake solver, handing an (empty) track per star to the run's track sink; a blocked star's write fails. */
    private CliHarness harness(Path runDir, Set<String> blockedStars) {
        ChunkSolverFactory factory = new ChunkSolverFactory() {
            @Override
            public ChunkSolver solverFor(GridSpec grid) {
                return FakeChunkSolver.fast();
            }

            @Override
            public boolean writesTracks() {
                return true;
            }

            @Override
            public ChunkSolver solverFor(GridSpec grid, StarTrackSink tracks, ModelSink models) {
                ChunkSolver fake = FakeChunkSolver.fast();
                return chunk -> {
                    Map<String, ModelRequest> stars = new LinkedHashMap<>();
                    chunk.forEach(r -> stars.putIfAbsent(ModelIdFormat.trackIdOf(r.modelId()), r));
                    stars.forEach((id, first) -> {
                        if (blockedStars.contains(id)) {
                            block(runDir.resolve("tracks").resolve(id + ".csv"));
                        }
                        tracks.accept(first, List.of(), null);
                    });
                    return fake.solve(chunk);
                };
            }
        };
        return new CliHarness(new CommandContext(factory, List.of(), Map.of(), dir, false,
                new FakeMassLines(Set.of())));
    }

    /** A non-empty directory where a file is to go: its rename fails, as a write to a full disk does. */
    private static void block(Path file) {
        try {
            Files.createDirectories(file.resolve("blocker"));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private CliHarness.Execution run(CliHarness harness, String out, String... more) throws IOException {
        Path grid = CliHarness.writeGrid(dir, "grid.yaml", CliHarness.GRID);
        List<String> args = new java.util.ArrayList<>(List.of("run", grid.toString(), "--out", out, "--threads", "2",
                "--no-refine", "--quiet"));
        args.addAll(List.of(more));
        return harness.execute(args.toArray(String[]::new));
    }

    @Test
    void aFailedTrackStopsTheSweepBeforeItsStarsRowsAndTheResumeCompletesTheRun() throws Exception {
        Path clean = dir.resolve("clean");
        assertThat(run(harness(clean, Set.of()), "clean").code()).isZero();

        Path broken = dir.resolve("broken");
        String blocked = "p0-z00-m020";
        CliHarness.Execution failed = run(harness(broken, Set.of(blocked)), "broken");
        assertThat(failed.code()).isEqualTo(1);
        assertThat(failed.err()).contains("cannot write ", blocked + ".csv", "--resume")
                .doesNotContain("internal error");
        List<CatalogueRow> kept = CatalogueReader.read(broken.resolve("catalogue.ecsv"));
        assertThat(kept).isNotEmpty().noneMatch(r -> ModelIdFormat.trackIdOf(r.modelId()).equals(blocked));
        // every row kept has its track: none is kept without it
        assertThat(kept).allSatisfy(r -> assertThat(broken.resolve("tracks")
                .resolve(ModelIdFormat.trackIdOf(r.modelId()) + ".csv")).isRegularFile());

        Files.delete(broken.resolve("tracks").resolve(blocked + ".csv").resolve("blocker"));
        Files.delete(broken.resolve("tracks").resolve(blocked + ".csv"));
        CliHarness.Execution resumed = run(harness(broken, Set.of()), "broken", "--resume");
        assertThat(resumed.code()).as(resumed.err()).isZero();
        assertThat(Files.readAllBytes(broken.resolve("catalogue.ecsv")))
                .isEqualTo(Files.readAllBytes(clean.resolve("catalogue.ecsv")));
        assertThat(Files.readAllBytes(broken.resolve("zones.csv"))).isEqualTo(Files.readAllBytes(clean.resolve("zones.csv")));
        assertThat(trackNames(broken)).isEqualTo(trackNames(clean));
    }

    @Test
    void aResumeRecomputesTheBlocksOfKeptStarsWhoseTrackFilesAreMissing() throws Exception {
        Path clean = dir.resolve("clean");
        assertThat(run(harness(clean, Set.of()), "clean").code()).isZero();
        byte[] catalogue = Files.readAllBytes(clean.resolve("catalogue.ecsv"));
        List<String> tracks = trackNames(clean);
        Files.delete(clean.resolve("tracks/p0-z01-m030.zones.csv"));

        CliHarness.Execution resumed = run(harness(clean, Set.of()), "clean", "--resume");
        assertThat(resumed.code()).as(resumed.err()).isZero();
        assertThat(resumed.err()).contains("note: ", "lacked files (first: p0-z01-m030, tracks/p0-z01-m030.zones.csv)",
                "computed again");
        assertThat(resumed.out()).doesNotContain("0 computed now");
        assertThat(trackNames(clean)).isEqualTo(tracks);
        assertThat(Files.readAllBytes(clean.resolve("catalogue.ecsv"))).isEqualTo(catalogue);

        CliHarness.Execution again = run(harness(clean, Set.of()), "clean", "--resume");
        assertThat(again.code()).isZero();
        assertThat(again.err()).as("nothing lacks files now").doesNotContain("lacked files");
    }

    private static List<String> trackNames(Path run) throws IOException {
        try (var files = Files.list(run.resolve("tracks"))) {
            return files.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }
}
