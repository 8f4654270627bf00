package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.convgrid.survey.ProductionSolvers;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code origin: zams} keeps the meaning ages had before they counted from birth: the rows below were written by the
 * version before this change (commit b13c164) for the same grid without the {@code origin} key, and must come out
 * again byte for byte (production solver, default time steps). The evolved rows (0.06 Gyr) were re-frozen when
 * eps_grav took its conservative form (-du/dt - P dv/dt, time-centred work), which moved them by ~1e-4 (0.3 Msun:
 * L 0.0119434 -> 0.01194178, Newton iterations 104 -> 120; 1 Msun: L 0.7363761 -> 0.736298); the zero-age rows
 * are unchanged.
 */
class ZamsOriginTest {

    private static final String GRID = """
            title: Zero-age origin check
            mass: {values: [0.3, 1.0]}
            metallicity: {z: [0.02], y: [0.28]}
            age: {gyr: [0, 0.06], origin: zams}
            output: {dir: runs/zams}
            """;

    /**
     * Non-regression rows, frozen from the version before ages could count from birth; re-frozen on purpose when the
     * equation of state gave hydrogen's bound state its Planck-Larkin weight (1 Msun at zero age: L 0.7337 -> 0.7351
     * Lsun, envelope base r/R 0.7239 -> 0.7225; 0.3 Msun L 0.012507 -> 0.012510 Lsun) and when eps_grav took its
     * conservative form (the 0.06 Gyr rows move by ~1e-4: 1 Msun L 0.73778 -> 0.73770; 0.3 Msun Newton iterations
     * 104 -> 120).
     */
    private static final List<String> ROWS_BEFORE = List.of(
            "p0-z00-m000-a00,0.3,0.02,0.28,1.8,0.0,0.0,main_sequence,ok,,0.01251018,0.2964114,3545.643,4.971399,"
                    + "7545562.0,96.05156,0.6974955,,fully_convective,,,0.0,0.0,0.3,154.8685,48,schwarzschild,1.0,"
                    + "467.8088",
            "p0-z00-m000-a01,0.3,0.02,0.28,1.8,0.0,0.06,main_sequence,ok,,0.01194498,0.2899598,3543.676,4.990513,"
                    + "7691048.0,102.26,0.6992281,,fully_convective,,,0.0,0.0,0.3,159.8034,120,schwarzschild,1.0,"
                    + "537.5978",
            "p0-z00-m001-a00,1.0,0.02,0.28,1.8,0.0,0.0,main_sequence,ok,,0.73511,0.8821527,5690.4,4.54698,"
                    + "1.351821e+07,81.96842,0.6993805,,conv_envelope,,,0.9701136,0.7225335,0.02988644,27.05909,37,"
                    + "schwarzschild,1.0,38.79652",
            "p0-z00-m001-a01,1.0,0.02,0.28,1.8,0.0,0.06,main_sequence,ok,,0.7376995,0.883225,5691.946,4.545925,"
                    + "1.353667e+07,82.46618,0.6949946,,conv_envelope,,,0.9701923,0.7224834,0.02980766,27.03112,68,"
                    + "schwarzschild,1.0,38.92585");

    @TempDir
    Path dir;

    @Test
    void zeroAgeOriginReproducesTheRowsOfBefore() throws Exception {
        Path grid = CliHarness.writeGrid(dir, "zams.yaml", GRID);
        CliHarness harness = new CliHarness(new CommandContext(ProductionSolvers.factory(), List.of(), Map.of(), dir,
                false));
        CliHarness.Execution e = harness.execute("run", "--no-refine", grid.toString(), "--out", "zams", "--quiet");
        assertThat(e.code()).as(e.err()).isZero();
        List<String> rows = CliHarness.tableLines(dir.resolve("zams/catalogue.ecsv"));
        assertThat(rows.subList(1, rows.size())).containsExactlyElementsOf(ROWS_BEFORE);
        assertThat(dir.resolve("zams/life_events.csv")).doesNotExist();
    }
}
