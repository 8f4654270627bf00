package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.convgrid.output.RunLayout;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The words of messages, help texts and warnings that a practitioner read and found wrong or missing. */
class CommandWordsTest {

    /** The grid's axes without physics, one model: 1 Msun at Z = 0.014 on the zero-age main sequence. */
    private static final String ONE_MODEL = """
            mass: {values: [1.0]}
            metallicity: {z: 0.014, y: 0.27}
            age: {gyr: [0], origin: zams}
            """;

    @TempDir
    Path work;

    private CliHarness cli() {
        return CliHarness.in(work, FakeChunkSolver.fast());
    }

    /** Help text with its line wrapping undone, so that phrases can be looked for whole. */
    private String help(String... args) {
        CliHarness.Execution help = cli().execute(args);
        assertThat(help.code()).isZero();
        return help.out().replaceAll("\\s+", " ");
    }

    @Test
    void starProfileHelpNamesEveryProfileColumnInTheFileOrder() {
        // the help had listed the columns by hand and fell behind when mu, he3_frac and buoyancy_n2_cgs came
        String help = help("star", "--help");
        assertThat(help).contains(String.join(", ", org.convgrid.output.profile.ProfileColumns.HEADER));
        assertThat(help).contains("mu", "he3_frac", "buoyancy_n2_cgs");
    }

    @Test
    void aNegativeOvershootIsNamedAsTheUserWroteIt() throws Exception {
        Path plain = CliHarness.writeGrid(work, "plain.yaml", ONE_MODEL + "physics:\n  overshoot: -1\n");
        CliHarness.Execution check = cli().execute("check", plain.toString());
        assertThat(check.code()).isEqualTo(2);
        // the key as written, at its value's line and column; not the mapping form's 'length_hp'
        assertThat(check.err()).contains(plain + ":5:14: overshoot must be at least 0 (got -1)").doesNotContain("length_hp");
        Path mapped = CliHarness.writeGrid(work, "mapped.yaml",
                ONE_MODEL + "physics:\n  overshoot: {profile: decaying, length_hp: -1}\n");
        check = cli().execute("check", mapped.toString());
        assertThat(check.code()).isEqualTo(2);
        assertThat(check.err()).contains(mapped + ":5:45: overshoot length_hp must be at least 0 (got -1)");
    }

    @Test
    void theReadmeSampleGridSaysThatHeliumOrYIsRequired() throws Exception {
        // the README's grid, as a user copies it: it must be valid, and say what the parser requires
        String readme = Files.readString(Path.of("..", "README.md"));
        Matcher block = Pattern.compile("### A grid file\n```yaml\n(.*?)```", Pattern.DOTALL).matcher(readme);
        assertThat(block.find()).as("README has a sample grid").isTrue();
        String sample = block.group(1);
        String heliumLine = sample.lines().filter(l -> l.strip().startsWith("helium:")).findFirst().orElseThrow();
        assertThat(heliumLine).contains("required").contains("y: [");
        Path grid = CliHarness.writeGrid(work, "sample.yaml", sample);
        CliHarness.Execution check = cli().execute("check", grid.toString());
        assertThat(check.code()).as(check.err()).isZero();
        // without helium the parser refuses it: README's word "required" is the parser's
        Path noHelium = CliHarness.writeGrid(work, "no-helium.yaml",
                sample.lines().filter(l -> !l.strip().startsWith("helium:")).reduce("", (a, l) -> a + l + "\n"));
        check = cli().execute("check", noHelium.toString());
        assertThat(check.code()).isEqualTo(2);
        assertThat(check.err()).contains("metallicity needs exactly one of 'helium'").contains("'y'");
        assertThat(readme).contains("`metallicity` needs `z` and exactly one of `helium`");
    }

    @Test
    void calibrateSunRefusesAnAgeBelowOneMyr() {
        for (String age : List.of("0.0005", "0", "-1", "NaN")) {
            CliHarness.Execution calibrate = cli().execute("calibrate-sun", "--age-gyr", age,
                    "--preset", "sun.yaml");
            assertThat(calibrate.code()).as(age).isEqualTo(2);
            assertThat(calibrate.err()).as(age).contains("--age-gyr must be from 0.001 to 13 Gyr (got "
                    + (age.equals("0.0005") ? "5e-4" : age) + ")");
        }
        assertThat(work.resolve("sun.yaml")).doesNotExist();
    }

