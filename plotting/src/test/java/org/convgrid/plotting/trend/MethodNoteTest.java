package org.convgrid.plotting.trend;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.InputStreamReader;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.convgrid.engine.request.AgeOrigin;
import org.convgrid.output.transitions.TransitionMethod;
import org.convgrid.output.transitions.TransitionReader;
import org.convgrid.output.transitions.TransitionRow;
import org.convgrid.plotting.label.PhysicsKey;
import org.convgrid.plotting.style.StyledChart;
import org.junit.jupiter.api.Test;

/** How the transition charts say how their masses were found, and the unit of their age axis (wording only). */
class MethodNoteTest {

    private static List<TransitionRow> demo() throws Exception {
        try (Reader in = new InputStreamReader(MethodNoteTest.class.getResourceAsStream(
                "/demo-cluster/transitions.csv"), StandardCharsets.UTF_8)) {
            return TransitionReader.read(in);
        }
    }

    @Test
    void allRefinedIsSaidOnceInTheSubtitleNotOnEveryLegendEntry() throws Exception {
        List<TransitionRow> rows = demo();
        TransitionAgeTrendData data = TransitionAgeTrend.build(PhysicsKey.of(rows.get(0).slice()), rows);
        StyledChart chart = TransitionAgeTrendRenderer.render(data, AgeOrigin.BIRTH);
        assertThat(chart.getSeriesMap().keySet()).contains("fully convective limit, Z = 0.008")
                .noneMatch(name -> name.contains("refined") || name.contains("grid"));
        assertThat(TransitionAgeTrendRenderer.methodNote(data).subtitle("physics"))
                .isEqualTo("physics; all masses refined to 0.002 M\u2609");
        // the demo's ages are 20, 150 and 600 Myr: the axis is in Myr, ticks at 20, 150, 600
        assertThat(chart.getXAxisTitle()).isEqualTo("age since birth / Myr (logarithmic)");
        assertThat(TransitionAgeTrendRenderer.placement(data).x(0.15, 1)).isEqualTo(150.0);
        TransitionTrendData byZ = TransitionTrend.build(PhysicsKey.of(rows.get(0).slice()), rows);
        assertThat(TransitionTrendRenderer.render(byZ).getSeriesMap().keySet())
                .contains("core in every star above, 150 Myr").noneMatch(name -> name.contains("refined"));
    }

    @Test
    void mixedMethodsAreSaidOnEveryLegendEntry() throws Exception {
        // the 20 Myr slices as if read off the grid, the others refined
        List<TransitionRow> rows = demo().stream().map(t -> t.slice().ageGyr() == 0.02 ? new TransitionRow(
                t.slice(), t.yInit(), t.fullyConvective(), t.convCoreOnset(), t.transientCore(), TransitionMethod.GRID,
                Double.NaN, t.notes()) : t).toList();
        TransitionAgeTrendData data = TransitionAgeTrend.build(PhysicsKey.of(rows.get(0).slice()), rows);
        assertThat(TransitionAgeTrendRenderer.render(data, AgeOrigin.BIRTH).getSeriesMap().keySet())
                .contains("fully convective limit, Z = 0.008, refined", "fully convective limit, Z = 0.008, grid");
        assertThat(TransitionAgeTrendRenderer.methodNote(data).subtitle("physics")).isEqualTo("physics");
        TransitionTrendData byZ = TransitionTrend.build(PhysicsKey.of(rows.get(0).slice()), rows);
        assertThat(TransitionTrendRenderer.render(byZ).getSeriesMap().keySet())
                .contains("fully convective limit, 20 Myr, grid", "fully convective limit, 150 Myr, refined");
    }
}
