package org.convgrid.plotting.label;

import static org.assertj.core.api.Assertions.assertThat;

import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.output.transitions.Slice;
import org.junit.jupiter.api.Test;

/**
 * Chart subtitles, report rows and map file names say what the overshoot length means under its profile: a
 * uniform-ramped run's 0.2 is 0.2 H_P from 2 Msun only and a decaying run's 0.016 is f, so "overshoot 0.2 Hp" and
 * {@code _ov0.2_} on their charts read like a uniform run's.
 */
class OvershootLabelTest {

    private static final StabilityCriterion SCHWARZSCHILD = StabilityCriterion.SCHWARZSCHILD;

    @Test
    void eachProfileIsWordedForWhatItsLengthMeans() {
        assertThat(SliceLabels.physics(1.8, 0.2, OvershootScheme.STEP, SCHWARZSCHILD, 1.0))
                .isEqualTo("\u03b1 = 1.8, Schwarzschild, overshoot 0.2 Hp");
        assertThat(SliceLabels.physics(1.8, 0.2, OvershootScheme.MASS_RAMPED_STEP, SCHWARZSCHILD, 1.0))
                .isEqualTo("\u03b1 = 1.8, Schwarzschild, overshoot 0.2 Hp from 2 M\u2609, none up to 1.2 M\u2609"
                        + " (uniform-ramped)");
        assertThat(SliceLabels.physics(1.8, 0.016, OvershootScheme.EXPONENTIAL, SCHWARZSCHILD, 1.0))
                .isEqualTo("\u03b1 = 1.8, Schwarzschild, overshoot f = 0.016 (decaying)");
        // no length: the same star under every profile
        for (OvershootScheme profile : OvershootScheme.values()) {
            assertThat(SliceLabels.overshoot(0.0, profile)).isEqualTo("no overshoot");
        }
        // a table written before the profile was recorded: the length as it was always worded
        assertThat(SliceLabels.overshoot(0.2, null)).isEqualTo("overshoot 0.2 Hp");
    }

    @Test
    void fileNamesNameAProfileOtherThanUniformAfterTheLength() {
        assertThat(SliceLabels.physicsStem(1.8, 0.2, OvershootScheme.STEP, SCHWARZSCHILD, 1.0))
                .isEqualTo("a1.8_ov0.2_schwarzschild");
        assertThat(SliceLabels.physicsStem(1.8, 0.2, OvershootScheme.MASS_RAMPED_STEP, SCHWARZSCHILD, 1.0))
                .isEqualTo("a1.8_ov0.2-uniform-ramped_schwarzschild");
        assertThat(SliceLabels.physicsStem(1.8, 0.016, OvershootScheme.EXPONENTIAL, SCHWARZSCHILD, 1.0))
                .isEqualTo("a1.8_ov0.016-decaying_schwarzschild");
        assertThat(SliceLabels.physicsStem(1.8, 0.0, OvershootScheme.EXPONENTIAL, SCHWARZSCHILD, 1.0))
                .isEqualTo("a1.8_ov0_schwarzschild");
        Slice ramped = new Slice(0.02, 1.0, 1.8, 0.2, SCHWARZSCHILD, 1.0, OvershootScheme.MASS_RAMPED_STEP);
        assertThat(SliceLabels.fileStem(ramped)).isEqualTo("z0.02_age1gyr_a1.8_ov0.2-uniform-ramped_schwarzschild");
        assertThat(PhysicsKey.of(ramped).describe()).contains("(uniform-ramped)");
    }
}
