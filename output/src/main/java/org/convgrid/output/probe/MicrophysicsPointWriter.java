package org.convgrid.output.probe;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.convgrid.engine.physics.MicrophysicsPoint;
import org.convgrid.output.CsvNumbers;

/** Writes the {@code probe} columns (README, "probe") as CSV or as a readable table. */
public final class MicrophysicsPointWriter {

    /** Column names in output order; the first eighteen are fixed by the conventions. */
    public static final List<String> COLUMNS = List.of("temp_k", "density_cgs", "x", "z", "pressure_cgs",
            "gas_pressure_frac", "mu", "electrons_per_baryon", "nabla_ad", "gamma1", "cp_cgs", "chi_rho", "chi_t",
            "kappa_cgs", "eps_nuc_cgs", "eps_pp_cgs", "eps_cno_cgs", "degeneracy_eta", "y", "he3_frac",
            "internal_energy_cgs", "cv_cgs", "delta", "dlnkappa_dlnrho", "dlnkappa_dlnt", "dlneps_dlnt");

    private static final List<String> UNITS = List.of("K", "g/cm^3", "", "", "dyn/cm^2", "", "", "", "", "", "erg/g/K",
            "", "", "cm^2/g", "erg/g/s", "erg/g/s", "erg/g/s", "", "", "", "erg/g", "erg/g/K", "", "", "", "");

    /** Header row then one data row. */
    public void writeCsv(MicrophysicsPoint p, Appendable out) throws IOException {
        try (CSVPrinter printer = new CSVPrinter(out, CSVFormat.DEFAULT.builder().setRecordSeparator('\n').get())) {
            printer.printRecord(COLUMNS);
            printer.printRecord(values(p).stream().map(MicrophysicsPointWriter::format).toList());
        }
    }

    /** One line per quantity: name, value, unit. */
    public void writeTable(MicrophysicsPoint p, Appendable out) throws IOException {
        List<Double> values = values(p);
        for (int i = 0; i < COLUMNS.size(); i++) {
            out.append(String.format(Locale.ROOT, "%-22s %14s  %s%n", COLUMNS.get(i), format(values.get(i)),
                    UNITS.get(i)));
        }
    }

    private static List<Double> values(MicrophysicsPoint p) {
        List<Double> v = new ArrayList<>();
        v.add(p.eos().temperature());
        v.add(p.eos().density());
        v.add(p.requested().x());
        v.add(p.requested().z());
        v.add(p.eos().pressure());
        v.add(p.eos().gasPressureFraction());
        v.add(p.eos().mu());
        v.add(p.eos().electronsPerBaryon());
        v.add(p.eos().nablaAd());
        v.add(p.eos().gamma1());
        v.add(p.eos().cp());
        v.add(p.eos().chiRho());
        v.add(p.eos().chiT());
        v.add(p.opacity().kappa());
        v.add(p.burning().eps());
        v.add(p.burning().epsPp());
        v.add(p.burning().epsCno());
        v.add(p.eos().eta());
        v.add(p.requested().y());
        v.add(p.composition().he3());
        v.add(p.eos().internalEnergy());
        v.add(p.eos().cv());
        v.add(p.eos().delta());
        v.add(p.opacity().dlnKappaDlnRho());
        v.add(p.opacity().dlnKappaDlnT());
        v.add(p.burning().dlnEpsDlnT());
        return v;
    }

    private static String format(double value) {
        return CsvNumbers.format(value);
    }
}
