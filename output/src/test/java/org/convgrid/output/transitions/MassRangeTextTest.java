package org.convgrid.output.transitions;

import static org.assertj.core.api.Assertions.assertThat;

import org.convgrid.output.Span;
import org.junit.jupiter.api.Test;

/** How a note of transitions.csv writes a range of masses (formatting only, no physics). */
class MassRangeTextTest {

    @Test
    void equalEndsAreOneMassNotARange() {
        // the demo's Z = 0.008, 150 Myr window: one refinement model at 0.2875 Msun had a core
        assertThat(MassRangeText.of(new Span(0.2875, 0.2875))).isEqualTo("0.2875");
        assertThat(MassRangeText.isOneMass(new Span(0.2875, 0.2875))).isTrue();
        // ends that the notes' six decimals cannot tell apart are one mass too
        assertThat(MassRangeText.of(new Span(0.2875, 0.28750004))).isEqualTo("0.2875");
    }

    @Test
    void distinctEndsAreARangeWrittenAsTheSpanColumnsWereWritten() {
        Span window = new Span(0.315625, 0.7359375);
        assertThat(MassRangeText.of(window)).isEqualTo("0.315625-0.735938").isEqualTo(window.toString());
        assertThat(MassRangeText.isOneMass(window)).isFalse();
    }
}
