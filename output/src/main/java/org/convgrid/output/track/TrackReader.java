package org.convgrid.output.track;

import static org.convgrid.output.track.TrackColumns.AGE_GYR;
import static org.convgrid.output.track.TrackColumns.BURNING_ZONE;
import static org.convgrid.output.track.TrackColumns.CENTRAL_DENSITY;
import static org.convgrid.output.track.TrackColumns.CENTRAL_H;
import static org.convgrid.output.track.TrackColumns.CENTRAL_TEMP;
import static org.convgrid.output.track.TrackColumns.CONV_ZONES;
import static org.convgrid.output.track.TrackColumns.LOG_G;
import static org.convgrid.output.track.TrackColumns.LUMINOSITY;
import static org.convgrid.output.track.TrackColumns.RADIUS;
import static org.convgrid.output.track.TrackColumns.TEFF;

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
import org.convgrid.output.OutputFormatException;
import org.convgrid.output.RunLayout;
import org.convgrid.output.Span;

/**
 * Reads track files ({@code tracks/<track id>.csv}, columns: {@link TrackColumns}) by column name: columns in any
 * order, unknown (later or trailing) columns ignored. {@link TrackColumns#AGE_GYR} and
 * {@link TrackColumns#CONV_ZONES} must be present; the other known columns may be missing and then read as
 * "not applicable".
 */
public final class TrackReader {

    private static final CSVFormat FORMAT = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true)
            .setAllowMissingColumnNames(true).setIgnoreSurroundingSpaces(true).get();

    private TrackReader() {
    }

    /** Every track file of a tracks directory, sorted by track id; empty when the directory does not exist. */
    public static List<Track> readAll(Path tracksDir) throws IOException {
        if (!Files.isDirectory(tracksDir)) {
            return List.of();
        }
        List<Path> files;
        try (var entries = Files.list(tracksDir)) {
            files = entries.filter(f -> RunLayout.isTable(f) && Files.isRegularFile(f))
                    .sorted().toList();
        }
        List<Track> tracks = new ArrayList<>(files.size());
        for (Path f : files) {
            tracks.add(read(f));
        }
        return tracks;
    }

    /** One track file; its id is the file name without {@code .csv}. */
    public static Track read(Path file) throws IOException {
        try (Reader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            return new Track(RunLayout.idOf(file), read(in));
        } catch (OutputFormatException e) {
            throw new OutputFormatException(file + ": " + e.getMessage(), e);
        }
    }

    /**
     * The steps of a track file, in file order.
     *
     * @throws OutputFormatException when a required column is missing or a cell cannot be read
     */
    public static List<TrackStep> read(Reader in) throws IOException {
        try (CSVParser parser = CSVParser.builder().setReader(in).setFormat(FORMAT).get()) {
            for (String column : List.of(AGE_GYR, CONV_ZONES)) {
                if (!parser.getHeaderNames().contains(column)) {
                    throw new OutputFormatException("track file misses the column '" + column + "'");
                }
            }
            List<TrackStep> steps = new ArrayList<>();
            for (CSVRecord r : parser) {
                steps.add(step(r));
            }
            return steps;
        }
    }

    private static TrackStep step(CSVRecord r) {
        String column = AGE_GYR;
        try {
            double age = number(r, column);
            column = CONV_ZONES;
            List<Span> zones = Span.parseList(text(r, column));
            column = BURNING_ZONE;
            Span burning = hull(Span.parseList(text(r, column)));
            column = LUMINOSITY;
            return new TrackStep(age, number(r, LUMINOSITY), number(r, column = RADIUS), number(r, column = TEFF),
                    number(r, column = LOG_G), number(r, column = CENTRAL_TEMP), number(r, column = CENTRAL_DENSITY),
                    number(r, column = CENTRAL_H), zones, burning);
        } catch (IllegalArgumentException e) {
            throw new OutputFormatException("track row " + r.getRecordNumber() + " (line " + (r.getRecordNumber() + 1)
                    + "), column '" + column + "': " + e.getMessage(), e);
        }
    }

    /** One span for the burning region; should a writer give several, their hull (the band shown) is taken. */
    private static Span hull(List<Span> spans) {
        return spans.isEmpty() ? null : new Span(spans.get(0).lo(), spans.get(spans.size() - 1).hi());
    }

    private static String text(CSVRecord r, String column) {
        return r.isSet(column) ? r.get(column) : "";
    }

    private static double number(CSVRecord r, String column) {
        return CsvNumbers.parse(text(r, column));
    }
}
