package org.convgrid.engine.birth;

import java.util.ArrayList;
import java.util.List;
import org.convgrid.engine.reference.PublishedTable;

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
        List<PublishedTrackRow> rows = new ArrayList<>();
        for (String[] f : PublishedTable.rows(PublishedTrackRow.class, path)) {
            rows.add(new PublishedTrackRow(Double.parseDouble(f[0]), Double.parseDouble(f[1]),
                    Double.parseDouble(f[2]), Double.parseDouble(f[3]), Double.parseDouble(f[5]),
                    Double.parseDouble(f[6]), Double.parseDouble(f[7]), Double.parseDouble(f[9]),
                    Double.parseDouble(f[10]), f[11].trim()));
        }
        return rows;
    }
}
