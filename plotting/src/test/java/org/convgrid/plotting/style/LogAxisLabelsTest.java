package org.convgrid.plotting.style;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/** Which values a logarithmic axis offers as labels (the painter then leaves out those that would touch). */
class LogAxisLabelsTest {

    @Test
    void aWideRangeKeepsTheRoundValues() {
        // the demo grid's 0.2-2 Msun: 0.2, 0.3, 0.5, 1, 2
        assertThat(LogAxis.labelValues(0.18, 2.2)).containsExactly(0.2, 0.3, 0.5, 1.0, 2.0);
    }

    @Test
    void aNarrowRangeOffersEveryMantissa() {
        // 0.8-1.2 Msun held the one round value 1: a chart with one label on its mass axis (found by a code review)
        assertThat(LogAxis.roundValues(0.71, 1.34)).containsExactly(1.0);
        assertThat(LogAxis.labelValues(0.71, 1.34)).containsExactly(0.8, 0.9, 1.0);
        assertThat(LogAxis.labelValues(0.25, 0.51)).containsExactly(0.3, 0.4, 0.5);
    }
}
