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
     * 104 -> 120). Re-frozen when a grid line's first model came to start from the line's shared zero-age ladder
     * instead of a cold start: the same equations, another mesh history, so the rows move by the discretisation only,
     * <= 1.5e-4 relative (1 Msun at zero age: L 0.73511 -> 0.7350465 Lsun, T_c 1.351821e7 -> 1.352024e7 K, envelope
     * base r/R 0.7225335 -> 0.7226881; 0.3 Msun L 0.01251018 -> 0.01251048 Lsun), against the 3e-3 of a doubled mesh
     * (MeshConvergenceTest); Newton iterations change with the start (0.3 Msun at zero age 48 -> 4, as the 0.30 Msun
     * rung is a step away; 0.06 Gyr 120 -> 76 and 68 -> 56).
     */
    private static final List<String> ROWS_BEFORE = List.of(
            "p0-z00-m000-a00,0.3,0.02,0.28,1.8,0.0,0.0,main_sequence,ok,,0.01251048,0.2964116,3545.663,4.971399,"
                    + "7546442.0,96.06871,0.6974977,,fully_convective,,,0.0,0.0,0.3,154.8649,4,schwarzschild,1.0,"
                    + "467.7695",
            "p0-z00-m000-a01,0.3,0.02,0.28,1.8,0.0,0.06,main_sequence,ok,,0.01194527,0.2899596,3543.699,4.990514,"
                    + "7691955.0,102.2788,0.6992281,,fully_convective,,,0.0,0.0,0.3,159.7991,76,schwarzschild,1.0,"
                    + "537.4946",
            "p0-z00-m001-a00,1.0,0.02,0.28,1.8,0.0,0.0,main_sequence,ok,,0.7350465,0.8822046,5690.109,4.546929,"
                    + "1.352024e+07,81.9808,0.6993805,,conv_envelope,,,0.970159,0.7226881,0.029841,27.01253,25,"
                    + "schwarzschild,1.0,40.34376",
            "p0-z00-m001-a01,1.0,0.02,0.28,1.8,0.0,0.06,main_sequence,ok,,0.7376333,0.8832782,5691.647,4.545873,"
                    + "1.35387e+07,82.47898,0.6949911,,conv_envelope,,,0.9702459,0.7226687,0.02975409,26.97319,56,"
                    + "schwarzschild,1.0,41.03362");

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
