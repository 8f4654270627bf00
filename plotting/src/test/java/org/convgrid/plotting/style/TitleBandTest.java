package org.convgrid.plotting.style;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import org.junit.jupiter.api.Test;

/** The band our two title lines are written in, above the plot (drawing only, no physics). */
class TitleBandTest {

    @Test
    void aTickLabelJustUnderTheAxisTopKeepsItsUpperHalf() {
        // 0.2 steps up to 1.405: the 1.4 tick sits 2 px under the plot's top edge, its label reaches ~10 px above it
        StyledChart chart = ChartStyle.newChart("what", "physics", "x", "y");
        chart.addSeries("s", new double[] {0, 1}, new double[] {0.2, 0.8});
        chart.getStyler().setYAxisMin(0.0).setYAxisMax(1.405).setYAxisTickMarkSpacingHint(90);
        BufferedImage image = paint(chart);
        Rectangle2D plot = chart.plotBounds();
        int top = (int) Math.floor(plot.getMinY());
        // dark pixels of the label's upper half, left of the plot and above its top edge
        assertThat(dark(image, 0, (int) plot.getMinX() - 12, top - 6, top - 1)).isPositive();
        // the glyph XChart was given to reserve the band is gone from above the plot
        assertThat(dark(image, (int) plot.getMinX() + 2, (int) plot.getMaxX() - 2, top - 12, top - 2)).isZero();
    }

    private static BufferedImage paint(StyledChart chart) {
        BufferedImage image = new BufferedImage(ChartStyle.WIDTH, ChartStyle.HEIGHT, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        chart.paint(g, ChartStyle.WIDTH, ChartStyle.HEIGHT);
        g.dispose();
        return image;
    }

    /** How many pixels of [x0, x1) x [y0, y1) are dark (text, lines). */
    private static int dark(BufferedImage image, int x0, int x1, int y0, int y1) {
        int n = 0;
        for (int x = x0; x < x1; x++) {
            for (int y = y0; y < y1; y++) {
                int rgb = image.getRGB(x, y);
                int sum = ((rgb >> 16) & 0xff) + ((rgb >> 8) & 0xff) + (rgb & 0xff);
                if (sum < 3 * 128) {
                    n++;
                }
            }
        }
        return n;
    }
}
