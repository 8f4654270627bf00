package org.convgrid.output.profile;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVPrinter;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.units.Constants;
import org.convgrid.output.AtomicFiles;
import org.convgrid.output.CsvNumbers;
import org.convgrid.output.EcsvHeader;
import org.convgrid.output.catalogue.CatalogueWriter;

/**
 * Writes one model's profile as ECSV: the {@code #} header (each column's unit, datatype and description, and the
 * star's {@link ProfileMeta}), the {@link ProfileColumns} name row, then one row per shell. Every real cell carries the
 * digits that read back its double exactly ({@link CsvNumbers#formatRoundTrip}): oscillation work differences the
 * columns, and seven digits left the outer shells' radii, the mass continuity and dL/dm to rounding noise.
 */
public final class ProfileWriter {

    private ProfileWriter() {
    }

    /**
     * Writes the profile of {@code model}, solved for {@code request}, to {@code target}: its meta, then every shell
     * from the centre out, atomically (a reader never sees half a file; a profile already there is replaced whole).
     * The one way a profile file is made, by a grid run, {@code star --profile} and {@code calibrate-sun --profile}
     * alike, so that the three cannot differ.
     *
     * @param settling whether the model's evolution let helium and metals settle (recorded in the meta)
     * @param toolVersion the convgrid version, recorded in the meta
     * @param toolCommit the commit it was built from, recorded alike
     */
    public static void writeFile(Path target, ModelRequest request, StellarModel model, boolean settling,
                                 String toolVersion, String toolCommit) throws IOException {
        ProfileMeta meta = ProfileMeta.of(request, model, settling, toolVersion, toolCommit);
        AtomicFiles.write(target, out -> write(meta, ProfileRows.of(model), out));
    }

    /** Writes the header and every shell, in the given order (centre outwards by convention). */
    public static void write(ProfileMeta meta, List<ProfileRow> shells, Appendable out) throws IOException {
        out.append(EcsvHeader.of(ProfileColumns.DESCRIBED, meta.entries()));
        CSVPrinter printer = new CSVPrinter(out, CatalogueWriter.FORMAT);
        printer.printRecord(ProfileColumns.HEADER);
        for (ProfileRow s : shells) {
            List<String> cells = new ArrayList<>(ProfileColumns.HEADER.size());
            for (double v : new double[] {s.massFrac(), s.radiusFrac(), s.pressure(), s.temperature(), s.density(),
                    s.luminosity() / Constants.L_SUN, s.opacity(), s.nuclearEnergy(), s.nabla(), s.nablaAd(),
                    s.nablaRad()}) {
                cells.add(CsvNumbers.formatRoundTrip(v));
            }
            cells.add(s.convective() ? "1" : "0");
            cells.add(CsvNumbers.formatRoundTrip(s.convectiveVelocity()));
            for (double v : new double[] {s.radius(), s.gamma1(), s.soundSpeed(), s.hydrogen(), s.mu(), s.helium3(),
                    s.buoyancySquared(), s.exteriorMassFrac()}) {
                cells.add(CsvNumbers.formatRoundTrip(v));
            }
            printer.printRecord(cells);
        }
        printer.flush();
    }
}
