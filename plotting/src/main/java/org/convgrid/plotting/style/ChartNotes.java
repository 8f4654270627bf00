package org.convgrid.plotting.style;

import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.util.ArrayList;
import java.util.List;

/**
 * Caveats printed on a chart, in the margin right of the plot under the legend (where charts with a right-hand
 * legend have room), word-wrapped to that margin, bottom-aligned with the plot. Notes too long for the room under
 * the legend are set smaller, down to {@link #SMALLEST_NOTE_SIZE} points, and past that start under the legend and
 * run below the plot's lower edge: they never cover the legend (a longer caveat once ran over its last entry).
 */
public final class ChartNotes {

    /** Notes font: smaller than the legend, italic so they read as remarks, not data. */
    public static final Font NOTE_FONT = new Font(Font.SANS_SERIF, Font.ITALIC, 19);
    private static final int MARGIN = 14;
    /** The smallest size the notes are set in to fit under the legend, points. */
    static final int SMALLEST_NOTE_SIZE = 13;

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
        g.setFont(fittingFont(g, notes, width, bottom - highestTop));
        FontMetrics fm = g.getFontMetrics();
        List<String> lines = wrapAll(notes, fm, width);
        int y = Math.max(bottom - (lines.size() - 1) * fm.getHeight(), highestTop + fm.getAscent());
        for (String line : lines) {
            g.drawString(line, left, y);
            y += fm.getHeight();
        }
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
            if ((wrapAll(notes, fm, width).size() - 1) * fm.getHeight() + fm.getAscent() <= height) {
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
