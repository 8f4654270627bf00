package org.convgrid.output.transitions;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.output.Span;
import org.junit.jupiter.api.Test;

class LastingCoreOnsetTest {

    private static final Slice SLICE = new Slice(0.02, 0.0, 1.8, 0.0, StabilityCriterion.SCHWARZSCHILD, 1.0);

    private static TransitionRow withCoreCrossings(Span... crossings) {
        List<Span> list = List.of(crossings);
        TransitionEstimate core = list.isEmpty() ? TransitionEstimate.NONE
                : new TransitionEstimate(list.get(0).hi(), list.get(0), list, 0);
        return new TransitionRow(SLICE, TransitionEstimate.NONE, core, TransitionMethod.GRID, "");
    }

    @Test
    void aSmallCoreThatComesAndGoesDoesNotHideTheLastingOne() {
        // core at 0.44, gone again by 0.45, back for good from 1.40: the lasting onset is 1.40
        TransitionRow row = withCoreCrossings(new Span(0.43, 0.44), new Span(0.44, 0.45), new Span(1.39, 1.40));
        assertThat(row.convCore().massMsun()).isEqualTo(0.44);
        assertThat(row.lastingCoreOnset().massMsun()).isEqualTo(1.40);
        assertThat(row.lastingCoreOnset().bracket()).isEqualTo(new Span(1.39, 1.40));
    }

    @Test
    void aCleanTransitionIsItsOwnLastingOnset() {
        TransitionRow row = withCoreCrossings(new Span(1.1, 1.2));
        assertThat(row.lastingCoreOnset().massMsun()).isEqualTo(row.convCore().massMsun());
    }

    @Test
    void noLastingCoreWhenTheHighestMassesHaveNone() {
        assertThat(withCoreCrossings(new Span(0.43, 0.44), new Span(0.44, 0.45)).lastingCoreOnset().found())
                .isFalse();
        assertThat(withCoreCrossings().lastingCoreOnset().found()).isFalse();
    }
}
