package org.convgrid.engine.evolution;

import static org.assertj.core.api.Assertions.assertThat;

import org.convgrid.engine.structure.MassMesh;
import org.junit.jupiter.api.Test;

class IsothermExtrapolationTest {

    private static final MassMesh MESH = TestMeshes.logit(200, -5.0, 16.0);

    /**
     * Synthetic outer layers (no published source needed: the test is about interpolation): ln T falls outwards
     * gently and, across a front two mesh intervals wide, by 1.0; the front moves outwards by 1.5 intervals per
     * unit of time, ln rho and ln r follow ln(1 - m/M) smoothly, L is constant; all below 2e5 K.
     */
    private static double[][] layersAt(double time) {
        int n = MESH.size();
        double[][] v = new double[4][n];
        for (int k = 0; k < n; k++) {
            double s = k == n - 1 ? Math.log(MESH.exteriorFraction(n - 2)) - 1.0 : Math.log(MESH.exteriorFraction(k));
            double front = -8.0 - 0.16 * time;
            v[0][k] = 24.0 - 0.01 * s - 0.02 * time;
            v[1][k] = -7.0 + 0.3 * s + 0.05 * time;
            v[2][k] = 9.5 + 0.02 * s + 0.5 * Math.tanh((s - front) / 0.2);
            v[3][k] = 1.0e33;
        }
        return v;
    }

    private static double largestError(double[] guess, double[] exact) {
        double largest = 0.0;
        for (int k = 1; k < guess.length - 1; k++) {
            largest = Math.max(largest, Math.abs(guess[k] - exact[k]));
        }
        return largest;
    }

    @Test
    void aFrontMovingThroughTheMeshIsFollowedAlongIsotherms() {
        double[][] first = layersAt(0.0);
        double[][] before = layersAt(1.0);
        double[][] now = layersAt(2.0);
        double[][] exact = layersAt(3.0);
        // the parabola through the three at fixed mass, as the step's guess takes it
        double[][] fixedMass = new double[4][];
        for (int v = 0; v < 4; v++) {
            fixedMass[v] = new double[now[v].length];
            for (int k = 0; k < now[v].length; k++) {
                double slope = now[v][k] - before[v][k];
                double curvature = (slope - (before[v][k] - first[v][k])) / 2.0;
                fixedMass[v][k] = now[v][k] + slope + 2.0 * curvature;
            }
        }
        double[][] alongIsotherms = new double[4][];
        for (int v = 0; v < 4; v++) {
            alongIsotherms[v] = fixedMass[v].clone();
        }
        IsothermExtrapolation.apply(alongIsotherms, now, now, before, first, MESH, 1.0, 1.0, 1.0);
        double fixedError = largestError(fixedMass[2], exact[2]);
        double isothermError = largestError(alongIsotherms[2], exact[2]);
        // at fixed mass the front is missed by a good part of its height; along isotherms it is followed to the
        // interpolation error of the mesh
        assertThat(fixedError).isGreaterThan(0.1);
        assertThat(isothermError).isLessThan(0.1 * fixedError);
        assertThat(largestError(alongIsotherms[1], exact[1])).isLessThan(0.01);
        assertThat(largestError(alongIsotherms[0], exact[0])).isLessThan(1.0e-3);
    }

    @Test
    void hotterLayersKeepTheFixedMassExtrapolation() {
        double[][] first = layersAt(0.0);
        double[][] before = layersAt(1.0);
        double[][] now = layersAt(2.0);
        for (double[][] model : new double[][][] {first, before, now}) {
            for (int k = 0; k < model[2].length; k++) {
                model[2][k] += Math.log(1.0e3);
            }
        }
        double[][] target = {now[0].clone(), now[1].clone(), now[2].clone(), now[3].clone()};
        IsothermExtrapolation.apply(target, now, now, before, first, MESH, 1.0, 1.0, 1.0);
        for (int v = 0; v < 4; v++) {
            assertThat(target[v]).containsExactly(now[v]);
        }
    }
}
