package org.convgrid.output;

import java.util.List;
import java.util.Map;

/**
 * The {@code #} lines an ECSV 1.0 file (astropy's Enhanced Character Separated Values) starts with, before its
 * column-name row: the version line, then YAML with the delimiter, one flow mapping per column (name, unit, datatype,
 * description) and, when given, a {@code meta} mapping of scalars. astropy reads such a file with
 * {@code Table.read(path, format="ascii.ecsv")} (needed for a {@code .csv} name; the meta mapping becomes
 * {@code table.meta}); pandas with {@code comment="#"}.
 * Fixed text for fixed input, so that a file can be checked against it.
 */
public final class EcsvHeader {

    private static final String LINE = "# ";

    private EcsvHeader() {
    }

    /** The header of a file without metadata. */
    public static String of(List<EcsvColumn> columns) {
        return of(columns, Map.of());
    }

    /**
     * The header with a {@code meta} mapping.
     *
     * @param meta written in its iteration order; each value a {@link Double} (written with
     *     {@link CsvNumbers#formatRoundTrip}, NaN as YAML's {@code .nan}), {@link Integer}, {@link Boolean} or
     *     {@link String} (single-quoted)
     */
    public static String of(List<EcsvColumn> columns, Map<String, ?> meta) {
        StringBuilder b = new StringBuilder("# %ECSV 1.0\n# ---\n# delimiter: ','\n# datatype:\n");
        for (EcsvColumn c : columns) {
            b.append(LINE).append("- {name: ").append(c.name());
            if (!c.unit().isEmpty()) {
                b.append(", unit: ").append(quoted(c.unit()));
            }
            b.append(", datatype: ").append(c.datatype()).append(", description: ").append(quoted(c.description()))
                    .append("}\n");
        }
        if (!meta.isEmpty()) {
            b.append(LINE).append("meta:\n");
            meta.forEach((key, value) -> b.append(LINE).append("  ").append(key).append(": ").append(scalar(value))
                    .append('\n'));
        }
        return b.append("# schema: astropy-2.0\n").toString();
    }

    private static String scalar(Object value) {
        if (value instanceof Double d) {
            // a NaN cell is empty and an infinite one "inf", but YAML reads those as null and as text
            if (d.isNaN()) {
                return ".nan";
            }
            return d.isInfinite() ? (d > 0 ? ".inf" : "-.inf") : CsvNumbers.formatRoundTrip(d);
        }
        if (value instanceof Integer || value instanceof Boolean) {
            return value.toString();
        }
        if (value instanceof String s) {
            return quoted(s);
        }
        throw new IllegalArgumentException("an ECSV meta value must be a number, a boolean or a text, got " + value);
    }

    /**
     * YAML's single-quoted form, in which nothing is special but the quote itself, which is doubled; a text with a
     * control character (a line break would end the {@code #} line) takes the double-quoted form with escapes.
     */
    private static String quoted(String text) {
        if (text.chars().noneMatch(Character::isISOControl)) {
            return "'" + text.replace("'", "''") + "'";
        }
        StringBuilder b = new StringBuilder("\"");
        text.chars().forEach(c -> {
            if (c == '"' || c == '\\') {
                b.append('\\').append((char) c);
            } else if (Character.isISOControl(c)) {
                b.append(String.format(java.util.Locale.ROOT, "\\u%04x", c));
            } else {
                b.append((char) c);
            }
        });
        return b.append('"').toString();
    }
}
