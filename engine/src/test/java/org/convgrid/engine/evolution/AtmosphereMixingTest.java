package org.convgrid.engine.evolution;

import static org.assertj.core.api.Assertions.assertThat;

import org.convgrid.engine.structure.MassMesh;
import org.junit.jupiter.api.Test;

/**
 * {@link AtmosphereMixing}: the atmosphere's points join a mixed zone whose top lies within the surface skin (1e-6
 * of the mass, {@code ConvectiveZoneFinder.DEFAULT_SURFACE_SKIN_MASS_FRACTION}), and no other (common practice: the
 * photosphere shows the convective envelope's composition; no single published source).
 */
class AtmosphereMixingTest {

    /** Five points: m/M 0.2, 0.6, 1 - 1e-3 or 1 - 1e-8 at the third-from-last, 1 - 1e-10, 1. */
    private static MassMesh mesh(double exteriorOfMiddle) {
        double[] outside = {0.8, 0.4, exteriorOfMiddle, 1e-10, 0.0};
        double[] q = new double[outside.length];
        for (int k = 0; k < q.length; k++) {
            q[k] = 1.0 - outside[k];
        }
        return MassMesh.ofFractions(2e33, q, outside);
    }

    @Test
    void pointsAboveAZoneReachingTheSurfaceJoinIt() {
        boolean[] mixed = {false, true, true, false, false};
        assertThat(AtmosphereMixing.joined(mesh(1e-8), mixed)).containsExactly(false, true, true, true, true);
        assertThat(mixed).as("the argument is not changed").containsExactly(false, true, true, false, false);
    }

    @Test
    void aZoneEndingBelowTheSkinKeepsTheRadiativeLayersAboveIt() {
        boolean[] mixed = {true, true, true, false, false};
        // 1e-3 of the mass above the zone's last point: a radiative envelope, not an atmosphere
        assertThat(AtmosphereMixing.joined(mesh(1e-3), mixed)).containsExactly(true, true, true, false, false);
    }

    @Test
    void aLoneMixedSurfacePointDoesNotKeepTheAtmosphereApartFromTheEnvelope() {
        // the envelope's top within the skin, a radiative point, then a one-point surface zone
        boolean[] mixed = {false, true, true, false, true};
        assertThat(AtmosphereMixing.joined(mesh(1e-8), mixed)).containsExactly(false, true, true, true, true);
    }

    @Test
    void noMixedPointOrAMixedSurfaceChangeNothing() {
        boolean[] none = {false, false, false, false, false};
        boolean[] surface = {false, false, true, true, true};
        assertThat(AtmosphereMixing.joined(mesh(1e-8), none)).containsExactly(none);
        assertThat(AtmosphereMixing.joined(mesh(1e-8), surface)).containsExactly(surface);
    }
}
