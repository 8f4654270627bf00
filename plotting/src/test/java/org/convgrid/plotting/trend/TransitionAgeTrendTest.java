package org.convgrid.plotting.trend;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.transitions.TransitionFinder;
import org.convgrid.output.transitions.TransitionRow;
import org.convgrid.plotting.TestRuns;
import org.convgrid.plotting.label.PhysicsKey;
import org.convgrid.plotting.zones.TransitionMarker;
import org.junit.jupiter.api.Test;

class TransitionAgeTrendTest {

    @Test
    void oneSeriesPerTransitionAndZWithTheFileValues() {
        List<CatalogueRow> rows = TestRuns.demoRows();
        List<TransitionRow> transitions = TransitionFinder.withDefaults().find(rows);
        TransitionAgeTrendData data = TransitionAgeTrend.build(PhysicsKey.of(rows.get(0)), transitions);
        assertThat(data.ages()).containsExactly(0.0, 1.0, 4.57);
        assertThat(data.series()).extracting(TransitionAgeTrendData.Series::zInit)
                .containsExactly(0.004, 0.014, 0.02, 0.004, 0.014, 0.02);
        assertThat(data.series().get(0).kind()).isEqualTo(TransitionMarker.Kind.FULLY_CONVECTIVE_LIMIT);
        for (TransitionAgeTrendData.Series s : data.series()) {
            assertThat(s.points()).extracting(AgePoint::ageGyr).isSorted();
            for (AgePoint p : s.points()) {
                TransitionRow t = transitions.stream().filter(r -> r.slice().zInit() == s.zInit()
                        && r.slice().ageGyr() == p.ageGyr()).findFirst().orElseThrow();
                var estimate = s.kind() == TransitionMarker.Kind.FULLY_CONVECTIVE_LIMIT ? t.fullyConvective()
                        : t.lastingCoreOnset();
                assertThat(p.massMsun()).isEqualTo(estimate.massMsun());
                assertThat(p.bracket()).isEqualTo(estimate.bracket());
            }
        }
    }
}
