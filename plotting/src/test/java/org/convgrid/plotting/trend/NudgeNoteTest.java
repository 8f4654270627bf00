package org.convgrid.plotting.trend;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.convgrid.output.transitions.TransitionFinder;
import org.convgrid.output.transitions.TransitionRow;
import org.convgrid.plotting.TestRuns;
import org.convgrid.plotting.label.PhysicsKey;
import org.junit.jupiter.api.Test;

/** The transition trends say, under their legend, that series are drawn slightly apart, and only when they are. */
class NudgeNoteTest {

    private static List<TransitionRow> transitions(double[] zs, double[] ages) {
        return TransitionFinder.withDefaults().find(TestRuns.rows(TestRuns.masses(0.1, 2.0, 39), zs, ages));
    }

    @Test
    void severalAgesAreSaidToBeDrawnApartAlongZ() {
        List<TransitionRow> rows = transitions(new double[] {0.004, 0.014, 0.02}, new double[] {0, 1, 4.57});
        TransitionTrendData data = TransitionTrend.build(PhysicsKey.of(rows.get(0).slice()), rows);
        assertThat(TransitionTrendRenderer.nudgeNote(data)).isEqualTo("Each age is drawn slightly apart at its Z "
                + "(youngest left) so that markers do not hide each other.");
    }

    @Test
    void oneAgeIsDrawnAtItsTrueZAndTheTitleSaysNothingMore() {
        List<TransitionRow> rows = transitions(new double[] {0.004, 0.014, 0.02}, new double[] {1});
        TransitionTrendData data = TransitionTrend.build(PhysicsKey.of(rows.get(0).slice()), rows);
        assertThat(TransitionTrendRenderer.nudgeNote(data)).isEmpty();
        TransitionTrendRenderer.Placement at = TransitionTrendRenderer.placement(data);
        assertThat(at.x(0.02, 0)).isEqualTo(0.02);
    }

    @Test
    void oneMetallicityIsDrawnAtItsTrueAge() {
        List<TransitionRow> oneZ = transitions(new double[] {0.014}, new double[] {0, 1, 4.57});
        TransitionAgeTrendData one = TransitionAgeTrend.build(PhysicsKey.of(oneZ.get(0).slice()), oneZ);
        assertThat(TransitionAgeTrendRenderer.placement(one).x(1.0, 0)).isEqualTo(1.0);
    }

    @Test
    void manyAgesStayInsideTheAxisRoomBesideTheirZ() {
        // one Z and ten ages (a young cluster's grid): nudged 0.03 dex apart they spread over 0.27 dex and the
        // outer ones fell off the plot, which leaves 0.097 dex either side of the Z
        double[] ages = {0.005, 0.01, 0.015, 0.02, 0.025, 0.035, 0.05, 0.08, 0.125, 0.2};
        List<TransitionRow> rows = transitions(new double[] {0.014}, ages);
        TransitionTrendData data = TransitionTrend.build(PhysicsKey.of(rows.get(0).slice()), rows);
        TransitionTrendRenderer.Placement at = TransitionTrendRenderer.placement(data);
        int slots = at.ages().size() + at.windowOnlyAges().size();
        assertThat(slots).isGreaterThan(6);
        double room = Math.log10(1.25);
        for (int i = 0; i < slots; i++) {
            assertThat(Math.abs(Math.log10(at.x(0.014, i) / 0.014))).as("age slot " + i).isLessThan(room);
        }
        // three ages keep their 0.03 dex apart
        List<TransitionRow> three = transitions(new double[] {0.014}, new double[] {0, 1, 4.57});
        TransitionTrendRenderer.Placement few = TransitionTrendRenderer.placement(
                TransitionTrend.build(PhysicsKey.of(three.get(0).slice()), three));
        assertThat(Math.log10(few.x(0.014, 1) / few.x(0.014, 0))).isCloseTo(0.03, org.assertj.core.api.Assertions
                .within(1e-12));
    }
}
