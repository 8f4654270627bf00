package org.convgrid.output.profile;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVPrinter;
import org.convgrid.engine.units.Constants;
import org.convgrid.output.CsvNumbers;
import org.convgrid.output.catalogue.CatalogueWriter;

/** Writes one model's profile as CSV: the {@link ProfileColumns} header, then one row per shell. */
public final class ProfileWriter {

    private ProfileWriter() {
    }

    /** Writes the header and every shell, in the given order (centre outwards by convention). */
    public static void write(List<ProfileRow> shells, Appendable out) throws IOException {
        CSVPrinter printer = new CSVPrinter(out, CatalogueWriter.FORMAT);
        printer.printRecord(ProfileColumns.HEADER);
        for (ProfileRow s : shells) {
            List<String> cells = new ArrayList<>(ProfileColumns.HEADER.size());
            for (double v : new double[] {s.massFrac(), s.radiusFrac(), s.pressure(), s.temperature(), s.density(),
                    s.luminosity() / Constants.L_SUN, s.opacity(), s.nuclearEnergy(), s.nabla(), s.nablaAd(),
                    s.nablaRad()}) {
                cells.add(CsvNumbers.format(v));
            }
            cells.add(s.convective() ? "1" : "0");
            cells.add(CsvNumbers.format(s.convectiveVelocity()));
            for (double v : new double[] {s.radius(), s.gamma1(), s.soundSpeed(), s.hydrogen(), s.mu(), s.helium3(),
                    s.buoyancySquared(), s.exteriorMassFrac()}) {
                cells.add(CsvNumbers.format(v));
            }
            printer.printRecord(cells);
        }
        printer.flush();
    }
}
