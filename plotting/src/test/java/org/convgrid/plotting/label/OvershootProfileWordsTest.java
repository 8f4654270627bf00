package org.convgrid.plotting.label;

import static org.assertj.core.api.Assertions.assertThat;

import org.convgrid.engine.request.OvershootScheme;
import org.junit.jupiter.api.Test;

/** The report's physics rows say what the overshoot length means under the profiles other than uniform. */
class OvershootProfileWordsTest {

    @Test
    void onlyTheUniformProfileNeedsNoWords() {
        assertThat(SliceLabels.overshootProfile(OvershootScheme.STEP)).isEmpty();
        assertThat(SliceLabels.overshootProfile(OvershootScheme.MASS_RAMPED_STEP))
                .isEqualTo(" (uniform-ramped: that length from 2 M\u2609 up, none up to 1.2 M\u2609, linear between)");
        assertThat(SliceLabels.overshootProfile(OvershootScheme.EXPONENTIAL)).contains("the length is f");
    }
}
