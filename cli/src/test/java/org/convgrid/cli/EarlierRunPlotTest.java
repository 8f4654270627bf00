package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code plot} of a run directory whose tables were written before they named the overshoot profile: the charts take
 * the run's profile from its manifest, so their file names and subtitles agree with the report's physics rows (a
 * ramped run's charts had read "overshoot 0.2 Hp" beside a report that said uniform-ramped).
 */
class EarlierRunPlotTest {

    @TempDir
    Path dir;

    @Test
    void chartsOfAnEarlierRampedRunNameItsProfile() throws Exception {
        Path grid = CliHarness.writeGrid(dir, "ramped.yaml", """
                title: Earlier ramped run
                mass: {values: [1.6, 2.0]}
                metallicity: {z: [0.02], y: [0.28]}
                physics: {overshoot: {profile: uniform-ramped, length_hp: 0.2}}
                """);
        CliHarness harness = CliHarness.real(dir);
        CliHarness.Execution sweep = harness.execute("run", "--no-refine", grid.toString(), "--out", "old", "--quiet");
        assertThat(sweep.code()).as(sweep.err()).isZero();
        Path run = dir.resolve("old");
        // the tables as the version before the column wrote them
        dropColumn(run.resolve("catalogue.ecsv"), "overshoot_profile");
        dropColumn(run.resolve("transitions.csv"), "overshoot_profile");
        if (Files.isDirectory(run.resolve("maps"))) {
            try (Stream<Path> maps = Files.list(run.resolve("maps"))) {
                for (Path p : maps.toList()) {
                    Files.delete(p);
                }
            }
        }
        CliHarness.Execution plot = harness.execute("plot", run.toString());
        assertThat(plot.code()).as(plot.err()).isZero();
        try (Stream<Path> maps = Files.list(run.resolve("maps"))) {
            List<String> names = maps.map(p -> p.getFileName().toString()).toList();
            assertThat(names).isNotEmpty().allSatisfy(n -> assertThat(n).contains("_ov0.2-uniform-ramped_"));
        }
    }

    /** Removes a column (header description line and cells) from a CSV or ECSV table. */
    private static void dropColumn(Path table, String column) throws Exception {
        List<String> lines = Files.readAllLines(table);
        String header = lines.stream().filter(l -> !l.startsWith("#")).findFirst().orElseThrow();
        int index = List.of(header.split(",")).indexOf(column);
        assertThat(index).isNotNegative();
        List<String> out = new java.util.ArrayList<>();
        for (String line : lines) {
            if (line.startsWith("#")) {
                if (!line.contains("{name: " + column)) {
                    out.add(line);
                }
                continue;
            }
            List<String> cells = new java.util.ArrayList<>(List.of(line.split(",", -1)));
            cells.remove(index);
            out.add(String.join(",", cells));
        }
        Files.write(table, out);
    }
}
