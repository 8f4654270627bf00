package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.convgrid.engine.request.GlobalProperties;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.calibration.CalibratedSun;
import org.convgrid.engine.convection.ConvectiveStructure;
import org.convgrid.engine.convection.ConvectiveZone;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.physics.atmosphere.AtmosphereChoice;
import org.convgrid.engine.units.Constants;
import org.convgrid.output.catalogue.CatalogueColumns;
import org.convgrid.output.profile.ProfileReader;
import org.convgrid.output.profile.ProfileRow;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CalibrateSunCommandTest {

    @TempDir
    Path dir;

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        return ConvgridMain.commandLine(new PrintWriter(out), new PrintWriter(err),
                CommandContext.production().withWorkingDirectory(dir)).execute(args);
    }

    /**
     * The conventions' row: mixing_length, y_init, z_init, the catalogue columns (without those three, which the row
     * has already given), the two extras; then our extensions (conventions allow more columns after the fixed ones).
     */
    static List<String> expectedHeader() {
        List<String> h = new ArrayList<>(List.of("mixing_length", "y_init", "z_init"));
        h.addAll(CatalogueColumns.HEADER.stream().filter(c -> !h.contains(c)).toList());
        h.addAll(List.of("zams_luminosity_lsun", "ms_lifetime_gyr", "z_over_x_init", "y_surface",
                "z_over_x_surface"));
        return h;
    }

    @Test
    void csvHeaderFollowsTheConventionsAndTheRowFillsIt() throws Exception {
        StringWriter csv = new StringWriter();
        SolarCalibrationReport.writeCsv(syntheticSun(), csv);
        String[] lines = csv.toString().split("\n");
        assertThat(lines).hasSize(2);
        assertThat(Arrays.asList(lines[0].split(","))).containsExactlyElementsOf(expectedHeader());
        String[] cells = lines[1].split(",", -1);
        assertThat(cells).hasSize(expectedHeader().size());
        assertThat(cells[0]).isEqualTo("1.9");
        assertThat(cells[cells.length - 5]).isEqualTo("0.7");
        assertThat(cells[cells.length - 4]).isEqualTo("10.5");
        assertThat(cells[cells.length - 3]).isEqualTo("0.0255");
        assertThat(cells[cells.length - 2]).isEqualTo("0.245");
        assertThat(lines[1]).contains(",calibrated-sun,").contains(",ok,").contains(",conv_envelope,");
    }

    @Test
    void csvNamesEveryColumnOnce() throws Exception {
        // mixing_length, y_init and z_init came twice (pandas read the repeats as mixing_length.1, ...)
        StringWriter csv = new StringWriter();
        SolarCalibrationReport.writeCsv(syntheticSun(), csv);
        String[] lines = csv.toString().split("\n");
        List<String> header = Arrays.asList(lines[0].split(","));
        assertThat(header).doesNotHaveDuplicates().contains("model_id", "mass_msun", "overshoot_hp", "age_gyr");
        List<String> cells = Arrays.asList(lines[1].split(",", -1));
        assertThat(cells.get(header.indexOf("mixing_length"))).isEqualTo("1.9");
        assertThat(cells.get(header.indexOf("y_init"))).isEqualTo("0.27");
        assertThat(cells.get(header.indexOf("z_init"))).isEqualTo("0.0165");
        assertThat(cells.get(header.indexOf("mass_msun"))).isEqualTo("1.0");
        assertThat(cells.get(header.indexOf("model_id"))).isEqualTo("calibrated-sun");
    }

    @Test
    void aProfileThatCannotBeWrittenOrNamesThePresetIsRefusedBeforeTheCalibration() throws Exception {
        // refused at once (exit 2), not after a minute of evolutions, and nothing is written
        Files.createDirectory(dir.resolve("folder"));
        assertThat(run("calibrate-sun", "--profile", "folder")).isEqualTo(2);
        assertThat(err.toString()).contains("--profile").contains("is a directory");
        assertThat(run("calibrate-sun", "--profile", "sun.yaml", "--preset", "sun.yaml")).isEqualTo(2);
        assertThat(err.toString()).contains("--profile and --preset both name");
        assertThat(err.toString()).doesNotContain("evolution 1");
        assertThat(dir.resolve("calibrated-sun.yaml")).doesNotExist();
        assertThat(dir.resolve("sun.yaml")).doesNotExist();
    }

    @Test
    void tableNamesEveryCalibratedQuantityWithItsUnit() throws Exception {
        StringWriter table = new StringWriter();
        SolarCalibrationReport.writeTable(syntheticSun(), true, table);
        assertThat(table.toString()).contains("mixing length alpha       1.90000 pressure scale heights")
                .contains("envelope base r/R         0.7200").contains("main-sequence lifetime    10.500 Gyr")
                .contains("zero-age L / L_sun        0.7000")
                // the reference of Rossby numbers and envelope-mass scalings
                .contains("envelope mass             0.02000 Msun")
                .contains("turnover time             23.15 d local").contains("34.72 d global");
    }

    @Test
    void presetNamesTheMixingLengthAndTheCalibratedComposition() {
        String text = SolarCalibrationReport.preset(syntheticSun(), AtmosphereChoice.KRISHNA_SWAMY, true, "1.2.3");
        assertThat(text).contains("\nmixing_length: 1.9\n").contains("\ny_init: 0.27\n")
                .contains("\nz_over_x: 0.0231\n").contains("\nage_gyr: 4.57\n").contains("tool_version: \"1.2.3\"")
                .contains("\natmosphere: krishna_swamy\n").contains("\nsettling: true\n")
                .contains("\nz_over_x_init: 0.0255\n");
    }

    @Test
    void ageOutsideZeroToThirteenGyrIsAUsageError() {
        assertThat(run("calibrate-sun", "--age-gyr", "0")).isEqualTo(2);
        assertThat(run("calibrate-sun", "--age-gyr", "-1")).isEqualTo(2);
        assertThat(run("calibrate-sun", "--age-gyr", "13.5")).isEqualTo(2);
        assertThat(run("calibrate-sun", "--z-over-x", "0")).isEqualTo(2);
        assertThat(err.toString()).contains("--age-gyr").contains("--z-over-x");
        assertThat(dir.resolve("calibrated-sun.yaml")).doesNotExist();
    }

    @Test
    void calibratesAndWritesTheCsvRowAndThePreset() throws Exception {
        // the whole calibration (several evolutions, ~20-40 s without settling): the command end to end; the
        // settling calibration's figures are checked in the engine's SolarCalibrationTest
        int code = run("calibrate-sun", "--format", "csv", "--no-settling", "--preset", "sun.yaml", "--profile",
                "sun.csv");
        assertThat(code).as(err.toString()).isZero();
        String[] lines = out.toString().split("\n");
        assertThat(lines).hasSize(2);
        assertThat(Arrays.asList(lines[0].split(","))).containsExactlyElementsOf(expectedHeader());
        assertThat(lines[1]).contains(",calibrated-sun,").contains(",ok,");
        String preset = Files.readString(dir.resolve("sun.yaml"));
        assertThat(preset).contains("mixing_length: ").contains("residual_ln_radius: ").contains("settling: false");
        assertThat(err.toString()).contains("evolution 1: alpha = 1.80000, Y = 0.27000");

        // --profile: the calibrated model itself, with star's columns and header; its surface is the Sun's L and R
        // to the calibration's tolerance (IAU 2015 nominal values, Prsa et al. 2016)
        List<String> profile = Files.readAllLines(dir.resolve("sun.csv"));
        assertThat(profile.get(0)).isEqualTo("# %ECSV 1.0");
        assertThat(profile).contains("#   model_id: 'calibrated-sun'", "#   age_gyr: 4.57", "#   age_origin: 'zams'",
                "#   settling: false");
        List<ProfileRow> shells = ProfileReader.read(Files.newBufferedReader(dir.resolve("sun.csv")));
        ProfileRow surface = shells.get(shells.size() - 1);
        assertThat(surface.luminosity() / Constants.L_SUN).isCloseTo(1.0, within(1e-3));
        assertThat(surface.radius() / Constants.R_SUN).isCloseTo(1.0, within(1e-3));
        assertThat(err.toString()).contains("profile: " + shells.size() + " shells written to");
    }

    private static CalibratedSun syntheticSun() {
        var request = new ModelRequest(CalibratedSun.MODEL_ID, Constants.M_SUN, 0.0165, 0.27, 4.57 * Constants.GYR,
                new PhysicsOptions(1.9, 0.0, org.convgrid.engine.convection.StabilityCriterion.SCHWARZSCHILD, 1.0));
        var global = new GlobalProperties(Constants.L_SUN, Constants.R_SUN, 5772.0, 27420.0, 1.55e7, 150.0, 0.35);
        var convection = new ConvectiveStructure(List.of(new ConvectiveZone(0.98, 1.0, 0.72, 1.0)),
                StructureClass.CONV_ENVELOPE, 0.0, 0.98, 0.72, 0.02 * Constants.M_SUN, 2.0e6, 3.0e6);
        var outcome = new ModelOutcome.Solved(request, global, convection, 1234);
        return new CalibratedSun(1.9, 0.27, 0.0165, 0.0231, 4.57 * Constants.GYR, outcome, null, 1e-6, -2e-6,
                0.7 * Constants.L_SUN, 10.5 * Constants.GYR, 0.72, 1.55e7, 150.0, 9, 5, 0.0255, 0.245, 0.0231);
    }
}
