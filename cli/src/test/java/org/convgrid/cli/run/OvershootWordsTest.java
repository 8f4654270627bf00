package org.convgrid.cli.run;

import static org.assertj.core.api.Assertions.assertThat;

import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.physics.atmosphere.AtmosphereChoice;
import org.convgrid.engine.request.OpacityChoice;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.engine.request.PhysicsOptions;
import org.junit.jupiter.api.Test;

/** check and star name each overshoot profile's length for what it is ("0.2 Hp" misled for two of three). */
class OvershootWordsTest {

    private static PhysicsOptions physics(double length, OvershootScheme scheme) {
        return new PhysicsOptions(1.8, length, StabilityCriterion.SCHWARZSCHILD, 1.0, OpacityChoice.BUILT_IN,
                AtmosphereChoice.DEFAULT, scheme);
    }

    @Test
    void eachProfileIsNamedWithWhatItsLengthMeans() {
        assertThat(OvershootWords.describe(physics(0.2, OvershootScheme.STEP))).isEqualTo("overshoot 0.2 Hp");
        assertThat(OvershootWords.describe(physics(0.016, OvershootScheme.EXPONENTIAL)))
                .isEqualTo("overshoot f = 0.016 (decaying)");
        assertThat(OvershootWords.describe(physics(0.2, OvershootScheme.MASS_RAMPED_STEP)))
                .isEqualTo("overshoot 0.2 Hp from 2 Msun, none up to 1.2 Msun (uniform-ramped)");
    }

    @Test
    void aStarOnTheRampIsToldItsOwnLength() {
        assertThat(OvershootWords.describe(physics(0.2, OvershootScheme.MASS_RAMPED_STEP), 1.5))
                .endsWith("(uniform-ramped): 0.075 Hp for this star");
        assertThat(OvershootWords.describe(physics(0.2, OvershootScheme.MASS_RAMPED_STEP), 2.5))
                .endsWith("(uniform-ramped)");
        assertThat(OvershootWords.describe(physics(0.2, OvershootScheme.STEP), 0.8)).isEqualTo("overshoot 0.2 Hp");
    }
}
