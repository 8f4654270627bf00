package org.convgrid.output.transitions;

import java.io.IOException;
import java.io.Reader;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.output.CsvNumbers;
import org.convgrid.output.OutputFormatException;
import org.convgrid.output.OvershootProfileCell;
import org.convgrid.output.Span;
import org.convgrid.output.catalogue.CatalogueWriter;

/**
 * Reads {@code transitions.csv} (version 2) by column name; every column of {@link TransitionColumns#HEADER} is
 * required but those {@link TransitionColumns#ADDED_LATER} (read as unknown when missing). A file in the first
 * layout (one {@code lo-hi} bracket column per transition) is refused with a message that says how to rewrite it. What the file does not keep reads as unknown: no crossings, nothing skipped.
 */
public final class TransitionReader {

    /** What to do with a transitions file of the first layout. */
    public static final String REWRITE_HINT = "rewrite it from the catalogue with 'convgrid transitions RUN_DIR'";

    private TransitionReader() {
    }

    /**
     * Every row.
     *
     * @throws OutputFormatException when the file is of the first layout, a column is missing or a cell cannot be read
     */
    public static List<TransitionRow> read(Reader in) throws IOException {
        try (CSVParser parser = CSVParser.builder().setReader(in).setFormat(CatalogueWriter.FORMAT.builder()
                .setHeader().setSkipHeaderRecord(true).setAllowMissingColumnNames(true).get()).get()) {
            List<String> header = parser.getHeaderNames();
            if (header.contains(TransitionColumns.VERSION_1_MARKER)) {
                // written by an earlier convgrid, as a run directory of version 1 is: a conflict, not bad data
                throw OutputFormatException.earlierRunDirectory("transitions.csv is in the layout before version 2 "
                        + "(column '" + TransitionColumns.VERSION_1_MARKER + "'); " + REWRITE_HINT);
            }
            for (String column : TransitionColumns.HEADER) {
                if (!header.contains(column) && !TransitionColumns.ADDED_LATER.contains(column)) {
                    throw new OutputFormatException("transitions file misses the column '" + column + "'");
                }
            }
            List<TransitionRow> rows = new ArrayList<>();
            for (CSVRecord r : parser) {
                try {
                    rows.add(row(r));
                } catch (IllegalArgumentException e) {
                    throw new OutputFormatException("transitions row " + r.getRecordNumber() + ": "
                            + e.getMessage(), e);
                }
            }
            return rows;
        }
    }

    private static TransitionRow row(CSVRecord r) {
        String criterion = r.get(TransitionColumns.CRITERION);
        Slice slice = new Slice(number(r, TransitionColumns.Z_INIT), number(r, TransitionColumns.AGE_GYR),
                number(r, TransitionColumns.MIXING_LENGTH), number(r, TransitionColumns.OVERSHOOT_HP),
                criterion.isEmpty() ? null : StabilityCriterion.valueOf(criterion.toUpperCase(Locale.ROOT)),
                number(r, TransitionColumns.OPACITY_SCALE), overshootProfile(r));
        TransitionEstimate fc = estimate(r, TransitionColumns.FULLY_CONVECTIVE_LIMIT_MSUN,
                TransitionColumns.FULLY_CONVECTIVE_BRACKET_LO_MSUN, TransitionColumns.FULLY_CONVECTIVE_BRACKET_HI_MSUN);
        TransitionEstimate core = estimate(r, TransitionColumns.CONV_CORE_ONSET_MSUN,
                TransitionColumns.CONV_CORE_BRACKET_LO_MSUN, TransitionColumns.CONV_CORE_BRACKET_HI_MSUN);
        Span window = span(r, TransitionColumns.TRANSIENT_CORE_LO_MSUN, TransitionColumns.TRANSIENT_CORE_HI_MSUN);
        // a table written before the turn-off columns reads as one without a turn-off
        TransitionEstimate turnoff = r.isMapped(TransitionColumns.TURNOFF_MASS_MSUN)
                ? estimate(r, TransitionColumns.TURNOFF_MASS_MSUN, TransitionColumns.TURNOFF_BRACKET_LO_MSUN,
                TransitionColumns.TURNOFF_BRACKET_HI_MSUN) : TransitionEstimate.NONE;
        // a table written before the lithium columns reads as one without a boundary
        TransitionEstimate boundary = r.isMapped(TransitionColumns.LI_DEPLETION_BOUNDARY_MSUN)
                ? estimate(r, TransitionColumns.LI_DEPLETION_BOUNDARY_MSUN, TransitionColumns.LI_DEPLETION_BRACKET_LO_MSUN,
                TransitionColumns.LI_DEPLETION_BRACKET_HI_MSUN) : TransitionEstimate.NONE;
        // each added column is optional on its own: a table edited to drop the luminosity keeps its boundary
        LithiumDepletion lithium = boundary.found() ? new LithiumDepletion(boundary,
                r.isMapped(TransitionColumns.LI_DEPLETION_BOUNDARY_LUMINOSITY_LSUN)
                        ? number(r, TransitionColumns.LI_DEPLETION_BOUNDARY_LUMINOSITY_LSUN) : Double.NaN)
                : LithiumDepletion.NONE;
        return new TransitionRow(slice, number(r, TransitionColumns.Y_INIT), fc, core, window, turnoff, lithium,
                TransitionMethod.fromLabel(r.get(TransitionColumns.METHOD)), number(r, TransitionColumns.TOLERANCE_MSUN),
                r.get(TransitionColumns.NOTES));
    }

    private static TransitionEstimate estimate(CSVRecord r, String mass, String lo, String hi) {
        Span bracket = span(r, lo, hi);
        return bracket == null ? TransitionEstimate.NONE
                : new TransitionEstimate(number(r, mass), bracket, List.of(), 0);
    }

    /** Two cells that are both empty (null) or both masses. */
    private static Span span(CSVRecord r, String lo, String hi) {
        double a = number(r, lo);
        double b = number(r, hi);
        if (Double.isNaN(a) != Double.isNaN(b)) {
            throw new IllegalArgumentException("'" + lo + "' and '" + hi + "' must both be empty or both be masses");
        }
        return Double.isNaN(a) ? null : new Span(a, b);
    }

    /** The slice's overshoot profile; null when the cell is empty or the column missing (an earlier table). */
    private static OvershootScheme overshootProfile(CSVRecord r) {
        return OvershootProfileCell.parse(r.isMapped(TransitionColumns.OVERSHOOT_PROFILE)
                ? r.get(TransitionColumns.OVERSHOOT_PROFILE) : "");
    }

    private static double number(CSVRecord r, String column) {
        return CsvNumbers.parse(r.get(column));
    }
}
