package org.convgrid.plotting.tracks;

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
import org.convgrid.output.Span;

/**
 * Reads track files ({@code tracks/<track id>.csv}, columns fixed by conventions.md) by column name: columns in any
 * order, unknown (later or trailing) columns ignored. {@link #AGE_GYR} and {@link #CONV_ZONES} must be present;
 * the other known columns may be missing and then read as "not applicable".
 */
public final class TrackReader {

    public static final String AGE_GYR = "age_gyr";
    public static final String LUMINOSITY = "luminosity_lsun";
    public static final String RADIUS = "radius_rsun";
    public static final String TEFF = "teff_k";
    public static final String LOG_G = "log_g_cgs";
    public static final String CENTER_TEMP = "center_temp_k";
    public static final String CENTER_DENSITY = "center_density_cgs";
    public static final String CENTER_H = "center_h_frac";
    public static final String CONV_ZONES = "conv_zones_mass_frac";
    public static final String BURNING_ZONE = "burning_zone_mass_frac";

    private static final String EXTENSION = ".csv";
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
            files = entries.filter(f -> f.getFileName().toString().endsWith(EXTENSION) && Files.isRegularFile(f))
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
        String name = file.getFileName().toString();
        try (Reader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            return new Track(name.substring(0, name.length() - EXTENSION.length()), read(in));
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
                    number(r, column = LOG_G), number(r, column = CENTER_TEMP), number(r, column = CENTER_DENSITY),
                    number(r, column = CENTER_H), zones, burning);
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
