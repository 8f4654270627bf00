package org.convgrid.plotting.style;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
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
        // 0.8-1.2 Msun held the one round value 1: a chart with one label on its mass axis
        assertThat(LogAxis.roundValues(0.71, 1.34)).containsExactly(1.0);
        assertThat(LogAxis.labelValues(0.71, 1.34)).containsExactly(0.8, 0.9, 1.0, 1.1, 1.2, 1.3);
        // 1.0-1.4 Msun (F stars about the Kraft break) was labelled only at 0.9 and 1
        assertThat(LogAxis.labelValues(0.89, 1.57)).containsExactly(0.9, 1.0, 1.1, 1.2, 1.3, 1.4, 1.5);
        assertThat(LogAxis.labelValues(0.25, 0.51)).containsExactly(0.26, 0.28, 0.3, 0.4, 0.5);
        // a range of a factor 3 to 10 keeps the round values when three fall inside
        assertThat(LogAxis.labelValues(0.09, 0.6)).containsExactly(0.1, 0.2, 0.3, 0.5);
        // 1.1-3 Msun (a seismology grid) held only 2 and 3, round or every mantissa: the tenths of the first decade too
        assertThat(LogAxis.labelValues(1.05, 3.4)).containsExactly(1.1, 1.2, 1.3, 1.4, 1.5, 1.6, 1.7, 1.8, 1.9, 2.0,
                2.2, 2.4, 2.6, 2.8, 3.0);
        // 1.2-2.4 Msun by 0.2 (the columns' outer edges 1.1 and 2.6): 2.2 and 2.4 were left without a label
        assertThat(LogAxis.labelValues(1.1, 2.62)).contains(2.2, 2.4);
    }

    @Test
    void manyDecadesKeepThePowersOfTenAndSmallValuesAreWrittenShort() {
        // an envelope axis from an F star's 3e-6 Msun to a K dwarf's 0.4: 1, 2, 3, 5 x 10^n would be 18 labels
        assertThat(LogAxis.sparseRoundValues(3e-6, 0.4)).containsExactly(1e-5, 1e-4, 1e-3, 1e-2, 0.1);
        assertThat(LogAxis.sparseRoundValues(0.02, 0.4)).containsExactly(0.02, 0.03, 0.05, 0.1, 0.2, 0.3);
        // 0.000005 ran off the chart beside the axis title; with one such label every one below 1 is written alike
        var tiny = LogAxis.compactLabels(List.of(5e-6, 1e-5, 1e-3, 0.01, 0.1, 2.0));
        assertThat(tiny.apply(5e-6)).isEqualTo("5e-6");
        assertThat(tiny.apply(1e-5)).isEqualTo("1e-5");
        assertThat(tiny.apply(1e-3)).isEqualTo("1e-3");
        assertThat(tiny.apply(0.1)).isEqualTo("1e-1");
        assertThat(tiny.apply(2.0)).isEqualTo("2");
        assertThat(LogAxis.exponentForm(3e-4)).isEqualTo("3e-4");
        // without one, plain decimals
        assertThat(LogAxis.compactLabels(List.of(0.01, 0.1)).apply(0.01)).isEqualTo("0.01");
    }

    @Test
    void anEndOfTheRangeWithoutALabelGetsFinerOnes() {
        // 0.5-1.4 Msun by 0.1 (outer edges 0.45 and 1.45): labelled 0.5 ... 0.9, 1 and nothing over its F stars above
        assertThat(LogAxis.labelValues(0.45, 1.45)).contains(0.5, 0.9, 1.0, 1.2, 1.4);
        // the demo's axis keeps its round values alone: no end is bare
        assertThat(LogAxis.labelValues(0.18, 2.2)).containsExactly(0.2, 0.3, 0.5, 1.0, 2.0);
    }
}
