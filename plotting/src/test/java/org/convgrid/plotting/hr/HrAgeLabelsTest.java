package org.convgrid.plotting.hr;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.plotting.label.PhysicsKey;
import org.convgrid.plotting.style.StyledChart;
import org.junit.jupiter.api.Test;

/**
 * The isochrones' age labels of an HR diagram with several close ages (five, 0.9-1.1 Gyr: the labels
 * and their leaders piled up at the bright end). Made-up points on a straight main sequence (shapes only, nothing
 * under test): each older isochrone a hair brighter.
 */
class HrAgeLabelsTest {

    private static final PhysicsKey PHYSICS = new PhysicsKey(1.8, 0.0, OvershootScheme.STEP,
            StabilityCriterion.SCHWARZSCHILD, 1.0);

    private static HrDiagramData diagram(List<Double> ages, double brighterPerAgeDex) {
        List<HrPoint> points = new ArrayList<>();
        List<HrDiagramData.ZeroAgeLine> isochrones = new ArrayList<>();
        List<HrDiagramData.TrackLine> tracks = new ArrayList<>();
        for (int a = 0; a < ages.size(); a++) {
            List<HrPoint> line = new ArrayList<>();
            for (int m = 0; m < 12; m++) {
                double mass = 0.4 + 0.1 * m;
                line.add(new HrPoint("m" + m + "a" + a, mass, 0.014, ages.get(a), 3.55 + 0.3 * (mass - 0.4),
                        -1.5 + 2.5 * (mass - 0.4) + brighterPerAgeDex * a, StructureClass.CONV_ENVELOPE));
            }
            points.addAll(line);
            isochrones.add(new HrDiagramData.ZeroAgeLine(0.014, ages.get(a), line));
        }
        for (int m = 0; m < 12; m++) {
            int mass = m;
            List<HrPoint> along = points.stream().filter(p -> p.modelId().startsWith("m" + mass + "a")).toList();
            tracks.add(new HrDiagramData.TrackLine(along.get(0).massMsun(), 0.014,
                    along.stream().map(HrPoint::logTeff).toList(), along.stream().map(HrPoint::logL).toList()));
        }
        return new HrDiagramData(PHYSICS, List.of(0.014), ages, points, List.of(isochrones.get(0)), List.of(),
                tracks, isochrones, List.of());
    }

    private static List<String> ageLabels(HrDiagramData data) {
        StyledChart chart = HrDiagramRenderer.render(data);
        return HrDiagramRenderer.labels(data, chart).stream().filter(l -> !l.massLabel())
                .map(HrDiagramRenderer.Label::text).toList();
    }

    @Test
    void closeIsochronesKeepTheYoungestAndOldestLabelsOnly() {
        List<String> shown = ageLabels(diagram(List.of(0.9, 0.95, 1.0, 1.05, 1.1), 0.005));
        assertThat(shown).containsExactlyInAnyOrder("900 Myr", "1.1 Gyr");
    }

    @Test
    void isochronesFarApartAreEachLabelled() {
        assertThat(ageLabels(diagram(List.of(0.9, 0.95, 1.0, 1.05, 1.1), 0.4)))
                .containsExactlyInAnyOrder("900 Myr", "950 Myr", "1 Gyr", "1.05 Gyr", "1.1 Gyr");
    }
}
