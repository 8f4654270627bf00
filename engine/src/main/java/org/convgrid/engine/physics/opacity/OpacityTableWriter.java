package org.convgrid.engine.physics.opacity;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

/**
 * Writes a {@link TabulatedOpacity} in the plain-text layout read by {@link OpacityTableReader}
 * (see {@code TABLE-FORMAT.md}). Grid values are written with full double precision, log10 kappa with
 * {@link #LOG_KAPPA_DECIMALS} decimals (2e-6 relative in kappa).
 */
public final class OpacityTableWriter {

    /** Decimals of log10 kappa. */
    public static final int LOG_KAPPA_DECIMALS = 6;
    private static final int VALUES_PER_GRID_LINE = 10;

    private OpacityTableWriter() {
    }

    /** Writes the table to out, log10 kappa with {@link #LOG_KAPPA_DECIMALS} decimals, with comment lines. */
    public static void write(TabulatedOpacity table, Appendable out, String... comments) throws IOException {
        write(table, LOG_KAPPA_DECIMALS, out, comments);
    }

    /**
     * Writes the table to out with the given comment lines (each prefixed by "# "), log10 kappa with
     * {@code decimals} decimals ("-" where not in table); tables in their stored order.
     */
    public static void write(TabulatedOpacity table, int decimals, Appendable out, String... comments)
            throws IOException {
        out.append("# ").append(OpacityTableReader.MAGIC).append(" - log10 Rosseland-mean opacity, cm^2/g\n");
        for (String c : comments) {
            out.append("# ").append(c.replace('\n', ' ')).append('\n');
        }
        out.append(OpacityTableReader.MAGIC).append(' ').append(String.valueOf(OpacityTableReader.VERSION)).append('\n');
        out.append("name ").append(table.name()).append('\n');
        writeGrid(out, "log10_temperature", table.logTemperatures());
        writeGrid(out, "log10_r", table.logR());
        writeGrid(out, "hydrogen", table.hydrogenFractions());
        writeGrid(out, "metals", table.metallicities());
        String fmt = "%." + decimals + "f";
        int nT = table.logTemperatures().length;
        int nR = table.logR().length;
        for (int k = 0; k < table.tableCount(); k++) {
            out.append("table ").append(Double.toString(table.hydrogen(k))).append(' ')
                    .append(Double.toString(table.metals(k))).append('\n');
            for (int i = 0; i < nT; i++) {
                StringBuilder line = new StringBuilder();
                for (int j = 0; j < nR; j++) {
                    if (j > 0) {
                        line.append(' ');
                    }
                    double v = table.logKappa(k, i, j);
                    line.append(Double.isNaN(v) ? OpacityTableReader.NOT_IN_TABLE : String.format(Locale.ROOT, fmt, v));
                }
                out.append(line).append('\n');
            }
        }
        out.append("end\n");
    }

    /** Thin wrapper: writes UTF-8 text to a file. */
    public static void write(TabulatedOpacity table, Path file, String... comments) {
        try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            write(table, w, comments);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static void writeGrid(Appendable out, String key, double[] values) throws IOException {
        out.append(key).append(' ').append(String.valueOf(values.length)).append('\n');
        for (int i = 0; i < values.length; i++) {
            out.append(Double.toString(values[i]));
            out.append((i + 1) % VALUES_PER_GRID_LINE == 0 || i == values.length - 1 ? '\n' : ' ');
        }
    }
}
