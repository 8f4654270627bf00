package org.convgrid.output.probe;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.convgrid.engine.physics.MicrophysicsPoint;
import org.convgrid.output.CsvNumbers;

/**
 * Writes the {@code probe} columns (README, "probe") as CSV or as a readable table: the numbers, then what the
 * opacity was read from ({@link #SOURCE_COLUMN}, last, so the numeric columns keep their places).
 */
public final class MicrophysicsPointWriter {

    /** The text column after the numbers: which opacity tables (or analytic terms) gave kappa_cgs. */
    public static final String SOURCE_COLUMN = "opacity_source";

    /** Numeric column names in output order; the first eighteen are fixed by the conventions. */
    public static final List<String> NUMERIC_COLUMNS = List.of("temp_k", "density_cgs", "x", "z", "pressure_cgs",
            "gas_pressure_frac", "mu", "electrons_per_baryon", "nabla_ad", "gamma1", "cp_cgs", "chi_rho", "chi_t",
            "kappa_cgs", "eps_nuc_cgs", "eps_pp_cgs", "eps_cno_cgs", "degeneracy_eta", "y", "he3_frac",
            "internal_energy_cgs", "cv_cgs", "delta", "dlnkappa_dlnrho", "dlnkappa_dlnt", "dlneps_dlnt");

    /** Every column in output order: the numeric ones, then {@link #SOURCE_COLUMN}. */
    public static final List<String> COLUMNS = java.util.stream.Stream.concat(NUMERIC_COLUMNS.stream(),
            java.util.stream.Stream.of(SOURCE_COLUMN)).toList();

    private static final List<String> UNITS = List.of("K", "g/cm^3", "", "", "dyn/cm^2", "", "", "", "", "", "erg/g/K",
            "", "", "cm^2/g", "erg/g/s", "erg/g/s", "erg/g/s", "", "", "", "erg/g", "erg/g/K", "", "", "", "");

    /**
     * Header row then one data row.
     *
     * @param opacitySource what kappa was read from, in words
     */
    public void writeCsv(MicrophysicsPoint p, String opacitySource, Appendable out) throws IOException {
        try (CSVPrinter printer = new CSVPrinter(out, CSVFormat.DEFAULT.builder().setRecordSeparator('\n').get())) {
            printer.printRecord(COLUMNS);
            List<String> row = new ArrayList<>(values(p).stream().map(MicrophysicsPointWriter::format).toList());
            row.add(opacitySource);
            printer.printRecord(row);
        }
    }

    /**
     * One line per quantity: name, value, unit; the opacity's source last, as words after its name.
     *
     * @param opacitySource what kappa was read from, in words
     */
    public void writeTable(MicrophysicsPoint p, String opacitySource, Appendable out) throws IOException {
        List<Double> values = values(p);
        for (int i = 0; i < NUMERIC_COLUMNS.size(); i++) {
            out.append(String.format(Locale.ROOT, "%-22s %14s  %s%n", NUMERIC_COLUMNS.get(i),
                    format(values.get(i)), UNITS.get(i)));
        }
        out.append(String.format(Locale.ROOT, "%-22s %s%n", SOURCE_COLUMN, opacitySource));
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
