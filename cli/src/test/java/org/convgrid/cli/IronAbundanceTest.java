package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * [Fe/H] instead of Z, in a grid ({@code metallicity: fe_h_dex}) and in {@code star --fe-h-dex}: the same
 * composition, so the same model. Wanted for stellar-activity and exoplanet-host work (hosts come with a
 * spectroscopic [Fe/H]); the conversion is IronToMetals's (common practice, no single published source).
 */
class IronAbundanceTest {

    @TempDir
    Path dir;

    private CliHarness.Execution run(String... args) {
        return CliHarness.real(dir).execute(args);
    }

    @Test
    void aGridAndStarGiveTheSameZeroAgeModelForOneIronAbundance() throws Exception {
        Path grid = CliHarness.writeGrid(dir, "hosts.yaml", """
                title: Iron abundance check
                mass: {values: [1.0]}
                metallicity: {fe_h_dex: [0.1], helium: {primordial: 0.2471, enrichment: 1.5}}
                age: {gyr: [0], origin: zams}
                """);
        CliHarness.Execution check = run("check", grid.toString());
        assertThat(check.code()).as(check.err()).isZero();
        assertThat(check.out()).contains("metallicities: 1: [Fe/H]=0.1 Z=0.02155975");
        CliHarness.Execution sweep = run("run", "--no-refine", grid.toString(), "--out", "hosts", "--quiet");
        assertThat(sweep.code()).as(sweep.err()).isZero();
        List<String> gridLines = CliHarness.tableLines(dir.resolve("hosts/catalogue.ecsv"));

        CliHarness.Execution star = run("star", "--mass", "1", "--fe-h-dex", "0.1", "--format", "csv");
        assertThat(star.code()).as(star.err()).isZero();
        assertThat(star.err()).contains("convgrid: [Fe/H] 0.1 against solar Z/X 0.0245: Z = 0.02155975, Y = ");
        List<String> starLines = star.out().lines().filter(l -> !l.startsWith("#")).toList();
        List<String> header = List.of(starLines.get(0).split(","));
        String[] fromStar = starLines.get(1).split(",", -1);
        String[] fromGrid = gridLines.get(1).split(",", -1);
        for (String column : List.of("z_init", "y_init", "luminosity_lsun", "teff_k", "env_cz_base_radius_frac",
                "fe_h_dex")) {
            assertThat(fromStar[header.indexOf(column)]).as(column).isEqualTo(fromGrid[header.indexOf(column)]);
        }
        // Z / X = 0.0245 x 10^0.1 with Y = 0.2471 + 1.5 Z: Z = 0.0215597, by hand
        assertThat(Double.parseDouble(fromStar[header.indexOf("z_init")])).isBetween(0.0215595, 0.0215600);
        // both give back the [Fe/H] asked for
        assertThat(fromStar[header.indexOf("fe_h_dex")]).isEqualTo("0.1");
    }

    @Test
    void checkSaysWhatIronAGridInZWillHave() throws Exception {
        Path grid = CliHarness.writeGrid(dir, "inz.yaml", """
                title: Z check
                mass: {values: [1.0]}
                metallicity: {z: [0.0, 0.014], helium: {primordial: 0.2471, enrichment: 1.5}}
                age: {gyr: [0], origin: zams}
                """);
        CliHarness.Execution check = run("check", grid.toString());
        assertThat(check.code()).as(check.err()).isZero();
        // log10((0.014 / 0.7179) / 0.0245) = -0.0991 (Y = 0.2681, X = 0.7179), by hand; Z = 0 has none
        assertThat(check.out()).contains("metallicities: 2: Z=0 Y=0.2471, Z=0.014 Y=0.2681 ([Fe/H] -0.0991); [Fe/H]"
                + " against solar Z/X 0.0245");
    }

    @Test
    void starsCsvMeasuresIronAgainstItsOwnSun() {
        CliHarness.Execution star = run("star", "--mass", "1", "--fe-h-dex", "-0.35", "--solar-z-over-x", "0.0181",
                "--format", "csv");
        assertThat(star.code()).as(star.err()).isZero();
        assertThat(star.out()).contains("description: '[Fe/H] = log10 of (Z/X) over the solar Z/X 0.0181 ");
        List<String> lines = star.out().lines().filter(l -> !l.startsWith("#")).toList();
        List<String> header = List.of(lines.get(0).split(","));
        assertThat(header).contains("fe_h_dex");
        assertThat(lines.get(1).split(",", -1)[header.indexOf("fe_h_dex")]).isEqualTo("-0.35");
    }

    @Test
    void zAndIronTogetherOrNeitherAreUsageErrors() {
        CliHarness.Execution both = run("star", "--mass", "1", "--z", "0.02", "--fe-h-dex", "0");
        assertThat(both.code()).isEqualTo(ExitCodes.USAGE);
        assertThat(both.err()).contains("convgrid: --z=Z, --fe-h-dex=DEX are mutually exclusive (specify only one)");
        CliHarness.Execution neither = run("star", "--mass", "1");
        assertThat(neither.code()).isEqualTo(ExitCodes.USAGE);
        assertThat(neither.err()).contains("convgrid: Missing required argument (specify one of these): (--z=Z | "
                + "--fe-h-dex=DEX)");
        CliHarness.Execution stray = run("star", "--mass", "1", "--z", "0.02", "--solar-z-over-x", "0.018");
        assertThat(stray.code()).isEqualTo(ExitCodes.USAGE);
        assertThat(stray.err()).contains("--solar-z-over-x is the Sun's Z/X that --fe-h-dex is measured against");
        CliHarness.Execution far = run("star", "--mass", "1", "--fe-h-dex", "3");
        assertThat(far.code()).isEqualTo(ExitCodes.USAGE);
        assertThat(far.err()).contains("--fe-h-dex must be from -5 to 1 (got 3)");
        CliHarness.Execution rich = run("star", "--mass", "1", "--fe-h-dex", "1", "--solar-z-over-x", "0.1");
        assertThat(rich.code()).isEqualTo(ExitCodes.USAGE);
        assertThat(rich.err()).contains("--fe-h-dex 1 gives Z = 0.2151143 (solar Z/X 0.1), outside [0, 0.1)");
    }
}
