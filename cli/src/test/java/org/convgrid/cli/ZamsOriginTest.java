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
     * Non-regression rows, frozen from the version before ages could count from birth; re-frozen when the equation
     * of state gave hydrogen's bound state its Planck-Larkin weight (1 Msun at zero age: L 0.7337 -> 0.7351 Lsun,
     * envelope base r/R 0.7239 -> 0.7225; 0.3 Msun L 0.012507 -> 0.012510 Lsun).
     */
    private static final List<String> ROWS_BEFORE = List.of(
            "p0-z00-m000-a00,0.3,0.02,0.28,1.8,0.0,0.0,main_sequence,ok,,0.01250659,0.2963781,3545.588,4.971497,"
                    + "7545156.0,96.075,0.6974946,,fully_convective,,,0.0,0.0,0.3,154.833,48,schwarzschild,1.0,"
                    + "467.8384",
            "p0-z00-m000-a01,0.3,0.02,0.28,1.8,0.0,0.06,main_sequence,ok,,0.01194178,0.2899293,3543.626,4.990605,"
                    + "7690708.0,102.2838,0.6992282,,fully_convective,,,0.0,0.0,0.3,159.7644,120,schwarzschild,1.0,"
                    + "537.5331",
            "p0-z00-m001-a00,1.0,0.02,0.28,1.8,0.0,0.0,main_sequence,ok,,0.7337187,0.8816044,5689.474,4.54752,"
                    + "1.351398e+07,81.9607,0.6993804,,conv_envelope,,,0.970238,0.7239238,0.02976199,27.01641,37,"
                    + "schwarzschild,1.0,39.80681",
            "p0-z00-m001-a01,1.0,0.02,0.28,1.8,0.0,0.06,main_sequence,ok,,0.736298,0.882674,5691.016,4.546467,"
                    + "1.353239e+07,82.45771,0.6950009,,conv_envelope,,,0.9703238,0.7238992,0.02967623,26.97893,68,"
                    + "schwarzschild,1.0,40.10152");

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
