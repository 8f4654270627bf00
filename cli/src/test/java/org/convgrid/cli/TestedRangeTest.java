package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Warnings, never errors, for masses, Z, helium and ages from birth outside the range the models are tested in (README,
 * "Good for / not for").
 */
class TestedRangeTest {

    /** Two masses, one Z and one age outside the range, beside values inside it. */
    private static final String OUTSIDE = """
            mass: {values: [0.05, 1.0, 12.0]}
            metallicity: {z: [0.0, 0.02], y: [0.25, 0.27]}
            age: {myr: [0.05, 20]}
            """;

    @TempDir
    Path work;

    @Test
    void checkWarnsOncePerKindNamingTheValuesAndExitsAsBefore() throws Exception {
        Path grid = CliHarness.writeGrid(work, "outside.yaml", OUTSIDE);
        CliHarness.Execution check = CliHarness.in(work, FakeChunkSolver.fast()).execute("check", grid.toString());
        assertThat(check.code()).as(check.err()).isZero();
        assertThat(check.err().lines().filter(l -> l.startsWith("convgrid: warning: ")).toList()).containsExactly(
                "convgrid: warning: masses 0.05, 12 Msun lie outside the tested range 0.1-10 Msun; results there "
                        + "are untested",
                "convgrid: warning: metallicity Z = 0 lies outside the tested range Z = 1e-4 to 0.04; results "
                        + "there are untested",
                "convgrid: warning: age 0.05 Myr from birth lies below the tested 0.1 Myr (there they depend on "
                        + "the pre-main-sequence start model); results there are untested");
        assertThat(check.out()).contains("models:        12");
    }

    @Test
    void runWarnsEvenWhenQuiet() throws Exception {
        // zero-age models (ages from the ZAMS are never too young), which the fake solver answers: exit 0 as before
        Path grid = CliHarness.writeGrid(work, "outside.yaml",
                OUTSIDE.replace("age: {myr: [0.05, 20]}", "age: {gyr: [0], origin: zams}"));
        CliHarness.Execution run = CliHarness.in(work, FakeChunkSolver.fast())
                .execute("run", grid.toString(), "--quiet", "--no-refine", "--threads", "1");
        assertThat(run.code()).as(run.out() + run.err()).isZero();
        assertThat(run.err().lines().filter(l -> l.startsWith("convgrid: warning: "))).hasSize(2);
    }

    @Test
    void starWarnsOfItsMetallicityAndKeepsItsExitCode() {
        CliHarness.Execution star = CliHarness.in(work, FakeChunkSolver.fast())
                .execute("star", "--mass", "1", "--z", "0.05", "--format", "csv");
        assertThat(star.code()).as(star.err()).isZero();
        assertThat(star.err()).contains("convgrid: warning: metallicity Z = 0.05 lies outside the tested range");
        assertThat(star.out()).doesNotContain("warning");
    }

    @Test
    void heliumOutsideTheRangeWarnsAlikeInAGridAndInStarAndOnlyNoHydrogenIsAnError() throws Exception {
        // a practitioner found y: [0.8] passing check and run silently while star --y 0.99 was refused as untested
        String warning = "convgrid: warning: helium fraction Y = 0.8 lies outside the tested range Y = 0.2 to 0.45; "
                + "results there are untested";
        Path grid = CliHarness.writeGrid(work, "helium.yaml", """
                mass: {values: [1.0]}
                metallicity: {z: [0.02], y: [0.8]}
                age: {gyr: [0], origin: zams}
                """);
        CliHarness.Execution check = CliHarness.in(work, FakeChunkSolver.fast()).execute("check", grid.toString());
        assertThat(check.code()).as(check.err()).isZero();
        assertThat(check.err().lines()).containsExactly(warning);
        CliHarness.Execution run = CliHarness.in(work, FakeChunkSolver.fast())
                .execute("run", grid.toString(), "--quiet", "--no-refine", "--threads", "1");
        assertThat(run.err().lines().filter(l -> l.startsWith("convgrid: warning: "))).containsExactly(warning);

        CliHarness.Execution star = CliHarness.in(work, FakeChunkSolver.fast())
                .execute("star", "--mass", "1", "--z", "0.02", "--y", "0.8", "--format", "csv");
        assertThat(star.code()).as(star.err()).isZero();
        assertThat(star.err().lines()).contains(warning);

        CliHarness.Execution noHydrogen = CliHarness.in(work, FakeChunkSolver.fast())
                .execute("star", "--mass", "1", "--z", "0.02", "--y", "0.98");
        assertThat(noHydrogen.code()).isEqualTo(ExitCodes.USAGE);
        assertThat(noHydrogen.err()).contains("--y 0.98 with --z 0.02 leaves no hydrogen");
        Path dry = CliHarness.writeGrid(work, "dry.yaml", """
                mass: {values: [1.0]}
                metallicity: {z: [0.02], y: [0.98]}
                age: {gyr: [0], origin: zams}
                """);
        CliHarness.Execution refused = CliHarness.in(work, FakeChunkSolver.fast()).execute("check", dry.toString());
        assertThat(refused.code()).isEqualTo(ExitCodes.USAGE);
        assertThat(refused.err()).contains("leaves no hydrogen");
    }

