package org.convgrid.engine.birth;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * One row of a published pre-main-sequence track as shipped in a test resource (its header names the paper, the table
 * and what was kept), in the units printed there.
 *
 * @param massMsun stellar mass, Msun
 * @param logAgeYr log10 age, yr
 * @param teffK effective temperature, K
 * @param logLuminosity log10 L/Lsun with the source's own Lsun
 * @param radiusRsun R/Rsun with the source's own Rsun
 * @param logLithium log10 of the surface lithium over its initial value
 * @param logCentralTemperature log10 T_c, K
 * @param radiativeCoreMassMsun mass of the radiative core, Msun
 * @param radiativeCoreRadiusRsun radius of the radiative core, Rsun
 * @param role why the row was kept (the resource's header lists the roles)
 */
record PublishedTrackRow(double massMsun, double logAgeYr, double teffK, double logLuminosity, double radiusRsun,
                         double logLithium, double logCentralTemperature, double radiativeCoreMassMsun,
                         double radiativeCoreRadiusRsun, String role) {

    /** Age, Myr. */
    double ageMyr() {
        return Math.pow(10.0, logAgeYr) / 1.0e6;
    }

    /** Every row of the resource at {@code path} on the test class path, in file order. */
    static List<PublishedTrackRow> read(String path) {
        var stream = Objects.requireNonNull(PublishedTrackRow.class.getResourceAsStream(path), path);
        List<PublishedTrackRow> rows = new ArrayList<>();
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
                rows.add(new PublishedTrackRow(Double.parseDouble(f[0]), Double.parseDouble(f[1]),
                        Double.parseDouble(f[2]), Double.parseDouble(f[3]), Double.parseDouble(f[5]),
                        Double.parseDouble(f[6]), Double.parseDouble(f[7]), Double.parseDouble(f[9]),
                        Double.parseDouble(f[10]), f[11].trim()));
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return rows;
    }
}
