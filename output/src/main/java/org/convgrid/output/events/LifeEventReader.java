package org.convgrid.output.events;

import static org.convgrid.output.events.LifeEventColumns.CENTRAL_H_EXHAUSTED;
import static org.convgrid.output.events.LifeEventColumns.CONV_CORE_END;
import static org.convgrid.output.events.LifeEventColumns.CORE_ENVELOPE_MERGE;
import static org.convgrid.output.events.LifeEventColumns.CONV_CORE_ONSET;
import static org.convgrid.output.events.LifeEventColumns.LI_HALVED;
import static org.convgrid.output.events.LifeEventColumns.LI_ONE_PERCENT;
import static org.convgrid.output.events.LifeEventColumns.MASS;
import static org.convgrid.output.events.LifeEventColumns.MIXING_LENGTH;
import static org.convgrid.output.events.LifeEventColumns.OVERSHOOT;
import static org.convgrid.output.events.LifeEventColumns.OVERSHOOT_PROFILE;
import static org.convgrid.output.events.LifeEventColumns.RADIATIVE_CORE;
import static org.convgrid.output.events.LifeEventColumns.RADIATIVE_CORE_END;
import static org.convgrid.output.events.LifeEventColumns.TRACK_END;
import static org.convgrid.output.events.LifeEventColumns.TRACK_ID;
import static org.convgrid.output.events.LifeEventColumns.Y_INIT;
import static org.convgrid.output.events.LifeEventColumns.ZAMS;
import static org.convgrid.output.events.LifeEventColumns.Z_INIT;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.convgrid.output.CsvNumbers;
import org.convgrid.output.OvershootProfileCell;
import org.convgrid.output.OutputFormatException;

/**
 * Reads {@code life_events.csv} by column name, in file order. A row cut short by an interruption (the file grows
 * row by row during a run) is left out; every other unreadable row is an error. A table written before
 * {@code central_h_exhausted_myr}, {@code radiative_core_end_myr} or {@code track_end_myr} existed reads with those
 * ages empty.
 */
public final class LifeEventReader {

    private static final CSVFormat FORMAT = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true)
            .setIgnoreSurroundingSpaces(true).get();

    private LifeEventReader() {
    }

    /** The rows of a table file; empty when the file does not exist. */
    public static List<LifeEventRow> read(Path file) throws IOException {
        if (!Files.isRegularFile(file)) {
            return List.of();
        }
        try (Reader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            return read(in);
        } catch (OutputFormatException e) {
            throw new OutputFormatException(file + ": " + e.getMessage(), e);
        }
    }

    /** The rows of a table, in order. */
    public static List<LifeEventRow> read(Reader in) throws IOException {
        List<LifeEventRow> rows = new ArrayList<>();
        try (CSVParser parser = parser(in)) {
            if (!parser.getHeaderNames().containsAll(LifeEventColumns.REQUIRED)) {
                throw new OutputFormatException("damaged: its first line is not the column names (a life-events "
                        + "table needs the columns " + LifeEventColumns.REQUIRED + "); 'convgrid run GRID.yaml "
                        + "--resume' on the run rebuilds it");
            }
            List<String> header = parser.getHeaderNames();
            for (CSVRecord r : parser) {
                if (!r.isConsistent()) {
                    continue;
                }
                try {
                    rows.add(new LifeEventRow(r.get(TRACK_ID), n(r, MASS), n(r, Z_INIT), n(r, Y_INIT),
                            n(r, MIXING_LENGTH), n(r, OVERSHOOT),
                            OvershootProfileCell.parse(header.contains(OVERSHOOT_PROFILE)
                                    ? r.get(OVERSHOOT_PROFILE) : ""),
                            n(r, RADIATIVE_CORE),
                            ifPresent(header, r, RADIATIVE_CORE_END), n(r, ZAMS), n(r, CONV_CORE_ONSET),
                            n(r, CONV_CORE_END), ifPresent(header, r, CORE_ENVELOPE_MERGE), n(r, LI_HALVED),
                            ifPresent(header, r, LI_ONE_PERCENT),
                            ifPresent(header, r, CENTRAL_H_EXHAUSTED),
                            ifPresent(header, r, TRACK_END)));
                } catch (IllegalArgumentException e) {
                    throw new OutputFormatException("life-events row " + r.getRecordNumber() + ": " + e.getMessage(),
                            e);
                }
            }
        }
        return rows;
    }

    /**
     * A parser past the header line. A first line that is a row, not column names (a header lost to a full disk),
     * makes Commons CSV refuse it as a header with an IllegalArgumentException: a damaged table, said so.
     */
    private static CSVParser parser(Reader in) throws IOException {
        try {
            return CSVParser.builder().setReader(in).setFormat(FORMAT).get();
        } catch (IllegalArgumentException e) {
            throw new OutputFormatException("damaged life-events table: its first line is not the column names ("
                    + e.getMessage() + "); 'convgrid run GRID.yaml --resume' on the run rebuilds it", e);
        }
    }

    private static double n(CSVRecord r, String column) {
        return CsvNumbers.parse(r.get(column));
    }

    /** A column that tables of an earlier layout lack: NaN (empty) there. */
    private static double ifPresent(List<String> header, CSVRecord r, String column) {
        return header.contains(column) ? n(r, column) : Double.NaN;
    }
}
