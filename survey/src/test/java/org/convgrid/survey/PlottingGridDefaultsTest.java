package org.convgrid.survey;

import static org.assertj.core.api.Assertions.assertThat;

import org.convgrid.grids.TransitionSettings;
import org.convgrid.plotting.GridChoices;
import org.junit.jupiter.api.Test;

/** The report reads the grid text itself (it does not see the grid reader): its defaults must be the reader's. */
class PlottingGridDefaultsTest {

    @Test
    void theReportsTransitionDefaultsAreTheGridReaders() {
        assertThat(GridChoices.DEFAULT_REFINE_TOLERANCE_MSUN).isEqualTo(TransitionSettings.DEFAULT.toleranceMsun());
        assertThat(GridChoices.of(null).refinesTransitions()).isEqualTo(TransitionSettings.DEFAULT.refine());
    }
}
