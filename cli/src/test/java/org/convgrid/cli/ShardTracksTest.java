package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.convgrid.engine.batch.ChunkSolver;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.evolution.EvolutionStep;
import org.convgrid.engine.batch.StarTrackSink;
import org.convgrid.engine.birth.LifeEvents;
import org.convgrid.engine.birth.Phase;
import org.convgrid.engine.birth.TrackPoint;
import org.convgrid.engine.units.Constants;
import org.convgrid.grids.GridSpec;
import org.convgrid.survey.ChunkSolverFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Track files of shard runs are joined by {@code merge} into the same set a single run writes. */
class ShardTracksTest {

    @TempDir
    Path work;

    /** The fake solver, handing one made-up step per star (its first request) to the track sink. */
    static final ChunkSolverFactory FAKE_WITH_TRACKS = new ChunkSolverFactory() {
        @Override
        public ChunkSolver solverFor(GridSpec grid) {
            return FakeChunkSolver.fast();
        }

        @Override
        public ChunkSolver solverFor(GridSpec grid, StarTrackSink tracks) {
            return chunk -> {
                List<ModelOutcome> out = FakeChunkSolver.fast().solve(chunk);
                for (ModelRequest r : chunk) {
                    if (r.age().isZeroAge()) {
                        double m = r.mass() / Constants.M_SUN;
                        tracks.accept(r, List.of(new TrackPoint(new EvolutionStep(0.0, 0.0, m * Constants.L_SUN,
                                m * Constants.R_SUN, 5000.0 + m, 1.5e7, 100.0, 0.7, List.of(), 0.0, 0.1, 3),
                                Phase.MAIN_SEQUENCE, Double.NaN, Double.NaN, Double.NaN)),
                                new LifeEvents(1e13 * m, Double.NaN, 2e14 / m, Double.NaN, Double.NaN, Double.NaN,
                                        3e14 * m, Double.NaN, Double.NaN));
                    }
                }
                return out;
            };
        }
    };

    private CliHarness.Execution run(String... args) {
        return new CliHarness(new CommandContext(FAKE_WITH_TRACKS, List.of(), Map.of(), work, false)).execute(args);
    }

    private static List<Path> tracks(Path dir) throws Exception {
        try (Stream<Path> files = Files.list(dir.resolve("tracks"))) {
            return files.sorted().toList();
        }
    }

    @Test
    void mergedShardsHoldEveryTrackOfASingleRun() throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        assertThat(run("run", "--no-refine", grid.toString(), "--out", "single", "--quiet").code()).isZero();
        for (int k = 1; k <= 3; k++) {
            assertThat(run("run", "--no-refine", grid.toString(), "--shard", k + "/3", "--quiet").code()).isZero();
        }
        // one shard's life events as the version before overshoot_profile and fe_h_dex wrote them: the merge fills
        // in the grid's profile and each row's [Fe/H]
        Path earlierEvents = work.resolve("runs/test-survey-shard-2-of-3/life_events.csv");
        List<String> earlierLines = Files.readAllLines(earlierEvents).stream()
                .map(line -> String.join(",", withoutCell(withoutCell(line.split(",", -1), 7).toArray(String[]::new),
                        4))).toList();
        assertThat(earlierLines.get(0)).contains("overshoot_hp,radiative_core_myr");
        Files.write(earlierEvents, earlierLines);
        // a user's table in a shard's tracks/ stays there: it is not one of the run's tracks
        Files.writeString(work.resolve("runs/test-survey-shard-2-of-3/tracks/my-track.csv"), "mass\n1.0\n");
        assertThat(run("merge", "runs/test-survey-shard-1-of-3", "runs/test-survey-shard-2-of-3",
                "runs/test-survey-shard-3-of-3", "--out", "merged").code()).isZero();

