package org.convgrid.plotting.style;

import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.util.ArrayList;
import java.util.List;

/**
 * Caveats printed on a chart, in the margin right of the plot under the legend (where charts with a right-hand
 * legend have room), word-wrapped to that margin, bottom-aligned with the plot.
 */
public final class ChartNotes {

    /** Notes font: smaller than the legend, italic so they read as remarks, not data. */
    public static final Font NOTE_FONT = new Font(Font.SANS_SERIF, Font.ITALIC, 19);
    private static final int MARGIN = 14;

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
        g.setFont(NOTE_FONT);
        g.setColor(ChartStyle.TEXT);
        FontMetrics fm = g.getFontMetrics();
        double xMax = chart.getStyler().getXAxisMax();
        int left = (int) chart.getScreenXFromChart(xMax) + 2 * MARGIN;
        int width = chart.getWidth() - left - MARGIN;
        List<String> lines = new ArrayList<>();
        for (String note : notes) {
            lines.addAll(wrap(note, fm, width));
        }
        double yMin = chart.getStyler().getYAxisMin();
        int bottom = (int) chart.getScreenYFromChart(yMin);
        int y = bottom - (lines.size() - 1) * fm.getHeight();
        for (String line : lines) {
            g.drawString(line, left, y);
            y += fm.getHeight();
        }
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
