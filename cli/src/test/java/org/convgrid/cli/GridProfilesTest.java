package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.convgrid.output.profile.ProfileReader;
import org.convgrid.output.profile.ProfileRow;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code output: profiles: true} writes one profile per OK grid model into {@code profiles/}, named by its model id,
 * the same at any thread count, carried over by {@code merge}; without it there is no {@code profiles/}. The key had
 * been read and never acted on (a demo run with it left no {@code profiles/}). Production solver, real
 * zero-age models; the checks are of the files, not of physics.
 */
class GridProfilesTest {

    private static final String GRID = """
            title: Profiles check
            mass: {values: [0.5, 1.0, 1.5]}
            metallicity: {z: [0.02], y: [0.28]}
            output: {dir: runs/profiles, profiles: PROFILES}
            """;

    @TempDir
    Path dir;

    private CliHarness.Execution run(String... args) {
        return CliHarness.real(dir).execute(args);
    }

    @Test
    void everyModelGetsItsProfileTheSameAtAnyThreadCount() throws Exception {
        Path grid = CliHarness.writeGrid(dir, "p.yaml", GRID.replace("PROFILES", "true"));
        CliHarness.Execution one = run("run", "--no-refine", grid.toString(), "--out", "one", "--threads", "1",
                "--quiet");
        assertThat(one.code()).as(one.err()).isZero();
        CliHarness.Execution two = run("run", "--no-refine", grid.toString(), "--out", "two", "--threads", "2",
                "--quiet");
        assertThat(two.code()).as(two.err()).isZero();

        List<String> ids = CliHarness.tableLines(dir.resolve("one/catalogue.ecsv")).stream().skip(1)
                .map(l -> l.substring(0, l.indexOf(','))).toList();
        assertThat(ids).hasSize(3);
        assertThat(names(dir.resolve("one/profiles"))).containsExactlyElementsOf(ids.stream().map(i -> i + ".csv")
                .toList());
        for (String id : ids) {
            Path file = dir.resolve("one/profiles/" + id + ".csv");
            assertThat(Files.readAllBytes(dir.resolve("two/profiles/" + id + ".csv")))
                    .isEqualTo(Files.readAllBytes(file));
            List<ProfileRow> rows;
            try (Reader in = Files.newBufferedReader(file)) {
                rows = ProfileReader.read(in);
            }
            // centre to surface, the whole star
            assertThat(rows.size()).isGreaterThan(100);
            assertThat(rows.get(0).massFrac()).isLessThan(1e-4);
            assertThat(rows.get(rows.size() - 1).massFrac()).isEqualTo(1.0);
            assertThat(rows.get(rows.size() - 1).radiusFrac()).isEqualTo(1.0);
        }

        // shards write their own models' profiles; merge carries them over
        for (int k = 1; k <= 2; k++) {
            assertThat(run("run", grid.toString(), "--shard", k + "/2", "--quiet").code()).isZero();
        }
        CliHarness.Execution merged = run("merge", "runs/profiles-shard-1-of-2", "runs/profiles-shard-2-of-2",
                "--out", "merged");
        assertThat(merged.code()).as(merged.err()).isZero();
        assertThat(names(dir.resolve("merged/profiles"))).containsExactlyElementsOf(names(dir.resolve("one/profiles")));
    }

    @Test
    void withoutTheKeyThereAreNoProfiles() throws Exception {
        Path grid = CliHarness.writeGrid(dir, "p.yaml", GRID.replace("PROFILES", "false"));
        CliHarness.Execution e = run("run", "--no-refine", grid.toString(), "--out", "none", "--quiet");
        assertThat(e.code()).as(e.err()).isZero();
        assertThat(dir.resolve("none/profiles")).doesNotExist();
    }

    private static List<String> names(Path folder) throws Exception {
        try (Stream<Path> files = Files.list(folder)) {
            return files.map(f -> f.getFileName().toString()).sorted().toList();
        }
    }
}
