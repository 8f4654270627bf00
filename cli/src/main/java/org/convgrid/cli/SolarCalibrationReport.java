package org.convgrid.cli;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.csv.CSVPrinter;
import org.convgrid.engine.calibration.CalibratedSun;
import org.convgrid.engine.physics.atmosphere.AtmosphereChoice;
import org.convgrid.engine.units.Constants;
import org.convgrid.grids.yaml.PresetWriter;
import org.convgrid.output.CsvNumbers;
import org.convgrid.output.catalogue.CatalogueColumns;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.catalogue.CatalogueWriter;
import org.convgrid.output.catalogue.OutcomeRows;

/**
 * The three renderings of a calibrated Sun: the readable table, the conventions' CSV row, and the physics preset
 * file that grid files name with {@code physics: {preset: FILE}}.
 */
final class SolarCalibrationReport {

    /** CSV column after the catalogue columns: zero-age luminosity, solar units. */
    static final String ZAMS_LUMINOSITY_LSUN = "zams_luminosity_lsun";
    /** CSV column after the catalogue columns: core-hydrogen exhaustion age, Gyr. */
    static final String MS_LIFETIME_GYR = "ms_lifetime_gyr";
    /** Extension column: the initial Z/X found (higher than the present one with settling). */
    static final String Z_OVER_X_INIT = "z_over_x_init";
    /** Extension column: Y of the convective envelope at the solar age. */
    static final String Y_SURFACE = "y_surface";
    /** Extension column: Z/X of the convective envelope at the solar age. */
    static final String Z_OVER_X_SURFACE = "z_over_x_surface";

    private SolarCalibrationReport() {
    }

    /** The calibrated values, first in the row; the catalogue columns of the same names are not repeated after them. */
    private static final List<String> CALIBRATED = List.of(CatalogueColumns.MIXING_LENGTH, CatalogueColumns.Y_INIT,
            CatalogueColumns.Z_INIT);

    /**
     * mixing_length, y_init, z_init, the catalogue header without those three (each column once: pandas renamed the
     * repeats {@code .1}), zams_luminosity_lsun, ms_lifetime_gyr, then our extensions z_over_x_init, y_surface,
     * z_over_x_surface.
     */
    static List<String> csvHeader() {
        List<String> header = new ArrayList<>(CALIBRATED);
        header.addAll(CatalogueColumns.HEADER.stream().filter(c -> !CALIBRATED.contains(c)).toList());
        header.add(ZAMS_LUMINOSITY_LSUN);
        header.add(MS_LIFETIME_GYR);
        header.addAll(List.of(Z_OVER_X_INIT, Y_SURFACE, Z_OVER_X_SURFACE));
        return header;
    }

    /**
     * The header row and the calibrated Sun's row. The catalogue's own mixing_length, y_init and z_init hold the
     * calibrated values too (the model was computed with them), so dropping them loses nothing.
     */
    static void writeCsv(CalibratedSun sun, Appendable out) throws IOException {
        List<String> row = new ArrayList<>(List.of(CsvNumbers.format(sun.mixingLength()),
                CsvNumbers.format(sun.helium()), CsvNumbers.format(sun.metals())));
        List<String> catalogue = CatalogueWriter.cells(OutcomeRows.toRow(sun.sun()));
        for (int i = 0; i < catalogue.size(); i++) {
            if (!CALIBRATED.contains(CatalogueColumns.HEADER.get(i))) {
                row.add(catalogue.get(i));
            }
        }
        row.add(CsvNumbers.format(sun.zeroAgeLuminosity() / Constants.L_SUN));
        row.add(CsvNumbers.format(sun.exhaustionAge() / Constants.GYR));
        row.add(CsvNumbers.format(sun.initialMetalsToHydrogen()));
        row.add(CsvNumbers.format(sun.envelopeHelium()));
        row.add(CsvNumbers.format(sun.envelopeMetalsToHydrogen()));
        CSVPrinter printer = new CSVPrinter(out, CatalogueWriter.FORMAT);
        printer.printRecord(csvHeader());
        printer.printRecord(row);
        printer.flush();
    }

    /**
     * A readable summary. It gives the envelope's mass and turnover times too: the calibrated Sun is the usual
     * reference for Rossby numbers (Ro / Ro_sun) and for envelope-mass scalings, so it is asked for beside alpha.
     */
    static void writeTable(CalibratedSun sun, boolean settling, Appendable out) throws IOException {
        var g = sun.sun().solved().global();
        CatalogueRow row = OutcomeRows.toRow(sun.sun());
        out.append(String.format(Locale.ROOT, """
                Calibrated Sun (1 Msun, %.4g Gyr, present surface Z/X = %.4g, %s)
                  mixing length alpha       %.5f pressure scale heights
                  initial Y                 %.5f
                  initial Z                 %.6f
                  R / R_sun                 %.6f   (ln residual %+.2e)
                  L / L_sun                 %.6f   (ln residual %+.2e)
                  Teff                      %.1f K
                  envelope base r/R         %.4f
                  envelope mass             %.5f Msun
                  turnover time             %.2f d local, %.2f d global (as the catalogue's two columns)
                  central temperature       %.4e K
                  central density           %.2f g/cm^3
                  central X                 %.4f
                  zero-age L / L_sun        %.4f
                  main-sequence lifetime    %.3f Gyr (central X < 1e-4)
                  initial Z/X               %.5f
                  surface Y, Z/X now        %.4f, %.5f
                  evolutions computed       %d
                """, sun.age() / Constants.GYR, sun.metalsToHydrogen(),
                settling ? "helium and metals settling" : "no settling: initial Z/X = present surface Z/X",
                sun.mixingLength(), sun.helium(),
                sun.metals(), g.radius() / Constants.R_SUN, sun.radiusResidual(), g.luminosity() / Constants.L_SUN,
                sun.luminosityResidual(), g.effectiveTemperature(), sun.envelopeBaseRadiusFraction(),
                row.envCzMassMsun(), row.turnoverTimeDays(), row.turnoverTimeGlobalDays(),
                sun.centralTemperature(), sun.centralDensity(), g.centralHydrogen(),
                sun.zeroAgeLuminosity() / Constants.L_SUN, sun.exhaustionAge() / Constants.GYR,
                sun.initialMetalsToHydrogen(), sun.envelopeHelium(), sun.envelopeMetalsToHydrogen(),
                sun.evolutions()));
    }

    /** The physics preset file ({@link PresetWriter}'s layout, which grid files read back). */
    static String preset(CalibratedSun sun, AtmosphereChoice atmosphere, boolean settling, String toolVersion) {
        return PresetWriter.toYaml(new PresetWriter.Calibration(sun.mixingLength(), atmosphere, settling,
                sun.helium(), sun.metals(), sun.metalsToHydrogen(), sun.initialMetalsToHydrogen(),
                sun.age() / Constants.GYR, toolVersion, sun.radiusResidual(), sun.luminosityResidual()),
                CsvNumbers::format);
    }
}
