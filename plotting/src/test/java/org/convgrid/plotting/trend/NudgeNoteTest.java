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
}
