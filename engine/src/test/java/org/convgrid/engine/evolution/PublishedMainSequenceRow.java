package org.convgrid.engine.evolution;

import java.util.ArrayList;
import java.util.List;
import org.convgrid.engine.reference.PublishedTable;

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
        List<PublishedMainSequenceRow> rows = new ArrayList<>();
        for (String[] f : PublishedTable.rows(PublishedMainSequenceRow.class, path)) {
            rows.add(new PublishedMainSequenceRow(Double.parseDouble(f[0]), Integer.parseInt(f[1]),
                    Double.parseDouble(f[2]), Double.parseDouble(f[3]), Double.parseDouble(f[4]),
                    Double.parseDouble(f[5]), Double.parseDouble(f[6]), Double.parseDouble(f[7]), f[8].trim()));
        }
        return rows;
    }
}
