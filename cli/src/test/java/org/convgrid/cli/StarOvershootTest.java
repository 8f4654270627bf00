package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code star --overshoot-hp L [--overshoot-profile uniform|decaying]} gives the same catalogue row (all but the model
 * id) as a one-model grid whose {@code overshoot} key says the same: a practitioner could not reproduce a grid model
 * with overshoot, star having no such option. Production solver; the check is that both paths ask for the same
 * physics, not of the physics itself.
 */
class StarOvershootTest {

    private static final String GRID = """
            title: Overshoot reproduction
            mass: {values: [1.5]}
            metallicity: {z: [0.02], y: [0.28]}
            age: {myr: [300], origin: ORIGIN}
            physics: {overshoot: OVERSHOOT}
            """;

    @TempDir
    Path dir;

    private CliHarness.Execution run(String... args) {
        return CliHarness.real(dir).execute(args);
    }

    @Test
    void uniformOvershootGivesTheGridRow() throws Exception {
        assertSameRow("birth", "0.2", "--overshoot-hp", "0.2");
    }

    @Test
    void decayingOvershootGivesTheGridRow() throws Exception {
        assertSameRow("zams", "{profile: decaying, length_hp: 0.016}", "--overshoot-hp", "0.016",
                "--overshoot-profile", "decaying", "--age-origin", "zams");
    }

    /**
     * From birth too: before the diffusion stopped at the top of a zone that reaches the surface skin
     * ({@code ExponentialOvershoot}), every 1.0, 1.5 and 2.0 Msun star from birth with decaying overshoot failed in
     * the first Myr (step budget used at X_c = 0.700), in a grid and in star alike.
     */
    @Test
    void decayingOvershootFromBirthGivesTheGridRow() throws Exception {
        assertSameRow("birth", "{profile: decaying, length_hp: 0.016}", "--overshoot-hp", "0.016",
                "--overshoot-profile", "decaying");
    }

    @Test
    void aNegativeLengthOrAnUnknownProfileIsAUsageError() {
        CliHarness.Execution negative = run("star", "--mass", "1", "--z", "0.02", "--overshoot-hp", "-0.1");
        assertThat(negative.code()).isEqualTo(ExitCodes.USAGE);
        assertThat(negative.err()).contains("--overshoot-hp must be at least 0");
        CliHarness.Execution unknown = run("star", "--mass", "1", "--z", "0.02", "--overshoot-profile", "step");
        assertThat(unknown.code()).isEqualTo(ExitCodes.USAGE);
        assertThat(unknown.err()).contains("--overshoot-profile must be uniform or decaying, got 'step'");
        // a profile without its length mixed nothing, silently; the grid key needs its length_hp alike
        CliHarness.Execution lengthless = run("star", "--mass", "1", "--z", "0.02", "--overshoot-profile", "decaying");
        assertThat(lengthless.code()).isEqualTo(ExitCodes.USAGE);
        assertThat(lengthless.err()).contains("--overshoot-profile decaying needs --overshoot-hp");
    }

    private void assertSameRow(String origin, String gridOvershoot, String... starOptions) throws Exception {
        Path grid = CliHarness.writeGrid(dir, "ov-" + origin + ".yaml",
                GRID.replace("ORIGIN", origin).replace("OVERSHOOT", gridOvershoot));
        CliHarness.Execution sweep = run("run", "--no-refine", grid.toString(), "--out", "run-" + origin, "--quiet");
        assertThat(sweep.code()).as(sweep.err()).isZero();
        List<String> gridLines = CliHarness.tableLines(dir.resolve("run-" + origin + "/catalogue.ecsv"));

        List<String> args = new java.util.ArrayList<>(List.of("star", "--mass", "1.5", "--z", "0.02", "--y", "0.28",
                "--age-myr", "300", "--format", "csv"));
        args.addAll(List.of(starOptions));
        CliHarness.Execution star = run(args.toArray(String[]::new));
        assertThat(star.code()).as(star.err()).isZero();
        List<String> starLines = star.out().lines().filter(l -> !l.startsWith("#")).toList();

        assertThat(starLines.get(0)).isEqualTo(gridLines.get(0));
        assertThat(withoutId(starLines.get(1))).isEqualTo(withoutId(gridLines.get(1)));
        assertThat(starLines.get(1)).contains(",ok,");
    }

    private static String withoutId(String row) {
        return row.substring(row.indexOf(','));
    }
}
