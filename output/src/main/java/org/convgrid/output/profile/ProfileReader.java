package org.convgrid.output.profile;

import java.io.IOException;
import java.io.Reader;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.convgrid.engine.units.Constants;
import org.convgrid.output.CsvNumbers;
import org.convgrid.output.OutputFormatException;
import org.convgrid.output.catalogue.CatalogueWriter;

/**
 * Reads a profile file written by {@link ProfileWriter} (columns by name; unknown columns ignored). The ECSV header
 * ({@code #} lines) is skipped, so profiles written before it (a bare name row) read alike.
 */
public final class ProfileReader {

    private static final CSVFormat FORMAT = CatalogueWriter.FORMAT.builder().setHeader().setSkipHeaderRecord(true)
            .setCommentMarker('#').get();

    private ProfileReader() {
    }

    /**
     * Every shell, luminosity back in erg s^-1.
     *
     * @throws OutputFormatException when a column is missing or a cell is not a number
     */
    public static List<ProfileRow> read(Reader in) throws IOException {
        try (CSVParser parser = CSVParser.builder().setReader(in).setFormat(FORMAT).get()) {
            for (String column : ProfileColumns.REQUIRED) {
                if (!parser.getHeaderNames().contains(column)) {
                    throw new OutputFormatException("profile misses the column '" + column + "'");
                }
            }
            List<String> present = parser.getHeaderNames();
            List<ProfileRow> shells = new ArrayList<>();
            for (CSVRecord r : parser) {
                try {
                    shells.add(new ProfileRow(n(r, ProfileColumns.MASS_FRAC), n(r, ProfileColumns.RADIUS_FRAC),
                            n(r, ProfileColumns.PRESSURE_CGS), n(r, ProfileColumns.TEMP_K),
                            n(r, ProfileColumns.DENSITY_CGS), n(r, ProfileColumns.LUMINOSITY_LSUN) * Constants.L_SUN,
                            n(r, ProfileColumns.KAPPA_CGS), n(r, ProfileColumns.EPS_NUC_CGS),
                            n(r, ProfileColumns.NABLA), n(r, ProfileColumns.NABLA_AD), n(r, ProfileColumns.NABLA_RAD),
                            n(r, ProfileColumns.CONVECTIVE) != 0.0, n(r, ProfileColumns.CONV_VELOCITY_CGS),
                            optional(r, present, ProfileColumns.RADIUS_CM),
                            optional(r, present, ProfileColumns.GAMMA1),
                            optional(r, present, ProfileColumns.SOUND_SPEED_CGS),
                            optional(r, present, ProfileColumns.H_FRAC), optional(r, present, ProfileColumns.MU),
                            optional(r, present, ProfileColumns.HE3_FRAC),
                            optional(r, present, ProfileColumns.BUOYANCY_N2_CGS),
                            optional(r, present, ProfileColumns.EXTERIOR_MASS_FRAC)));
                } catch (IllegalArgumentException e) {
                    throw new OutputFormatException("profile row " + r.getRecordNumber() + ": " + e.getMessage(), e);
                }
            }
            return shells;
        }
    }

    private static double n(CSVRecord r, String column) {
        return CsvNumbers.parse(r.get(column));
    }

    /** A column of {@link ProfileColumns#OPTIONAL}: NaN in a profile written before it existed. */
    private static double optional(CSVRecord r, List<String> present, String column) {
        return present.contains(column) ? n(r, column) : Double.NaN;
    }
}
