package org.convgrid.plotting.trend;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.InputStreamReader;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import org.convgrid.engine.request.AgeOrigin;
import org.convgrid.output.transitions.TransitionReader;
import org.convgrid.output.transitions.TransitionRow;
import org.convgrid.plotting.label.PhysicsKey;
import org.convgrid.plotting.layout.LabelPlacement;
import org.convgrid.plotting.style.ChartStyle;
import org.convgrid.plotting.style.StyledChart;
import org.junit.jupiter.api.Test;

/**
 * The value labels of both transition charts for the demo grid's transitions.csv (grids/demo-cluster.yaml, refined,
 * copied into the test resources): every label inside the plot, clear of every marker, line, bracket box, window box
 * and other label. The geometry the labels must avoid is worked out here from the data, not taken from the layout.
 */
class TrendLabelsTest {

    private static List<TransitionRow> demo() throws Exception {
        try (Reader in = new InputStreamReader(TrendLabelsTest.class.getResourceAsStream(
                "/demo-cluster/transitions.csv"), StandardCharsets.UTF_8)) {
            return TransitionReader.read(in);
        }
    }

    @Test
    void labelsAgainstAgeCoverNothing() throws Exception {
        List<TransitionRow> rows = demo();
        TransitionAgeTrendData data = TransitionAgeTrend.build(PhysicsKey.of(rows.get(0).slice()), rows);
        StyledChart chart = TransitionAgeTrendRenderer.render(data, AgeOrigin.BIRTH);
        FontMetrics fm = paint(chart);
        TransitionAgeTrendRenderer.Placement at = TransitionAgeTrendRenderer.placement(data);
        List<TrendDrawing.Label> labels = TransitionAgeTrendRenderer.valueLabels(data, at);
        List<TrendDrawing.Window> windows = TransitionAgeTrendRenderer.windows(data, at);
        List<List<double[]>> lines = data.series().stream().map(s -> s.points().stream().map(p -> new double[] {
            at.x(p.ageGyr(), data.metallicities().indexOf(s.zInit())), p.massMsun()}).toList()).toList();
        assertThat(labels).hasSize(18);
        assertClear(chart, TrendDrawing.layout(chart, fm, labels, windows), labels, windows, lines);
    }

    @Test
    void labelsAgainstMetallicityCoverNothing() throws Exception {
        List<TransitionRow> rows = demo();
        TransitionTrendData data = TransitionTrend.build(PhysicsKey.of(rows.get(0).slice()), rows);
        StyledChart chart = TransitionTrendRenderer.render(data);
        FontMetrics fm = paint(chart);
        TransitionTrendRenderer.Placement at = TransitionTrendRenderer.placement(data);
        List<TrendDrawing.Label> labels = TransitionTrendRenderer.valueLabels(data, at);
        List<TrendDrawing.Window> windows = TransitionTrendRenderer.windows(data, at);
        List<List<double[]>> lines = data.series().stream().map(s -> s.points().stream().map(p -> new double[] {
            at.x(p.zInit(), at.ages().indexOf(s.ageGyr())), p.massMsun()}).toList()).toList();
        assertThat(labels).hasSize(18);
        assertClear(chart, TrendDrawing.layout(chart, fm, labels, windows), labels, windows, lines);
    }

    /** Paints the chart (so it knows where its axes are) and gives the metrics of the label font. */
    static FontMetrics paint(StyledChart chart) {
        BufferedImage image = new BufferedImage(ChartStyle.WIDTH, ChartStyle.HEIGHT, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        chart.paint(g, ChartStyle.WIDTH, ChartStyle.HEIGHT);
        g.setFont(ChartStyle.ANNOTATION_FONT);
        return g.getFontMetrics();
    }

    private static void assertClear(StyledChart c, List<LabelPlacement.Placed> placed, List<TrendDrawing.Label> labels,
                                    List<TrendDrawing.Window> windows, List<List<double[]>> lines) {
        double half = ChartStyle.MARKER_SIZE / 2.0;
        List<Rectangle2D> boxes = new ArrayList<>();
        labels.forEach(l -> boxes.add(new Rectangle2D.Double(c.getScreenXFromChart(l.x()) - half,
                c.getScreenYFromChart(l.mass()) - half, 2 * half, 2 * half)));
        windows.forEach(w -> {
            boxes.add(TrendDrawing.windowBox(c, w));
            double middle = c.getScreenYFromChart(0.5 * (w.masses().lo() + w.masses().hi()));
            boxes.add(new Rectangle2D.Double(c.getScreenXFromChart(w.x()) - half, middle - half, 2 * half, 2 * half));
        });
        labels.stream().filter(l -> l.bracket() != null).forEach(l -> boxes.add(BracketBands.box(c, l.x(),
                l.bracket())));
        List<Line2D> segments = new ArrayList<>();
        for (List<double[]> line : lines) {
            for (int i = 1; i < line.size(); i++) {
                segments.add(new Line2D.Double(c.getScreenXFromChart(line.get(i - 1)[0]),
                        c.getScreenYFromChart(line.get(i - 1)[1]), c.getScreenXFromChart(line.get(i)[0]),
                        c.getScreenYFromChart(line.get(i)[1])));
            }
        }
        Rectangle2D plot = TrendDrawing.plotArea(c);
        for (int i = 0; i < placed.size(); i++) {
            Rectangle2D box = placed.get(i).box();
            String what = "label " + labels.get(i).text();
            assertThat(placed.get(i).free()).as(what).isTrue();
            assertThat(plot.contains(box)).as(what + " inside the plot").isTrue();
            assertThat(boxes).as(what + " on a marker or box").noneMatch(box::intersects);
            assertThat(segments).as(what + " on a line").noneMatch(box::intersectsLine);
            for (int j = 0; j < i; j++) {
                assertThat(box.intersects(placed.get(j).box())).as(what + " on " + labels.get(j).text()).isFalse();
            }
        }
    }
}
