package org.convgrid.plotting.label;

import static org.assertj.core.api.Assertions.assertThat;

import org.convgrid.output.Span;
import org.junit.jupiter.api.Test;

class MassWithinTest {

    @Test
    void roundsToTheAccuracyOfTheBracket() {
        assertThat(SliceLabels.massWithin(0.3640625, new Span(0.3625, 0.3640625))).isEqualTo("0.364");
        assertThat(SliceLabels.massWithin(0.3, new Span(0.3, 0.4))).isEqualTo("0.3");
        // a grid step of 0.1 computed as 1.2 - 1.1 is 0.09999999999999987: still one decimal
        assertThat(SliceLabels.massWithin(1.2, new Span(1.1, 1.2))).isEqualTo("1.2");
        assertThat(SliceLabels.massWithin(0.35, null)).isEqualTo("0.35");
    }
}