    @Test
    void starGivesAgesBelowOneGyrInMyr() {
        CliHarness.Execution young = cli().execute("star", "--mass", "1", "--z", "0.02", "--age-gyr", "0.15",
                "--age-origin", "zams");
        assertThat(young.code()).as(young.err()).isZero();
        assertThat(young.out()).startsWith("Model at 150 Myr since the zero-age main sequence:");
        CliHarness.Execution old = cli().execute("star", "--mass", "1", "--z", "0.02", "--age-gyr", "1",
                "--age-origin", "zams");
        assertThat(old.code()).as(old.err()).isZero();
        assertThat(old.out()).startsWith("Model at 1 Gyr since the zero-age main sequence:");
    }

    @Test
    void oneModelAndOneThreadAreSingular() throws Exception {
        Path grid = CliHarness.writeGrid(work, "one.yaml", ONE_MODEL);
        CliHarness.Execution check = cli().execute("check", grid.toString(), "--threads", "1");
        assertThat(check.out()).contains(" on 1 thread for these models").doesNotContain("thread(s)");
        CliHarness.Execution run = cli().execute("run", grid.toString(), "--threads", "1");
        assertThat(run.code()).as(run.err()).isZero();
        assertThat(run.err()).contains("computing 1 model on 1 thread into ");
        assertThat(run.out()).contains(": 1 model in " + RunLayout.CATALOGUE + " (");
        CliHarness.Execution two = cli().execute("run", grid.toString(), "--threads", "2", "--force", "--quiet");
        assertThat(two.code()).as(two.err()).isZero();
        assertThat(cli().execute("check", grid.toString(), "--threads", "2").out()).contains(" on 2 threads for");
    }

    @Test
    void checkSaysNoRefinementIsExpectedWhenTheMassStepIsWithinTheTolerance() throws Exception {
        Path grid = CliHarness.writeGrid(work, "fine.yaml", """
                mass: {from: 1.0, to: 1.01, step: 0.001}
                metallicity: {z: 0.014, y: 0.27}
                age: {gyr: [0], origin: zams}
                transitions: {tolerance_msun: 0.002}
                """);
        CliHarness.Execution check = cli().execute("check", grid.toString());
        assertThat(check.code()).as(check.err()).isZero();
        assertThat(check.out()).contains("refinement:    none expected (the grid's mass step, 0.001 Msun at the "
                + "median, is already within the tolerance of 0.002 Msun)").doesNotContain("0 halvings");
    }

    @Test
    void checkGivesAgesBelowOneGyrInMyrAndOneUnitPerLine() throws Exception {
        Path young = CliHarness.writeGrid(work, "young.yaml", """
                mass: {values: [0.5, 1.0]}
                metallicity: {z: 0.014, y: 0.27}
                age: {myr: [20, 150, 600]}
                """);
        CliHarness.Execution check = cli().execute("check", young.toString());
        assertThat(check.code()).as(check.err()).isZero();
        assertThat(check.out()).contains("ages:          3: 20, 150, 600 Myr since birth")
                .contains("for ages up to the demo's 600 Myr").doesNotContain("Gyr");
        // one unit for the line: Gyr as soon as one age reaches 1 Gyr
        Path mixed = CliHarness.writeGrid(work, "mixed.yaml", ONE_MODEL.replace("age: {gyr: [0], origin: zams}",
                "age: {myr: [500, 2000]}"));
        check = cli().execute("check", mixed.toString());
        assertThat(check.code()).as(check.err()).isZero();
        assertThat(check.out()).contains("ages:          2: 0.5, 2 Gyr since birth");
    }

    @Test
    void progressAndSummaryCountsAgreeWithTheirNoun() throws Exception {
        Path grid = CliHarness.writeGrid(work, "one.yaml", ONE_MODEL);
        CliHarness.Execution run = cli().execute("run", grid.toString(), "--threads", "1");
        assertThat(run.code()).as(run.err()).isZero();
        // the sweep's line counts saved and computed models, without a noun to disagree with
        assertThat(run.err()).contains("convgrid: 1 of 1 saved (100%), 1 computed").doesNotContain("1/1 models");
    }