        List<Path> single = tracks(work.resolve("single"));
        // 2 metallicities x 39 masses, one track and one zone table each, named by the model id without its age part
        assertThat(single).hasSize(2 * 78);
        assertThat(single.get(0).getFileName().toString()).isEqualTo("p0-z00-m000.csv");
        List<Path> merged = tracks(work.resolve("merged"));
        assertThat(work.resolve("merged/tracks/my-track.csv")).doesNotExist();
        assertThat(merged).extracting(Path::getFileName).isEqualTo(single.stream().map(Path::getFileName).toList());
        for (Path t : single) {
            assertThat(Files.readAllBytes(work.resolve("merged/tracks").resolve(t.getFileName())))
                    .isEqualTo(Files.readAllBytes(t));
        }
        // one life-events row per star, sorted by track id: the merged table is the single run's, byte for byte
        List<String> events = Files.readAllLines(work.resolve("single/life_events.csv"));
        assertThat(events).hasSize(1 + 78);
        assertThat(events.get(0)).startsWith("track_id,mass_msun,z_init,y_init,fe_h_dex,mixing_length,overshoot_hp,"
                + "overshoot_profile,radiative_core_myr,radiative_core_end_myr,zams_myr,conv_core_onset_myr,conv_core_end_myr,"
                + "core_envelope_merge_myr,li_halved_myr,li_one_percent_myr,central_h_exhausted_myr,track_end_myr");
        assertThat(events.get(1)).startsWith("p0-z00-m000,");
        assertThat(Files.readAllBytes(work.resolve("merged/life_events.csv")))
                .isEqualTo(Files.readAllBytes(work.resolve("single/life_events.csv")));
    }

    @Test
    void aShardWhoseStarLacksItsTrackIsRefusedUntilItIsResumed() throws Exception {
        // a shard's track file deleted, then merged: exit 0, the merged run one track short and nothing said
        ChunkSolverFactory checked = new ChunkSolverFactory() {
            @Override
            public ChunkSolver solverFor(GridSpec grid) {
                return FAKE_WITH_TRACKS.solverFor(grid);
            }

            @Override
            public ChunkSolver solverFor(GridSpec grid, StarTrackSink tracks) {
                return FAKE_WITH_TRACKS.solverFor(grid, tracks);
            }

            @Override
            public boolean writesTracks() {
                return true;
            }
        };
        CliHarness harness = new CliHarness(new CommandContext(checked, List.of(), Map.of(), work, false));
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        for (int k = 1; k <= 2; k++) {
            assertThat(harness.execute("run", "--no-refine", grid.toString(), "--shard", k + "/2", "--quiet").code())
                    .isZero();
        }
        Path second = work.resolve("runs/test-survey-shard-2-of-2");
        Path track = tracks(second).get(0);
        Files.delete(track);
        CliHarness.Execution refused = harness.execute("merge", "runs/test-survey-shard-1-of-2",
                "runs/test-survey-shard-2-of-2", "--out", "merged");
        assertThat(refused.code()).isEqualTo(2);
        assertThat(refused.err()).contains("1 star lacks files (first: ").contains(track.getFileName().toString())
                .contains("--resume");
        assertThat(work.resolve("merged/catalogue.ecsv")).doesNotExist();

        assertThat(harness.execute("run", "--no-refine", grid.toString(), "--out", second.toString(), "--resume",
                "--quiet").code()).isZero();
        assertThat(track).exists();
        assertThat(harness.execute("merge", "runs/test-survey-shard-1-of-2", "runs/test-survey-shard-2-of-2",
                "--out", "merged").code()).isZero();
        assertThat(tracks(work.resolve("merged"))).hasSize(2 * 78);
    }

    @Test
    void aShardWithoutItsZonesTableIsRefused() throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        for (int k = 1; k <= 2; k++) {
            assertThat(run("run", "--no-refine", grid.toString(), "--shard", k + "/2", "--quiet").code()).isZero();
        }
        Files.delete(work.resolve("runs/test-survey-shard-1-of-2/zones.csv"));
        CliHarness.Execution refused = run("merge", "runs/test-survey-shard-1-of-2", "runs/test-survey-shard-2-of-2",
                "--out", "merged");
        assertThat(refused.code()).isEqualTo(2);
        assertThat(refused.err()).contains("zones.csv is missing beside its ").contains("run that shard again");
    }

    private static List<String> withoutCell(String[] cells, int index) {
        List<String> kept = new java.util.ArrayList<>(List.of(cells));
        kept.remove(index);
        return kept;
    }
}
