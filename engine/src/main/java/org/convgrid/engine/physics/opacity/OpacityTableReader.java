package org.convgrid.engine.physics.opacity;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;

/**
 * Reads the convgrid opacity-table text layout (UTF-8, whitespace-separated tokens, '#' starts a comment that
 * runs to the end of the line):
 * <pre>
 * convgrid-opacity-table 1
 * name          free text to the end of the line
 * log10_temperature N   then N numbers, strictly increasing   (log10 T, T in K)
 * log10_r           M   then M numbers, strictly increasing   (log10 R, R = rho/T6^3, rho in g/cm^3)
 * hydrogen          P   then P numbers, strictly increasing   (X values)
 * metals            Q   then Q numbers, strictly increasing   (Z values)
 * table X Z             then N x M numbers: row i = log10_temperature[i], column j = log10_r[j], log10 kappa
 *                       (one block per (X, Z) pair, P x Q blocks in any order)
 * end
 * </pre>
 * Problems fail with {@link ErrorKind#BAD_DATA}, naming the line; parameters are the source name and line.
 */
public final class OpacityTableReader {

    /** First keyword of every table file. */
    public static final String MAGIC = "convgrid-opacity-table";
    /** Layout version this reader understands. */
    public static final int VERSION = 1;

    /** Largest table file read, bytes: OPAL-sized tables are well under 1 MB, so this is generous. */
    public static final long MAX_FILE_BYTES = 64L * 1024 * 1024;
    /** Most values one axis may declare (OPAL tables have about 70 temperatures). */
    public static final int MAX_AXIS_VALUES = 10_000;
    /** Most (X, Z) blocks a table may declare. */
    public static final int MAX_BLOCKS = 10_000;

    private final String source;
    private final List<String> tokens = new ArrayList<>();
    private final List<Integer> lines = new ArrayList<>();
    private String name;
    private int pos;

    private OpacityTableReader(String source) {
        this.source = source;
    }

    /** Reads a table; source names the input in error messages. */
    public static TabulatedOpacity read(Reader in, String source) throws IOException {
        OpacityTableReader r = new OpacityTableReader(source);
        r.tokenize(in);
        return r.parse();
    }

    /** Reads UTF-8 text from a stream. */
    public static TabulatedOpacity read(InputStream in, String source) throws IOException {
        return read(new InputStreamReader(in, StandardCharsets.UTF_8), source);
    }

    /**
     * Thin wrapper: reads a file.
     *
     * @throws ConvgridException BAD_DATA when the file cannot be read or understood
     */
    public static TabulatedOpacity read(Path file) {
        checkReadable(file);
        try (Reader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            return read(in, file.toString());
        } catch (IOException e) {
            throw new ConvgridException(ErrorKind.BAD_DATA, "cannot read opacity table " + file + ": "
                    + (e instanceof java.nio.file.AccessDeniedException ? "permission denied"
                    : e instanceof java.nio.charset.CharacterCodingException ? "it is not UTF-8 text"
                    : "the file could not be read"), file);
        }
    }

    /** Only a regular file under {@link #MAX_FILE_BYTES}: a device or a pipe would never end, a huge file is a mistake. */
    private static void checkReadable(Path file) {
        String problem = null;
        try {
            if (!Files.exists(file)) {
                problem = "no such file";
            } else if (Files.isDirectory(file)) {
                problem = "it is a directory, not a file";
            } else if (!Files.isRegularFile(file)) {
                problem = "it is not a regular file (a device or a pipe?)";
            } else if (Files.size(file) > MAX_FILE_BYTES) {
                problem = "it holds " + Files.size(file) + " bytes, more than the limit of " + MAX_FILE_BYTES;
            }
        } catch (IOException | SecurityException e) {
            problem = "the file could not be examined";
        }
        if (problem != null) {
            throw new ConvgridException(ErrorKind.BAD_DATA, "cannot read opacity table " + file + ": " + problem,
                    file);
        }
    }

    private void tokenize(Reader in) throws IOException {
        BufferedReader br = new BufferedReader(in);
        String line;
        int n = 0;
        while ((line = br.readLine()) != null) {
            n++;
            int hash = line.indexOf('#');
            String body = (hash >= 0 ? line.substring(0, hash) : line).strip();
            if (body.startsWith("name ") || body.equals("name")) {
                tokens.add("name");
                lines.add(n);
                name = body.substring(4).strip();
                continue;
            }
            for (String t : body.split("\\s+")) {
                if (!t.isEmpty()) {
                    tokens.add(t);
                    lines.add(n);
                }
            }
        }
    }