    @Test
    void rangeErrorsSayTheRangeInWordsWithTheValueAsWritten() throws Exception {
        Path grid = CliHarness.writeGrid(work, "bad.yaml", """
                mass: {values: [1.0, 1e6]}
                metallicity: {z: 0.014, helium: {primordial: 0.2485, enrichment: -1.50}}
                age: {myr: [0, 20]}
                physics: {mixing_length: 0}
                """);
        CliHarness.Execution check = cli().execute("check", grid.toString());
        assertThat(check.code()).isEqualTo(2);
        assertThat(check.err()).contains(grid + ":1:22: mass value must be above 0 and at most 300 (got 1e6)")
                .contains(grid + ":2:66: helium enrichment must be at least 0 (got -1.50)")
                .contains(grid + ":3:13: age from birth in Myr must be above 0 and at most 20000 (got 0): age 0 "
                        + "would be the start model; for the zero-age main sequence add origin: zams")
                .contains(grid + ":4:26: mixing_length must be above 0 (got 0)")
                .doesNotContain("inf").doesNotContain("[").doesNotContain(".0E");
        CliHarness.Execution star = cli().execute("star", "--mass", "-1", "--z", "0.02");
        assertThat(star.err()).contains("--mass must be above 0 and at most 300 solar masses (got -1)");
    }

    @Test
    void messageNumbersAreWrittenForPeople() {
        CliHarness.Execution star = cli().execute("star", "--mass", "1", "--z", "0.0005", "--mixing-length", "20");
        assertThat(star.code()).isEqualTo(2);
        assertThat(star.err()).contains("(got 20)").doesNotContain("20.0");
        CliHarness.Execution probe = cli().execute("probe", "--temp-k", "1e30", "--density-cgs", "1", "--x", "0.7",
                "--z", "0.02");
        assertThat(probe.err()).contains("--temp-k must be from 1000 to 1e9 K (got 1e30)");
    }

    @Test
    void aStarFarBelowTheHydrogenBurningLimitIsSaidToBeBelowIt() {
        CliHarness.Execution star = cli().execute("star", "--mass", "0.0005", "--z", "0.02");
        assertThat(star.code()).as(star.err()).isEqualTo(3);
        assertThat(star.err()).contains("convgrid: note: 5e-4 Msun is below the hydrogen-burning limit "
                + "(~0.07-0.09 Msun, higher at low Z: Chabrier & Baraffe 1997)").doesNotContain("near");
        assertThat(star.out() + star.err()).doesNotContain(" 1 iterations");
        // near only within the limit's range (Chabrier & Baraffe 1997: ~0.07-0.09 Msun)
        assertThat(StarCommand.burningLimitNote(0.08)).startsWith("convgrid: note: 0.08 Msun is near the ");
        assertThat(StarCommand.burningLimitNote(0.05)).startsWith("convgrid: note: 0.05 Msun is below the ");
    }

    @Test
    void theHelpTextsSayWhatPractitionersAsked() {
        assertThat(help("--help")).contains("Ages count from birth by default, so young ages cover the "
                + "pre-main sequence");
        String run = help("run", "--help");
        for (String output : List.of(RunLayout.CATALOGUE, RunLayout.ZONES, RunLayout.TRANSITIONS,
                RunLayout.LIFE_EVENTS, RunLayout.TRACKS + "/", RunLayout.PROFILES + "/", RunLayout.MAPS + "/",
                RunLayout.REPORT, RunLayout.MANIFEST)) {
            assertThat(run).as(output).contains(output);
        }
        // the built-in opacity: OpalGn93Opacity.shipped(), the OPAL GN93 tables joined to Ferguson et al. 2005's
        assertThat(help("star", "--help")).contains("OPAL GN93 tables (Iglesias & Rogers 1996)")
                .contains("low-temperature tables of Ferguson et al. 2005");
        String calibrate = help("calibrate-sun", "--help");
        assertThat(calibrate).contains("from 0.001 to 13.0");
        for (String column : List.of("mixing_length", "y_init", "z_init", "model_id", "solver_iterations")) {
            assertThat(calibrate).contains(column);
        }
        for (String column : SolarCalibrationReport.csvHeader().subList(3 + org.convgrid.output.catalogue
                .CatalogueColumns.HEADER.size(), SolarCalibrationReport.csvHeader().size())) {
            assertThat(calibrate).as(column).contains(column);
        }
        assertThat(help("check", "--help")).contains("every key known").contains("within its range")
                .contains("the run directory writable").contains("outside the range convgrid is tested in");
    }
}
