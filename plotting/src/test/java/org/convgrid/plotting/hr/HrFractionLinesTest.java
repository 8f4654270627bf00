package org.convgrid.plotting.hr;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.track.TrackTimeline;
import org.convgrid.plotting.TestRuns;
import org.convgrid.plotting.label.AgeGroups;
import org.convgrid.plotting.label.MetallicityNames;
import org.convgrid.plotting.label.PhysicsKey;
import org.convgrid.plotting.style.StyledChart;
import org.junit.jupiter.api.Test;

/** The HR diagram of an ms_fraction grid names its lines by fraction, in the title, the legend and the labels. */
class HrFractionLinesTest {

    private static HrDiagramData diagram() {
        List<CatalogueRow> rows = new ArrayList<>();
        double[] masses = {1.1, 1.5, 2.0, 3.0};
        double[] fractions = {0, 0.5, 0.95};
        for (int im = 0; im < masses.length; im++) {
            for (int ia = 0; ia < fractions.length; ia++) {
                rows.add(TestRuns.row(String.format("p0-z00-m%03d-a%02d", im, ia), masses[im], 0.02,
                        fractions[ia] * 10.0 * Math.pow(masses[im], -2.5), false));
            }
        }
        return HrDiagram.build(PhysicsKey.of(rows.get(0)), rows, List.of(), id -> TrackTimeline.UNKNOWN,
                new AgeGroups(List.of(0.0, 0.5, 0.95)));
    }

    @Test
    void titleLegendAndLabelsNameTheFractions() {
        HrDiagramData data = diagram();
        assertThat(HrDiagramRenderer.title(data, MetallicityNames.Z_ONLY))
                .isEqualTo("HR diagram, Z = 0.02, MS fractions 0, 0.5, 0.95");
        StyledChart chart = HrDiagramRenderer.render(data);
        assertThat(chart.getSeriesMap().keySet()).contains("MS fraction 0", "MS fraction 0.5", "MS fraction 0.95")
                .noneMatch(name -> name.contains("isochrone,") || name.contains("Myr"));
        assertThat(HrDiagramRenderer.labels(data, chart)).filteredOn(l -> !l.massLabel())
                .allSatisfy(l -> assertThat(l.text()).startsWith("MS fraction "));
        // the per-age dash patterns, one per fraction
        assertThat(data.ages()).map(f -> java.util.Arrays.toString(IsochroneDashes.stroke(data, f).getDashArray()))
                .doesNotHaveDuplicates();
    }
}
