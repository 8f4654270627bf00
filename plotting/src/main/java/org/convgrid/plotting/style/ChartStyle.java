package org.convgrid.plotting.style;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import org.convgrid.engine.convection.StructureClass;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.XYStyler;
import org.knowm.xchart.style.markers.Marker;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * convgrid's one chart style: palette, fonts, marker shapes, line widths and the PNG size. Every chart goes
 * through {@link #newChart}, so all charts look alike and nothing else picks a colour or a font.
 *
 * <p>Colours are the eight-colour palette of Okabe &amp; Ito (2008), "Color Universal Design (CUD): how to make
 * figures and presentations that are friendly to colorblind people" (sRGB values as published there). Structure
 * classes get both a colour and a marker shape, so they stay apart in grey print too. Area fills are the same hues
 * lightened towards white, so lines and text drawn over them keep their contrast.
 *
 * <p>Font sizes are chosen for a 1200 x 800 PNG that is still readable when shrunk to one column of a two-column
 * paper (about 8.5 cm wide): tick labels then come out near 7 pt.
 */
public final class ChartStyle {

    /** PNG width, pixels. */
    public static final int WIDTH = 1200;
    /** PNG height, pixels. */
    public static final int HEIGHT = 800;

    // Okabe & Ito (2008) palette.
    public static final Color BLACK = new Color(0, 0, 0);
    public static final Color ORANGE = new Color(230, 159, 0);
    public static final Color SKY_BLUE = new Color(86, 180, 233);
    public static final Color BLUISH_GREEN = new Color(0, 158, 115);
    public static final Color YELLOW = new Color(240, 228, 66);
    public static final Color BLUE = new Color(0, 114, 178);
    public static final Color VERMILLION = new Color(213, 94, 0);
    public static final Color REDDISH_PURPLE = new Color(204, 121, 167);
    /** Neutral grey for "no result", not part of the hue palette on purpose. */
    public static final Color NO_RESULT_GREY = new Color(200, 200, 200);
    /**
     * Grey of legend keys that say what a line style or marker means whatever the colour, where colour stands for an
     * age or a metallicity.
     */
    public static final Color KEY_GREY = new Color(90, 90, 90);
    /** Darker neutral grey for masses past the main sequence at the asked age: known, so told apart from failures. */
    public static final Color PAST_MAIN_SEQUENCE_GREY = new Color(120, 120, 120);
    private static final Color GRID_GREY = new Color(225, 225, 225);
    static final Color TEXT = new Color(25, 25, 25);

    private static final String FAMILY = Font.SANS_SERIF;
    public static final Font TITLE_FONT = new Font(FAMILY, Font.BOLD, 25);
    public static final Font SUBTITLE_FONT = new Font(FAMILY, Font.PLAIN, 23);
    /** Invisible XChart title whose line height equals our two title lines. */
    private static final Font TITLE_RESERVE_FONT = new Font(FAMILY, Font.PLAIN, 46);
    private static final String TITLE_RESERVE_GLYPH = "\u2588";
    /** Gap under the title band; more than the reserve glyph's descent, so blanking it never touches the plot. */
    private static final int TITLE_PADDING = 16;
    public static final Font AXIS_TITLE_FONT = new Font(FAMILY, Font.PLAIN, 26);
    public static final Font TICK_FONT = new Font(FAMILY, Font.PLAIN, 23);
    public static final Font LEGEND_FONT = new Font(FAMILY, Font.PLAIN, 21);
    public static final Font ANNOTATION_FONT = new Font(FAMILY, Font.PLAIN, 21);

    /** Pixel spacing hint that gives 0.1 steps on a 0..1 axis of a standard chart. */
    private static final int UNIT_AXIS_TICK_SPACING = 60;

    /** Data lines. */
    public static final float LINE_WIDTH = 3.0f;
    /** Marker diameter, pixels. */
    public static final int MARKER_SIZE = 13;
    /** Reference lines (transition masses). */
    public static final BasicStroke REFERENCE_SOLID = new BasicStroke(3.0f);
    public static final BasicStroke REFERENCE_DASHED = new BasicStroke(3.0f, BasicStroke.CAP_BUTT,
            BasicStroke.JOIN_MITER, 10f, new float[] {14f, 8f}, 0f);
    /**
     * Dash patterns told apart without colour (zero-age lines of several metallicities, isochrones of several ages):
     * solid, dashed, dotted, dash-dot, long dash, dash-dot-dot, long-short, dot-triplets. Eight, because a young
     * cluster's grid has six ages or more (a 1-200 Myr grid had six, and with five patterns its 1 and 200 Myr
     * isochrones were both solid); each period is at most about a legend line long (36 px), so the legend shows it.
     */
    private static final float[][] DASHES = {null, {14f, 7f}, {4f, 6f}, {16f, 6f, 4f, 6f}, {24f, 8f},
        {14f, 5f, 3f, 5f, 3f, 5f}, {22f, 5f, 7f, 5f}, {2f, 4f, 2f, 4f, 2f, 12f}};
    /** How many distinct dash patterns {@link #dashed} has; index this many and it starts again at solid. */
    public static final int DASH_PATTERNS = DASHES.length;

    private ChartStyle() {
    }

    /**
     * A chart of the standard size with our style applied and a two-line title: {@code what} in bold (for example
     * the metallicity and age), {@code physics} below it in plain type. XChart titles are one line centred over the
     * plot and overflow the image when long, so XChart only reserves the room (a block glyph in a font as tall as
     * our two lines) and an overlay blanks that band and writes both lines centred on the whole image.
     */
    /**
     * {@code font}, made smaller when a line of {@code width} pixels in it would not fit in {@code room}: a
     * transitions chart of a uniform-ramped grid refined to 0.002 Msun had its physics line cut off at both ends.
     * Unchanged when it fits, so charts whose lines fit keep their bytes.
     */
    static java.awt.Font fitted(java.awt.Font font, int width, int room) {
        return width <= room ? font : font.deriveFont(font.getSize2D() * room / width);
    }

    public static StyledChart newChart(String what, String physics, String xTitle, String yTitle) {
        StyledChart chart = new StyledChart(WIDTH, HEIGHT);
        chart.setTitle(TITLE_RESERVE_GLYPH);
        chart.addOverlay((g, c) -> {
            int top = c.getStyler().getChartPadding();
            java.awt.font.TextLayout reserved = new java.awt.font.TextLayout(TITLE_RESERVE_GLYPH,
                    TITLE_RESERVE_FONT, g.getFontRenderContext());
            g.setColor(Color.WHITE);
            // XChart draws the glyph lower than its band (its descent hangs down to the plot): blank down to the
            // plot's top edge, which is where the y axis maximum sits (every chart of ours sets one).
            Double yMax = c.getStyler().getYAxisMax();
            int bandFoot = yMax != null ? (int) Math.floor(c.getScreenYFromChart(yMax)) - 1
                    : top + (int) Math.ceil(reserved.getBounds().getHeight() + reserved.getDescent());
            // only above the plot, where XChart centres the glyph: the y axis's tick labels beside it are left alone
            // (a tick just under the axis top has a label that reaches above the plot's edge, and blanking the whole
            // width cut its upper half off; an HR diagram's luminosity axis ends wherever its data end)
            java.awt.geom.Rectangle2D plot = c.plotBounds();
            g.fillRect((int) Math.floor(plot.getMinX()), 0, (int) Math.ceil(plot.getWidth()) + 1, bandFoot);
            g.setColor(TEXT);
            int room = c.getWidth() - 2 * top;
            g.setFont(TITLE_FONT);
            java.awt.FontMetrics bold = g.getFontMetrics();
            g.setFont(fitted(TITLE_FONT, bold.stringWidth(what), room));
            java.awt.FontMetrics boldFitted = g.getFontMetrics();
            g.drawString(what, (c.getWidth() - boldFitted.stringWidth(what)) / 2f, top + bold.getAscent());
            g.setFont(SUBTITLE_FONT);
            java.awt.FontMetrics plain = g.getFontMetrics();
            g.setFont(fitted(SUBTITLE_FONT, plain.stringWidth(physics), room));
            java.awt.FontMetrics plainFitted = g.getFontMetrics();
            g.drawString(physics, (c.getWidth() - plainFitted.stringWidth(physics)) / 2f,
                    top + bold.getHeight() + plain.getAscent());
        });
        chart.setXAxisTitle(xTitle);
        chart.setYAxisTitle(yTitle);
        XYStyler s = chart.getStyler();
        s.setChartBackgroundColor(Color.WHITE);
        s.setPlotBackgroundColor(Color.WHITE);
        s.setPlotBorderColor(TEXT);
        s.setPlotBorderVisible(true);
        s.setChartFontColor(TEXT);
        s.setChartTitleBoxVisible(false);
        s.setChartTitleFont(TITLE_RESERVE_FONT);
        s.setChartTitlePadding(TITLE_PADDING);
        s.setChartPadding(14);
        s.setAxisTitleFont(AXIS_TITLE_FONT);
        s.setAxisTickLabelsFont(TICK_FONT);
        s.setAxisTickLabelsColor(TEXT);
        s.setAxisTickMarksColor(TEXT);
        // the plot border is the axis line; XChart's own tick line sits a few pixels off it and doubles it
        s.setAxisTicksLineVisible(false);
        s.setAxisTickMarkLength(8);
        s.setAxisTickPadding(8);
        s.setAxisTitlePadding(10);
        s.setPlotGridLinesColor(GRID_GREY);
        s.setPlotGridLinesStroke(new BasicStroke(1.0f));
        s.setPlotMargin(0);
        s.setPlotContentSize(1.0);
        s.setLegendFont(LEGEND_FONT);
        s.setLegendBorderColor(new Color(160, 160, 160));
        s.setLegendBackgroundColor(new Color(255, 255, 255, 235));
        s.setLegendPadding(8);
        s.setLegendSeriesLineLength(36);
        s.setMarkerSize(MARKER_SIZE);
        s.setAnnotationTextFont(ANNOTATION_FONT);
        s.setAnnotationTextFontColor(TEXT);
        s.setErrorBarsColorSeriesColor(true);
        s.setAntiAlias(true);
        s.setToolTipsEnabled(false);
        s.setLocale(java.util.Locale.ROOT);
        return chart;
    }

    /** Puts the legend below the plot, in rows, so it never covers data. */
    public static void legendBelow(XYChart chart) {
        chart.getStyler().setLegendPosition(Styler.LegendPosition.OutsideS);
        chart.getStyler().setLegendLayout(Styler.LegendLayout.Horizontal);
    }

    /** Puts the legend right of the plot, one entry per line, so it never covers data. */
    public static void legendRight(XYChart chart) {
        chart.getStyler().setLegendPosition(Styler.LegendPosition.OutsideE);
        chart.getStyler().setLegendLayout(Styler.LegendLayout.Vertical);
    }

    /**
     * A y axis over [0, 1] with ticks every 0.1 (fractional coordinates m/M, r/R). XChart leaves the ticks at the
     * very ends unlabelled, so its labels are made transparent (they keep their space) and an overlay labels
     * 0.0 to 1.0.
     */
    public static void unitYAxis(StyledChart chart) {
        chart.getStyler().setYAxisMin(0.0).setYAxisMax(1.0);
        chart.getStyler().setYAxisDecimalPattern("0.0");
        chart.getStyler().setYAxisTickMarkSpacingHint(UNIT_AXIS_TICK_SPACING);
        chart.getStyler().setYAxisTickLabelsColor(new Color(0, 0, 0, 0));
        chart.addOverlay((g, c) -> {
            g.setFont(TICK_FONT);
            g.setColor(TEXT);
            java.awt.FontMetrics fm = g.getFontMetrics();
            double right = c.getScreenXFromChart(c.getStyler().getXAxisMin()) - c.getStyler().getAxisTickMarkLength()
                    - c.getStyler().getAxisTickPadding();
            for (int tenth = 0; tenth <= 10; tenth++) {
                String text = String.format(java.util.Locale.ROOT, "%.1f", tenth / 10.0);
                double y = c.getScreenYFromChart(tenth / 10.0);
                g.drawString(text, (float) (right - fm.stringWidth(text)), (float) (y + fm.getAscent() / 2.0 - 2));
            }
        });
    }

    /** The colour of a structure class (markers, legend). */
    public static Color classColor(StructureClass c) {
        return switch (c) {
            case FULLY_CONVECTIVE -> VERMILLION;
            case CONV_ENVELOPE -> BLUE;
            case CONV_CORE -> BLUISH_GREEN;
            case CONV_CORE_AND_ENVELOPE -> REDDISH_PURPLE;
            case RADIATIVE -> ORANGE;
        };
    }

    /** The marker shape of a structure class, distinct for every class. */
    public static Marker classMarker(StructureClass c) {
        return switch (c) {
            case FULLY_CONVECTIVE -> SeriesMarkers.CIRCLE;
            case CONV_ENVELOPE -> SeriesMarkers.SQUARE;
            case CONV_CORE -> SeriesMarkers.DIAMOND;
            case CONV_CORE_AND_ENVELOPE -> SeriesMarkers.TRIANGLE_UP;
            case RADIATIVE -> SeriesMarkers.TRIANGLE_DOWN;
        };
    }

    /** A structure class in words, for legends and tables. */
    public static String classLabel(StructureClass c) {
        return switch (c) {
            case FULLY_CONVECTIVE -> "fully convective";
            case CONV_ENVELOPE -> "convective envelope";
            case CONV_CORE -> "convective core";
            case CONV_CORE_AND_ENVELOPE -> "core + envelope";
            case RADIATIVE -> "radiative";
        };
    }

    /** An area fill: {@code c} lightened towards white by {@code share} (0 = unchanged, 1 = white). */
    public static Color tint(Color c, double share) {
        return new Color(mix(c.getRed(), share), mix(c.getGreen(), share), mix(c.getBlue(), share));
    }

    private static int mix(int channel, double share) {
        return (int) Math.round(channel + (255 - channel) * share);
    }

    /** Colours for an ordered family of series (ages, metallicities): palette order, skipping the pale yellow. */
    public static Color seriesColor(int index) {
        Color[] order = {BLUE, VERMILLION, BLUISH_GREEN, REDDISH_PURPLE, ORANGE, SKY_BLUE, BLACK};
        return order[Math.floorMod(index, order.length)];
    }

    /** Markers for an ordered family of series. */
    public static Marker seriesMarker(int index) {
        Marker[] order = {SeriesMarkers.CIRCLE, SeriesMarkers.SQUARE, SeriesMarkers.DIAMOND,
            SeriesMarkers.TRIANGLE_UP, SeriesMarkers.TRIANGLE_DOWN, SeriesMarkers.CROSS, SeriesMarkers.PLUS};
        return order[Math.floorMod(index, order.length)];
    }

    /** A line stroke with the index-th dash pattern (solid first), repeating after {@link #DASH_PATTERNS}. */
    public static BasicStroke dashed(int index, float width) {
        float[] dash = DASHES[Math.floorMod(index, DASHES.length)];
        return dash == null ? new BasicStroke(width)
                : new BasicStroke(width, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, dash, 0f);
    }
}
