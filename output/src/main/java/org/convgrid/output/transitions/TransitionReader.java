package org.convgrid.output.transitions;

import java.io.IOException;
import java.io.Reader;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.output.CsvNumbers;
import org.convgrid.output.OutputFormatException;
import org.convgrid.output.Span;
import org.convgrid.output.catalogue.CatalogueWriter;

/**
 * Reads {@code transitions.csv} by column name. The {@link TransitionColumns#FIXED} columns are required; missing
 * extensions read as unknown (NaN, null, no crossings list, nothing skipped).
 */
public final class TransitionReader {

    private TransitionReader() {
    }

    /**
     * Every row.
     *
     * @throws OutputFormatException when a fixed column is missing or a cell cannot be read
     */
    public static List<TransitionRow> read(Reader in) throws IOException {
        try (CSVParser parser = CSVParser.builder().setReader(in).setFormat(CatalogueWriter.FORMAT.builder()
                .setHeader().setSkipHeaderRecord(true).setAllowMissingColumnNames(true).get()).get()) {
            for (String column : TransitionColumns.FIXED) {
                if (!parser.getHeaderNames().contains(column)) {
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
        String criterion = text(r, TransitionColumns.CRITERION);
        Slice slice = new Slice(number(r, TransitionColumns.Z_INIT), number(r, TransitionColumns.AGE_GYR),
                number(r, TransitionColumns.MIXING_LENGTH), number(r, TransitionColumns.OVERSHOOT_HP),
                criterion.isEmpty() ? null : StabilityCriterion.valueOf(criterion.toUpperCase(Locale.ROOT)),
                number(r, TransitionColumns.OPACITY_SCALE));
        TransitionEstimate fc = estimate(r, TransitionColumns.FULLY_CONVECTIVE_LIMIT_MSUN,
                TransitionColumns.FULLY_CONVECTIVE_BRACKET_MSUN, TransitionColumns.FULLY_CONVECTIVE_CROSSINGS_MSUN,
                TransitionColumns.FULLY_CONVECTIVE_BRACKET_SKIPPED);
        TransitionEstimate core = estimate(r, TransitionColumns.CONV_CORE_ONSET_MSUN,
                TransitionColumns.CONV_CORE_BRACKET_MSUN, TransitionColumns.CONV_CORE_CROSSINGS_MSUN,
                TransitionColumns.CONV_CORE_BRACKET_SKIPPED);
        return new TransitionRow(slice, fc, core, TransitionMethod.fromLabel(text(r, TransitionColumns.METHOD)),
                text(r, TransitionColumns.NOTES));
    }

    private static TransitionEstimate estimate(CSVRecord r, String mass, String bracket, String crossings,
                                               String skipped) {
        String skippedText = text(r, skipped);
        return new TransitionEstimate(number(r, mass), Span.parseOptional(text(r, bracket)),
                Span.parseList(text(r, crossings)), skippedText.isEmpty() ? 0 : Integer.parseInt(skippedText));
    }

    private static String text(CSVRecord r, String column) {
        return r.isSet(column) ? r.get(column) : "";
    }

    private static double number(CSVRecord r, String column) {
        return CsvNumbers.parse(text(r, column));
    }
}
