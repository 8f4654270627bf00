package org.convgrid.engine.physics.opacity;

import java.io.IOException;
import java.io.InputStream;
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
 * convgrid-opacity-table 2
 * name          free text to the end of the line
 * log10_temperature N   then N numbers, strictly increasing   (log10 T, T in K)
 * log10_r           M   then M numbers, strictly increasing   (log10 R, R = rho/T6^3, rho in g/cm^3)
 * hydrogen          P   then P numbers, strictly increasing   (the X values the tables use)
 * metals            Q   then Q numbers, strictly increasing   (the Z values the tables use)
 * table X Z             then N x M entries: row i = log10_temperature[i], column j = log10_r[j], log10 kappa,
 *                       or "-" where the composition's table has no value ("not in table")
 *                       (one block per composition, any order, any subset of the X x Z pairs)
 * end
 * </pre>
 * Version 1 files (every X x Z pair present, no "-") are read as before. Problems fail with
 * {@link ErrorKind#BAD_DATA}, naming the line; parameters are the source name and line. The text is scanned once,
 * without a token list, because the shipped OPAL set has ~170 000 entries and is read at first use.
 */
public final class OpacityTableReader {

    /** First keyword of every table file. */
    public static final String MAGIC = "convgrid-opacity-table";
    /** Layout version this reader writes and understands (it also reads version 1). */
    public static final int VERSION = 2;
    /** Entry of a version-2 table for "not in table". */
    public static final String NOT_IN_TABLE = "-";
    /** Largest table file read, bytes: the shipped OPAL set is about 1 MB, so this is generous. */
    public static final long MAX_FILE_BYTES = 64L * 1024 * 1024;
    /** Most values one axis may declare (OPAL tables have 70 temperatures). */
    public static final int MAX_AXIS_VALUES = 10_000;
    /** Most cells one (X, Z) table may declare (OPAL: 70 x 19). */
    public static final long MAX_CELLS_PER_TABLE = 1_000_000;

    private static final double[] POWERS_OF_TEN = {1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11,
        1e12, 1e13, 1e14, 1e15};

    private final String source;
    /** The whole text as chars: indexing a char array is several times cheaper than a UTF-16 String's charAt. */
    private final char[] text;
    private int pos;
    private int tokenStart;
    private String name;

    private OpacityTableReader(String source, char[] text) {
        this.source = source;
        this.text = text;
    }

    /** Reads a table; source names the input in error messages. */
    public static TabulatedOpacity read(Reader in, String source) throws IOException {
        StringBuilder all = new StringBuilder(1 << 16);
        char[] buffer = new char[1 << 16];
        int n;
        while ((n = in.read(buffer)) > 0) {
            all.append(buffer, 0, n);
        }
        char[] text = new char[all.length()];
        all.getChars(0, text.length, text, 0);
        return new OpacityTableReader(source, text).parse();
    }

    /** Reads UTF-8 text from a stream (malformed bytes read as U+FFFD, as a decoding reader would). */
    public static TabulatedOpacity read(InputStream in, String source) throws IOException {
        // one bulk decode of all bytes: several times faster than a Reader's buffered decoding of the ~1 MB set
        return new OpacityTableReader(source, new String(in.readAllBytes(), StandardCharsets.UTF_8).toCharArray())
                .parse();
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

    private TabulatedOpacity parse() {
        int save = pos;
        String first = next();
        if (!MAGIC.equals(first)) {
            // the content of a file that is no table is not echoed: it may be anything (a password file...)
            pos = save;
            throw fail("not an opacity table: the first word must be '" + MAGIC + "'");
        }
        int version = (int) number();
        if (version != 1 && version != VERSION) {
            throw fail("unsupported version " + version);
        }
        if (peek("name")) {
            next();
            int end = pos;
            while (end < text.length && text[end] != '\n' && text[end] != '#') {
                end++;
            }
            name = new String(text, pos, end - pos).strip();
            pos = end;
        }
        double[] logT = grid("log10_temperature");
        double[] logR = grid("log10_r");
        double[] xs = grid("hydrogen");
        double[] zs = grid("metals");
        List<double[]> compositions = new ArrayList<>();
        List<double[][]> values = new ArrayList<>();
        while (!peek("end")) {
            expect("table");
            double x = xs[indexOf(xs, number(), "X")];
            double z = zs[indexOf(zs, number(), "Z")];
            for (double[] c : compositions) {
                if (c[0] == x && c[1] == z) {
                    throw fail("second table for X = " + x + ", Z = " + z);
                }
            }
            compositions.add(new double[] {x, z});
            double[][] table = new double[logT.length][logR.length];
            for (int i = 0; i < logT.length; i++) {
                for (int j = 0; j < logR.length; j++) {
                    table[i][j] = entry(version);
                }
            }
            values.add(table);
        }
        expect("end");
        if (version == 1) {
            for (double x : xs) {
                for (double z : zs) {
                    if (compositions.stream().noneMatch(c -> c[0] == x && c[1] == z)) {
                        throw fail("missing table for X = " + x + ", Z = " + z);
                    }
                }
            }
        }
        if (compositions.isEmpty()) {
            throw fail("no table");
        }
        double[] tx = compositions.stream().mapToDouble(c -> c[0]).toArray();
        double[] tz = compositions.stream().mapToDouble(c -> c[1]).toArray();
        return new TabulatedOpacity(name == null ? source : name, tx, tz, logT, logR,
                values.toArray(new double[0][][]));
    }

    private double[] grid(String key) {
        expect(key);
        double count = number();
        if (count < 1 || count != Math.rint(count)) {
            throw fail(key + " count must be a positive integer");
        }
        // every value needs at least two characters (a digit and a blank), so the text left bounds the count
        long possible = Math.min(MAX_AXIS_VALUES, (text.length - pos) / 2 + 1);
        if (count > possible) {
            throw fail(key + " declares " + (long) Math.min(count, Long.MAX_VALUE) + " values; at most "
                    + possible + " are possible here");
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

    /** Moves to the next token and returns it, or null at the end of the text. */
    private String next() {
        skipBlank();
        tokenStart = pos;
        if (pos >= text.length) {
            return null;
        }
        while (!endOfToken(pos)) {
            pos++;
        }
        return new String(text, tokenStart, pos - tokenStart);
    }

    private boolean peek(String word) {
        int save = pos;
        String t = next();
        pos = save;
        if (t == null) {
            throw fail("unexpected end of input (missing 'end'?)");
        }
        return t.equals(word);
    }

    private void expect(String word) {
        String t = next();
        if (t == null) {
            throw fail("unexpected end of input (missing 'end'?)");
        }
        if (!t.equals(word)) {
            throw fail("expected '" + word + "', found '" + shortToken(t) + "'");
        }
    }

    private double entry(int version) {
        skipBlank();
        if (version >= 2 && pos < text.length && text[pos] == '-' && endOfToken(pos + 1)) {
            tokenStart = pos++;
            return Double.NaN;
        }
        return number();
    }

    private double number() {
        skipBlank();
        if (pos >= text.length) {
            tokenStart = pos;
            throw fail("unexpected end of input");
        }
        tokenStart = pos;
        while (!endOfToken(pos)) {
            pos++;
        }
        double v = plainDecimal(tokenStart, pos);
        if (Double.isNaN(v)) {
            String t = new String(text, tokenStart, pos - tokenStart);
            try {
                v = Double.parseDouble(t);
            } catch (NumberFormatException e) {
                throw fail("expected a number, found '" + shortToken(t) + "'");
            }
            if (!Double.isFinite(v)) {
                throw fail("non-finite number '" + shortToken(t) + "'");
            }
        }
        return v;
    }

    /**
     * A token of the form [-]digits[.digits] with at most 15 digits, read without building a string (the shipped
     * tables are ~170 000 such tokens); m / 10^d of two exact doubles is correctly rounded, so the value is the
     * one {@link Double#parseDouble} gives. NaN for any other form, which the caller then parses in full.
     */
    private double plainDecimal(int from, int to) {
        int i = from;
        boolean negative = i < to && text[i] == '-';
        if (negative) {
            i++;
        }
        long mantissa = 0;
        int digits = 0;
        int decimals = -1;
        for (; i < to; i++) {
            char c = text[i];
            if (c == '.' && decimals < 0) {
                decimals = 0;
            } else if (c >= '0' && c <= '9' && digits < 15) {
                mantissa = 10 * mantissa + (c - '0');
                digits++;
                if (decimals >= 0) {
                    decimals++;
                }
            } else {
                return Double.NaN;
            }
        }
        if (digits == 0) {
            return Double.NaN;
        }
        double v = decimals > 0 ? mantissa / POWERS_OF_TEN[decimals] : (double) mantissa;
        return negative ? -v : v;
    }

    private void skipBlank() {
        int n = text.length;
        while (pos < n) {
            char c = text[pos];
            if (c == '#') {
                while (pos < n && text[pos] != '\n') {
                    pos++;
                }
            } else if (Character.isWhitespace(c)) {
                pos++;
            } else {
                return;
            }
        }
    }

    private boolean endOfToken(int at) {
        return at >= text.length || Character.isWhitespace(text[at]) || text[at] == '#';
    }

    /** A word of the file as quoted in a message: short, without control characters. */
    private static String shortToken(String t) {
        String clean = t.replaceAll("\\p{Cntrl}", "?");
        return clean.length() <= 24 ? clean : clean.substring(0, 24) + "...";
    }

    private ConvgridException fail(String what) {
        int line = 1;
        for (int i = 0; i < Math.min(tokenStart, text.length); i++) {
            if (text[i] == '\n') {
                line++;
            }
        }
        return new ConvgridException(ErrorKind.BAD_DATA, source + ":" + line + ": " + what, source, line);
    }
}
