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
 * again byte for byte (production solver, default time steps).
 */
class ZamsOriginTest {

    private static final String GRID = """
            title: Zero-age origin check
            mass: {values: [0.3, 1.0]}
            metallicity: {z: [0.02], y: [0.28]}
            age: {gyr: [0, 0.06], origin: zams}
            output: {dir: runs/zams}
            """;

    /** Non-regression rows, frozen from the version before ages could count from birth. */
    private static final List<String> ROWS_BEFORE = List.of(
            "p0-z00-m000-a00,0.3,0.02,0.28,1.8,0.0,0.0,main_sequence,ok,,0.01250659,0.2963781,3545.588,4.971497,"
                    + "7545156.0,96.075,0.6974946,,fully_convective,,,0.0,0.0,0.3,154.833,48,schwarzschild,1.0,"
                    + "467.8384",
            "p0-z00-m000-a01,0.3,0.02,0.28,1.8,0.0,0.06,main_sequence,ok,,0.0119434,0.289948,3543.631,4.990549,"
                    + "7690250.0,102.2641,0.6992283,,fully_convective,,,0.0,0.0,0.3,159.7766,104,schwarzschild,1.0,"
                    + "537.6732",
            "p0-z00-m001-a00,1.0,0.02,0.28,1.8,0.0,0.0,main_sequence,ok,,0.7337187,0.8816044,5689.474,4.54752,"
                    + "1.351398e+07,81.9607,0.6993804,,conv_envelope,,,0.970238,0.7239238,0.02976199,27.01641,37,"
                    + "schwarzschild,1.0,39.80681",
            "p0-z00-m001-a01,1.0,0.02,0.28,1.8,0.0,0.06,main_sequence,ok,,0.7363761,0.8826709,5691.177,4.54647,"
                    + "1.353329e+07,82.47659,0.694999,,conv_envelope,,,0.970339,0.7239236,0.02966102,26.97134,68,"
                    + "schwarzschild,1.0,40.16313");

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
