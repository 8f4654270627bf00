package org.convgrid.engine.evolution;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Arrays;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.MassMesh;
import org.convgrid.engine.structure.ModelState;
import org.junit.jupiter.api.Test;

class CarriedUnknownsTest {

    /** Unknowns that are linear in the mesh coordinate ln(m/(M - m)) at every interior point; the surface apart. */
    private static ModelState linearIn(MassMesh mesh) {
        int n = mesh.size();
        double[][] v = new double[4][n];
        for (int k = 0; k < n - 1; k++) {
            double u = mesh.logit(k);
            v[0][k] = 20.0 + 0.3 * u;
            v[1][k] = -2.0 - 0.5 * u;
            v[2][k] = 15.0 - 0.1 * u;
            v[3][k] = 1.0e33 * (3.0 + u);
        }
        v[0][n - 1] = 25.0;
        v[1][n - 1] = -20.0;
        v[2][n - 1] = 8.5;
        v[3][n - 1] = 4.0e33;
        Composition[] comp = new Composition[n];
        Arrays.fill(comp, Composition.scaledSolar(0.7, 0.02));
        return new ModelState(mesh, comp, v[0], v[1], v[2], v[3]);
    }

    @Test
    void linearProfilesAreCarriedExactlyAndEndsMapOntoEnds() {
        // interpolation identity, no published source needed: linear data on a linear interpolant
        ModelState state = linearIn(TestMeshes.logit(40, -12.0, 14.0));
        MassMesh target = TestMeshes.logit(57, -11.0, 13.0);
        ModelState expected = linearIn(target);
        double[][] carried = CarriedUnknowns.onto(state, target);
        double[][] want = {expected.lnRadii(), expected.lnDensities(), expected.lnTemperatures(),
                expected.luminosities()};
        int m = target.size();
        for (int v = 0; v < 4; v++) {
            for (int k = 1; k < m - 1; k++) {
                assertThat(carried[v][k]).isCloseTo(want[v][k], within(1.0e-9 * Math.abs(want[v][k])));
            }
        }
        // the centre and the surface point are the old centre and surface, not extrapolated
        assertThat(carried[0][0]).isEqualTo(state.lnRadius(0));
        assertThat(carried[3][m - 1]).isEqualTo(state.luminosity(state.size() - 1));
    }

    @Test
    void pointsBeyondTheLastInteriorPointLieBetweenItAndTheSurface() {
        // the outermost interval of the source reaches from logit 10 to the surface; the target has points in it
        ModelState state = linearIn(TestMeshes.logit(40, -12.0, 10.0));
        MassMesh target = TestMeshes.logit(57, -11.0, 14.0);
        double[][] carried = CarriedUnknowns.onto(state, target);
        int n = state.size();
        int m = target.size();
        double[] lnT = state.lnTemperatures();
        for (int k = 1; k < m - 1; k++) {
            if (target.logit(k) > state.mesh().logit(n - 2)) {
                // between the two, falling outwards like the source (a clamp would hold lnT[n - 2])
                assertThat(carried[2][k]).isLessThan(lnT[n - 2]).isGreaterThan(lnT[n - 1]);
                assertThat(carried[2][k]).isLessThan(carried[2][k - 1]);
            }
        }
        // main-sequence steps keep holding them
        double[][] held = CarriedUnknowns.onto(state, target, false);
        assertThat(held[2][m - 2]).isEqualTo(lnT[n - 2]);
    }

    @Test
    void onItsOwnMeshTheValuesAreUnchanged() {
        MassMesh mesh = TestMeshes.logit(30, -10.0, 12.0);
        ModelState state = linearIn(mesh);
        assertThat(CarriedUnknowns.onto(state, mesh)[2]).containsExactly(state.lnTemperatures());
    }
}
