package org.convgrid.plotting.layout;

import java.awt.geom.Line2D;
import org.convgrid.plotting.style.StyledChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.None;

/**
 * The obstacles a chart's own series draw, read off the series themselves so no marker or line is forgotten: a box
 * per marker (at the chart's marker size) and a segment per stretch of line between two data points, in screen
 * pixels. Valid only while the chart paints (XChart knows where its axes are only then).
 */
public final class SeriesObstacles {

    private SeriesObstacles() {
    }

    /** Adds every marker and line segment of {@code chart}'s enabled series to {@code obstacles}. */
    public static Obstacles addTo(Obstacles obstacles, StyledChart chart) {
        double size = chart.getStyler().getMarkerSize();
        for (XYSeries s : chart.getSeriesMap().values()) {
            if (!s.isEnabled()) {
                continue;
            }
            double[] x = s.getXData();
            double[] y = s.getYData();
            boolean markers = !(s.getMarker() instanceof None);
            boolean line = s.getXYSeriesRenderStyle() == XYSeries.XYSeriesRenderStyle.Line
                    || s.getXYSeriesRenderStyle() == XYSeries.XYSeriesRenderStyle.Step;
            double lastX = Double.NaN;
            double lastY = Double.NaN;
            for (int i = 0; i < x.length; i++) {
                if (!Double.isFinite(x[i]) || !Double.isFinite(y[i])) {
                    // XChart breaks a line at a missing value
                    lastX = Double.NaN;
                    continue;
                }
                double sx = chart.getScreenXFromChart(x[i]);
                double sy = chart.getScreenYFromChart(y[i]);
                if (markers) {
                    obstacles.addMarker(sx, sy, size);
                }
                if (line && Double.isFinite(lastX)) {
                    obstacles.addSegment(new Line2D.Double(lastX, lastY, sx, sy));
                }
                lastX = sx;
                lastY = sy;
            }
        }
        return obstacles;
    }
}
