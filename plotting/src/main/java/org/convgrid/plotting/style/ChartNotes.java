package org.convgrid.plotting.style;

import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.util.ArrayList;
import java.util.List;

/**
 * Caveats printed on a chart, in the margin right of the plot under the legend (where charts with a right-hand
 * legend have room), word-wrapped to that margin, bottom-aligned with the plot. Notes too long for the room under
 * the legend are set smaller, down to {@link #SMALLEST_NOTE_SIZE} points; past that they start under the legend and
 * run below the plot's lower edge, set smaller again down to {@link #SMALLEST_OVERFLOW_SIZE} points so that they end
 * inside the image, and when even that is too long the last line that fits ends with an ellipsis: they never cover
 * the legend (a longer caveat once ran over its last entry) and never leave the image (one ran past its lower edge,
 * cut mid-sentence).
 */
public final class ChartNotes {

    /** Notes font: smaller than the legend, italic so they read as remarks, not data. */
    public static final Font NOTE_FONT = new Font(Font.SANS_SERIF, Font.ITALIC, 19);
    private static final int MARGIN = 14;
    /** The smallest size the notes are set in to fit under the legend and above the plot's lower edge, points. */
    static final int SMALLEST_NOTE_SIZE = 13;
    /** The smallest size the notes are set in to fit between the legend and the image's lower edge, points. */
    static final int SMALLEST_OVERFLOW_SIZE = 11;
    /** Ends the last line printed when the notes do not fit even at {@link #SMALLEST_OVERFLOW_SIZE}. */
    static final String CUT = " \u2026";

    private ChartNotes() {
    }

    /** Prints {@code notes} right of the plot, bottom-aligned with the plot's lower edge. */
    public static void addRightOfPlot(StyledChart chart, List<String> notes) {
        if (notes.isEmpty()) {
            return;
        }
        chart.addOverlay((g, c) -> paint(g, c, notes));
    }

    private static void paint(Graphics2D g, StyledChart chart, List<String> notes) {
        g.setColor(ChartStyle.TEXT);
        double xMax = chart.getStyler().getXAxisMax();
        int left = (int) chart.getScreenXFromChart(xMax) + 2 * MARGIN;
        int width = chart.getWidth() - left - MARGIN;
        double yMin = chart.getStyler().getYAxisMin();
        int bottom = (int) chart.getScreenYFromChart(yMin);
        double legendBottom = chart.rightLegendBottom();
        // the first line's top may sit no higher than a margin below the legend's lower edge
        int highestTop = Double.isNaN(legendBottom) ? 0 : (int) Math.ceil(legendBottom) + MARGIN;
        Layout layout = layout(g, notes, width, highestTop, bottom, chart.getHeight() - MARGIN / 2);
        g.setFont(layout.font());
        int y = layout.firstBaseline();
        for (String line : layout.lines()) {
            g.drawString(line, left, y);
            y += g.getFontMetrics().getHeight();
        }
    }

    /**
     * Where the notes go.
     *
     * @param font the size they are set in
     * @param lines the lines printed (the last cut with {@link #CUT} when the notes do not fit)
     * @param firstBaseline the first line's baseline, pixels from the image's top
     */
    record Layout(Font font, List<String> lines, int firstBaseline) {
    }

    /**
     * The notes wrapped to {@code width} pixels, their first line's top at {@code highestTop} or lower: bottom-aligned
     * with {@code plotBottom} when they fit above it at {@link #SMALLEST_NOTE_SIZE} or more, else from
     * {@code highestTop} down to at most {@code imageBottom} (the lowest a line's descent may reach).
     */
    static Layout layout(Graphics2D g, List<String> notes, int width, int highestTop, int plotBottom,
                         int imageBottom) {
        Font font = fittingFont(g, notes, width, plotBottom - highestTop);
        FontMetrics fm = g.getFontMetrics(font);
        List<String> lines = wrapAll(notes, fm, width);
        if (height(lines, fm) <= plotBottom - highestTop) {
            return new Layout(font, lines, plotBottom - (lines.size() - 1) * fm.getHeight());
        }
        int room = imageBottom - highestTop;
        while (font.getSize() > SMALLEST_OVERFLOW_SIZE && height(lines, fm) + fm.getDescent() > room) {
            font = font.deriveFont((float) (font.getSize() - 1));
            fm = g.getFontMetrics(font);
            lines = wrapAll(notes, fm, width);
        }
        // no line at all when not even one fits (a legend down to the image's lower edge): the notes are in the
        // tables too, and a line past the edge is cut mid-word
        int fitting = room < fm.getAscent() + fm.getDescent() ? 0
                : (room - fm.getAscent() - fm.getDescent()) / fm.getHeight() + 1;
        if (fitting == 0) {
            return new Layout(font, List.of(), highestTop + fm.getAscent());
        }
        if (lines.size() > fitting) {
            List<String> kept = new ArrayList<>(lines.subList(0, fitting));
            kept.set(fitting - 1, cut(kept.get(fitting - 1), fm, width));
            lines = kept;
        }
        return new Layout(font, List.copyOf(lines), highestTop + fm.getAscent());
    }

    /** From the first line's top to the last line's baseline, pixels. */
    private static int height(List<String> lines, FontMetrics fm) {
        return (lines.size() - 1) * fm.getHeight() + fm.getAscent();
    }

    /** {@code line} with {@link #CUT} at its end, words dropped from its end until it fits {@code width}. */
    private static String cut(String line, FontMetrics fm, int width) {
        String kept = line;
        while (fm.stringWidth(kept + CUT) > width && kept.contains(" ")) {
            kept = kept.substring(0, kept.lastIndexOf(' '));
        }
        return kept + CUT;
    }

    /**
     * The largest font from {@link #NOTE_FONT} down to {@link #SMALLEST_NOTE_SIZE} points in which the notes, wrapped
     * to {@code width} pixels, take at most {@code height} pixels from the first line's top to the last baseline
     * (the smallest when none does).
     */
    static Font fittingFont(Graphics2D g, List<String> notes, int width, int height) {
        Font font = NOTE_FONT;
        while (font.getSize() > SMALLEST_NOTE_SIZE) {
            FontMetrics fm = g.getFontMetrics(font);
            if (height(wrapAll(notes, fm, width), fm) <= height) {
                return font;
            }
            font = font.deriveFont((float) (font.getSize() - 1));
        }
        return font;
    }

    private static List<String> wrapAll(List<String> notes, FontMetrics fm, int width) {
        List<String> lines = new ArrayList<>();
        for (String note : notes) {
            lines.addAll(wrap(note, fm, width));
        }
        return lines;
    }

    /** Greedy word wrap to {@code width} pixels. */
    static List<String> wrap(String text, FontMetrics fm, int width) {
        List<String> lines = new ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String word : text.split(" ")) {
            String candidate = line.length() == 0 ? word : line + " " + word;
            if (fm.stringWidth(candidate) > width && line.length() > 0) {
                lines.add(line.toString());
                line = new StringBuilder(word);
            } else {
                line = new StringBuilder(candidate);
            }
        }
        if (line.length() > 0) {
            lines.add(line.toString());
        }
        return lines;
    }
}