    private TabulatedOpacity parse() {
        if (pos >= tokens.size() || !tokens.get(pos).equals(MAGIC)) {
            // the content of a file that is no table is not echoed: it may be anything (a password file...)
            throw fail("not an opacity table: the first word must be '" + MAGIC + "'");
        }
        pos++;
        int version = (int) number();
        if (version != VERSION) {
            throw fail("unsupported version " + version);
        }
        if (pos < tokens.size() && tokens.get(pos).equals("name")) {
            pos++;
        }
        double[] logT = grid("log10_temperature");
        double[] logR = grid("log10_r");
        double[] xs = grid("hydrogen");
        double[] zs = grid("metals");
        long blocks = (long) xs.length * zs.length;
        if (blocks > MAX_BLOCKS) {
            throw fail(xs.length + " hydrogen x " + zs.length + " metals values declare " + blocks
                    + " tables, more than the limit of " + MAX_BLOCKS);
        }
        long perBlock = (long) logT.length * logR.length;
        double[][][] values = new double[(int) blocks][][];
        while (!peek("end")) {
            expect("table");
            int ix = indexOf(xs, number(), "X");
            int iz = indexOf(zs, number(), "Z");
            int k = ix * zs.length + iz;
            if (values[k] != null) {
                throw fail("second table for X = " + xs[ix] + ", Z = " + zs[iz]);
            }
            if (perBlock > tokens.size() - pos) {
                throw fail("the table for X = " + xs[ix] + ", Z = " + zs[iz] + " needs " + perBlock
                        + " numbers but the file has only " + (tokens.size() - pos) + " words left");
            }
            values[k] = new double[logT.length][logR.length];
            for (int i = 0; i < logT.length; i++) {
                for (int j = 0; j < logR.length; j++) {
                    values[k][i][j] = number();
                }
            }
        }
        expect("end");
        for (int k = 0; k < values.length; k++) {
            if (values[k] == null) {
                throw fail("missing table for X = " + xs[k / zs.length] + ", Z = " + zs[k % zs.length]);
            }
        }
        return new TabulatedOpacity(name == null ? source : name, xs, zs, logT, logR, values);
    }

    private double[] grid(String key) {
        expect(key);
        double count = number();
        if (count < 1 || count != Math.rint(count)) {
            throw fail(key + " count must be a positive integer");
        }
        if (count > MAX_AXIS_VALUES || count > tokens.size() - pos) {
            throw fail(key + " declares " + (long) Math.min(count, Long.MAX_VALUE) + " values; at most "
                    + Math.min(MAX_AXIS_VALUES, tokens.size() - pos) + " are possible here");
        }
        double[] g = new double[(int) count];
        for (int i = 0; i < g.length; i++) {
            g[i] = number();
        }
        return g;
    }

    private int indexOf(double[] grid, double v, String what) {
        for (int i = 0; i < grid.length; i++) {
            if (grid[i] == v) {
                return i;
            }
        }
        throw fail(what + " = " + v + " is not in the declared grid");
    }

    private boolean peek(String word) {
        if (pos >= tokens.size()) {
            throw fail("unexpected end of input (missing 'end'?)");
        }
        return tokens.get(pos).equals(word);
    }

    private void expect(String word) {
        if (!peek(word)) {
            throw fail("expected '" + word + "', found '" + shortToken(tokens.get(pos)) + "'");
        }
        pos++;
    }

    private double number() {
        if (pos >= tokens.size()) {
            throw fail("unexpected end of input");
        }
        String t = tokens.get(pos);
        try {
            double v = Double.parseDouble(t);
            if (!Double.isFinite(v)) {
                throw fail("non-finite number '" + shortToken(t) + "'");
            }
            pos++;
            return v;
        } catch (NumberFormatException e) {
            throw fail("expected a number, found '" + shortToken(t) + "'");
        }
    }

    /** A word of the file as quoted in a message: short, without control characters. */
    private static String shortToken(String t) {
        String clean = t.replaceAll("\\p{Cntrl}", "?");
        return clean.length() <= 24 ? clean : clean.substring(0, 24) + "...";
    }

    private ConvgridException fail(String what) {
        int line = lines.isEmpty() ? 0 : lines.get(Math.min(pos, lines.size() - 1));
        return new ConvgridException(ErrorKind.BAD_DATA, source + ":" + line + ": " + what, source, line);
    }
}
