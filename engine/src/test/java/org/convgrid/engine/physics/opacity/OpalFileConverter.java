package org.convgrid.engine.physics.opacity;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Converts the published OPAL opacity file layout (the "GN93hz" file of Iglesias &amp; Rogers 1996, ApJ 464, 943)
 * into convgrid's table layout ({@link OpacityTableReader}), and verifies the conversion. No main: it runs from
 * {@code OpalFileConversionTest} (the one-off entry point) and from tests.
 *
 * <p>Raw layout, as published: each table starts with a header line {@code TABLE # n ... X=0.7000 Y=0.2800
 * Z=0.0200 ...}, then (after blank lines and a "log R" line) a line {@code logT -8.0 -7.5 ... 1.0} with the log R
 * columns, then one line per log T: log T followed by up to 19 values of log10 kappa. "9.999", and columns left
 * blank at the right end of a line, are "not in table". Header lines not followed by a {@code logT} line (the
 * file's summary at the top) are skipped.
 *
 * <p>Conversion: one convgrid table per raw table, in the raw order; the log T grid is the union of the raw rows
 * (70 rows, 3.75-8.70, in the full file; a window's missing rows are "not in table"); values are copied as
 * published, three decimals. Verification ({@link #verify}, and {@link #numbering} for the full file): X + Y + Z = 1
 * to 1e-4, one log R header for all tables, log T rows increasing, every cell of the written file read back and
 * equal to the raw cell (or both not in table), and no isolated jump ({@link #isolatedJumps}).
 */
final class OpalFileConverter {

    /** Number of tables in the full GN93hz file. */
    static final int FULL_FILE_TABLES = 126;
    /** Raw-file entry meaning "not in table". */
    static final double RAW_NOT_IN_TABLE = 9.999;
    /** A cell further than this (dex) from the mean of its neighbours both along its row and its column is flagged. */
    static final double JUMP_LIMIT = 0.3;

    private static final Pattern HEADER = Pattern.compile(
            "TABLE\\s*#\\s*(\\d+).*?\\bX=\\s*([0-9.]+)\\s+Y=\\s*([0-9.]+)\\s+Z=\\s*([0-9.]+)", Pattern.CASE_INSENSITIVE);

    /** One published table: its number, composition, grids and log10 kappa (NaN where not in table). */
    record RawTable(int number, double x, double y, double z, double[] logR, double[] logT, double[][] logKappa) {
    }

    private OpalFileConverter() {
    }

    /** Parses the raw layout. */
    static List<RawTable> parse(Reader in) throws IOException {
        List<RawTable> tables = new ArrayList<>();
        BufferedReader reader = new BufferedReader(in);
        Matcher header = null;
        double[] logR = null;
        List<Double> logT = new ArrayList<>();
        List<double[]> rows = new ArrayList<>();
        String line;
        int lineNumber = 0;
        while ((line = reader.readLine()) != null) {
            lineNumber++;
            String trimmed = line.strip();
            Matcher m = HEADER.matcher(trimmed);
            if (m.find()) {
                flush(tables, header, logR, logT, rows);
                header = m;
                logR = null;
                continue;
            }
            if (trimmed.startsWith("logT")) {
                if (header == null) {
                    throw new IllegalArgumentException("line " + lineNumber + ": logT line without a TABLE header");
                }
                String[] parts = trimmed.split("\\s+");
                logR = new double[parts.length - 1];
                for (int j = 1; j < parts.length; j++) {
                    logR[j - 1] = Double.parseDouble(parts[j]);
                }
                continue;
            }
            if (logR == null || trimmed.isEmpty() || !Character.isDigit(trimmed.charAt(0))) {
                continue;
            }
            String[] parts = trimmed.split("\\s+");
            if (parts.length - 1 > logR.length) {
                throw new IllegalArgumentException("line " + lineNumber + ": " + (parts.length - 1)
                        + " values, header has " + logR.length);
            }
            double[] row = new double[logR.length];
            Arrays.fill(row, Double.NaN);
            for (int j = 1; j < parts.length; j++) {
                double v = Double.parseDouble(parts[j]);
                row[j - 1] = v == RAW_NOT_IN_TABLE ? Double.NaN : v;
            }
            logT.add(Double.parseDouble(parts[0]));
            rows.add(row);
        }
        flush(tables, header, logR, logT, rows);
        return tables;
    }

    private static void flush(List<RawTable> tables, Matcher header, double[] logR, List<Double> logT,
                              List<double[]> rows) {
        if (header != null && logR != null && !rows.isEmpty()) {
            tables.add(new RawTable(Integer.parseInt(header.group(1)), Double.parseDouble(header.group(2)),
                    Double.parseDouble(header.group(3)), Double.parseDouble(header.group(4)), logR,
                    logT.stream().mapToDouble(Double::doubleValue).toArray(), rows.toArray(new double[0][])));
        }
        logT.clear();
        rows.clear();
    }

    /** The raw tables as one convgrid table set on the union of their log T rows. */
    static TabulatedOpacity convert(List<RawTable> raw, String name) {
        TreeSet<Double> rows = new TreeSet<>();
        raw.forEach(t -> Arrays.stream(t.logT()).forEach(rows::add));
        double[] logT = rows.stream().mapToDouble(Double::doubleValue).toArray();
        double[] logR = raw.get(0).logR();
        double[][][] values = new double[raw.size()][logT.length][logR.length];
        for (int k = 0; k < raw.size(); k++) {
            RawTable t = raw.get(k);
            for (double[] row : values[k]) {
                Arrays.fill(row, Double.NaN);
            }
            for (int r = 0; r < t.logT().length; r++) {
                values[k][Arrays.binarySearch(logT, t.logT()[r])] = t.logKappa()[r].clone();
            }
        }
        return new TabulatedOpacity(name, raw.stream().mapToDouble(RawTable::x).toArray(),
                raw.stream().mapToDouble(RawTable::z).toArray(), logT, logR, values);
    }

    /** Comment lines for the converted file: source, paper, table numbers and compositions, method, checks. */
    static List<String> provenance(List<RawTable> raw, String source, String fileDate) {
        List<String> lines = new ArrayList<>();
        lines.add("OPAL Rosseland-mean opacities, Grevesse & Noels 1993 metal mixture (Iglesias & Rogers 1996,");
        lines.add("ApJ 464, 943), the GN93hz file dated " + fileDate + ".");
        lines.add("Source: " + source);
        lines.add("Converted by OpalFileConverter (engine tests; run OpalFileConversionTest with -Dconvgrid.opal.raw):");
        lines.add("values copied as published (3 decimals); raw 9.999 and blank cells are written '-' (not in table);");
        lines.add("log T rows are the union of the raw rows. Verified at conversion: " + (raw.size() == FULL_FILE_TABLES
                ? "table numbers 1.." + FULL_FILE_TABLES + "," : "(a partial set: numbers not checked)"));
        lines.add("X + Y + Z = 1, one log R header, every written cell read back equal to the raw cell, no");
        lines.add("cell more than " + JUMP_LIMIT + " dex off the mean of its neighbours along both its row and column.");
        lines.add("Tables (number: X, Z, log T rows present):");
        for (RawTable t : raw) {
            lines.add(String.format(Locale.ROOT, "  %3d: X = %.4f, Z = %.4f, log T %.2f-%.2f (%d rows)", t.number(),
                    t.x(), t.z(), t.logT()[0], t.logT()[t.logT().length - 1], t.logT().length));
        }
        return lines;
    }

    /**
     * Checks the raw tables and the converted set read back from its text; returns the problems found (empty when
     * the conversion is faithful).
     */
    static List<String> verify(List<RawTable> raw, TabulatedOpacity readBack) {
        List<String> problems = new ArrayList<>();
        for (int k = 0; k < raw.size(); k++) {
            RawTable t = raw.get(k);
            if (Math.abs(t.x() + t.y() + t.z() - 1.0) > 1e-4) {
                problems.add("table " + t.number() + ": X + Y + Z = " + (t.x() + t.y() + t.z()));
            }
            if (!Arrays.equals(t.logR(), raw.get(0).logR())) {
                problems.add("table " + t.number() + ": log R header differs from table " + raw.get(0).number());
            }
            for (int r = 1; r < t.logT().length; r++) {
                if (!(t.logT()[r] > t.logT()[r - 1])) {
                    problems.add("table " + t.number() + ": log T rows not increasing at " + t.logT()[r]);
                }
            }
            if (readBack.hydrogen(k) != t.x() || readBack.metals(k) != t.z()) {
                problems.add("table " + t.number() + ": composition written as X = " + readBack.hydrogen(k) + ", Z = "
                        + readBack.metals(k));
            }
            double[] logT = readBack.logTemperatures();
            for (int r = 0; r < t.logT().length; r++) {
                int i = Arrays.binarySearch(logT, t.logT()[r]);
                for (int j = 0; j < t.logR().length; j++) {
                    double want = t.logKappa()[r][j];
                    double got = i < 0 ? Double.NaN : readBack.logKappa(k, i, j);
                    boolean same = Double.isNaN(want) ? Double.isNaN(got) : Math.abs(got - want) < 5e-7;
                    if (!same) {
                        problems.add(String.format(Locale.ROOT, "table %d log T %.2f log R %.1f: raw %s, written %s",
                                t.number(), t.logT()[r], t.logR()[j], want, got));
                    }
                }
            }
            problems.addAll(isolatedJumps(t));
        }
        return problems;
    }

    /** Table numbers 1..N without gap or repeat (the full file; a set of windows has gaps). */
    static List<String> numbering(List<RawTable> raw) {
        List<String> problems = new ArrayList<>();
        for (int k = 0; k < raw.size(); k++) {
            if (raw.get(k).number() != k + 1) {
                problems.add("table numbers not 1..N: table " + raw.get(k).number() + " at place " + (k + 1));
            }
        }
        return problems;
    }

    /**
     * Cells further than {@link #JUMP_LIMIT} dex from the mean of their two neighbours along the row and also along
     * the column (weighted for uneven log T steps): a typing slip shows both ways, a physical feature rarely does.
     */
    static List<String> isolatedJumps(RawTable t) {
        List<String> flagged = new ArrayList<>();
        double[][] v = t.logKappa();
        for (int r = 1; r < v.length - 1; r++) {
            for (int j = 1; j < t.logR().length - 1; j++) {
                double rowMean = 0.5 * (v[r][j - 1] + v[r][j + 1]);
                double a = t.logT()[r] - t.logT()[r - 1];
                double b = t.logT()[r + 1] - t.logT()[r];
                double columnMean = (b * v[r - 1][j] + a * v[r + 1][j]) / (a + b);
                if (Math.abs(v[r][j] - rowMean) > JUMP_LIMIT && Math.abs(v[r][j] - columnMean) > JUMP_LIMIT) {
                    flagged.add(String.format(Locale.ROOT, "table %d log T %.2f log R %.1f: %.3f is an isolated jump",
                            t.number(), t.logT()[r], t.logR()[j], v[r][j]));
                }
            }
        }
        return flagged;
    }

    /** Cell-by-cell differences between two independent transcriptions of the same file (empty when identical). */
    static List<String> compare(List<RawTable> first, List<RawTable> second) {
        List<String> differences = new ArrayList<>();
        if (first.size() != second.size()) {
            differences.add(first.size() + " tables against " + second.size());
            return differences;
        }
        for (int k = 0; k < first.size(); k++) {
            RawTable a = first.get(k);
            RawTable b = second.get(k);
            if (a.number() != b.number() || a.x() != b.x() || a.z() != b.z() || !Arrays.equals(a.logT(), b.logT())) {
                differences.add("table " + a.number() + ": header or rows differ");
                continue;
            }
            for (int r = 0; r < a.logT().length; r++) {
                for (int j = 0; j < a.logR().length; j++) {
                    double p = a.logKappa()[r][j];
                    double q = b.logKappa()[r][j];
                    if (!(Double.isNaN(p) && Double.isNaN(q)) && p != q) {
                        differences.add(String.format(Locale.ROOT, "table %d log T %.2f log R %.1f: %s against %s",
                                a.number(), a.logT()[r], a.logR()[j], p, q));
                    }
                }
            }
        }
        return differences;
    }

    /** The converted set's text, with its provenance header. */
    static String write(TabulatedOpacity table, List<String> provenance) throws IOException {
        StringBuilder out = new StringBuilder(1 << 20);
        OpacityTableWriter.write(table, 3, out, provenance.toArray(new String[0]));
        return out.toString();
    }

    /** Reads text in our layout (for the read-back check). */
    static TabulatedOpacity readBack(String text) throws IOException {
        return OpacityTableReader.read(new StringReader(text), "converted");
    }

    /**
     * The two OPAL windows shipped earlier in this repository (tables 47 and 73 of the GN93hz file) written back
     * in the published raw layout, so the converter can be run and tested before the full file is at hand.
     */
    static String windowsAsRawFile() throws IOException {
        StringBuilder raw = new StringBuilder();
        appendWindow(raw, 47, 0.35, 0.63, "/reference/opacity/opal-gn93-x035-z002.txt");
        appendWindow(raw, 73, 0.70, 0.28, "/reference/opacity/opal-gn93-x070-z002.txt");
        return raw.toString();
    }

    private static void appendWindow(StringBuilder raw, int number, double x, double y, String resource)
            throws IOException {
        List<String[]> rows = AnalyticCompositeOpacityTest.rows(resource);
        raw.append(String.format(Locale.ROOT, "TABLE #%3d     $G&N'93 Solar$     X=%.4f Y=%.4f Z=%.4f dXc=0.0000"
                + " dXo=0.0000%n%n                                                 log R%n%n", number, x, y, 0.02));
        raw.append(String.join("  ", rows.get(0))).append("\n\n");
        for (String[] row : rows.subList(1, rows.size())) {
            raw.append(row[0]);
            for (int j = 1; j < row.length; j++) {
                raw.append(String.format(Locale.ROOT, "%7.3f", Double.parseDouble(row[j])));
            }
            raw.append('\n');
        }
        raw.append('\n');
    }
}
