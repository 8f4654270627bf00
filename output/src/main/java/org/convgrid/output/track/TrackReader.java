package org.convgrid.output.track;

import static org.convgrid.output.track.TrackColumns.AGE_GYR;
import static org.convgrid.output.track.TrackColumns.BURNING_INNER;
import static org.convgrid.output.track.TrackColumns.BURNING_OUTER;
import static org.convgrid.output.track.TrackColumns.CENTRAL_CZ_TOP;
import static org.convgrid.output.track.TrackColumns.CENTRAL_DENSITY;
import static org.convgrid.output.track.TrackColumns.CENTRAL_H;
import static org.convgrid.output.track.TrackColumns.CENTRAL_TEMP;
import static org.convgrid.output.track.TrackColumns.ENV_CZ_BASE;
import static org.convgrid.output.track.TrackColumns.LOG_G;
import static org.convgrid.output.track.TrackColumns.LUMINOSITY;
import static org.convgrid.output.track.TrackColumns.MASS_FRAC_INNER;
import static org.convgrid.output.track.TrackColumns.MASS_FRAC_OUTER;
import static org.convgrid.output.track.TrackColumns.NUCLEAR_FRACTION;
import static org.convgrid.output.track.TrackColumns.PERIOD_SPACING_L1;
import static org.convgrid.output.track.TrackColumns.PHASE;
import static org.convgrid.output.track.TrackColumns.RADIUS;
import static org.convgrid.output.track.TrackColumns.STEP_INDEX;
import static org.convgrid.output.track.TrackColumns.SURFACE_LI;
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
 * Reads track files ({@code tracks/<track id>.csv}, columns: {@link TrackColumns#ALL}) by column name: columns in
 * any order, unknown columns ignored; {@link TrackColumns#AGE_GYR} must be present, the other known columns may be
 * missing and then read as "not applicable". Each step's convective zones come from the zone table beside the
 * track ({@code tracks/<track id>.zones.csv}); without one, from the central and envelope zone columns (shells are
 * then not known). A track file of an earlier layout (packed zone lists) is refused with a message.
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
            files = entries.filter(f -> RunLayout.isTrackFile(f) && !RunLayout.isTrackZones(f) && Files.isRegularFile(f))
                    .sorted().toList();
        }
        List<Track> tracks = new ArrayList<>(files.size());
        for (Path f : files) {
            tracks.add(read(f));
        }
        return tracks;
    }

    /** One track file with its zone table when there is one; its id is the file name without {@code .csv}. */
    public static Track read(Path file) throws IOException {
        String id = RunLayout.idOf(file);
        Path zonesFile = file.resolveSibling(id + RunLayout.TRACK_ZONES_SUFFIX);
        List<TrackStep> steps;
        try (Reader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            steps = read(in);
        } catch (OutputFormatException e) {
            throw new OutputFormatException(file + ": " + e.getMessage(), e);
        }
        if (Files.isRegularFile(zonesFile)) {
            try (Reader in = Files.newBufferedReader(zonesFile, StandardCharsets.UTF_8)) {
                steps = withZones(steps, in);
            } catch (OutputFormatException e) {
                throw new OutputFormatException(zonesFile + ": " + e.getMessage(), e);
            }
        }
        return new Track(id, steps);
    }

    /**
     * The steps of a track file, in file order, with the zones its central and envelope columns give.
     *
     * @throws OutputFormatException when a required column is missing, a cell cannot be read or the file has an
     *                               earlier layout
     */
    public static List<TrackStep> read(Reader in) throws IOException {
        try (CSVParser parser = CSVParser.builder().setReader(in).setFormat(FORMAT).get()) {
            if (parser.getHeaderNames().contains(TrackColumns.PACKED_ZONES_V1)) {
                throw OutputFormatException.earlierRunDirectory("track file written by an earlier convgrid (packed "
                        + TrackColumns.PACKED_ZONES_V1 + "; ages from the zero-age main sequence): run the grid "
                        + "again into a new --out");
            }
            if (!parser.getHeaderNames().contains(AGE_GYR)) {
                throw new OutputFormatException("track file misses the column '" + AGE_GYR + "'");
            }
            List<TrackStep> steps = new ArrayList<>();
            for (CSVRecord r : parser) {
                steps.add(step(r));
            }
            return steps;
        }
    }

    /**
     * The steps with the zones of a zone table ({@link TrackColumns#ZONES}) instead of those of the track's
     * columns; a step the table does not name has no zones.
     *
     * @throws OutputFormatException when a cell cannot be read or a step index lies outside the track
     */
    public static List<TrackStep> withZones(List<TrackStep> steps, Reader zoneTable) throws IOException {
        List<List<Span>> zones = new ArrayList<>(steps.size());
        for (int i = 0; i < steps.size(); i++) {
            zones.add(new ArrayList<>());
        }
        try (CSVParser parser = CSVParser.builder().setReader(zoneTable).setFormat(FORMAT).get()) {
            for (String column : List.of(STEP_INDEX, MASS_FRAC_INNER, MASS_FRAC_OUTER)) {
                if (!parser.getHeaderNames().contains(column)) {
                    throw new OutputFormatException("zone table misses the column '" + column + "'");
                }
            }
            for (CSVRecord r : parser) {
                String column = STEP_INDEX;
                try {
                    int index = Integer.parseInt(r.get(STEP_INDEX).strip());
                    if (index < 0 || index >= steps.size()) {
                        throw new IllegalArgumentException("step " + index + " is not in the track ("
                                + steps.size() + " steps)");
                    }
                    column = MASS_FRAC_INNER;
                    double lo = number(r, MASS_FRAC_INNER);
                    column = MASS_FRAC_OUTER;
                    zones.get(index).add(new Span(lo, number(r, MASS_FRAC_OUTER)));
                } catch (IllegalArgumentException e) {
                    throw new OutputFormatException("zone row " + r.getRecordNumber() + " (line "
                            + (r.getRecordNumber() + 1) + "), column '" + column + "': " + e.getMessage(), e);
                }
            }
        }
        List<TrackStep> out = new ArrayList<>(steps.size());
        for (int i = 0; i < steps.size(); i++) {
            out.add(steps.get(i).withZones(zones.get(i)));
        }
        return out;
    }

    private static TrackStep step(CSVRecord r) {
        String column = AGE_GYR;
        try {
            double age = number(r, column);
            column = CENTRAL_CZ_TOP;
            double centralTop = number(r, column);
            column = ENV_CZ_BASE;
            double envelopeBase = number(r, column);
            column = BURNING_INNER;
            double burnLo = number(r, column);
            column = BURNING_OUTER;
            double burnHi = number(r, column);
            Span burning = Double.isNaN(burnLo) || Double.isNaN(burnHi) ? null : new Span(burnLo, burnHi);
            column = LUMINOSITY;
            return new TrackStep(age, text(r, PHASE), number(r, LUMINOSITY), number(r, column = RADIUS),
                    number(r, column = TEFF), number(r, column = LOG_G), number(r, column = CENTRAL_TEMP),
                    number(r, column = CENTRAL_DENSITY), number(r, column = CENTRAL_H),
                    number(r, column = SURFACE_LI), zones(centralTop, envelopeBase), burning,
                    number(r, column = NUCLEAR_FRACTION), number(r, column = PERIOD_SPACING_L1));
        } catch (IllegalArgumentException e) {
            throw new OutputFormatException("track row " + r.getRecordNumber() + " (line " + (r.getRecordNumber() + 1)
                    + "), column '" + column + "': " + e.getMessage(), e);
        }
    }

    /** The central and surface zones alone; one zone when they meet (a fully convective star). */
    private static List<Span> zones(double centralTop, double envelopeBase) {
        boolean central = !Double.isNaN(centralTop);
        boolean envelope = !Double.isNaN(envelopeBase);
        if (central && envelope && envelopeBase <= centralTop) {
            return List.of(new Span(0.0, 1.0));
        }
        List<Span> zones = new ArrayList<>(2);
        if (central) {
            zones.add(new Span(0.0, centralTop));
        }
        if (envelope) {
            zones.add(new Span(envelopeBase, 1.0));
        }
        return zones;
    }

    private static String text(CSVRecord r, String column) {
        return r.isSet(column) ? r.get(column) : "";
    }

    private static double number(CSVRecord r, String column) {
        return CsvNumbers.parse(text(r, column));
    }
}
