package org.convgrid.plotting.hr;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.BasicStroke;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.plotting.label.PhysicsKey;
import org.convgrid.plotting.style.ChartStyle;
import org.junit.jupiter.api.Test;

/**
 * Each isochrone age of an HR diagram gets a dash pattern of its own, the legend's only key to the ages (a grid's
 * six ages, 1-200 Myr, had 1 and 200 Myr both solid), and past the patterns there are the chart says which ages
 * share one. Made-up straight lines: shapes only, no physics under test.
 */
class IsochroneDashesTest {

    private static final PhysicsKey PHYSICS = new PhysicsKey(1.8, 0.0, OvershootScheme.STEP,
            StabilityCriterion.SCHWARZSCHILD, 1.0);

    private static HrDiagramData diagram(List<Double> agesGyr) {
        List<HrPoint> points = new ArrayList<>();
        List<HrDiagramData.ZeroAgeLine> isochrones = new ArrayList<>();
        for (int a = 0; a < agesGyr.size(); a++) {
            List<HrPoint> line = List.of(
                    new HrPoint("lo" + a, 0.5, 0.02, agesGyr.get(a), 3.6, -1.0 - 0.1 * a, StructureClass.CONV_ENVELOPE),
                    new HrPoint("hi" + a, 1.0, 0.02, agesGyr.get(a), 3.76, 0.0, StructureClass.CONV_ENVELOPE));
            points.addAll(line);
            isochrones.add(new HrDiagramData.ZeroAgeLine(0.02, agesGyr.get(a), line));
        }
        return new HrDiagramData(PHYSICS, List.of(0.02), agesGyr, points, List.of(isochrones.get(0)), List.of(),
                List.of(), isochrones, List.of());
    }

    private static String pattern(BasicStroke stroke) {
        return Arrays.toString(stroke.getDashArray());
    }

    @Test
    void sixAgesGetSixPatterns() {
        HrDiagramData data = diagram(List.of(0.001, 0.005, 0.01, 0.03, 0.1, 0.2));
        assertThat(data.ages()).map(age -> pattern(IsochroneDashes.stroke(data, age))).doesNotHaveDuplicates();
        assertThat(IsochroneDashes.sharing(data)).isEmpty();
        assertThat(IsochroneDashes.sharingNote(data)).isEmpty();
    }

    @Test
    void theRenderedLegendShowsSixAgesWithSixPatterns() {
        HrDiagramData data = diagram(List.of(0.001, 0.005, 0.01, 0.03, 0.1, 0.2));
        List<String> keys = HrDiagramRenderer.render(data).getSeriesMap().values().stream()
                .filter(s -> s.getName().startsWith("isochrone, ")).map(s -> pattern(s.getLineStyle())).toList();
        assertThat(keys).hasSize(6).doesNotHaveDuplicates();
        assertThat(HrDiagramRenderer.notes(data, HrDiagramRenderer.render(data))).isEmpty();
    }

    @Test
    void asManyAgesAsPatternsStillShareNone() {
        List<Double> ages = new ArrayList<>();
        for (int i = 1; i <= ChartStyle.DASH_PATTERNS; i++) {
            ages.add(0.01 * i);
        }
        HrDiagramData data = diagram(ages);
        assertThat(ages).map(age -> pattern(IsochroneDashes.stroke(data, age))).doesNotHaveDuplicates();
        assertThat(IsochroneDashes.sharingNote(data)).isEmpty();
    }

    @Test
    void agesPastThePatternsAreNamedAsSharing() {
        // ten ages, eight patterns: the ninth and tenth repeat the first and second
        List<Double> ages = List.of(0.001, 0.002, 0.005, 0.01, 0.02, 0.05, 0.1, 0.2, 0.5, 1.0);
        HrDiagramData data = diagram(ages);
        assertThat(IsochroneDashes.sharing(data)).containsExactly(List.of(0.001, 0.5), List.of(0.002, 1.0));
        assertThat(pattern(IsochroneDashes.stroke(data, 0.5))).isEqualTo(pattern(IsochroneDashes.stroke(data, 0.001)));
        assertThat(IsochroneDashes.sharingNote(data)).contains("More ages than dash patterns (8), so the isochrones' "
                + "patterns repeat: 1 Myr and 500 Myr share one; 2 Myr and 1 Gyr share another.");
    }

    @Test
    void theChartPrintsTheSharingNote() {
        HrDiagramData data = diagram(List.of(0.001, 0.002, 0.005, 0.01, 0.02, 0.05, 0.1, 0.2, 0.5));
        assertThat(HrDiagramRenderer.notes(data, HrDiagramRenderer.render(data)))
                .anyMatch(n -> n.contains("1 Myr and 500 Myr share one"));
    }
}
