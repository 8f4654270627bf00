package org.convgrid.engine.structure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/**
 * {@link MomentOfInertia} on a sphere of uniform density, whose moment of inertia is (2/5) M R^2 and whose part
 * outside mass m0 is (2/5) M R^2 (1 - (m0 / M)^(5/3)) (textbook mechanics; r = R (m / M)^(1/3)).
 */
class MomentOfInertiaTest {

    private static final double MASS = 2.0e33;
    private static final double RADIUS = 7.0e10;

    private static double[][] uniformSphere(int points) {
        double[] m = new double[points];
        double[] r = new double[points];
        for (int k = 0; k < points; k++) {
            // points crowding towards the centre in m, as a star's mesh does
            double x = Math.pow((k + 1.0) / points, 3);
            m[k] = MASS * x;
            r[k] = RADIUS * Math.cbrt(x);
        }
        return new double[][] {m, r};
    }

    @Test
    void aUniformSphereHasTwoFifthsMRSquared() {
        double[][] sphere = uniformSphere(500);
        double exact = 0.4 * MASS * RADIUS * RADIUS;
        assertThat(MomentOfInertia.outside(sphere[0], sphere[1], 0.0)).isCloseTo(exact, within(1e-4 * exact));
        double outer = 0.4 * MASS * RADIUS * RADIUS * (1.0 - Math.pow(0.3, 5.0 / 3.0));
        assertThat(MomentOfInertia.outside(sphere[0], sphere[1], 0.3 * MASS)).isCloseTo(outer, within(1e-4 * exact));
        assertThat(MomentOfInertia.outside(sphere[0], sphere[1], MASS)).isZero();
    }

    @Test
    void refusesAnInnerMassOutsideTheStar() {
        double[][] sphere = uniformSphere(10);
        assertThatThrownBy(() -> MomentOfInertia.outside(sphere[0], sphere[1], 1.1 * MASS))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("between 0 and the total mass");
        assertThatThrownBy(() -> MomentOfInertia.outside(sphere[0], new double[3], 0.0))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("as many");
    }
}
