package org.convgrid.plotting.hr;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.plotting.TestRuns;
import org.convgrid.plotting.label.PhysicsKey;
import org.convgrid.plotting.style.StyledChart;
import org.junit.jupiter.api.Test;

/** Models without a result are not drawn, and the HR diagram says which masses they are. */
class HrWithoutResultTest {

    @Test
    void theMassesOfFailedModelsAreNamedInANote() {
        // 0.2-2 Msun at one Z and age; the 0.8 Msun model did not converge (a decaying-overshoot run had all its
        // 1.3 Msun models fail, and the diagram showed the gap without a word)
        List<CatalogueRow> rows = new ArrayList<>(TestRuns.rows(TestRuns.masses(0.2, 2.0, 10), new double[] {0.014},
                new double[] {0}));
        rows.set(3, TestRuns.row(rows.get(3).modelId(), 0.8, 0.014, 0, true));
        HrDiagramData data = HrDiagram.build(PhysicsKey.of(rows.get(0)), rows);
        assertThat(data.withoutResult()).containsExactly(0.8);
        assertThat(data.points()).noneMatch(p -> p.massMsun() == 0.8);
        StyledChart chart = HrDiagramRenderer.render(data);
        assertThat(HrDiagramRenderer.notes(data, chart)).contains(
                "Not drawn: models of 0.8 M\u2609 that failed or did not converge (report.html lists them).");
    }

    @Test
    void manyMassesAreCountedAfterTheFirstSix() {
        assertThat(HrDiagramRenderer.withoutResultNote(List.of(0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8)))
                .startsWith("Not drawn: models of 0.1, 0.2, 0.3, 0.4, 0.5, 0.6 M\u2609 and 2 more masses that failed");
        assertThat(HrDiagram.build(PhysicsKey.of(TestRuns.rows(TestRuns.masses(0.2, 2.0, 10),
                new double[] {0.014}, new double[] {0}).get(0)), TestRuns.rows(TestRuns.masses(0.2, 2.0, 10),
                new double[] {0.014}, new double[] {0})).withoutResult()).isEmpty();
    }
}