    @Test
    void aGridGivenInIronSpeaksOfIronAndTheZItGives() throws Exception {
        // a user's fe_h_dex: [-2.5] was told "metallicity Z = 5.832024e-5 lies outside the tested range Z = 1e-4 to
        // 0.04", a Z nobody typed; with the default Sun (Z/X 0.0245, Grevesse & Noels 1993) and helium law
        // (0.2471 + 1.5 Z), Z = 1e-4 is [Fe/H] = log10(1e-4 / 0.75265 / 0.0245) = -2.27 and Z = 0.04 is +0.40
        Path grid = CliHarness.writeGrid(work, "iron.yaml", """
                mass: {values: [1.0]}
                metallicity: {fe_h_dex: [-2.5, -1.0], helium: {primordial: 0.2471, enrichment: 1.5}}
                age: {gyr: [0], origin: zams}
                """);
        CliHarness.Execution check = CliHarness.in(work, FakeChunkSolver.fast()).execute("check", grid.toString());
        assertThat(check.code()).as(check.err()).isZero();
        assertThat(check.err().lines().filter(l -> l.startsWith("convgrid: warning: ")).toList()).containsExactly(
                "convgrid: warning: metallicity [Fe/H] = -2.5 gives Z = 5.832e-5, below the tested Z = 1e-4 "
                        + "([Fe/H] = -2.27 here); results there are untested");

        CliHarness.Execution star = CliHarness.in(work, FakeChunkSolver.fast())
                .execute("star", "--mass", "1", "--fe-h-dex", "0.5", "--format", "csv");
        assertThat(star.code()).as(star.err()).isZero();
        assertThat(star.err()).contains("convgrid: warning: metallicity [Fe/H] = 0.5 gives Z = 0.04887, above the "
                + "tested Z = 0.04 ([Fe/H] = +0.40 here); results there are untested");
        // an [Fe/H] that rounds like the end itself is told apart from it by a third decimal
        CliHarness.Execution edge = CliHarness.in(work, FakeChunkSolver.fast())
                .execute("star", "--mass", "1", "--fe-h-dex", "0.4", "--format", "csv");
        assertThat(edge.err()).contains("[Fe/H] = 0.4 gives Z = 0.04016, above the tested Z = 0.04 ([Fe/H] = "
                + "+0.398 here)");

        // both ends at once, under another Sun: each end in that Sun's [Fe/H]
        Path both = CliHarness.writeGrid(work, "both.yaml", """
                mass: {values: [1.0]}
                metallicity: {fe_h_dex: [-3, 0.6], solar_z_over_x: 0.0181, helium: {primordial: 0.2471, enrichment: 1.5}}
                age: {gyr: [0], origin: zams}
                """);
        CliHarness.Execution check2 = CliHarness.in(work, FakeChunkSolver.fast()).execute("check", both.toString());
        assertThat(check2.err().lines().filter(l -> l.startsWith("convgrid: warning: ")).toList()).singleElement()
                .asString().startsWith("convgrid: warning: metallicities [Fe/H] = -3, 0.6 give Z = ")
                .contains("outside the tested range Z = 1e-4 to 0.04 ([Fe/H] = -2.13 to +0.53 here)");
    }

    @Test
    void theEdgesAreInsideAndEveryValueIsListedOrSpanned() {
        assertThat(TestedRange.warnings(List.of(0.1, 10.000000000000002), List.of(1e-4, 0.04), List.of(0.2, 0.45),
                List.of(0.1)))
                .isEmpty();
        List<Double> heavy = List.of(11.0, 12.0, 13.0, 14.0, 15.0, 16.0, 17.0);
        assertThat(TestedRange.warnings(heavy, List.of(0.02), List.of(0.27), List.of())).containsExactly("convgrid: warning: "
                + "7 masses, 11 to 17 Msun, lie outside the tested range 0.1-10 Msun; results there are untested");
    }

    @Test
    void theReadmeStatesTheSameRange() throws Exception {
        String readme = Files.readString(Path.of("..", "README.md")).replaceAll("\\s*\n>?\\s*", " ");
        assertThat(readme).contains("stars of 0.1-10 Msun from birth to core-hydrogen exhaustion, Z = 1e-4 to 0.04")
                .contains("ages from birth from 0.1 Myr").contains("helium Y = 0.2 to 0.45")
                .contains("Outside this tested range `check`, `run` and `star` still compute but print a warning");
        assertThat(TestedRange.MIN_MASS_MSUN).isEqualTo(0.1);
        assertThat(TestedRange.MAX_MASS_MSUN).isEqualTo(10.0);
        assertThat(TestedRange.MIN_Z).isEqualTo(1e-4);
        assertThat(TestedRange.MAX_Z).isEqualTo(0.04);
        assertThat(TestedRange.MIN_BIRTH_AGE_MYR).isEqualTo(0.1);
        assertThat(TestedRange.MIN_Y).isEqualTo(0.2);
        assertThat(TestedRange.MAX_Y).isEqualTo(0.45);
    }
}
