package org.convgrid.engine.evolution;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.MassMesh;
import org.junit.jupiter.api.Test;

class SettlingStepTest {

    @Test
    void settlingConservesEverySpeciesAndMovesHeliumAndMetalsInward() {
        MassMesh mesh = TestMeshes.logit(40, -4.0, 4.0);
        int n = mesh.size();
        Composition[] c = new Composition[n];
        double[] area = new double[n];
        double[] vHe = new double[n];
        double[] vZ = new double[n];
        for (int k = 0; k < n; k++) {
            c[k] = Composition.scaledSolar(0.70, 0.02);
            area[k] = 1.0e20;
            vHe[k] = -1.0e-9;
            vZ[k] = -1.5e-9;
        }
        double dt = 1.0e16;
        Composition[] out = SettlingStep.settle(mesh, c, area, vHe, vZ, new boolean[n], dt);
        double[] before = TestMeshes.totals(mesh, c);
        double[] after = TestMeshes.totals(mesh, out);
        for (int i = 0; i < before.length; i++) {
            assertThat(after[i]).isCloseTo(before[i], within(1e-12 * mesh.totalMass()));
        }
        // the innermost cell gains helium and metals, the outermost loses them; hydrogen the other way
        assertThat(out[0].he4()).isGreaterThan(c[0].he4());
        assertThat(out[n - 1].he4()).isLessThan(c[n - 1].he4());
        assertThat(out[0].o16()).isGreaterThan(c[0].o16());
        assertThat(out[n - 1].h1()).isGreaterThan(c[n - 1].h1());
        // uniform flow: the cells in between only pass material on
        assertThat(out[n / 2].he4()).isCloseTo(c[n / 2].he4(), within(1e-12));
    }

    @Test
    void noVelocityNoChange() {
        MassMesh mesh = TestMeshes.logit(10, -3.0, 3.0);
        int n = mesh.size();
        Composition[] c = new Composition[n];
        for (int k = 0; k < n; k++) {
            c[k] = Composition.scaledSolar(0.70 - 0.01 * k, 0.02);
        }
        Composition[] out = SettlingStep.settle(mesh, c, new double[n], new double[n], new double[n], new boolean[n],
                1e16);
        for (int k = 0; k < n; k++) {
            assertThat(out[k].h1()).isCloseTo(c[k].h1(), within(1e-15));
        }
    }

    @Test
    void noFlowBetweenTwoMixedPoints() {
        MassMesh mesh = TestMeshes.logit(12, -3.0, 3.0);
        int n = mesh.size();
        Composition[] c = new Composition[n];
        double[] area = new double[n];
        double[] v = new double[n];
        boolean[] mixed = new boolean[n];
        for (int k = 0; k < n; k++) {
            c[k] = Composition.scaledSolar(0.70, 0.02);
            area[k] = 1.0e20;
            v[k] = -1.0e-9;
            mixed[k] = k >= n / 2;
        }
        Composition[] out = SettlingStep.settle(mesh, c, area, v, v, mixed, 1.0e16);
        // inside the mixed zone flows cancel nothing and move nothing; its lowest point alone loses helium,
        // through the zone's lower edge
        for (int k = n / 2 + 1; k < n; k++) {
            assertThat(out[k].he4()).isEqualTo(c[k].he4());
        }
        assertThat(out[n / 2].he4()).isLessThan(c[n / 2].he4());
    }

    @Test
    void anExhaustedCentreGivesNoHydrogenItDoesNotHave() {
        MassMesh mesh = TestMeshes.logit(12, -3.0, 3.0);
        int n = mesh.size();
        Composition[] c = new Composition[n];
        double[] area = new double[n];
        double[] v = new double[n];
        for (int k = 0; k < n; k++) {
            c[k] = k == 0 ? Composition.scaledSolar(0.0, 0.02) : Composition.scaledSolar(0.70, 0.02);
            area[k] = 1.0e22;
            v[k] = -1.0e-6;
        }
        Composition[] out = SettlingStep.settle(mesh, c, area, v, v, new boolean[n], 1.0e16);
        double[] before = TestMeshes.totals(mesh, c);
        double[] after = TestMeshes.totals(mesh, out);
        for (int i = 0; i < before.length; i++) {
            assertThat(after[i]).isCloseTo(before[i], within(1e-12 * mesh.totalMass()));
        }
        assertThat(out[0].h1()).isGreaterThanOrEqualTo(0.0);
    }

    @Test
    void combiningTheTwoDiffusionsConservesEverySpecies() {
        // helium from one diffusion, metals from the other, hydrogen the balance: each total is kept
        MassMesh mesh = TestMeshes.logit(30, -3.0, 3.0);
        int n = mesh.size();
        Composition[] c = new Composition[n];
        double[] fast = new double[n];
        double[] slow = new double[n];
        for (int k = 0; k < n; k++) {
            c[k] = Composition.scaledSolar(0.60 + 0.1 * k / n, 0.01 + 0.01 * k / n);
            fast[k] = 1.0e40;
            slow[k] = 1.0e39;
        }
        Composition[] out = SettlingStep.combine(SemiconvectiveMixing.diffuse(mesh, c, fast, 1.0e16),
                SemiconvectiveMixing.diffuse(mesh, c, slow, 1.0e16));
        double[] before = TestMeshes.totals(mesh, c);
        double[] after = TestMeshes.totals(mesh, out);
        for (int i = 0; i < before.length; i++) {
            assertThat(after[i]).isCloseTo(before[i], within(1e-12 * mesh.totalMass()));
        }
        // the metals moved less than helium did: their coefficient is ten times smaller
        double heliumMove = Math.abs(out[0].he4() - c[0].he4()) / c[0].he4();
        double metalMove = Math.abs(out[0].o16() - c[0].o16()) / c[0].o16();
        assertThat(metalMove).isLessThan(heliumMove);
    }
}
