package org.convgrid.engine.overshoot;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/**
 * How far decaying overshoot has kept the core's hydrogen ({@link ExponentialOvershoot#mixedCoreTop}): where X
 * leaves the centre's value by 1 % of the surface-minus-centre contrast (our definition; no published source).
 * Invented profiles of ten points, masses in units of the star's.
 */
class DecayingMixedCoreTopTest {

    /** A profile with the given hydrogen per point, the first {@code coreTop + 1} points convective. */
    private static OvershootProfile profile(double[] hydrogen, int coreTop) {
        return new OvershootProfile() {
            @Override
            public int size() {
                return hydrogen.length;
            }

            @Override
            public double mass(int k) {
                return 0.1 * k;
            }

            @Override
            public double radius(int k) {
                return k;
            }

            @Override
            public double density(int k) {
                return 1.0;
            }

            @Override
            public double hydrogen(int k) {
                return hydrogen[k];
            }

            @Override
            public boolean convective(int k) {
                return k <= coreTop;
            }

            @Override
            public double stabilityExcess(int k) {
                return k <= coreTop ? 0.1 : -0.1;
            }

            @Override
            public double pressureScaleHeight(int k) {
                return 1.0;
            }

            @Override
            public double[] convectiveVelocities() {
                return new double[hydrogen.length];
            }

            @Override
            public double[] pressureScaleHeights() {
                return new double[hydrogen.length];
            }
        };
    }

    private static final ExponentialOvershoot DECAYING = new ExponentialOvershoot(0.02);

    @Test
    void theHydrogenPlateauAboveTheCoreCountsAsMixed() {
        // core to point 2 (m = 0.2), the centre's X = 0.50 out to point 4, then the gradient to the surface's 0.70:
        // the limit 0.50 + 0.01 x 0.20 = 0.502 is crossed between points 4 (0.50) and 5 (0.55), at 0.4 + 0.1 x 0.04
        double[] x = {0.50, 0.50, 0.50, 0.50, 0.50, 0.55, 0.60, 0.65, 0.70, 0.70};
        assertThat(DECAYING.mixedCoreTop(profile(x, 2))).isCloseTo(0.404, within(1e-12));
    }

    @Test
    void aStepRightAboveTheCoreLeavesTheCoreTop() {
        // X jumps from the core's 0.45 to 0.505 in the interval above its top (a core that shrank in one step):
        // the limit 0.4525 lies 0.0025 / 0.055 of the way into it
        double[] x = {0.45, 0.45, 0.45, 0.505, 0.505, 0.55, 0.60, 0.65, 0.70, 0.70};
        assertThat(DECAYING.mixedCoreTop(profile(x, 2))).isCloseTo(0.2 + 0.1 * 0.0025 / 0.055, within(1e-12));
    }

    @Test
    void noEdgeShowsInAnAlmostHomogeneousStarOrWithoutOvershootOrCore() {
        double[] young = {0.6995, 0.6995, 0.6995, 0.6997, 0.6999, 0.70, 0.70, 0.70, 0.70, 0.70};
        assertThat(DECAYING.mixedCoreTop(profile(young, 2))).isNaN();
        double[] x = {0.50, 0.50, 0.50, 0.50, 0.50, 0.55, 0.60, 0.65, 0.70, 0.70};
        assertThat(new ExponentialOvershoot(0.0).mixedCoreTop(profile(x, 2))).isNaN();
        assertThat(DECAYING.mixedCoreTop(profile(x, -1))).isNaN();
    }
}
