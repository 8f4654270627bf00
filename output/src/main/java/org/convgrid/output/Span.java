package org.convgrid.output;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;

/**
 * A closed interval written {@code lo-hi} (both ends non-negative, fixed-point, see
 * {@link CsvNumbers#formatFixed}); lists of spans are joined by {@code ;}, as in {@code 0-0.082;0.991-1}.
 * Used for convective zones in m/M and for transition brackets in solar masses.
 *
 * @param lo lower end, &gt;= 0
 * @param hi upper end, &gt;= lo
 */
public record Span(double lo, double hi) {

    public Span {
        if (!(lo >= 0.0 && hi >= lo && Double.isFinite(hi))) {
            throw new IllegalArgumentException("a span needs 0 <= lo <= hi, got " + lo + "-" + hi);
        }
    }

    @Override
    public String toString() {
        return CsvNumbers.formatFixed(lo) + "-" + CsvNumbers.formatFixed(hi);
    }

    /** Reads {@code lo-hi}. */
    public static Span parse(String text) {
        String[] ends = text.strip().split("-", -1);
        if (ends.length != 2) {
            throw new IllegalArgumentException("expected lo-hi, got '" + text + "'");
        }
        return new Span(Double.parseDouble(ends[0]), Double.parseDouble(ends[1]));
    }

    /** Spans joined by {@code ;}; the empty list is the empty text. */
    public static String join(List<Span> spans) {
        return spans.stream().map(Span::toString).collect(Collectors.joining(";"));
    }

    /** Reads a {@code ;}-joined list; the empty text is the empty list. */
    public static List<Span> parseList(String text) {
        List<Span> spans = new ArrayList<>();
        if (!text.isBlank()) {
            for (String part : text.split(";")) {
                spans.add(parse(part));
            }
        }
        return List.copyOf(spans);
    }

    /** An optional span: null is the empty text. */
    public static String format(Span span) {
        return span == null ? "" : span.toString();
    }

    /** Reads an optional span: the empty text is null. */
    public static Span parseOptional(String text) {
        return text.isBlank() ? null : parse(text);
    }
}
