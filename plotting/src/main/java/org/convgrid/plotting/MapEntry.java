package org.convgrid.plotting;

import java.util.function.Supplier;
import org.convgrid.plotting.style.StyledChart;

/**
 * One chart of a run: its file name under maps/, where it belongs in the report, a caption, and how to draw it.
 *
 * @param fileName PNG file name (ASCII, no directory)
 * @param section report section: {@link #ZONES_MASS}, {@link #ZONES_RADIUS}, {@link #HR}, {@link #TRENDS},
 *     {@link #TRENDS_AGE}, {@link #TURNOVER}, {@link #ENVELOPE_MASS}, {@link #ZONES_AGE} or {@link #PERIOD_SPACING}
 * @param group where it sits within its section, so a reader finds one metallicity or one mass quickly (e.g.
 *     {@code Z = 0.014}); empty when the section has no groups
 * @param caption one sentence for people
 * @param chart draws the chart (called once per file written)
 */
public record MapEntry(String fileName, String section, String group, String caption, Supplier<StyledChart> chart) {

    /** An entry without a group. */
    public MapEntry(String fileName, String section, String caption, Supplier<StyledChart> chart) {
        this(fileName, section, "", caption, chart);
    }

    public static final String ZONES_MASS = "Convective zones in mass";
    public static final String ZONES_RADIUS = "Convective zones in radius";
    public static final String HR = "HR diagrams";
    public static final String TRENDS = "Transition masses against metallicity";
    public static final String TRENDS_AGE = "Transition masses against age";
    public static final String TURNOVER = "Convective turnover time against mass";
    public static final String ENVELOPE_MASS = "Convective envelope mass against effective temperature";
    public static final String ZONES_AGE = "Convective zones against age";
    public static final String PERIOD_SPACING = "Dipole g-mode period spacing against age";

    /** The file name without {@code .png}. */
    public String stem() {
        return fileName.substring(0, fileName.length() - ".png".length());
    }
}
