package org.convgrid.plotting.trend;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.util.List;
import org.convgrid.output.Span;
import org.convgrid.plotting.style.ChartStyle;
import org.convgrid.plotting.style.StyledChart;
import org.junit.jupiter.api.Test;

/** How a window of small transient cores is drawn on the trend charts (drawing only, no physics). */
class TrendWindowsTest {

    @Test
    void aWindowOfOneMassGetsNoBoxThatWouldReadAsARange() {
        // the demo's Z = 0.008, 150 Myr slice: one refinement model, 0.2875 Msun, is both ends of its window
        int[] bare = pixels(List.of());
        assertThat(pixels(List.of(new TrendDrawing.Window(0.008, new Span(0.2875, 0.2875))))).isEqualTo(bare);
        assertThat(pixels(List.of(new TrendDrawing.Window(0.008, new Span(0.3156, 0.7359))))).isNotEqualTo(bare);
    }

    private static int[] pixels(List<TrendDrawing.Window> windows) {
        StyledChart chart = ChartStyle.newChart("windows", "physics", "Z", "M");
        chart.getStyler().setXAxisMin(0.004).setXAxisMax(0.02).setYAxisMin(0.0).setYAxisMax(1.0);
        chart.addSeries("axis", new double[] {0.004, 0.02}, new double[] {0.0, 1.0});
        TrendDrawing.windows(chart, windows, ChartStyle.BLUE);
        BufferedImage image = new BufferedImage(ChartStyle.WIDTH, ChartStyle.HEIGHT, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        chart.paint(g, ChartStyle.WIDTH, ChartStyle.HEIGHT);
        g.dispose();
        return image.getRGB(0, 0, ChartStyle.WIDTH, ChartStyle.HEIGHT, null, 0, ChartStyle.WIDTH);
    }
}
