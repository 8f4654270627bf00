package org.convgrid.plotting.style;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.awt.Font;
import org.junit.jupiter.api.Test;

/** Title lines too wide for the chart are drawn in a smaller font; lines that fit keep theirs (layout, no physics). */
class FittedTitleTest {

    private static final Font FONT = new Font(Font.SANS_SERIF, Font.PLAIN, 20);

    @Test
    void aLineThatFitsKeepsItsFont() {
        assertThat(ChartStyle.fitted(FONT, 1100, 1172)).isSameAs(FONT);
        assertThat(ChartStyle.fitted(FONT, 1172, 1172)).isSameAs(FONT);
    }

    @Test
    void aWiderLineShrinksInProportion() {
        // the transitions chart of a uniform-ramped grid refined to 0.002 Msun: its physics line ran ~1400 px
        assertThat(ChartStyle.fitted(FONT, 1400, 1172).getSize2D()).isCloseTo(20f * 1172 / 1400, within(1e-4f));
    }
}
