package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import org.convgrid.output.catalogue.CatalogueColumns;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class StarCommandTest {

    @TempDir
    Path dir;

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        return ConvgridMain.commandLine(new PrintWriter(out), new PrintWriter(err),
                CommandContext.production().withWorkingDirectory(dir)).execute(args);
    }

    @Test
    void csvIsTheCatalogueHeaderAndOneRowAndTheProfileHasEveryShell() throws Exception {
        int code = run("star", "--mass", "0.8", "--z", "0.0188", "--y", "0.275", "--format", "csv",
                "--profile", "p.csv");
        assertThat(code).as(err.toString()).isZero();
        String[] lines = out.toString().lines().filter(l -> !l.startsWith("#")).toArray(String[]::new);
        assertThat(lines).hasSize(2);
        List<String> header = Arrays.asList(lines[0].split(","));
        assertThat(header).startsWith(CatalogueColumns.FIXED.toArray(String[]::new));
        assertThat(lines[1]).contains(",ok,").contains(",conv_envelope,");
        // without an age: the zero-age main-sequence model, lithium not followed (empty cell)
        List<String> row = Arrays.asList(lines[1].split(",", -1));
        assertThat(row.get(header.indexOf("phase"))).isEqualTo("main_sequence");
        assertThat(row.get(header.indexOf("surface_li_rel"))).isEmpty();
        assertThat(row.get(header.indexOf("age_gyr"))).isEqualTo("0.0");
        List<String> profile = Files.readAllLines(dir.resolve("p.csv"));
        assertThat(profile.size()).isGreaterThan(300);
        // an ECSV header naming the star, then the column names (pandas: comment="#")
        assertThat(profile.get(0)).isEqualTo("# %ECSV 1.0");
        assertThat(profile).contains("#   model_id: 'star-m0.8000-z0.01880'", "#   y_init: 0.275", "#   age_gyr: 0.0",
                "#   age_origin: 'zams'", "#   settling: false");
        assertThat(profile.stream().filter(l -> !l.startsWith("#")).findFirst().orElseThrow())
                .startsWith("mass_frac,radius_frac");
    }

    @Test
    void theProfileCarriesTheAcousticColumns() throws Exception {
        assertThat(run("star", "--mass", "1", "--z", "0.02", "--profile", "sun.csv")).as(err.toString()).isZero();
        List<org.convgrid.output.profile.ProfileRow> shells = org.convgrid.output.profile.ProfileReader.read(
                Files.newBufferedReader(dir.resolve("sun.csv")));
        var centre = shells.get(0);
        var surface = shells.get(shells.size() - 1);
        // a fully ionised gas has Gamma1 close to 5/3; radiation, degeneracy and Coulomb terms move it at the 1e-3
        // level (common practice; measured here 1.667421 at the first point out, r/R = 0.003)
        assertThat(centre.gamma1()).isCloseTo(5.0 / 3.0, org.assertj.core.api.Assertions.within(0.01 * 5.0 / 3.0));
        // the Sun's central sound speed is ~5.1e7 cm/s (from memory); a zero-age Sun is close to it
        assertThat(centre.soundSpeed()).isBetween(4.5e7, 5.6e7);
        assertThat(centre.soundSpeed()).isCloseTo(Math.sqrt(centre.gamma1() * centre.pressure() / centre.density()),
                org.assertj.core.api.Assertions.within(1e-6 * centre.soundSpeed()));
        // the hydrogen and helium ionisation zones lower Gamma1 well below 5/3 just under the surface
        // (Kippenhahn, Weigert & Weiss 2012, ch. 14)
        double lowest = shells.stream().filter(s -> s.radiusFrac() > 0.95).mapToDouble(s -> s.gamma1()).min()
                .orElseThrow();
        assertThat(lowest).isLessThan(1.4);
        assertThat(surface.radius() / surface.radiusFrac()).isBetween(0.85 * 6.957e10, 0.95 * 6.957e10);
        // the surface keeps its birth hydrogen (X = 1 - 0.2771 - 0.02 with the default helium law), the centre less
        assertThat(surface.hydrogen()).isCloseTo(0.7029, org.assertj.core.api.Assertions.within(2e-3));
        assertThat(centre.hydrogen()).isLessThanOrEqualTo(surface.hydrogen());
        // mu of a fully ionised X = 0.7029, Z = 0.02 gas is 0.616 (1/mu = 2X + 3Y/4 + Z/2, Kippenhahn, Weigert &
        // Weiss 2012, ch. 13); a neutral photosphere's is ~1.3 (the same formula without electrons)
        assertThat(centre.mu()).isCloseTo(0.616, org.assertj.core.api.Assertions.within(0.01));
        assertThat(surface.mu()).isBetween(1.2, 1.35);
        assertThat(shells).allSatisfy(s -> assertThat(s.helium3()).isBetween(0.0, 1e-2));
        // N^2 is written at every point; radiative points are stable (N^2 > 0), and the innermost point, at
        // m/M 1e-6, is near the centre's limit N^2 -> 0 (Unno et al. 1989, "Nonradial Oscillations of Stars",
        // from memory)
        assertThat(shells).allSatisfy(s -> assertThat(s.buoyancySquared()).isFinite());
        assertThat(shells).filteredOn(s -> !s.convective()).allSatisfy(s -> assertThat(s.buoyancySquared()).isPositive());
        double interiorPeak = shells.stream().filter(s -> s.radiusFrac() < 0.5).mapToDouble(s -> s.buoyancySquared())
                .max().orElseThrow();
        assertThat(centre.buoyancySquared()).isLessThan(0.01 * interiorPeak);
    }

    @Test
    void aPresetGivesItsMixingLengthAndAtmosphereAsTheTwoOptionsWould() throws Exception {
        Files.writeString(dir.resolve("p.yaml"), "mixing_length: 2.0\natmosphere: eddington\n");
        assertThat(run("star", "--mass", "1", "--z", "0.02", "--format", "csv", "--preset", "p.yaml"))
                .as(err.toString()).isZero();
        String withPreset = out.toString();
        out.getBuffer().setLength(0);
        assertThat(run("star", "--mass", "1", "--z", "0.02", "--format", "csv", "--mixing-length", "2.0",
                "--atmosphere", "eddington")).as(err.toString()).isZero();
        assertThat(withPreset).isEqualTo(out.toString());
        String[] lines = withPreset.lines().filter(l -> !l.startsWith("#")).toArray(String[]::new);
        int alpha = Arrays.asList(lines[0].split(",")).indexOf(CatalogueColumns.MIXING_LENGTH);
        assertThat(lines[1].split(",", -1)[alpha]).isEqualTo("2.0");
        // the preset's mixing length belongs to its atmosphere: either one given beside it is refused
        assertThat(run("star", "--mass", "1", "--z", "0.02", "--preset", "p.yaml", "--atmosphere", "eddington"))
                .isEqualTo(2);
        assertThat(err.toString()).contains("give --preset or --atmosphere, not both");
        // a file that is not a preset, and one that is not there
        assertThat(run("star", "--mass", "1", "--z", "0.02", "--preset", "p.csv")).isEqualTo(2);
        assertThat(err.toString()).contains("--preset: cannot read").contains("p.csv");
        Files.writeString(dir.resolve("grid.yaml"), "mass: {values: [1]}\n");
        assertThat(run("star", "--mass", "1", "--z", "0.02", "--preset", "grid.yaml")).isEqualTo(2);
        assertThat(err.toString()).contains("unknown key 'mass' in the preset");
    }

    @Test
    void impossibleRequestsAreUsageErrors() {
        assertThat(run("star", "--mass", "-1", "--z", "0.02")).isEqualTo(2);
        assertThat(run("star", "--mass", "1", "--z", "0.02", "--age-gyr", "-1")).isEqualTo(2);
        assertThat(err.toString()).contains("--mass").contains("--age-gyr");
        assertThat(run("star", "--mass", "1", "--z", "0.02", "--y", "0.99")).isEqualTo(2);
    }

    @Test
    void ageOptionsThatContradictOrMeanNothingAreUsageErrors() {
        assertThat(run("star", "--mass", "1", "--z", "0.02", "--age-gyr", "1", "--age-myr", "5")).isEqualTo(2);
        assertThat(err.toString()).contains("--age-gyr and --age-myr exclude each other");
        assertThat(run("star", "--mass", "1", "--z", "0.02", "--age-myr", "5", "--age-origin", "formation"))
                .isEqualTo(2);
        assertThat(err.toString()).contains("--age-origin must be birth or zams").contains("formation");
        assertThat(run("star", "--mass", "1", "--z", "0.02", "--age-origin", "birth")).isEqualTo(2);
        assertThat(err.toString()).contains("--age-origin birth needs an age");
        assertThat(run("star", "--mass", "1", "--z", "0.02", "--age-myr", "0")).isEqualTo(2);
        assertThat(err.toString()).contains("--age-myr must be above 0 and at most 20000 Myr from birth (got 0)");
        assertThat(run("star", "--mass", "1", "--z", "0.02", "--age-myr", "25000", "--age-origin", "zams"))
                .isEqualTo(2);
        assertThat(err.toString()).contains("--age-myr must be from 0 to 20000 Myr (got 25000)");
    }

    @Test
    void anAgeCountsFromBirthByDefault() {
        int code = run("star", "--mass", "1", "--z", "0.02", "--age-myr", "5", "--format", "csv");
        assertThat(code).as(err.toString()).isZero();
        String[] lines = out.toString().lines().filter(l -> !l.startsWith("#")).toArray(String[]::new);
        List<String> header = Arrays.asList(lines[0].split(","));
        List<String> row = Arrays.asList(lines[1].split(",", -1));
        // 1 Msun reaches the main sequence after ~50 Myr (Iben 1965, ApJ 141, 993, from memory): at 5 Myr it contracts
        assertThat(row.get(header.indexOf("phase"))).isEqualTo("pre_main_sequence");
        assertThat(Double.parseDouble(row.get(header.indexOf("surface_li_rel")))).isBetween(0.0, 1.0);
        assertThat(row.get(header.indexOf("age_gyr"))).isEqualTo("0.005");
    }

    @Test
    void anAgeBeyondCoreHydrogenExhaustionIsExitCodeThreeWithTheReason() {
        // a 2 Msun star lives ~1.1 Gyr on the main sequence (Schaller et al. 1992, A&A Suppl. 96, 269, Table 47)
        int code = run("star", "--mass", "2", "--z", "0.0188", "--y", "0.275", "--age-gyr", "3", "--age-origin",
                "zams");
        assertThat(code).as(err.toString()).isEqualTo(3);
        assertThat(err.toString()).contains("past the main sequence").contains("core hydrogen exhausted");
        assertThat(out.toString()).startsWith("Model at 3 Gyr since the zero-age main sequence")
                .contains("past_main_sequence");
    }

    @Test
    void aFullyConvectiveStarHasNoCoreLineWithATopAtTheSurface() {
        // 0.2 Msun is fully convective on the zero-age main sequence (Chabrier & Baraffe 1997, A&A 327, 1039; from
        // memory); its one zone is the envelope reaching the centre, never a core reaching the surface
        int code = run("star", "--mass", "0.2", "--z", "0.02");
        assertThat(code).as(err.toString()).isZero();
        List<String> lines = out.toString().lines().toList();
        assertThat(lines).anyMatch(l -> l.matches("\\s+structure\\s+fully convective"));
        assertThat(lines).filteredOn(l -> l.contains("convective core, top")).hasSize(2)
                .allMatch(l -> l.matches("\\s+convective core, top\\s+-\\s+(m/M|r/R)"));
        assertThat(lines).anyMatch(l -> l.matches("\\s+convective envelope, base\\s+0\\.00000\\s+m/M"));
        assertThat(out.toString()).doesNotContain("1.00000 ");
    }

    @Test
    void aModelThePhysicsCannotBuildIsFailedWithExitCodeThreeAsInAGrid() {
        // an opacity a billion times too small leaves no equation of state solution for the zero-age model: the engine
        // raises it while building, and a grid marks the model failed (exit 3); star said so with exit 1 and no row
        int code = run("star", "--mass", "1", "--z", "0.02", "--opacity-scale", "1e-9", "--format", "csv",
                "--profile", "p.csv");
        assertThat(code).as(err.toString()).isEqualTo(3);
        String[] lines = out.toString().lines().filter(l -> !l.startsWith("#")).toArray(String[]::new);
        assertThat(lines).hasSize(2);
        List<String> header = Arrays.asList(lines[0].split(","));
        List<String> row = Arrays.asList(lines[1].split(",", -1));
        assertThat(row.get(header.indexOf("status"))).isEqualTo("failed");
        assertThat(row.get(header.indexOf("status_detail"))).isNotEmpty();
        assertThat(err.toString()).contains("convgrid: model failed: ").contains("no profile written");
        assertThat(dir.resolve("p.csv")).doesNotExist();
    }

    @Test
    void aTinyZIsWrittenWithItsDigitsAndANonDefaultAtmosphereIsNamed() {
        // Z = 4e-6 read "Z = 0.00000" and named the model as Z = 0 would be
        assertThat(StarReport.metalsText(4e-6)).isEqualTo("4.00e-06");
        assertThat(StarReport.metalsText(0.0)).isEqualTo("0.00000");
        assertThat(StarReport.metalsText(1e-4)).isEqualTo("0.00010");
        assertThat(StarReport.metalsText(0.0188)).isEqualTo("0.01880");
        int code = run("star", "--mass", "1", "--z", "0.02", "--atmosphere", "eddington");
        assertThat(code).as(err.toString()).isZero();
        assertThat(out.toString()).contains(", eddington atmosphere\n");
        out.getBuffer().setLength(0);
        assertThat(run("star", "--mass", "1", "--z", "0.02")).isZero();
        assertThat(out.toString()).doesNotContain("atmosphere");
    }
}
