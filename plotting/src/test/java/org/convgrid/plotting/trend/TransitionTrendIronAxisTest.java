package org.convgrid.plotting.trend;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Map;
import org.convgrid.output.transitions.TransitionFinder;
import org.convgrid.output.transitions.TransitionRow;
import org.convgrid.plotting.TestRuns;
import org.convgrid.plotting.label.MetallicityNames;
import org.convgrid.plotting.label.PhysicsKey;
import org.convgrid.plotting.style.StyledChart;
import org.junit.jupiter.api.Test;

/**
 * The transitions-against-metallicity chart of a grid given in [Fe/H] has an [Fe/H] axis: an old-population
 * grid, fe_h_dex [-2, -1, 0], drew Z = 0.0001843, 0.001833 and 0.01738 along x, numbers nobody had asked for.
 */
class TransitionTrendIronAxisTest {

    /** That grid's three compositions (Z from [Fe/H] with the default Sun and helium law) and their fe_h_dex. */
    private static final double[] ZS = {0.0001843476, 0.001832918, 0.01738278};
    private static final MetallicityNames IRON = new MetallicityNames(Map.of(ZS[0], -2.0, ZS[1], -1.0, ZS[2], 0.0));

    private static TransitionTrendData data(double[] ages) {
        List<TransitionRow> rows = TransitionFinder.withDefaults()
                .find(TestRuns.rows(TestRuns.masses(0.1, 2.0, 39), ZS, ages));
        return TransitionTrend.build(PhysicsKey.of(rows.get(0).slice()), rows);
    }

    @Test
    void aGridGivenInIronIsDrawnAlongIronInDex() {
        TransitionTrendData one = data(new double[] {1});
        TransitionTrendRenderer.Placement at = TransitionTrendRenderer.placement(one, IRON);
        assertThat(at.inIron()).isTrue();
        assertThat(at.x(ZS[0], 0)).isEqualTo(-2.0);
        assertThat(at.x(ZS[2], 0)).isEqualTo(0.0);
        StyledChart chart = TransitionTrendRenderer.render(one, IRON);
        assertThat(chart.getXAxisTitle()).isEqualTo(TransitionTrendRenderer.IRON_AXIS_TITLE);
        assertThat(chart.getStyler().isXAxisLogarithmic()).isFalse();
        assertThat(chart.getStyler().getXAxisMin()).isLessThan(-2.0);
        assertThat(chart.getStyler().getXAxisMax()).isGreaterThan(0.0).isLessThan(0.2);
        // several ages are nudged apart by the same hundredths of a dex as on the Z axis, and the note says [Fe/H]
        TransitionTrendData four = data(new double[] {1, 5, 10, 13});
        TransitionTrendRenderer.Placement apart = TransitionTrendRenderer.placement(four, IRON);
        assertThat(apart.x(ZS[1], 3) - apart.x(ZS[1], 0)).isCloseTo(0.09, within(1e-12));
        assertThat(TransitionTrendRenderer.nudgeNote(four, apart.inIron())).contains("at its [Fe/H] (youngest left)");
    }

    @Test
    void aGridGivenInZKeepsItsLogarithmicZAxis() {
        TransitionTrendData one = data(new double[] {1});
        assertThat(TransitionTrendRenderer.placement(one, MetallicityNames.Z_ONLY).inIron()).isFalse();
        StyledChart chart = TransitionTrendRenderer.render(one, MetallicityNames.Z_ONLY);
        assertThat(chart.getXAxisTitle()).isEqualTo(TransitionTrendRenderer.Z_AXIS_TITLE);
        assertThat(chart.getStyler().isXAxisLogarithmic()).isTrue();
        // a run holding Z = 0 has no [Fe/H] for it, so it stays in Z
        assertThat(TransitionTrendRenderer.inIron(List.of(0.0, ZS[1]), IRON)).isFalse();
    }
}
