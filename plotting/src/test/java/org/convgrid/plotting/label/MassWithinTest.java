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

    @Test
    void aRefinedMassIsRoundedToItsToleranceNotToItsNarrowerBracket() {
        // a bracket 0.00078 wide would give four decimals; the stated tolerance 0.002 gives three
        assertThat(SliceLabels.massToAccuracy(0.36484375, new Span(0.36406250, 0.36484375), 0.002))
                .isEqualTo("0.365");
        // a bracket wider than the tolerance (a bisection stopped early) keeps its own width
        assertThat(SliceLabels.massToAccuracy(0.35, new Span(0.35, 0.4), 0.002)).isEqualTo("0.35");
        assertThat(SliceLabels.massToAccuracy(0.3, new Span(0.3, 0.4), Double.NaN)).isEqualTo("0.3");
    }

    @Test
    void aMassHalfwayRoundsUpFromItsWrittenValueAsTheReadmeDoes() {
        // 0.6375 and 0.2875 are a hair below their decimals in binary: half-even from the binary gave 0.637, 0.287
        assertThat(SliceLabels.massToAccuracy(0.6375, null, 0.002)).isEqualTo("0.638");
        assertThat(SliceLabels.massToAccuracy(0.2875, null, 0.002)).isEqualTo("0.288");
        assertThat(SliceLabels.massToAccuracy(0.6365, null, 0.002)).isEqualTo("0.637");
        assertThat(SliceLabels.massWithin(0.31640625, new Span(0.3125, 0.31640625))).isEqualTo("0.316");
    }

    @Test
    void aWindowWithEqualEndsIsOneMassNotARange() {
        // the demo's Z = 0.008, 150 Myr slice: the only cored refinement model, 0.2875 Msun, is both ends
        assertThat(SliceLabels.massRange(new Span(0.2875, 0.2875), 0.002)).isEqualTo("0.288");
        assertThat(SliceLabels.massRange(new Span(0.315625, 0.7359375), 0.002)).isEqualTo("0.316\u20130.736");
        assertThat(SliceLabels.massRange(new Span(0.45, 0.45), Double.NaN)).isEqualTo("0.45");
    }
}
