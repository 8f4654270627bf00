package org.convgrid.plotting.trend;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.transitions.TransitionFinder;
import org.convgrid.output.transitions.TransitionRow;
import org.convgrid.plotting.TestRuns;
import org.convgrid.plotting.label.PhysicsKey;
import org.convgrid.plotting.zones.TransitionMarker;
import org.junit.jupiter.api.Test;

class TransitionTrendTest {

    @Test
    void pointsAndBracketsAreThoseOfTheTransitionsFile() {
        List<CatalogueRow> rows = TestRuns.demoRows();
        List<TransitionRow> transitions = TransitionFinder.withDefaults().find(rows);
        TransitionTrendData data = TransitionTrend.build(PhysicsKey.of(rows.get(0)), transitions);
        assertThat(data.metallicities()).containsExactly(0.004, 0.014, 0.02);
        // the fully convective limit and the core onset at each of the three ages, at every Z; the turn-off where
        // a slice has one (the synthetic run's oldest stars are past the main sequence)
        assertThat(data.series().stream().filter(s -> s.kind() != TransitionMarker.Kind.MAIN_SEQUENCE_TURNOFF))
                .hasSize(6).allSatisfy(s -> assertThat(s.points()).hasSize(3));
        long turnoffs = transitions.stream().filter(t -> t.turnoff().found()).count();
        assertThat(turnoffs).isPositive();
        assertThat(data.series().stream().filter(s -> s.kind() == TransitionMarker.Kind.MAIN_SEQUENCE_TURNOFF)
                .mapToInt(s -> s.points().size()).sum()).isEqualTo((int) turnoffs);
        for (TransitionTrendData.Series s : data.series()) {
            for (TrendPoint p : s.points()) {
                TransitionRow t = transitions.stream().filter(r -> r.slice().zInit() == p.zInit()
                        && r.slice().ageGyr() == s.ageGyr()).findFirst().orElseThrow();
                var estimate = switch (s.kind()) {
                    case FULLY_CONVECTIVE_LIMIT -> t.fullyConvective();
                    case CONV_CORE_ONSET -> t.convCoreOnset();
                    case MAIN_SEQUENCE_TURNOFF -> t.turnoff();
                    case LITHIUM_DEPLETION_BOUNDARY -> t.lithiumDepletion().boundary();
                };
                assertThat(p.massMsun()).isEqualTo(estimate.massMsun());
                assertThat(p.bracket()).isEqualTo(estimate.bracket());
            }
        }
    }

    @Test
    void otherPhysicsIsLeftOut() {
        List<TransitionRow> transitions = TransitionFinder.withDefaults().find(TestRuns.demoRows());
        TransitionTrendData data = TransitionTrend.build(new PhysicsKey(2.0, 0.0, OvershootScheme.STEP,
                null, 1.0), transitions);
        assertThat(data.metallicities()).isEmpty();
        assertThat(data.series()).isEmpty();
    }
}
