package org.convgrid.output.catalogue;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.convgrid.output.CsvNumbers;
import org.convgrid.output.OutputFormatException;
import org.convgrid.output.catalogue.CatalogueZone.ZoneKind;

/**
 * {@code zones.csv}: one row per convective zone of every catalogue model, innermost first (README, "Zones"). Its
 * rows follow the catalogue's, so the two grow together and a resume can keep the zones of the kept models.
 */
public final class ZoneTable {

    /** The columns, in order. */
    public static final List<String> HEADER = List.of("model_id", "zone_index", "zone_kind", "mass_frac_inner",
            "mass_frac_outer", "radius_frac_inner", "radius_frac_outer", "zone_mass_msun");

    private static final CSVFormat READ = CatalogueWriter.FORMAT.builder().setHeader().setSkipHeaderRecord(true)
            .get();

    private ZoneTable() {
    }

    /** The header line, with its line end. */
    public static String headerLine() {
        return String.join(",", HEADER) + "\n";
    }

    /** The lines of one model's zones, each with its line end; empty when it has none. */
    public static String lines(CatalogueRow row) {
        StringBuilder b = new StringBuilder();
        List<CatalogueZone> zones = row.zones();
        for (int i = 0; i < zones.size(); i++) {
            CatalogueZone z = zones.get(i);
            b.append(row.modelId()).append(',').append(i).append(',').append(z.kind().label());
            for (double v : new double[] {z.massFracInner(), z.massFracOuter(), z.radiusFracInner(),
                    z.radiusFracOuter(), zoneMass(z, row.massMsun())}) {
                b.append(',').append(CsvNumbers.format(v));
            }
            b.append('\n');
        }
        return b.toString();
    }

    /**
     * Msun: the zone's own mass, which a read keeps from the file; for a zone known by its ends alone (NaN own mass),
     * the difference of its ends as written, so that it comes out the same whether the row was just made or read
     * back. The zone_mass_msun of zones.csv.
     */
    public static double zoneMass(CatalogueZone z, double starMassMsun) {
        if (!Double.isNaN(z.zoneMassMsun())) {
            return z.zoneMassMsun();
        }
        return (asWritten(z.massFracOuter()) - asWritten(z.massFracInner())) * asWritten(starMassMsun);
    }

    /** A value as the files hold it (a merge rewrites the zones of rows it read). */
    private static double asWritten(double value) {
        return CsvNumbers.parse(CsvNumbers.format(value));
    }

    /** The zones of every model in a zones file, by model id, in file order. */
    public static Map<String, List<CatalogueZone>> read(Path file) throws IOException {
        try (Reader in = Files.newBufferedReader(file, StandardCharsets.UTF_8);
             CSVParser parser = CSVParser.builder().setReader(in).setFormat(READ).get()) {
            if (!parser.getHeaderNames().equals(HEADER)) {
                throw new OutputFormatException(file + " has the columns " + parser.getHeaderNames()
                        + ", expected " + HEADER);
            }
            Map<String, List<CatalogueZone>> zones = new LinkedHashMap<>();
            for (CSVRecord r : parser) {
                try {
                    // the zone's own mass is kept as the file holds it: its ends cannot give it back
                    zones.computeIfAbsent(r.get(0), id -> new ArrayList<>()).add(new CatalogueZone(
                            ZoneKind.fromLabel(r.get(2)), CsvNumbers.parse(r.get(3)), CsvNumbers.parse(r.get(4)),
                            CsvNumbers.parse(r.get(5)), CsvNumbers.parse(r.get(6)), CsvNumbers.parse(r.get(7))));
                } catch (IllegalArgumentException e) {
                    throw new OutputFormatException(file + " line " + (r.getRecordNumber() + 1) + ": "
                            + e.getMessage(), e);
                }
            }
            return zones;
        }
    }
}
