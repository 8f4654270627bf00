package org.convgrid.plotting.hr;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.plotting.TestRuns;
import org.convgrid.plotting.label.PhysicsKey;
import org.convgrid.plotting.layout.LabelPlacement;
import org.convgrid.plotting.style.ChartStyle;
import org.convgrid.plotting.style.StyledChart;
import org.junit.jupiter.api.Test;

/**
 * The mass labels of the HR diagram of the test demo grid (three metallicities whose models crowd each other): each
 * inside the plot, clear of every model marker, every zero-age line and every other label. The geometry is worked
 * out here from the data, not taken from the layout.
 */
class HrLabelsTest {

    @Test
    void massLabelsCoverNoMarkerNoLineAndNoOtherLabel() {
        List<CatalogueRow> rows = TestRuns.demoRows();
        HrDiagramData data = HrDiagram.build(PhysicsKey.of(rows.get(0)), rows);
        StyledChart c = HrDiagramRenderer.render(data);
        BufferedImage image = new BufferedImage(ChartStyle.WIDTH, ChartStyle.HEIGHT, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        c.paint(g, ChartStyle.WIDTH, ChartStyle.HEIGHT);
        g.setFont(ChartStyle.ANNOTATION_FONT);
        FontMetrics fm = g.getFontMetrics();
        List<HrDiagramRenderer.Label> labels = HrDiagramRenderer.labels(data, c);
        List<LabelPlacement.Placed> placed = HrDiagramRenderer.layout(c, fm, labels);
        assertThat(labels).extracting(HrDiagramRenderer.Label::text).contains("1 M\u2609", "0.2 M\u2609");

        double half = ChartStyle.MARKER_SIZE / 2.0;
        List<Rectangle2D> markers = data.points().stream().map(p -> (Rectangle2D) new Rectangle2D.Double(
                c.getScreenXFromChart(-p.logTeff()) - half, c.getScreenYFromChart(p.logL()) - half, 2 * half,
                2 * half)).toList();
        List<Line2D> lines = new ArrayList<>();
        for (HrDiagramData.ZeroAgeLine line : data.zeroAgeLines()) {
            for (int i = 1; i < line.points().size(); i++) {
                HrPoint a = line.points().get(i - 1);
                HrPoint b = line.points().get(i);
                lines.add(new Line2D.Double(c.getScreenXFromChart(-a.logTeff()), c.getScreenYFromChart(a.logL()),
                        c.getScreenXFromChart(-b.logTeff()), c.getScreenYFromChart(b.logL())));
            }
        }
        Rectangle2D plot = HrDiagramRenderer.plotArea(c);
        for (int i = 0; i < placed.size(); i++) {
            Rectangle2D box = placed.get(i).box();
            String what = labels.get(i).text();
            assertThat(placed.get(i).free()).as(what).isTrue();
            if (labels.get(i).massLabel()) {
                // a model of every other Z lies near the one a mass label names: the leader says which
                assertThat(placed.get(i).leader()).as(what + " leader").isNotNull();
            }
            assertThat(plot.contains(box)).as(what + " inside the plot").isTrue();
            assertThat(markers).as(what + " on a marker").noneMatch(box::intersects);
            assertThat(lines).as(what + " on a line").noneMatch(box::intersectsLine);
            for (int j = 0; j < i; j++) {
                assertThat(box.intersects(placed.get(j).box())).as(what + " on " + labels.get(j).text()).isFalse();
            }
        }
    }
}
