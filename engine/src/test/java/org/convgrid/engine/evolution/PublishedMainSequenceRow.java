package org.convgrid.engine.evolution;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * One row of a published main-sequence track as shipped in a test resource (its header names the paper, the tables
 * and what was kept), in the units printed there.
 *
 * @param massMsun initial stellar mass, Msun
 * @param sourceRow the row's number in the published track
 * @param ageYr age since the zero-age main sequence, yr
 * @param logLuminosity log10 L/Lsun
 * @param logTeff log10 Teff, K
 * @param logGravity log10 g, cgs
 * @param centralHydrogen central hydrogen mass fraction
 * @param coreMassFraction m/M of the convective core as the source prints it
 * @param role why the row was kept (the resource's header lists the roles)
 */
record PublishedMainSequenceRow(double massMsun, int sourceRow, double ageYr, double logLuminosity, double logTeff,
                                double logGravity, double centralHydrogen, double coreMassFraction, String role) {

    /** Every row of the resource at {@code path} on the test class path, in file order. */
    static List<PublishedMainSequenceRow> read(String path) {
        var stream = Objects.requireNonNull(PublishedMainSequenceRow.class.getResourceAsStream(path), path);
        List<PublishedMainSequenceRow> rows = new ArrayList<>();
        try (var in = new BufferedReader(new InputStreamReader(stream, StandardCharsets.UTF_8))) {
            String line;
            boolean header = true;
            while ((line = in.readLine()) != null) {
                if (line.startsWith("#") || line.isBlank()) {
                    continue;
                }
                if (header) {
                    // the column names
                    header = false;
                    continue;
                }
                String[] f = line.split(",");
                rows.add(new PublishedMainSequenceRow(Double.parseDouble(f[0]), Integer.parseInt(f[1]),
                        Double.parseDouble(f[2]), Double.parseDouble(f[3]), Double.parseDouble(f[4]),
                        Double.parseDouble(f[5]), Double.parseDouble(f[6]), Double.parseDouble(f[7]), f[8].trim()));
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return rows;
    }
}
